import { describe, expect, it } from 'vitest';
import path from 'node:path';
import { APP_PAGE_URL, isAppPageUrl, resolveAppAsset } from '../../../main/electron/app-page';
import { contentTypeFor } from '../../../main/ipc/content-types';
import { APP_SCHEME_PRIVILEGES, createAppProtocolHandler } from '../../../main/electron/app-protocol';
import { CONTENT_SECURITY_POLICY } from '../../../main/ipc/content-security-policy';

const root = path.resolve('/opt/lanewright/dist/renderer');

describe('app URLs', () => {
  it('recognises the app page with or without a fragment or query', () => {
    expect(isAppPageUrl(APP_PAGE_URL)).toBe(true);
    expect(isAppPageUrl(`${APP_PAGE_URL}#/loops`)).toBe(true);
    expect(isAppPageUrl('lanewright://app/')).toBe(true);
    expect(isAppPageUrl('lanewright://app/assets/index.js')).toBe(false);
    expect(isAppPageUrl('lanewright://evil/index.html')).toBe(false);
    expect(isAppPageUrl('file:///opt/lanewright/dist/renderer/index.html')).toBe(false);
    expect(isAppPageUrl('https://app/index.html')).toBe(false);
  });

  it('maps app URLs to files inside the renderer folder only', () => {
    expect(resolveAppAsset(APP_PAGE_URL, root)).toBe(path.join(root, 'index.html'));
    expect(resolveAppAsset('lanewright://app/', root)).toBe(path.join(root, 'index.html'));
    expect(resolveAppAsset('lanewright://app/assets/worker-1a2b.js', root)).toBe(path.join(root, 'assets', 'worker-1a2b.js'));
    // The URL parser folds plain and %2e-encoded dot segments (WHATWG URL), so these stay inside.
    expect(resolveAppAsset('lanewright://app/../../etc/passwd', root)).toBe(path.join(root, 'etc', 'passwd'));
    expect(resolveAppAsset('lanewright://app/%2e%2e/%2e%2e/etc/passwd', root)).toBe(path.join(root, 'etc', 'passwd'));
    // Encoded separators would survive the parser and escape after decoding: refused.
    expect(resolveAppAsset('lanewright://app/..%2f..%2fetc%2fpasswd', root)).toBeNull();
    expect(resolveAppAsset('lanewright://app/..%5c..%5csecret', root)).toBeNull();
    expect(resolveAppAsset('lanewright://app/a%00.js', root)).toBeNull();
    expect(resolveAppAsset('lanewright://app/%E0%A4%A', root)).toBeNull();
    expect(resolveAppAsset('lanewright://other/index.html', root)).toBeNull();
  });

  it('serves module scripts with a JavaScript type', () => {
    expect(contentTypeFor('index-abc.js')).toMatch(/^text\/javascript/);
    expect(contentTypeFor('index.HTML')).toMatch(/^text\/html/);
    expect(contentTypeFor('blob.bin')).toBe('application/octet-stream');
  });
});

describe('app protocol handler', () => {
  const files = new Map([[path.join(root, 'index.html'), new TextEncoder().encode('<!doctype html><title>x</title>')]]);
  const handler = createAppProtocolHandler(root, async (file) => {
    const bytes = files.get(file);
    if (!bytes) throw Object.assign(new Error('missing'), { code: 'ENOENT' });
    return bytes;
  });

  it('serves the page with the policy and a content type', async () => {
    const response = await handler(new Request(APP_PAGE_URL));
    expect(response.status).toBe(200);
    expect(response.headers.get('content-security-policy')).toBe(CONTENT_SECURITY_POLICY);
    expect(response.headers.get('content-type')).toMatch(/^text\/html/);
    expect(response.headers.get('x-content-type-options')).toBe('nosniff');
    expect(await response.text()).toContain('<title>x</title>');
  });

  it('makes the page cross-origin isolated: COOP same-origin, COEP require-corp on every answer (HTML Standard, cross-origin isolation)', async () => {
    for (const response of [await handler(new Request(APP_PAGE_URL)), await handler(new Request('lanewright://app/missing.js'))]) {
      expect(response.headers.get('cross-origin-opener-policy')).toBe('same-origin');
      expect(response.headers.get('cross-origin-embedder-policy')).toBe('require-corp');
      expect(response.headers.get('cross-origin-resource-policy')).toBe('same-origin');
    }
  });

  it('answers 404 outside the folder or for missing files, 405 for writes', async () => {
    expect((await handler(new Request('lanewright://app/..%2f..%2fetc%2fpasswd'))).status).toBe(404);
    expect((await handler(new Request('lanewright://app/missing.js'))).status).toBe(404);
    expect((await handler(new Request(APP_PAGE_URL, { method: 'POST', body: 'x' }))).status).toBe(405);
  });

  it('registers a standard, secure scheme that does not bypass the policy', () => {
    expect(APP_SCHEME_PRIVILEGES).toMatchObject({ scheme: 'lanewright', privileges: { standard: true, secure: true, bypassCSP: false } });
  });
});
