// Checks the window and session settings against Electron's security checklist
// (electronjs.org/docs/latest/tutorial/security): isolation, sandbox, no Node in the page, web
// security on, a Content-Security-Policy, permission handlers, no new windows or navigation.
import { describe, expect, it, vi } from 'vitest';
import { guardWebContents, installSessionGuards, isAllowedRequestUrl, secureWebPreferences, type GuardedSession, type GuardedWebContents } from '../../../main/electron/security';
import { CONTENT_SECURITY_POLICY } from '../../../main/ipc/content-security-policy';
import { APP_PAGE_URL } from '../../../main/electron/app-page';

type Listener = (...args: any[]) => any;

function fakeSession() {
  const captured: Record<string, Listener> = {};
  const session = {
    webRequest: {
      onBeforeRequest: (l: Listener) => (captured.beforeRequest = l),
      onHeadersReceived: (l: Listener) => (captured.headersReceived = l),
    },
    setPermissionRequestHandler: (l: Listener) => (captured.permissionRequest = l),
    setPermissionCheckHandler: (l: Listener) => (captured.permissionCheck = l),
    setDevicePermissionHandler: (l: Listener) => (captured.devicePermission = l),
    on: (name: string, l: Listener) => (captured[name] = l),
  };
  installSessionGuards(session as unknown as GuardedSession);
  return captured;
}

function beforeRequest(captured: Record<string, Listener>, url: string): boolean {
  let cancel: boolean | undefined;
  captured.beforeRequest({ url }, (response: { cancel?: boolean }) => (cancel = response.cancel));
  return cancel === true;
}

describe('webPreferences', () => {
  it('isolates and sandboxes the page and keeps Node out of it', () => {
    const prefs = secureWebPreferences('/app/dist/main/preload.cjs', false);
    expect(prefs).toMatchObject({
      preload: '/app/dist/main/preload.cjs',
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      webviewTag: false,
      experimentalFeatures: false,
      devTools: false,
    });
    expect(prefs).not.toHaveProperty('enableBlinkFeatures');
  });
});

describe('session guards', () => {
  it('refuses every network request; lets the app scheme, data: and blob: through', () => {
    const s = fakeSession();
    for (const url of ['https://tile.example.org/1/2/3.png', 'http://localhost:5178/', 'ws://127.0.0.1:9222', 'ftp://x/y', 'file:///etc/passwd', 'lanewright://other-host/index.html', 'chrome://gpu', 'not a url']) {
      expect(beforeRequest(s, url), url).toBe(true);
    }
    for (const url of [APP_PAGE_URL, 'lanewright://app/assets/index-abc.js', 'data:image/png;base64,AAAA', 'blob:lanewright://app/1234-5678']) {
      expect(beforeRequest(s, url), url).toBe(false);
    }
  });

  it('puts the app policy on every response, replacing any other policy', () => {
    const s = fakeSession();
    let headers: Record<string, string[]> = {};
    s.headersReceived(
      { responseHeaders: { 'content-security-policy': ["default-src *"], 'Content-Type': ['text/html'] } },
      (r: { responseHeaders: Record<string, string[]> }) => (headers = r.responseHeaders),
    );
    expect(headers).toEqual({ 'Content-Type': ['text/html'], 'Content-Security-Policy': [CONTENT_SECURITY_POLICY] });
  });

  it('denies permission requests and checks (camera, location, notifications, opening links...)', () => {
    const s = fakeSession();
    const appContents = { getURL: () => APP_PAGE_URL };
    for (const permission of ['media', 'geolocation', 'notifications', 'openExternal', 'midi', 'fullscreen', 'clipboard-read', 'unknown']) {
      const callback = vi.fn();
      s.permissionRequest(appContents, permission, callback, {});
      expect(callback, permission).toHaveBeenCalledWith(false);
      expect(s.permissionCheck(appContents, permission, 'lanewright://app', {}), permission).toBe(false);
    }
    expect(s.devicePermission({ deviceType: 'usb', origin: 'lanewright://app' })).toBe(false);
  });

  it('lets only the app page write to the clipboard (copy buttons)', () => {
    const s = fakeSession();
    const callback = vi.fn();
    s.permissionRequest({ getURL: () => APP_PAGE_URL }, 'clipboard-sanitized-write', callback, {});
    expect(callback).toHaveBeenCalledWith(true);
    const foreign = vi.fn();
    s.permissionRequest({ getURL: () => 'https://example.org/' }, 'clipboard-sanitized-write', foreign, {});
    expect(foreign).toHaveBeenCalledWith(false);
    expect(s.permissionCheck(null, 'clipboard-sanitized-write', 'file://', {})).toBe(false);
  });

  it('cancels downloads', () => {
    const s = fakeSession();
    const event = { preventDefault: vi.fn() };
    const item = { cancel: vi.fn() };
    s['will-download'](event, item);
    expect(event.preventDefault).toHaveBeenCalled();
    expect(item.cancel).toHaveBeenCalled();
  });

  it('classifies request URLs without a session too', () => {
    expect(isAllowedRequestUrl('https://example.org')).toBe(false);
    expect(isAllowedRequestUrl('lanewright://app/worker.js')).toBe(true);
  });
});

describe('web contents guards', () => {
  function guarded() {
    const captured: Record<string, Listener> = {};
    const contents = {
      setWindowOpenHandler: (l: Listener) => (captured.windowOpen = l),
      on: (name: string, l: Listener) => (captured[name] = l),
    };
    guardWebContents(contents as unknown as GuardedWebContents);
    return captured;
  }

  it('denies every new window', () => {
    const g = guarded();
    expect(g.windowOpen({ url: 'https://example.org' })).toEqual({ action: 'deny' });
    expect(g.windowOpen({ url: APP_PAGE_URL })).toEqual({ action: 'deny' });
  });

  it('blocks navigation and redirects away from the app page, and webviews', () => {
    const g = guarded();
    for (const url of ['https://example.org', 'file:///home/user/lanes.csv', 'lanewright://app/assets/x.js', 'javascript:alert(1)']) {
      const event = { preventDefault: vi.fn() };
      g['will-navigate'](event, url);
      expect(event.preventDefault, url).toHaveBeenCalled();
    }
    const reload = { preventDefault: vi.fn() };
    g['will-navigate'](reload, `${APP_PAGE_URL}#/routes`);
    expect(reload.preventDefault).not.toHaveBeenCalled();
    const redirect = { preventDefault: vi.fn() };
    g['will-redirect'](redirect, 'https://example.org');
    expect(redirect.preventDefault).toHaveBeenCalled();
    const webview = { preventDefault: vi.fn() };
    g['will-attach-webview'](webview, {}, {});
    expect(webview.preventDefault).toHaveBeenCalled();
  });
});
