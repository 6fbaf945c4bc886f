// A small static file server for browser mode (`npm run web`) and the end-to-end tests: serves the
// built renderer from one folder on localhost only, with the same Content-Security-Policy as the app
// and cross-origin isolated as the desktop window is.

import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { createServer, type Server } from 'node:http';
import { join, normalize, resolve, sep } from 'node:path';
import { CONTENT_SECURITY_POLICY } from '../ipc/content-security-policy';
import { CROSS_ORIGIN_ISOLATION_HEADERS } from '../ipc/cross-origin-isolation';
import { contentTypeFor } from '../ipc/content-types';

export interface RunningServer {
  server: Server;
  port: number;
  url: string;
  close(): Promise<void>;
}

/** Methods answered; every other one gets 405 (the server only hands out files). */
const ALLOWED_METHODS = 'GET, HEAD';

/**
 * Serves `root` on 127.0.0.1:`port` (0 = any free port). Paths outside `root` are refused; methods
 * other than GET and HEAD get 405; a Host header other than this server's loopback name and port
 * gets 421, so a page on another site cannot reach it through a DNS name rebound to 127.0.0.1.
 */
export function serveStatic(root: string, port: number): Promise<RunningServer> {
  const base = resolve(root);
  let hosts = new Set<string>();
  const server = createServer(async (request, response) => {
    try {
      if (!hosts.has((request.headers.host ?? '').toLowerCase())) {
        response.writeHead(421, { 'content-type': 'text/plain' }).end('misdirected request: this server answers only to its loopback address');
        return;
      }
      if (request.method !== 'GET' && request.method !== 'HEAD') {
        response.writeHead(405, { allow: ALLOWED_METHODS, 'content-type': 'text/plain' }).end('method not allowed');
        return;
      }
      const url = new URL(request.url ?? '/', 'http://localhost');
      const relative = normalize(decodeURIComponent(url.pathname)).replace(/^([/\\])+/, '');
      let file = join(base, relative === '' ? 'index.html' : relative);
      if (file !== base && !file.startsWith(base + sep)) {
        response.writeHead(403).end('outside the served folder');
        return;
      }
      let info = await stat(file).catch(() => null);
      if (info?.isDirectory()) {
        file = join(file, 'index.html');
        info = await stat(file).catch(() => null);
      }
      if (!info?.isFile()) {
        response.writeHead(404, { 'content-type': 'text/plain' }).end('not found');
        return;
      }
      response.writeHead(200, {
        'content-type': contentTypeFor(file),
        'cache-control': 'no-cache',
        'x-content-type-options': 'nosniff',
        'content-security-policy': CONTENT_SECURITY_POLICY,
        // Cross-origin isolated, as the desktop window is: the headroom workers share memory.
        ...CROSS_ORIGIN_ISOLATION_HEADERS,
      });
      if (request.method === 'HEAD') {
        response.end();
        return;
      }
      // A read error after the header went out (file removed meanwhile) ends this response only;
      // unhandled, it would stop the whole server.
      createReadStream(file)
        .on('error', () => response.destroy())
        .pipe(response);
    } catch {
      response.writeHead(400).end('bad request');
    }
  });
  return new Promise((resolveStart, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => {
      const address = server.address();
      const actual = typeof address === 'object' && address ? address.port : port;
      hosts = new Set([`127.0.0.1:${actual}`, `localhost:${actual}`]);
      resolveStart({
        server,
        port: actual,
        url: `http://127.0.0.1:${actual}/`,
        close: () => new Promise((done) => server.close(() => done())),
      });
    });
  });
}
