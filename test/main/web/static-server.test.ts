// The browser-mode server: serves only the given folder, on localhost, with the app's
// Content-Security-Policy on every response; paths that climb out of the folder are refused.

import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { request } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CONTENT_SECURITY_POLICY } from '../../../main/ipc/content-security-policy';
import { serveStatic, type RunningServer } from '../../../main/web/static-server';

let server: RunningServer;
let root: string;

// A raw request, so the path reaches the server exactly as written (no client-side normalising).
function get(path: string): Promise<{ status: number; headers: Record<string, string | string[] | undefined>; body: string }> {
  return new Promise((resolve, reject) => {
    const req = request({ host: '127.0.0.1', port: server.port, path, method: 'GET' }, (res) => {
      let body = '';
      res.on('data', (chunk) => (body += chunk));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body }));
    });
    req.on('error', reject);
    req.end();
  });
}

beforeAll(async () => {
  const base = mkdtempSync(join(tmpdir(), 'lw-serve-'));
  root = join(base, 'site');
  mkdirSync(join(root, 'assets'), { recursive: true });
  writeFileSync(join(root, 'index.html'), '<!doctype html><title>t</title>');
  writeFileSync(join(root, 'assets', 'app.js'), 'export {}');
  writeFileSync(join(base, 'secret.txt'), 'not for the browser');
  server = await serveStatic(root, 0);
});

afterAll(async () => {
  await server?.close();
});

describe('static server', () => {
  it('listens on localhost only and serves index.html for the root with the app CSP', async () => {
    expect(server.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/$/);
    const page = await get('/');
    expect(page.status).toBe(200);
    expect(page.body).toContain('<title>t</title>');
    expect(page.headers['content-security-policy']).toBe(CONTENT_SECURITY_POLICY);
    const script = await get('/assets/app.js');
    expect(script.headers['content-type']).toMatch(/^text\/javascript/);
  });

  it('makes the app cross-origin isolated: COOP same-origin and COEP require-corp on the page and its scripts (HTML Standard, cross-origin isolation)', async () => {
    for (const path of ['/', '/assets/app.js']) {
      const answer = await get(path);
      expect(answer.headers['cross-origin-opener-policy'], path).toBe('same-origin');
      expect(answer.headers['cross-origin-embedder-policy'], path).toBe('require-corp');
      expect(answer.headers['cross-origin-resource-policy'], path).toBe('same-origin');
    }
  });

  it('refuses paths outside the folder and answers 404 for missing files', async () => {
    for (const path of ['/../secret.txt', '/%2e%2e/secret.txt', '/assets/../../secret.txt', '/..%2fsecret.txt']) {
      const answer = await get(path);
      expect(answer.status, path).not.toBe(200);
      expect(answer.body).not.toContain('not for the browser');
    }
    expect((await get('/missing.js')).status).toBe(404);
  });

  it('answers 404 for a folder without index.html and keeps serving', async () => {
    expect((await get('/assets/')).status).toBe(404);
    expect((await get('/assets')).status).toBe(404);
    expect((await get('/assets/app.js')).status).toBe(200);
  });
});

// A raw request with any method and Host header.
function send(method: string, host: string, path = '/'): Promise<{ status: number; headers: Record<string, string | string[] | undefined>; body: string }> {
  return new Promise((resolve, reject) => {
    const req = request({ host: '127.0.0.1', port: server.port, path, method, headers: { host } }, (res) => {
      let body = '';
      res.on('data', (chunk) => (body += chunk));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body }));
    });
    req.on('error', reject);
    req.end();
  });
}

describe('methods and Host (RFC 9110: 405 Method Not Allowed with Allow; 421 Misdirected Request)', () => {
  it('answers GET and HEAD, and 405 with Allow to every other method', async () => {
    const host = `127.0.0.1:${server.port}`;
    expect((await send('GET', host)).status).toBe(200);
    const head = await send('HEAD', host);
    expect(head.status).toBe(200);
    expect(head.body).toBe('');
    expect(head.headers['content-security-policy']).toBe(CONTENT_SECURITY_POLICY);
    for (const method of ['POST', 'PUT', 'DELETE', 'PATCH', 'OPTIONS']) {
      const r = await send(method, host, '/index.html');
      expect(r.status, method).toBe(405);
      expect(r.headers.allow).toBe('GET, HEAD');
      expect(r.body).not.toContain('<title>');
    }
  });
  it('answers 421 to a Host other than its own loopback name and port', async () => {
    expect((await send('GET', `localhost:${server.port}`)).status).toBe(200);
    for (const host of ['evil.example', `evil.example:${server.port}`, '127.0.0.1', `127.0.0.1:${server.port + 1}`, `127.0.0.1.nip.io:${server.port}`]) {
      const r = await send('GET', host, '/index.html');
      expect(r.status, host).toBe(421);
      expect(r.body).not.toContain('<title>');
    }
  });
});
