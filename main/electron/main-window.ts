// Creates the one main window with the secure settings and wires its lifecycle: show when ready,
// the unsaved-changes guard on close, and a clear message if the page process dies.

import type { BrowserWindow, BrowserWindowConstructorOptions } from 'electron';
import { PRODUCT_NAME } from '../../engine/index';
import { APP_PAGE_URL } from './app-page';
import type { QuitGuard } from './quit-guard';
import { secureWebPreferences } from './security';

/** Constructor of BrowserWindow (a parameter so tests can pass a fake). */
export type WindowConstructor = new (options: BrowserWindowConstructorOptions) => BrowserWindow;

/** Everything the window needs. */
export interface MainWindowOptions {
  preloadPath: string;
  /** Window icon (Linux and Windows; macOS uses the bundle icon). */
  iconPath: string | null;
  allowDevTools: boolean;
  guard: Pick<QuitGuard, 'onClose'>;
  /** Called when the page process ends unexpectedly. */
  onPageGone(reason: string): void;
}

/** Options of the main window. */
export function mainWindowOptions(options: MainWindowOptions): BrowserWindowConstructorOptions {
  return {
    title: PRODUCT_NAME,
    width: 1440,
    height: 900,
    minWidth: 960,
    minHeight: 600,
    show: false,
    backgroundColor: '#f4f2ec',
    ...(options.iconPath ? { icon: options.iconPath } : {}),
    webPreferences: secureWebPreferences(options.preloadPath, options.allowDevTools),
  };
}

/** Creates the main window and starts loading the app page. */
export function createMainWindow(Window: WindowConstructor, options: MainWindowOptions): BrowserWindow {
  const window = new Window(mainWindowOptions(options));
  window.once('ready-to-show', () => window.show());
  window.on('close', (event) => options.guard.onClose(event));
  window.webContents.on('render-process-gone', (_event, details) => {
    if (details.reason !== 'clean-exit') options.onPageGone(details.reason);
  });
  void window.loadURL(APP_PAGE_URL);
  return window;
}
