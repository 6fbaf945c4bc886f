// The application menu as a plain template (Electron's MenuItemConstructorOptions), built from the
// recent list and a send function, so tests can read every item and click it without Electron.

import type { MenuItemConstructorOptions } from 'electron';
import { EXPORT_MENU, type ExportChoice } from '../../engine/index';
import type { MenuCommand, RecentWorkspace } from '../ipc/contract';

/** Shortcuts of Export entries (the rest have none). */
const EXPORT_ACCELERATORS: Partial<Record<ExportChoice, string>> = { 'routes-csv': 'CmdOrCtrl+E' };

/** What the menu needs. */
export interface MenuDeps {
  platform: string;
  recent: readonly RecentWorkspace[];
  send(command: MenuCommand): void;
  /** Empties the recent list. */
  clearRecent(): void;
  /** Shows developer tools entries (development builds only). */
  developer: boolean;
}

/** The menu template for the current state; rebuild it when the recent list changes. */
export function buildMenuTemplate(deps: MenuDeps): MenuItemConstructorOptions[] {
  const mac = deps.platform === 'darwin';
  const item = (label: string, command: MenuCommand, accelerator?: string): MenuItemConstructorOptions => ({
    label,
    accelerator,
    click: () => deps.send(command),
  });

  const recentItems: MenuItemConstructorOptions[] =
    deps.recent.length === 0
      ? [{ label: 'No recent workspaces', enabled: false }]
      : [
          ...deps.recent.map((entry, i) => ({
            label: `${i + 1 < 10 ? `&${i + 1} ` : ''}${entry.name}`,
            toolTip: entry.path,
            sublabel: entry.path,
            click: () => deps.send({ command: 'open-workspace', path: entry.path }),
          })),
          { type: 'separator' },
          { label: 'Clear list', click: () => deps.clearRecent() },
        ];

  const file: MenuItemConstructorOptions = {
    label: '&File',
    submenu: [
      item('New workspace', { command: 'new-workspace' }, 'CmdOrCtrl+N'),
      item('Open workspace…', { command: 'open-workspace', path: null }, 'CmdOrCtrl+O'),
      { label: 'Open recent', submenu: recentItems },
      { type: 'separator' },
      item('Import depots…', { command: 'import-depots' }, 'CmdOrCtrl+Shift+D'),
      item('Import lanes…', { command: 'import-lanes' }, 'CmdOrCtrl+Shift+L'),
      { type: 'separator' },
      item('Save', { command: 'save', thenQuit: false }, 'CmdOrCtrl+S'),
      item('Save as…', { command: 'save-as' }, 'CmdOrCtrl+Shift+S'),
      { type: 'separator' },
      {
        label: 'Export',
        // The page's Export menu lists the same table; "…": a save dialog follows.
        submenu: EXPORT_MENU.map((entry) => item(`${entry.label}…`, { command: 'export', what: entry.what }, EXPORT_ACCELERATORS[entry.what])),
      },
      ...(mac ? [] : ([{ type: 'separator' }, { label: 'Quit', role: 'quit', accelerator: 'Ctrl+Q' }] as MenuItemConstructorOptions[])),
    ],
  };

  const edit: MenuItemConstructorOptions = {
    label: '&Edit',
    submenu: [{ role: 'undo' }, { role: 'redo' }, { type: 'separator' }, { role: 'cut' }, { role: 'copy' }, { role: 'paste' }, { role: 'selectAll' }],
  };

  const view: MenuItemConstructorOptions = {
    label: '&View',
    submenu: [
      { role: 'resetZoom' },
      { role: 'zoomIn' },
      { role: 'zoomOut' },
      { type: 'separator' },
      { role: 'togglefullscreen' },
      ...(deps.developer ? ([{ type: 'separator' }, { role: 'toggleDevTools' }] as MenuItemConstructorOptions[]) : []),
    ],
  };

  const help: MenuItemConstructorOptions = {
    label: '&Help',
    role: 'help',
    submenu: [item('About Lanewright and its cautions', { command: 'about' })],
  };

  const appMenu: MenuItemConstructorOptions[] = mac
    ? [{ label: 'Lanewright', submenu: [item('About Lanewright', { command: 'about' }), { type: 'separator' }, { role: 'hide' }, { role: 'hideOthers' }, { role: 'unhide' }, { type: 'separator' }, { role: 'quit' }] }]
    : [];

  return [...appMenu, file, edit, view, help];
}
