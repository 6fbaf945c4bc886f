// Converts between the saved workspace document (engine/workspace) and the renderer's state, and
// finds the input files a document names (bundled sample files never go to the host).

import type { LanewrightHost, WorkspaceDocument } from '../../main/ipc/contract';
import type { WorkspaceLayout } from '../../engine/index';
import { emptyWorkspace } from '../../engine/index';
import { emptyScenario, type Scenario } from '../model/scenario-edits';
import { sampleText } from '../sample/sample';
import type { NamedText, PlanSettings } from '../worker/protocol';
import type { DatasetFiles } from './use-dataset';

export const NO_CLASS = '';

/**
 * The Loads panel's files, kept with the workspace. `loads.name` is empty while only a vehicles file
 * has been chosen (nothing to plan yet).
 */
export interface LoadFiles {
  loads: NamedText;
  vehicles: NamedText | null;
}

const workspaceName = (f: NamedText) => f.path ?? f.name;

/** Today as an ISO 8601 date in the local calendar. */
export function todayIso(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

export function defaultSettings(origin: string): PlanSettings {
  return { origin, maxLegs: null, vehicleClass: NO_CLASS, dispatchDate: todayIso() };
}

/** The document for the current state. */
export function documentOf(files: DatasetFiles | null, settings: PlanSettings, scenario: Scenario, loadFiles: LoadFiles | null = null, layout: WorkspaceLayout | null = null): WorkspaceDocument {
  const doc = emptyWorkspace();
  doc.savedAt = new Date().toISOString();
  doc.files = { depots: files ? workspaceName(files.depots) : null, lanes: files ? workspaceName(files.lanes) : null };
  // Written only when chosen, so a workspace without loads is the file an earlier build wrote.
  if (loadFiles && loadFiles.loads.name !== '') doc.files.loads = workspaceName(loadFiles.loads);
  if (loadFiles?.vehicles) doc.files.vehicles = workspaceName(loadFiles.vehicles);
  doc.settings = {
    origin: settings.origin || null,
    dispatchDate: settings.dispatchDate || null,
    vehicleClass: settings.vehicleClass === NO_CLASS ? null : settings.vehicleClass,
    maxLegs: settings.maxLegs,
  };
  if (settings.planning) doc.planning = { ...settings.planning };
  if (layout) doc.layout = { ...layout };
  doc.scenarios = [scenario];
  doc.activeScenario = scenario.changes.length > 0 ? scenario.name : null;
  return doc;
}

/** Settings, scenario and panel sizes from a document. */
export function stateOf(doc: WorkspaceDocument): { settings: PlanSettings; scenario: Scenario; layout: WorkspaceLayout } {
  const s = doc.settings;
  const scenario = doc.scenarios.find((x) => x.name === doc.activeScenario) ?? doc.scenarios[0] ?? emptyScenario();
  return {
    settings: { origin: s.origin ?? '', maxLegs: s.maxLegs, vehicleClass: s.vehicleClass ?? NO_CLASS, dispatchDate: s.dispatchDate ?? todayIso(), planning: { ...doc.planning } },
    scenario,
    layout: { ...doc.layout },
  };
}

/** Reads one file a document names: bundled sample text, or through the host. */
async function readNamed(host: LanewrightHost, path: string): Promise<{ name: string; path: string; text: string }> {
  const bundled = sampleText(path);
  if (bundled !== undefined) return { name: path, path, text: bundled };
  const result = await host.readFile(path);
  if (!result.ok) throw new Error(result.failure.message);
  return { name: result.value.name, path: result.value.path, text: result.value.text };
}

/** The input files a document names, or null when it names none. */
export async function filesOf(host: LanewrightHost, doc: WorkspaceDocument): Promise<DatasetFiles | null> {
  if (!doc.files.depots || !doc.files.lanes) return null;
  return { depots: await readNamed(host, doc.files.depots), lanes: await readNamed(host, doc.files.lanes) };
}

/**
 * The loads and vehicles files a document names, or null when it names neither. A file that cannot
 * be read is named in `problem`; the network still opens.
 */
export async function loadFilesOf(host: LanewrightHost, doc: WorkspaceDocument): Promise<{ files: LoadFiles | null; problem: string | null }> {
  const { loads, vehicles } = doc.files;
  if (!loads && !vehicles) return { files: null, problem: null };
  try {
    return {
      files: { loads: loads ? await readNamed(host, loads) : { name: '', text: '' }, vehicles: vehicles ? await readNamed(host, vehicles) : null },
      problem: null,
    };
  } catch (error) {
    return { files: null, problem: `the workspace's loads or vehicles file was not read: ${(error as Error).message}` };
  }
}
