// Entry point of the Electron main process (bundled to dist/main/main.cjs). The only file that
// touches the real Electron module; everything it wires is tested with fakes in test/main/electron.

import path from 'node:path';
import { app, BrowserWindow, dialog, ipcMain, Menu, protocol, session } from 'electron';
import { CAUTIONS, PRODUCT_NAME } from '../../engine/index';
import { MENU_COMMAND_CHANNEL, type MenuCommand, type RecentWorkspace } from '../ipc/contract';
import { RecentStore } from '../workspace/recent-list';
import { APP_SCHEME } from './app-page';
import { APP_SCHEME_PRIVILEGES, createAppProtocolHandler } from './app-protocol';
import { FileGrants } from './file-grants';
import { createHostService } from './host-service';
import { registerIpcHandlers } from './ipc-handlers';
import { createMainWindow } from './main-window';
import { buildMenuTemplate } from './menu';
import { ElectronDialogs } from './native-dialogs';
import { QuitGuard } from './quit-guard';
import { guardWebContents, installSessionGuards } from './security';

// Bundled layout: dist/main/main.cjs, dist/main/preload.cjs, dist/main/icon.png, dist/renderer/index.html.
const here = __dirname;
const rendererDir = path.join(here, '..', 'renderer');
const preloadPath = path.join(here, 'preload.cjs');
const iconPath = path.join(here, 'icon.png');

// Must happen before 'ready'.
protocol.registerSchemesAsPrivileged([APP_SCHEME_PRIVILEGES]);
app.enableSandbox();
app.setName(PRODUCT_NAME);

let mainWindow: BrowserWindow | null = null;
let recentEntries: RecentWorkspace[] = [];

function send(command: MenuCommand): void {
  if (mainWindow && !mainWindow.isDestroyed()) mainWindow.webContents.send(MENU_COMMAND_CHANNEL, command);
}

const guard = new QuitGuard({
  showPrompt: (options) => (mainWindow ? dialog.showMessageBoxSync(mainWindow, options) : dialog.showMessageBoxSync(options)),
  send,
  closeWindow: () => setImmediate(() => mainWindow?.close()),
  setEdited: (dirty) => {
    if (process.platform === 'darwin') mainWindow?.setDocumentEdited(dirty);
  },
});

function refreshMenu(recent: RecentStore): void {
  const template = buildMenuTemplate({
    platform: process.platform,
    recent: recentEntries,
    send,
    developer: !app.isPackaged,
    clearRecent: () => {
      void recent.clear().then((entries) => {
        recentEntries = entries;
        refreshMenu(recent);
      });
    },
  });
  Menu.setApplicationMenu(Menu.buildFromTemplate(template));
}

const gotLock = app.requestSingleInstanceLock();
if (!gotLock) {
  app.quit();
} else {
  app.on('second-instance', () => {
    if (!mainWindow) return;
    if (mainWindow.isMinimized()) mainWindow.restore();
    mainWindow.focus();
  });

  // Every web contents ever created (window, DevTools, anything a page might try) gets the guards.
  app.on('web-contents-created', (_event, contents) => guardWebContents(contents));

  app.on('window-all-closed', () => app.quit());

  void app.whenReady().then(async () => {
    installSessionGuards(session.defaultSession);
    session.defaultSession.protocol.handle(APP_SCHEME, createAppProtocolHandler(rendererDir));
    app.setAboutPanelOptions({ applicationName: PRODUCT_NAME, applicationVersion: app.getVersion(), credits: CAUTIONS.join('\n') });

    const recent = new RecentStore(path.join(app.getPath('userData'), 'recent-workspaces.json'));
    recentEntries = await recent.load();
    const grants = new FileGrants();
    const dialogs = new ElectronDialogs(dialog, () => mainWindow, () => app.getPath('documents'));

    registerIpcHandlers(
      ipcMain,
      createHostService({
        dialogs,
        grants,
        recent,
        info: { name: PRODUCT_NAME, version: app.getVersion(), platform: process.platform, runtime: process.versions.electron ?? null },
        onDirtyChange: (dirty) => guard.setDirty(dirty),
        onSaveFinished: (saved) => guard.onSaveFinished(saved),
        onRecentChange: (entries) => {
          recentEntries = entries;
          refreshMenu(recent);
        },
      }),
    );
    refreshMenu(recent);

    mainWindow = createMainWindow(BrowserWindow, {
      preloadPath,
      iconPath: process.platform === 'darwin' ? null : iconPath,
      allowDevTools: !app.isPackaged,
      guard,
      onPageGone: (reason) => {
        dialog.showErrorBox(PRODUCT_NAME, `The workspace view stopped (${reason}). It will reload from the last saved state; later changes are lost.`);
        guard.setDirty(false); // the reloaded page starts clean
        mainWindow?.reload();
      },
    });
    mainWindow.on('closed', () => {
      mainWindow = null;
    });
  });
}
