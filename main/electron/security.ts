// The desktop window's security settings, following Electron's security checklist: isolated and
// sandboxed renderer without Node, a strict Content-Security-Policy, and an offline session that
// refuses every network request, permission, new window, download and navigation away from the app.
// Electron objects come in as parameters so tests can hand in fakes.

import type { Session, WebContents, WebPreferences } from 'electron';
import { CONTENT_SECURITY_POLICY } from '../ipc/content-security-policy';
import { APP_ORIGIN, isAppPageUrl, isAppUrl } from './app-page';

/** webPreferences of every Lanewright window. */
export function secureWebPreferences(preloadPath: string, allowDevTools: boolean): WebPreferences {
  return {
    preload: preloadPath,
    contextIsolation: true,
    sandbox: true,
    nodeIntegration: false,
    nodeIntegrationInWorker: false,
    nodeIntegrationInSubFrames: false,
    webSecurity: true,
    allowRunningInsecureContent: false,
    webviewTag: false,
    experimentalFeatures: false,
    navigateOnDragDrop: false,
    safeDialogs: true,
    spellcheck: false,
    devTools: allowDevTools,
  };
}

// Schemes a page may load from. Everything else (http, https, ws, ftp, file, ...) is refused: the
// app works offline and reads files only through the host. `devtools:` serves the DevTools window.
const ALLOWED_SCHEMES = new Set(['data:', 'blob:', 'devtools:']);

/** True when the session may let a request for `url` through. */
export function isAllowedRequestUrl(url: string): boolean {
  if (isAppUrl(url)) return true;
  try {
    return ALLOWED_SCHEMES.has(new URL(url).protocol);
  } catch {
    return false;
  }
}

// Writing to the clipboard (the "copy" buttons of tables) is the one permission the app's own page
// may use; it is user-initiated and reveals nothing.
const PERMITTED_FOR_APP = new Set(['clipboard-sanitized-write']);

/** True when `origin` may use `permission`. */
export function isPermissionAllowed(permission: string, origin: string | null | undefined): boolean {
  return PERMITTED_FOR_APP.has(permission) && origin !== null && origin !== undefined && origin.replace(/\/$/, '') === APP_ORIGIN;
}

/** The parts of a Session the guards use. */
export type GuardedSession = {
  webRequest: Pick<Session['webRequest'], 'onBeforeRequest' | 'onHeadersReceived'>;
} & Pick<Session, 'setPermissionRequestHandler' | 'setPermissionCheckHandler' | 'setDevicePermissionHandler' | 'on'>;

/** Installs the network, header, permission and download guards on a session. */
export function installSessionGuards(session: GuardedSession): void {
  session.webRequest.onBeforeRequest((details, callback) => {
    callback({ cancel: !isAllowedRequestUrl(details.url) });
  });
  session.webRequest.onHeadersReceived((details, callback) => {
    const headers = { ...(details.responseHeaders ?? {}) };
    for (const key of Object.keys(headers)) {
      if (key.toLowerCase() === 'content-security-policy') delete headers[key];
    }
    headers['Content-Security-Policy'] = [CONTENT_SECURITY_POLICY];
    callback({ responseHeaders: headers });
  });
  session.setPermissionRequestHandler((webContents, permission, callback) => {
    callback(isPermissionAllowed(permission, originOf(webContents.getURL())));
  });
  session.setPermissionCheckHandler((_webContents, permission, requestingOrigin) => isPermissionAllowed(permission, requestingOrigin));
  session.setDevicePermissionHandler(() => false);
  session.on('will-download', (event, item) => {
    // Exports are written by the host after a save dialog; the page never downloads anything.
    event.preventDefault();
    item.cancel();
  });
}

function originOf(url: string): string | null {
  try {
    const parsed = new URL(url);
    return `${parsed.protocol}//${parsed.host}`;
  } catch {
    return null;
  }
}

/** The parts of WebContents the guards use. */
export type GuardedWebContents = Pick<WebContents, 'setWindowOpenHandler' | 'on'>;

/** Denies new windows, navigation and redirects away from the app page, and webviews. */
export function guardWebContents(contents: GuardedWebContents): void {
  contents.setWindowOpenHandler(() => ({ action: 'deny' }));
  contents.on('will-navigate', (event, url) => {
    if (!isAppPageUrl(url)) event.preventDefault();
  });
  contents.on('will-redirect', (event, url) => {
    if (!isAppUrl(url)) event.preventDefault();
  });
  contents.on('will-attach-webview', (event) => {
    event.preventDefault();
  });
}
