// Builds the renderer (React UI + engine Web Worker) into dist/renderer. Relative base so the
// Electron window can loadFile() it and the browser mode can serve it from any folder.
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

export default defineConfig({
  root: 'renderer',
  base: './',
  plugins: [react()],
  build: {
    outDir: '../dist/renderer',
    emptyOutDir: true,
    sourcemap: true,
    chunkSizeWarningLimit: 2000,
  },
  worker: { format: 'es' },
  server: { port: 5178, strictPort: false },
});
