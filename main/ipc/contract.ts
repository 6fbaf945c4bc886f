// The one contract between the renderer and its host. Every IPC channel with its request and
// response, the menu commands main sends to the renderer, and the `LanewrightHost` API the preload
// exposes (and the browser host adapter imitates). The renderer imports it with `import type` only;
// its constants are for main and the preload.

import type { ExportChoice, WorkspaceDocument } from '../../engine/index';

export type { WorkspaceDocument } from '../../engine/index';

/** Kinds of input file the user can pick; each has its own dialog title and filters. */
export type InputFileKind = 'depots' | 'lanes' | 'scenario' | 'loads' | 'vehicles';

/**
 * Kinds of export; they decide the file filter and extension of the save dialog. 'scenario' is the
 * versioned scenario document (engine/scenario/document.ts) that `lanewright compare --scenario` reads;
 * 'html' a printable, self-contained report (the contract review).
 */
export type ExportKind = 'csv' | 'geojson' | 'scenario' | 'html';

/** A text file read by the host on the renderer's behalf. */
export interface ReadFile {
  /** Absolute path (desktop) or the picked file's name (browser). */
  path: string;
  /** Base name, for labels and error messages. */
  name: string;
  /** Whole file as UTF-8 text, byte-order mark removed. */
  text: string;
}

/** A workspace entry in the recent list, most recent first. */
export interface RecentWorkspace {
  path: string;
  name: string;
  /** ISO 8601 timestamp of the last open or save. */
  openedAt: string;
}

/** What the host answers when a workspace is opened. */
export interface OpenedWorkspace {
  path: string;
  document: WorkspaceDocument;
  /** Version found in the file before migration (equals the current version when none was needed). */
  migratedFrom: number;
}

/** Facts about the running app, for the about box and bug reports. */
export interface AppInfo {
  name: string;
  version: string;
  /** 'linux' | 'win32' | 'darwin' on the desktop, 'web' in browser mode. */
  platform: string;
  /** Electron version, or null in browser mode. */
  runtime: string | null;
}

/**
 * Every channel: request sent by the renderer, response given by main. A `null` response from a
 * dialog-backed channel means the user cancelled the dialog (not an error).
 */
export interface Channels {
  /** Open a workspace: no path shows the open dialog; a path must be one the host already knows (recent list). */
  'workspace:open': { request: { path: string | null }; response: OpenedWorkspace | null };
  /**
   * Save the workspace. `path` must be the path the workspace was opened from or last saved to;
   * `saveAs` (or no known path) shows the save dialog. Answers the path written, or null when cancelled.
   */
  'workspace:save': { request: { document: WorkspaceDocument; path: string | null; saveAs: boolean }; response: { path: string } | null };
  /** The recent workspaces list (missing files already pruned). */
  'workspace:recent': { request: Record<string, never>; response: RecentWorkspace[] };
  /** Show the open dialog for one kind of input file and read the chosen file. */
  'file:pick-and-read': { request: { kind: InputFileKind }; response: ReadFile | null };
  /**
   * Read a file again by path (re-import when a workspace opens). Only paths the user picked or that
   * the opened workspace names are readable; anything else is refused.
   */
  'file:read': { request: { path: string }; response: ReadFile };
  /** Show the save dialog for an export and write the text. Answers the path written, or null when cancelled. */
  'file:save-export': { request: { suggestedName: string; text: string; kind: ExportKind }; response: { path: string } | null };
  /** Tell the host whether there are unsaved changes (drives the quit prompt and the title bar). */
  'app:set-dirty': { request: { dirty: boolean }; response: null };
  /** Name, version and platform. */
  'app:info': { request: Record<string, never>; response: AppInfo };
}

/** Names of every channel, as a type. */
export type ChannelName = keyof Channels;

/** Request of channel C. */
export type RequestOf<C extends ChannelName> = Channels[C]['request'];

/** Response of channel C. */
export type ResponseOf<C extends ChannelName> = Channels[C]['response'];

/**
 * Why a host call failed, as plain data (errors crossing the context bridge lose their class and
 * fields, so the host hands failures back as values). `error` is the named error class in main.
 */
export interface HostFailure {
  /** Class name of the error, e.g. 'WorkspaceFormatError', 'IpcPayloadError', 'FileAccessError'. */
  error: string;
  /** One line for people, naming the file and the reason. */
  message: string;
  /** File concerned, when there is one. */
  path: string | null;
  /** Field or JSON pointer concerned (workspace validation, payload validation), when there is one. */
  field: string | null;
}

/** Every host call resolves to one of these; it never rejects for an expected failure. */
export type HostResult<T> = { ok: true; value: T } | { ok: false; failure: HostFailure };

/** What travels over IPC for channel C (the invoke handler's return value). */
export type WireResponse<C extends ChannelName> = HostResult<ResponseOf<C>>;

/** Channel main uses to send menu commands to the renderer. */
export const MENU_COMMAND_CHANNEL = 'menu:command';

/**
 * Commands from the application menu (and the quit prompt) to the renderer, which owns the
 * workspace being edited. `open-workspace` carries a path when picked from the recent list.
 * `save` with `thenQuit` comes from the quit prompt: save, and main quits once the save succeeds.
 * `export` names one entry of the engine's `EXPORT_MENU` (the page's Export menu lists the same).
 */
export type MenuCommand =
  | { command: 'open-workspace'; path: string | null }
  | { command: 'new-workspace' }
  | { command: 'import-depots' }
  | { command: 'import-lanes' }
  | { command: 'save'; thenQuit: boolean }
  | { command: 'save-as' }
  | { command: 'export'; what: ExportChoice }
  | { command: 'about' };

/** Names of the menu commands. */
export type MenuCommandName = MenuCommand['command'];

/**
 * Every export choice, for the preload's check of menu commands (the preload cannot take the
 * engine's EXPORT_MENU in: a sandboxed bundle, and the engine index would add most of the engine).
 * main/preload/host-api.ts stops compiling when a choice of EXPORT_MENU is missing here.
 */
export const EXPORT_CHOICES = ['routes-csv', 'lanes-csv', 'loops-csv', 'geojson', 'review-html', 'scenario-json', 'compare-csv', 'review-csv', 'calendar-review-csv'] as const satisfies readonly ExportChoice[];

/**
 * The API the renderer sees as `window.lanewright` (preload on the desktop, the browser host adapter
 * in `npm run web`). Every method maps to exactly one channel above.
 */
export interface LanewrightHost {
  /** 'desktop' under Electron, 'web' in a plain browser. */
  readonly kind: 'desktop' | 'web';
  /** Open a workspace (dialog when `path` is omitted or null). */
  openWorkspace(path?: string | null): Promise<HostResult<OpenedWorkspace | null>>;
  /** Save; `saveAs` forces the dialog. */
  saveWorkspace(document: WorkspaceDocument, path: string | null, saveAs: boolean): Promise<HostResult<{ path: string } | null>>;
  recentWorkspaces(): Promise<HostResult<RecentWorkspace[]>>;
  /** Pick and read an input file. */
  pickFile(kind: InputFileKind): Promise<HostResult<ReadFile | null>>;
  /** Read a file the workspace names again. */
  readFile(path: string): Promise<HostResult<ReadFile>>;
  /** Save an export through the save dialog (a download in browser mode). */
  saveExport(suggestedName: string, text: string, kind: ExportKind): Promise<HostResult<{ path: string } | null>>;
  /** Report unsaved changes; returns once the host has recorded it. */
  setDirty(dirty: boolean): Promise<HostResult<null>>;
  appInfo(): Promise<HostResult<AppInfo>>;
  /** Listen for menu commands; returns a function that removes the listener. */
  onMenuCommand(listener: (command: MenuCommand) => void): () => void;
}

/** Name of the global the preload defines in the renderer (`window.lanewright`). */
export const HOST_GLOBAL = 'lanewright';
