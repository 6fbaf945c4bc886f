import { describe, expect, it, vi } from 'vitest';
import { cleanMenuCommand, createHostApi, type HostIpc } from '../../../main/preload/host-api';
import { MENU_COMMAND_CHANNEL } from '../../../main/ipc/contract';
import { validateRequest } from '../../../main/ipc/validate-request';
import { CHANNEL_NAMES } from '../../../main/ipc/channels';
import { emptyWorkspace } from '../../../engine/workspace/document';
import { EXPORT_MENU } from '../../../engine/export/export-menu';

function fakeIpc() {
  const invoked: [string, unknown][] = [];
  const listeners = new Map<string, Set<(...a: unknown[]) => void>>();
  const ipc = {
    invoke: vi.fn(async (channel: string, request: unknown) => {
      invoked.push([channel, request]);
      return { ok: true, value: null };
    }),
    on: (channel: string, l: (...a: unknown[]) => void) => {
      if (!listeners.has(channel)) listeners.set(channel, new Set());
      listeners.get(channel)!.add(l);
      return ipc;
    },
    removeListener: (channel: string, l: (...a: unknown[]) => void) => {
      listeners.get(channel)?.delete(l);
      return ipc;
    },
  };
  const emit = (channel: string, value: unknown) => listeners.get(channel)?.forEach((l) => l({ sender: 'event with internals' }, value));
  return { ipc: ipc as unknown as HostIpc, invoked, emit, listeners };
}

describe('preload host API', () => {
  it('sends one invoke per method, on its channel, with a payload main accepts', async () => {
    const { ipc, invoked } = fakeIpc();
    const host = createHostApi(ipc);
    await host.openWorkspace();
    await host.openWorkspace('/p/w.json');
    await host.saveWorkspace(emptyWorkspace(), '/p/w.json', false);
    await host.recentWorkspaces();
    await host.pickFile('lanes');
    await host.readFile('/p/lanes.csv');
    await host.saveExport('routes.csv', 'a,b\r\n', 'csv');
    await host.setDirty(true);
    await host.appInfo();
    expect(invoked.map(([c]) => c)).toEqual(['workspace:open', 'workspace:open', 'workspace:save', 'workspace:recent', 'file:pick-and-read', 'file:read', 'file:save-export', 'app:set-dirty', 'app:info']);
    expect(new Set(invoked.map(([c]) => c))).toEqual(new Set(CHANNEL_NAMES));
    expect(invoked[0][1]).toEqual({ path: null });
    for (const [channel, request] of invoked) {
      expect(() => validateRequest(channel as (typeof CHANNEL_NAMES)[number], request), channel).not.toThrow();
    }
    expect(host.kind).toBe('desktop');
  });

  it('hands the page only the command, never the IPC event, and stops on unsubscribe', () => {
    const { ipc, emit, listeners } = fakeIpc();
    const host = createHostApi(ipc);
    const seen: unknown[][] = [];
    const off = host.onMenuCommand((...args) => seen.push(args));
    emit(MENU_COMMAND_CHANNEL, { command: 'import-lanes' });
    emit(MENU_COMMAND_CHANNEL, { command: 'format-disk' });
    off();
    emit(MENU_COMMAND_CHANNEL, { command: 'about' });
    expect(seen).toEqual([[{ command: 'import-lanes' }]]);
    expect(listeners.get(MENU_COMMAND_CHANNEL)!.size).toBe(0);
  });

  it('cleans menu commands to their contract shape', () => {
    expect(cleanMenuCommand({ command: 'open-workspace', path: '/p/w.json', extra: 1 })).toEqual({ command: 'open-workspace', path: '/p/w.json' });
    expect(cleanMenuCommand({ command: 'open-workspace' })).toEqual({ command: 'open-workspace', path: null });
    expect(cleanMenuCommand({ command: 'save', thenQuit: 'yes' })).toEqual({ command: 'save', thenQuit: false });
    expect(cleanMenuCommand({ command: 'save', thenQuit: true })).toEqual({ command: 'save', thenQuit: true });
    expect(cleanMenuCommand({ command: 'about', path: '/x' })).toEqual({ command: 'about' });
    expect(cleanMenuCommand({ command: 'export', what: 'routes-csv', path: '/x' })).toEqual({ command: 'export', what: 'routes-csv' });
    expect(cleanMenuCommand({ command: 'export', what: 'review-html' })).toEqual({ command: 'export', what: 'review-html' });
    // Every entry of the Export menu passes; anything else is dropped.
    for (const { what } of EXPORT_MENU) expect(cleanMenuCommand({ command: 'export', what })).toEqual({ command: 'export', what });
    expect(cleanMenuCommand({ command: 'export', what: 'toString' })).toBeNull();
    expect(cleanMenuCommand({ command: 'export' })).toBeNull();
    expect(cleanMenuCommand('about')).toBeNull();
    expect(cleanMenuCommand(null)).toBeNull();
  });
});
