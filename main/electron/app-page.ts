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
