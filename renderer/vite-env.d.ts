// Module shapes vite provides at build time: `?raw` imports give the file's text (the bundled
// the sample carrier), and `*.css` imports are side effects.
declare module '*?raw' {
  const text: string;
  export default text;
}
declare module '*.css';
