// Builds the LanewrightHost object the preload exposes: one named method per contract channel,
// each a single ipcRenderer.invoke. Nothing of Electron (ipcRenderer, events) reaches the page;
// menu commands are checked against the known list before the page's listener sees them.

import type { IpcRenderer } from 'electron';
import type { ExportChoice } from '../../engine/index';
import type { ChannelName, LanewrightHost, MenuCommand, MenuCommandName, RequestOf, WireResponse } from '../ipc/contract';
import { EXPORT_CHOICES, MENU_COMMAND_CHANNEL } from '../ipc/contract';

/** The parts of ipcRenderer the host uses. */
export type HostIpc = Pick<IpcRenderer, 'invoke' | 'on' | 'removeListener'>;

const MENU_COMMANDS = [
  'open-workspace',
  'new-workspace',
  'import-depots',
  'import-lanes',
  'save',
  'save-as',
  'export',
  'about',
] as const satisfies readonly MenuCommandName[];

// A command the contract gains but this list lacks would be dropped here without a word: this line
// stops compiling instead.
type Unlisted = Exclude<MenuCommandName, (typeof MENU_COMMANDS)[number]>;
const everyCommandListed: Unlisted extends never ? true : Unlisted = true;
void everyCommandListed;
// Likewise an export the engine's EXPORT_MENU gains but the contract's EXPORT_CHOICES lacks.
type UncheckedChoice = Exclude<ExportChoice, (typeof EXPORT_CHOICES)[number]>;
const everyChoiceListed: UncheckedChoice extends never ? true : UncheckedChoice = true;
void everyChoiceListed;

/** The command as the page should see it, or null when it is not a known command. */
export function cleanMenuCommand(value: unknown): MenuCommand | null {
  if (typeof value !== 'object' || value === null) return null;
  const { command, path, thenQuit, what } = value as { command?: unknown; path?: unknown; thenQuit?: unknown; what?: unknown };
  if (typeof command !== 'string' || !(MENU_COMMANDS as readonly string[]).includes(command)) return null;
  if (command === 'open-workspace') return { command, path: typeof path === 'string' ? path : null };
  if (command === 'save') return { command, thenQuit: thenQuit === true };
  if (command === 'export') return typeof what === 'string' && (EXPORT_CHOICES as readonly string[]).includes(what) ? { command, what: what as ExportChoice } : null;
  return { command } as MenuCommand;
}

/** The host API over `ipc`. */
export function createHostApi(ipc: HostIpc): LanewrightHost {
  const call = <C extends ChannelName>(channel: C, request: RequestOf<C>): Promise<WireResponse<C>> =>
    ipc.invoke(channel, request) as Promise<WireResponse<C>>;
  return {
    kind: 'desktop',
    openWorkspace: (path = null) => call('workspace:open', { path }),
    saveWorkspace: (document, path, saveAs) => call('workspace:save', { document, path, saveAs }),
    recentWorkspaces: () => call('workspace:recent', {}),
    pickFile: (kind) => call('file:pick-and-read', { kind }),
    readFile: (path) => call('file:read', { path }),
    saveExport: (suggestedName, text, kind) => call('file:save-export', { suggestedName, text, kind }),
    setDirty: (dirty) => call('app:set-dirty', { dirty }),
    appInfo: () => call('app:info', {}),
    onMenuCommand(listener) {
      const relay = (_event: unknown, value: unknown) => {
        const command = cleanMenuCommand(value);
        if (command) listener(command);
      };
      ipc.on(MENU_COMMAND_CHANNEL, relay);
      return () => {
        ipc.removeListener(MENU_COMMAND_CHANNEL, relay);
      };
    },
  };
}
