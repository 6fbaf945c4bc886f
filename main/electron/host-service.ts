// What each IPC channel does on the desktop, free of Electron: dialogs, grants, files, the recent
// list and the unsaved-changes state come in as collaborators, so tests drive it with temp folders
// and scripted dialogs. Requests arrive already validated (validate-request.ts).

import path from 'node:path';
import { MAX_DOCUMENT_BYTES } from '../../engine/index';
import type { AppInfo, ChannelName, InputFileKind, OpenedWorkspace, ReadFile, RecentWorkspace, RequestOf, ResponseOf, WorkspaceDocument } from '../ipc/contract';
import { writeFileAtomic } from '../workspace/atomic-write';
import { FileAccessError } from '../workspace/errors';
import type { RecentStore } from '../workspace/recent-list';
import { readTextFile, readWorkspaceFile, writeWorkspaceFile } from '../workspace/workspace-file';
import { FileGrantError } from './errors';
import type { FileGrants } from './file-grants';
import type { NativeDialogs } from './native-dialogs';

/** Largest input file read (a 50,000-lane CSV is a few megabytes). */
export const MAX_INPUT_BYTES = 256 * 1024 * 1024;

/** Collaborators of the host service. */
export interface HostServiceDeps {
  dialogs: NativeDialogs;
  grants: FileGrants;
  recent: Pick<RecentStore, 'current' | 'touch' | 'forget' | 'has'>;
  info: AppInfo;
  /** Called with the new unsaved-changes state (quit prompt, title bar). */
  onDirtyChange(dirty: boolean): void;
  /** Called after every workspace save attempt: the path written, or null when cancelled or failed. */
  onSaveFinished(path: string | null): void;
  /** Called when the recent list changed (the menu rebuilds "Open recent"). */
  onRecentChange(entries: RecentWorkspace[]): void;
  now?(): Date;
}

type Handlers = { [C in ChannelName]: (request: RequestOf<C>) => Promise<ResponseOf<C>> };

/** Every input file a workspace names: network, loads and vehicles (each grants reading when opened). */
function inputFiles(document: WorkspaceDocument): (string | null)[] {
  const f = document.files;
  return [f.depots, f.lanes, f.loads ?? null, f.vehicles ?? null];
}

/** The desktop implementation of every channel. */
export function createHostService(deps: HostServiceDeps): Handlers {
  const now = () => (deps.now ? deps.now() : new Date());
  let currentWorkspace: string | null = null;

  async function readInput(file: string, kind?: InputFileKind): Promise<ReadFile> {
    // A scenario is a document (settings and edits): the engine's document limit, not the CSV one.
    const text = kind === 'scenario' ? await readTextFile(file, MAX_DOCUMENT_BYTES, 'scenario') : await readTextFile(file, MAX_INPUT_BYTES);
    return { path: file, name: path.basename(file), text };
  }

  async function remember(file: string): Promise<void> {
    deps.onRecentChange(await deps.recent.touch(file, now()));
  }

  return {
    async 'workspace:open'({ path: requested }): Promise<OpenedWorkspace | null> {
      if (requested !== null && !deps.recent.has(requested) && !deps.grants.canWriteWorkspace(requested)) {
        throw new FileGrantError(requested, 'open');
      }
      const file = requested ?? (await deps.dialogs.chooseWorkspaceToOpen());
      if (file === null) return null;
      let opened;
      try {
        opened = await readWorkspaceFile(file);
      } catch (error) {
        if (error instanceof FileAccessError && error.code === 'ENOENT' && deps.recent.has(file)) {
          deps.onRecentChange(await deps.recent.forget(file));
        }
        throw error;
      }
      deps.grants.allowWorkspace(file);
      for (const input of inputFiles(opened.document)) {
        if (input !== null) deps.grants.allowRead(input);
      }
      currentWorkspace = file;
      await remember(file);
      return { path: file, document: opened.document, migratedFrom: opened.migratedFrom };
    },

    async 'workspace:save'({ document, path: requested, saveAs }) {
      // A saved workspace grants reading of the files it names when reopened, so it may only name
      // files the user already chose; otherwise a page could grant itself any file. A bare file name
      // (the bundled sample) is let through: it can only ever resolve next to the workspace itself.
      for (const input of inputFiles(document)) {
        if (input === null) continue;
        const bareName = !path.isAbsolute(input) && !/[/\\]/.test(input) && input !== '..' && input !== '.';
        if (!bareName && !deps.grants.canRead(input)) throw new FileGrantError(input, 'read');
      }
      if (requested !== null && !saveAs && !deps.grants.canWriteWorkspace(requested)) {
        throw new FileGrantError(requested, 'write');
      }
      let target: string | null = null;
      try {
        target = requested !== null && !saveAs ? requested : await deps.dialogs.chooseWorkspaceTarget(requested ?? currentWorkspace);
        if (target === null) return null;
        await writeWorkspaceFile(target, document, now());
      } catch (error) {
        target = null;
        throw error;
      } finally {
        deps.onSaveFinished(target);
      }
      deps.grants.allowWorkspace(target);
      currentWorkspace = target;
      await remember(target);
      return { path: target };
    },

    async 'workspace:recent'() {
      return deps.recent.current();
    },

    async 'file:pick-and-read'({ kind }) {
      const file = await deps.dialogs.chooseInputFile(kind);
      if (file === null) return null;
      const read = await readInput(file, kind);
      deps.grants.allowRead(file);
      return read;
    },

    async 'file:read'({ path: file }) {
      if (!deps.grants.canRead(file)) throw new FileGrantError(file, 'read');
      return readInput(file);
    },

    async 'file:save-export'({ suggestedName, text, kind }) {
      const target = await deps.dialogs.chooseExportTarget(suggestedName, kind);
      if (target === null) return null;
      await writeFileAtomic(target, text);
      return { path: target };
    },

    async 'app:set-dirty'({ dirty }) {
      deps.onDirtyChange(dirty);
      return null;
    },

    async 'app:info'() {
      return { ...deps.info };
    },
  };
}
