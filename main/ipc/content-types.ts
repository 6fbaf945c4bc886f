// Content-Type of each file the renderer build holds, in one place for both servers of the page:
// the desktop's app scheme and the browser-mode static server. Pure data, so either may import it.

const CONTENT_TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.geojson': 'application/geo+json; charset=utf-8',
  '.csv': 'text/csv; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.jpg': 'image/jpeg',
  '.jpeg': 'image/jpeg',
  '.webp': 'image/webp',
  '.ico': 'image/x-icon',
  '.woff2': 'font/woff2',
  '.woff': 'font/woff',
  '.wasm': 'application/wasm',
  '.map': 'application/json; charset=utf-8',
  '.txt': 'text/plain; charset=utf-8',
};

/** Content-Type header for a file name (module scripts need a JavaScript type to run). */
export function contentTypeFor(file: string): string {
  const extension = /\.[^./\\]*$/.exec(file)?.[0] ?? '';
  return CONTENT_TYPES[extension.toLowerCase()] ?? 'application/octet-stream';
}
