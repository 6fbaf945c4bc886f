// Builds the real main and preload bundles and runs them against a fake 'electron' module, so the
// wiring in main/electron/main.ts (the one file that imports Electron) is checked end to end.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { createRequire, builtinModules } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildMain, type BundleImports } from '../../../main/build/build-main';
import { CHANNEL_NAMES } from '../../../main/ipc/channels';
import { APP_PAGE_URL } from '../../../main/electron/app-page';
import { fakeElectron } from './fake-electron';

let outDir: string;
let imports: BundleImports;

beforeAll(async () => {
  outDir = await mkdtemp(join(tmpdir(), 'lw-bundle-'));
  imports = await buildMain(outDir);
});
afterAll(async () => {
  await rm(outDir, { recursive: true, force: true });
});

async function run(bundle: string, electron: unknown): Promise<void> {
  const file = join(outDir, bundle);
  const code = await readFile(file, 'utf8');
  const realRequire = createRequire(file);
  const module = { exports: {} };
  const fakeRequire = (name: string) => (name === 'electron' ? electron : realRequire(name));
  new Function('require', 'module', 'exports', '__dirname', '__filename', code)(fakeRequire, module, module.exports, outDir, file);
}

describe('bundles', () => {
  it('leaves only electron for the sandboxed preload to require', () => {
    expect(imports.preload).toEqual(['electron']);
  });

  it('leaves only electron and Node built-ins for the main process to require', () => {
    const builtins = new Set(builtinModules.flatMap((m) => [m, `node:${m}`]));
    expect(imports.main.filter((m) => m !== 'electron' && !builtins.has(m))).toEqual([]);
  });

  it('the preload exposes exactly window.lanewright with the host methods', async () => {
    const fake = fakeElectron();
    await run('preload.cjs', fake.electron);
    expect([...fake.calls.exposed.keys()]).toEqual(['lanewright']);
    const host = fake.calls.exposed.get('lanewright');
    expect(Object.keys(host).sort()).toEqual(['appInfo', 'kind', 'onMenuCommand', 'openWorkspace', 'pickFile', 'readFile', 'recentWorkspaces', 'saveExport', 'saveWorkspace', 'setDirty']);
    expect(await host.pickFile('lanes')).toEqual({ channel: 'file:pick-and-read', request: { kind: 'lanes' } });
  });

  it('the main process sets up scheme, sandbox, session guards, IPC, menu and a secure window', async () => {
    const fake = fakeElectron();
    await run('main.cjs', fake.electron);
    // Before ready: privileged scheme and the global sandbox.
    expect(fake.calls.privileged).toMatchObject([{ scheme: 'lanewright', privileges: { standard: true, secure: true } }]);
    expect(fake.calls.sandboxEnabled).toBe(true);
    fake.ready();
    await new Promise((r) => setTimeout(r, 50));
    expect(Object.keys(fake.sessionHandlers).sort()).toEqual(['beforeRequest', 'devicePermission', 'headersReceived', 'permissionCheck', 'permissionRequest', 'will-download']);
    expect([...fake.calls.protocolHandlers.keys()]).toEqual(['lanewright']);
    expect([...fake.ipcHandlers.keys()].sort()).toEqual([...CHANNEL_NAMES].sort());
    expect(fake.calls.menus).toHaveLength(1);
    expect(fake.windows).toHaveLength(1);
    const [win] = fake.windows;
    expect(win.loaded).toBe(APP_PAGE_URL);
    expect(win.options.webPreferences).toMatchObject({ preload: join(outDir, 'preload.cjs'), contextIsolation: true, sandbox: true, nodeIntegration: false, webSecurity: true });

    // Every web contents created later gets the navigation and window guards.
    const contents = { handlers: {} as Record<string, unknown>, setWindowOpenHandler(h: unknown) { this.handlers.open = h; }, on(n: string, h: unknown) { this.handlers[n] = h; } };
    fake.electron.app.emit('web-contents-created', {}, contents);
    expect(Object.keys(contents.handlers).sort()).toEqual(['open', 'will-attach-webview', 'will-navigate', 'will-redirect']);

    // An IPC call from a foreign frame is refused by the real wiring.
    const refused = await fake.ipcHandlers.get('app:info')!({ senderFrame: { url: 'https://example.org', parent: null } }, {});
    expect(refused).toMatchObject({ ok: false, failure: { error: 'IpcSenderError' } });
    const info = await fake.ipcHandlers.get('app:info')!({ senderFrame: { url: APP_PAGE_URL, parent: null } }, {});
    expect(info).toMatchObject({ ok: true, value: { name: 'Lanewright', version: '0.1.0' } });

    fake.electron.app.emit('window-all-closed');
    expect(fake.calls.quit).toBe(1);
  });
});
