// Where the renderer is served from. The window loads lanewright://app/index.html, a privileged
// custom scheme backed by the built renderer folder (dist/renderer), rather than file:// URLs: the
// page gets a real origin for its Content-Security-Policy, and no other local file is reachable.

import path from 'node:path';

/** Scheme of the app's own pages. */
export const APP_SCHEME = 'lanewright';
/** Host part of every app URL. */
export const APP_HOST = 'app';
/** Origin of the app's pages. */
export const APP_ORIGIN = `${APP_SCHEME}://${APP_HOST}`;
/** The page the main window loads. */
export const APP_PAGE_URL = `${APP_ORIGIN}/index.html`;

/** True when `url` is the app's main page (query and fragment ignored: the renderer may route with them). */
export function isAppPageUrl(url: string): boolean {
  let parsed: URL;
  try {
    parsed = new URL(url);
  } catch {
    return false;
  }
  return parsed.protocol === `${APP_SCHEME}:` && parsed.host === APP_HOST && (parsed.pathname === '/index.html' || parsed.pathname === '/');
}

/** True when `url` is any resource of the app (page, script, style, image, worker). */
export function isAppUrl(url: string): boolean {
  try {
    const parsed = new URL(url);
    return parsed.protocol === `${APP_SCHEME}:` && parsed.host === APP_HOST;
  } catch {
    return false;
  }
}

/**
 * The file under `rootDir` that an app URL names, or null when the URL is not an app URL or would
 * leave the folder (`..`, encoded separators, absolute paths).
 */
export function resolveAppAsset(url: string, rootDir: string, api: typeof path = path): string | null {
  if (!isAppUrl(url)) return null;
  let pathname: string;
  try {
    pathname = decodeURIComponent(new URL(url).pathname);
  } catch {
    return null;
  }
  if (pathname.includes('\0') || pathname.includes('\\')) return null;
  const relative = pathname === '/' ? 'index.html' : pathname.replace(/^\/+/, '');
  const root = api.resolve(rootDir);
  const resolved = api.resolve(root, relative);
  const inside = api.relative(root, resolved);
  if (inside === '' || inside.startsWith('..') || api.isAbsolute(inside)) return null;
  return resolved;
}

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
  return CONTENT_TYPES[path.extname(file).toLowerCase()] ?? 'application/octet-stream';
}
