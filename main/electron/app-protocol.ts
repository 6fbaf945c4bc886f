// Serves the built renderer on the app's own scheme (lanewright://app/...). Only files inside the
// renderer folder are reachable; every response carries the Content-Security-Policy header and the
// cross-origin isolation headers.

import { readFile } from 'node:fs/promises';
import type { CustomScheme } from 'electron';
import { CONTENT_SECURITY_POLICY } from '../ipc/content-security-policy';
import { CROSS_ORIGIN_ISOLATION_HEADERS } from '../ipc/cross-origin-isolation';
import { contentTypeFor } from '../ipc/content-types';
import { APP_SCHEME, resolveAppAsset } from './app-page';

/**
 * Registration of the app scheme; must be passed to protocol.registerSchemesAsPrivileged before the
 * app is ready. `standard` gives the pages an origin and relative URLs; `secure` makes it a secure
 * context; fetch is allowed for the page's own bundled assets (the basemap). CSP is never bypassed.
 * `corsEnabled` stays off: page, module scripts and worker share one origin, and off keeps the
 * scheme's files unreadable from any other origin.
 */
export const APP_SCHEME_PRIVILEGES: CustomScheme = {
  scheme: APP_SCHEME,
  privileges: { standard: true, secure: true, supportFetchAPI: true, corsEnabled: false, bypassCSP: false, allowServiceWorkers: false, stream: false, codeCache: true },
};

/** Reads a file's bytes; a parameter so tests can serve from memory. */
export type ReadBytes = (file: string) => Promise<Uint8Array>;

/** A protocol.handle handler serving files under `rootDir`. */
export function createAppProtocolHandler(rootDir: string, read: ReadBytes = (f) => readFile(f)): (request: Request) => Promise<Response> {
  return async (request) => {
    // Cross-origin isolated (the headroom workers share memory); errors carry the headers too.
    const headers = { 'Content-Security-Policy': CONTENT_SECURITY_POLICY, 'X-Content-Type-Options': 'nosniff', ...CROSS_ORIGIN_ISOLATION_HEADERS };
    if (request.method !== 'GET' && request.method !== 'HEAD') {
      return new Response('method not allowed', { status: 405, headers });
    }
    const file = resolveAppAsset(request.url, rootDir);
    if (file === null) return new Response('not found', { status: 404, headers });
    try {
      const body = await read(file);
      return new Response(request.method === 'HEAD' ? null : (body as Uint8Array<ArrayBuffer>), {
        status: 200,
        headers: { ...headers, 'Content-Type': contentTypeFor(file) },
      });
    } catch {
      return new Response('not found', { status: 404, headers });
    }
  };
}
