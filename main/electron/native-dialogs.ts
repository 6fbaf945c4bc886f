// The native file dialogs the host shows, behind a small interface so the host logic can be tested
// with scripted answers. This file holds the Electron implementation: titles, filters, extensions.

import path from 'node:path';
import type { BrowserWindow, Dialog } from 'electron';
import type { ExportKind, InputFileKind } from '../ipc/contract';
import { WORKSPACE_EXTENSION } from '../../engine/index';

/** What the host asks of the user; every method answers a path, or null when cancelled. */
export interface NativeDialogs {
  chooseWorkspaceToOpen(): Promise<string | null>;
  chooseWorkspaceTarget(defaultPath: string | null): Promise<string | null>;
  chooseInputFile(kind: InputFileKind): Promise<string | null>;
  chooseExportTarget(suggestedName: string, kind: ExportKind): Promise<string | null>;
}

const INPUT_DIALOGS: Record<InputFileKind, { title: string; filters: Electron.FileFilter[] }> = {
  depots: { title: 'Import depots', filters: [{ name: 'Depots (CSV)', extensions: ['csv', 'txt'] }] },
  lanes: { title: 'Import lanes', filters: [{ name: 'Lanes (CSV)', extensions: ['csv', 'txt'] }] },
  scenario: { title: 'Import scenario', filters: [{ name: 'Scenario (JSON)', extensions: ['json'] }] },
  loads: { title: 'Import loads', filters: [{ name: 'Loads (CSV)', extensions: ['csv', 'txt'] }] },
  vehicles: { title: 'Import vehicles', filters: [{ name: 'Vehicles (CSV)', extensions: ['csv', 'txt'] }] },
};

const EXPORT_FILTERS: Record<ExportKind, Electron.FileFilter> = {
  csv: { name: 'CSV (RFC 4180)', extensions: ['csv'] },
  geojson: { name: 'GeoJSON (RFC 7946)', extensions: ['geojson', 'json'] },
  scenario: { name: 'Lanewright scenario (JSON)', extensions: ['json'] },
  html: { name: 'Printable report (HTML)', extensions: ['html', 'htm'] },
};

const EXPORT_TITLES: Record<ExportKind, string> = { csv: 'Export CSV', geojson: 'Export GeoJSON', scenario: 'Save scenario file', html: 'Save report' };

const WORKSPACE_FILTER: Electron.FileFilter = { name: 'Lanewright workspace', extensions: ['json'] };

/**
 * Adds `extension` when the chosen name has none (some Linux dialogs do not add it). A name that
 * already has an extension is kept as the user typed it.
 */
export function withExtension(file: string, extension: string): string {
  return path.extname(file) === '' ? `${file}.${extension}` : file;
}

/** NativeDialogs over Electron's dialog module, modal to `window`. */
export class ElectronDialogs implements NativeDialogs {
  constructor(
    private readonly dialog: Pick<Dialog, 'showOpenDialog' | 'showSaveDialog'>,
    private readonly window: () => BrowserWindow | null,
    private readonly defaultFolder: () => string,
  ) {}

  private async open(options: Electron.OpenDialogOptions): Promise<string | null> {
    const win = this.window();
    const result = win ? await this.dialog.showOpenDialog(win, options) : await this.dialog.showOpenDialog(options);
    return result.canceled || result.filePaths.length === 0 ? null : result.filePaths[0];
  }

  private async save(options: Electron.SaveDialogOptions): Promise<string | null> {
    const win = this.window();
    const result = win ? await this.dialog.showSaveDialog(win, options) : await this.dialog.showSaveDialog(options);
    return result.canceled || !result.filePath ? null : result.filePath;
  }

  chooseWorkspaceToOpen(): Promise<string | null> {
    return this.open({ title: 'Open workspace', defaultPath: this.defaultFolder(), filters: [WORKSPACE_FILTER], properties: ['openFile'] });
  }

  async chooseWorkspaceTarget(defaultPath: string | null): Promise<string | null> {
    const chosen = await this.save({
      title: 'Save workspace',
      defaultPath: defaultPath ?? path.join(this.defaultFolder(), `workspace.${WORKSPACE_EXTENSION}`),
      filters: [WORKSPACE_FILTER],
      properties: ['showOverwriteConfirmation', 'createDirectory'],
    });
    return chosen === null ? null : withExtension(chosen, WORKSPACE_EXTENSION);
  }

  chooseInputFile(kind: InputFileKind): Promise<string | null> {
    const { title, filters } = INPUT_DIALOGS[kind];
    return this.open({ title, defaultPath: this.defaultFolder(), filters: [...filters, { name: 'All files', extensions: ['*'] }], properties: ['openFile'] });
  }

  async chooseExportTarget(suggestedName: string, kind: ExportKind): Promise<string | null> {
    const chosen = await this.save({
      title: EXPORT_TITLES[kind],
      defaultPath: path.join(this.defaultFolder(), suggestedName),
      filters: [EXPORT_FILTERS[kind]],
      properties: ['showOverwriteConfirmation', 'createDirectory'],
    });
    return chosen === null ? null : withExtension(chosen, EXPORT_FILTERS[kind].extensions[0]);
  }
}
