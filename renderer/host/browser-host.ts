// The host for `npm run web`: the same API the desktop preload exposes, built from browser parts.
// File pickers are <input type="file">, exports are downloads from blob URLs, and the workspace is
// kept in the browser's own storage (there are no paths to grant, so "path" is a file name).

import type { AppInfo, ExportKind, HostResult, InputFileKind, LanewrightHost, MenuCommand, ReadFile, WorkspaceDocument } from '../../main/ipc/contract';
import { checkJsonDepth, documentSizeProblem, upgradeWorkspace } from '../../engine/index';
import { loadFileText, storeFileText, WORKSPACE_KEY, WORKSPACE_SAVED_AT_KEY } from './browser-store';

const WORKSPACE_NAME = 'browser workspace';

function ok<T>(value: T): HostResult<T> {
  return { ok: true, value };
}

function failed<T>(error: string, message: string, path: string | null = null): HostResult<T> {
  return { ok: false, failure: { error, message, path, field: null } };
}

function stripBom(text: string): string {
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

/** Shows a file chooser; resolves with the chosen file or null when the user cancels. */
function chooseFile(accept: string): Promise<File | null> {
  return new Promise((resolve) => {
    const input = document.createElement('input');
    input.type = 'file';
    input.accept = accept;
    input.style.display = 'none';
    document.body.append(input);
    const finish = (file: File | null) => {
      input.remove();
      resolve(file);
    };
    input.addEventListener('change', () => finish(input.files?.[0] ?? null), { once: true });
    input.addEventListener('cancel', () => finish(null), { once: true });
    input.click();
  });
}

function download(name: string, text: string, mime: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: mime }));
  const link = document.createElement('a');
  link.href = url;
  link.download = name;
  link.style.display = 'none';
  document.body.append(link);
  link.click();
  link.remove();
  // Revoke later: Chromium starts the download asynchronously from the URL.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/**
 * Reads a picked file. A scenario is a document (settings and edits): over the engine's document
 * limit it is refused before reading, with the same reason the desktop host and the CLI give.
 */
export async function readPickedFile(file: Pick<File, 'name' | 'size' | 'text'>, kind: InputFileKind): Promise<HostResult<ReadFile | null>> {
  const tooLarge = kind === 'scenario' ? documentSizeProblem(file.size, 'scenario') : null;
  if (tooLarge !== null) return failed<ReadFile | null>('FileAccessError', `${file.name}: ${tooLarge}`, file.name);
  const text = stripBom(await file.text());
  return ok<ReadFile | null>({ path: file.name, name: file.name, text });
}

/** Creates the browser host. `version` is shown in the about box. */
export function createBrowserHost(version: string): LanewrightHost {
  const listeners = new Set<(command: MenuCommand) => void>();
  // The kept workspace is checked like one from a file (an older build or a hand edit may have left
  // anything there): a refused one is reported and never reaches the workbench.
  const readStored = (): HostResult<WorkspaceDocument | null> => {
    const text = localStorage.getItem(WORKSPACE_KEY);
    if (!text) return ok(null);
    try {
      checkJsonDepth(text);
      // Kept by whichever build ran last: an older version is upgraded like a file.
      return ok(upgradeWorkspace(JSON.parse(text), 'browser storage'));
    } catch (error) {
      return failed('WorkspaceFormatError', `the workspace kept in this browser cannot be used: ${(error as Error).message}`);
    }
  };
  return {
    kind: 'web',
    async openWorkspace() {
      const stored = readStored();
      if (!stored.ok) return stored;
      const document = stored.value;
      return ok(document ? { path: WORKSPACE_NAME, document, migratedFrom: document.version } : null);
    },
    async saveWorkspace(document) {
      try {
        localStorage.setItem(WORKSPACE_KEY, JSON.stringify(document));
        localStorage.setItem(WORKSPACE_SAVED_AT_KEY, new Date().toISOString());
        return ok({ path: WORKSPACE_NAME });
      } catch (error) {
        return failed('StorageError', `could not keep the workspace in browser storage: ${(error as Error).message}`);
      }
    },
    async recentWorkspaces() {
      const openedAt = localStorage.getItem(WORKSPACE_SAVED_AT_KEY);
      return ok(localStorage.getItem(WORKSPACE_KEY) && openedAt ? [{ path: WORKSPACE_NAME, name: WORKSPACE_NAME, openedAt }] : []);
    },
    async pickFile(kind: InputFileKind) {
      const file = await chooseFile(kind === 'scenario' ? '.json,application/json' : '.csv,.txt,text/csv');
      if (!file) return ok<ReadFile | null>(null);
      const read = await readPickedFile(file, kind);
      if (read.ok && read.value) await storeFileText(file.name, read.value.text).catch(() => undefined); // storage full: the import still works this session
      return read;
    },
    async readFile(path) {
      const text = await loadFileText(path).catch(() => undefined);
      if (text === undefined) return failed<ReadFile>('FileAccessError', `${path}: not in this browser's storage any more; import it again`, path);
      return ok({ path, name: path, text });
    },
    async saveExport(suggestedName: string, text: string, kind: ExportKind) {
      download(suggestedName, text, kind === 'geojson' ? 'application/geo+json' : kind === 'scenario' ? 'application/json' : kind === 'html' ? 'text/html' : 'text/csv');
      return ok({ path: suggestedName });
    },
    async setDirty() {
      return ok(null);
    },
    async appInfo() {
      return ok<AppInfo>({ name: 'Lanewright', version, platform: 'web', runtime: null });
    },
    onMenuCommand(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
  };
}
