// A stand-in for the 'electron' module at its boundary, recording what the bundled main process and
// preload do with it. Only the members Lanewright touches exist; anything else would throw.
import { EventEmitter } from 'node:events';

export function fakeElectron() {
  const calls: { privileged: unknown[]; sandboxEnabled: boolean; protocolHandlers: Map<string, (r: Request) => Promise<Response>>; menus: unknown[]; quit: number; exposed: Map<string, any> } = {
    privileged: [],
    sandboxEnabled: false,
    protocolHandlers: new Map(),
    menus: [],
    quit: 0,
    exposed: new Map(),
  };
  let readyResolve!: () => void;
  const ready = new Promise<void>((r) => (readyResolve = r));
  const app = Object.assign(new EventEmitter(), {
    isPackaged: false,
    getVersion: () => '0.1.0',
    getPath: (name: string) => `/tmp/lanewright-fake-${name}`,
    setName: () => {},
    enableSandbox: () => (calls.sandboxEnabled = true),
    requestSingleInstanceLock: () => true,
    whenReady: () => ready,
    setAboutPanelOptions: () => {},
    quit: () => calls.quit++,
  });
  const sessionHandlers: Record<string, unknown> = {};
  const defaultSession = {
    webRequest: {
      onBeforeRequest: (l: unknown) => (sessionHandlers.beforeRequest = l),
      onHeadersReceived: (l: unknown) => (sessionHandlers.headersReceived = l),
    },
    setPermissionRequestHandler: (l: unknown) => (sessionHandlers.permissionRequest = l),
    setPermissionCheckHandler: (l: unknown) => (sessionHandlers.permissionCheck = l),
    setDevicePermissionHandler: (l: unknown) => (sessionHandlers.devicePermission = l),
    on: (name: string, l: unknown) => (sessionHandlers[name] = l),
    protocol: { handle: (scheme: string, h: (r: Request) => Promise<Response>) => calls.protocolHandlers.set(scheme, h) },
  };
  const ipcHandlers = new Map<string, (...a: unknown[]) => unknown>();
  const windows: any[] = [];
  class BrowserWindow extends EventEmitter {
    loaded: string | null = null;
    webContents = Object.assign(new EventEmitter(), { send: () => {} });
    constructor(readonly options: any) {
      super();
      windows.push(this);
    }
    loadURL(url: string) {
      this.loaded = url;
      return Promise.resolve();
    }
    show() {}
    isDestroyed() {
      return false;
    }
    close() {}
  }
  const rendererListeners = new Map<string, Set<(...a: unknown[]) => void>>();
  const electron = {
    app,
    BrowserWindow,
    dialog: { showMessageBoxSync: () => 2, showOpenDialog: async () => ({ canceled: true, filePaths: [] }), showSaveDialog: async () => ({ canceled: true }), showErrorBox: () => {} },
    ipcMain: { handle: (c: string, h: (...a: unknown[]) => unknown) => ipcHandlers.set(c, h), removeHandler: (c: string) => ipcHandlers.delete(c) },
    Menu: { buildFromTemplate: (t: unknown) => ({ template: t }), setApplicationMenu: (m: unknown) => calls.menus.push(m) },
    protocol: { registerSchemesAsPrivileged: (s: unknown[]) => calls.privileged.push(...s) },
    session: { defaultSession },
    contextBridge: { exposeInMainWorld: (key: string, api: unknown) => calls.exposed.set(key, api) },
    ipcRenderer: {
      invoke: async (channel: string, request: unknown) => ({ channel, request }),
      on: (c: string, l: (...a: unknown[]) => void) => {
        if (!rendererListeners.has(c)) rendererListeners.set(c, new Set());
        rendererListeners.get(c)!.add(l);
      },
      removeListener: (c: string, l: (...a: unknown[]) => void) => rendererListeners.get(c)?.delete(l),
    },
  };
  return { electron, calls, sessionHandlers, ipcHandlers, windows, ready: () => readyResolve() };
}
