import { describe, expect, it } from 'vitest';
import type { MenuItemConstructorOptions } from 'electron';
import { buildMenuTemplate } from '../../../main/electron/menu';
import type { MenuCommand, MenuCommandName } from '../../../main/ipc/contract';
import { EXPORT_MENU } from '../../../engine/export/export-menu';

function flatten(items: MenuItemConstructorOptions[]): MenuItemConstructorOptions[] {
  return items.flatMap((i) => [i, ...(Array.isArray(i.submenu) ? flatten(i.submenu) : [])]);
}

function menu(platform: string, recent: { path: string; name: string; openedAt: string }[] = [], developer = false) {
  const sent: MenuCommand[] = [];
  let cleared = 0;
  const items = flatten(buildMenuTemplate({ platform, recent, developer, send: (c) => sent.push(c), clearRecent: () => cleared++ }));
  const click = (label: string) => {
    const item = items.find((i) => i.label === label);
    if (!item?.click) throw new Error(`no item ${label}`);
    (item.click as () => void)();
  };
  return { items, sent, click, cleared: () => cleared };
}

describe('application menu', () => {
  it('reaches every menu command of the contract', () => {
    const { items, sent } = menu('linux', [{ path: '/p/a.json', name: 'a.json', openedAt: '2026-03-02T08:00:00Z' }]);
    for (const item of items) if (item.click) (item.click as () => void)();
    const expected: MenuCommandName[] = ['open-workspace', 'new-workspace', 'import-depots', 'import-lanes', 'save', 'save-as', 'export', 'about'];
    expect(new Set(sent.map((c) => c.command))).toEqual(new Set(expected));
  });

  it('offers every export of the page’s Export menu, in its order, each sending its choice', () => {
    const m = menu('linux');
    const exportMenu = m.items.find((i) => i.label === 'Export');
    const labels = (exportMenu?.submenu as MenuItemConstructorOptions[]).map((i) => i.label);
    expect(labels).toEqual(EXPORT_MENU.map((e) => `${e.label}…`));
    for (const needed of ['Contract review report (HTML)…', 'Scenario comparison (CSV)…', 'Contract review, one day (CSV)…', 'Contract review, calendar (CSV)…']) expect(labels).toContain(needed);
    m.click('Contract review report (HTML)…');
    m.click('Scenario comparison (CSV)…');
    expect(m.sent).toEqual([
      { command: 'export', what: 'review-html' },
      { command: 'export', what: 'compare-csv' },
    ]);
    expect(m.items.find((i) => i.label === 'Routes (CSV)…')?.accelerator).toBe('CmdOrCtrl+E');
  });

  it('opens a recent workspace by its path and can clear the list', () => {
    const m = menu('linux', [
      { path: '/p/b.json', name: 'b.json', openedAt: '2026-03-02T08:01:00Z' },
      { path: '/p/a.json', name: 'a.json', openedAt: '2026-03-02T08:00:00Z' },
    ]);
    m.click('&2 a.json');
    expect(m.sent).toEqual([{ command: 'open-workspace', path: '/p/a.json' }]);
    m.click('Clear list');
    expect(m.cleared()).toBe(1);
  });

  it('shows a disabled placeholder when there are no recent workspaces', () => {
    expect(menu('linux').items.find((i) => i.label === 'No recent workspaces')?.enabled).toBe(false);
  });

  it('sends plain saves without quitting and has the usual shortcuts', () => {
    const m = menu('win32');
    m.click('Save');
    expect(m.sent).toEqual([{ command: 'save', thenQuit: false }]);
    const accel = (label: string) => m.items.find((i) => i.label === label)?.accelerator;
    expect([accel('Open workspace…'), accel('Save'), accel('Save as…')]).toEqual(['CmdOrCtrl+O', 'CmdOrCtrl+S', 'CmdOrCtrl+Shift+S']);
  });

  it('puts Quit in the File menu on Linux and Windows, in the app menu on macOS', () => {
    expect(menu('linux').items.some((i) => i.role === 'quit')).toBe(true);
    const mac = buildMenuTemplate({ platform: 'darwin', recent: [], developer: false, send: () => {}, clearRecent: () => {} });
    expect(mac[0].label).toBe('Lanewright');
    expect(flatten([mac[0]]).some((i) => i.role === 'quit')).toBe(true);
    expect(flatten(mac.slice(1)).some((i) => i.role === 'quit')).toBe(false);
  });

  it('offers developer tools only in development builds', () => {
    expect(menu('linux').items.some((i) => i.role === 'toggleDevTools')).toBe(false);
    expect(menu('linux', [], true).items.some((i) => i.role === 'toggleDevTools')).toBe(true);
  });
});
