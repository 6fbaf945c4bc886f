// Reads and writes the workspace file: JSON text in, a checked and migrated WorkspaceDocument out,
// and back. Pure (no file access); the Electron main process and the browser host both use it.

import { WORKSPACE_FORMAT, WORKSPACE_VERSION, type WorkspaceSettings, type WorkspaceDocument, type WorkspaceFiles } from './document';
import { WorkspaceFormatError } from './errors';
import { migrateWorkspace } from './migrate';
import {
  checkArray,
  checkInteger,
  checkIsoDate,
  checkIsoTimestamp,
  checkObject,
  checkOptionalText,
  FieldCheckFailure,
  showValue,
} from './check';
import { SCENARIO_FORMAT, SCENARIO_VERSION, scenarioFromJson, scenarioToJson } from '../scenario/document';
import { ScenarioFormatError } from '../errors';
import type { Scenario } from '../scenario/types';

/** Longest file path accepted (Windows long paths reach 32,767). */
export const MAX_PATH_LENGTH = 32_767;
/** Most scenarios a workspace may hold. */
export const MAX_SCENARIOS = 500;
/** Largest maximum-legs setting. */
export const MAX_LEGS_LIMIT = 100_000;

const TOP_FIELDS = ['format', 'version', 'savedAt', 'files', 'settings', 'scenarios', 'activeScenario'];

function checkFiles(value: unknown): WorkspaceFiles {
  const o = checkObject(value, '/files', ['depots', 'lanes']);
  return {
    depots: checkOptionalText(o.depots, '/files/depots', MAX_PATH_LENGTH),
    lanes: checkOptionalText(o.lanes, '/files/lanes', MAX_PATH_LENGTH),
  };
}

function checkSettings(value: unknown): WorkspaceSettings {
  const o = checkObject(value, '/settings', ['origin', 'dispatchDate', 'vehicleClass', 'maxLegs']);
  return {
    origin: checkOptionalText(o.origin, '/settings/origin', 200),
    dispatchDate: o.dispatchDate === null ? null : checkIsoDate(o.dispatchDate, '/settings/dispatchDate'),
    vehicleClass: checkOptionalText(o.vehicleClass, '/settings/vehicleClass', 60),
    maxLegs: o.maxLegs === null ? null : checkInteger(o.maxLegs, '/settings/maxLegs', 1, MAX_LEGS_LIMIT),
  };
}

/**
 * How scenarios appear: in memory (and over IPC) as the engine's `Scenario`; on disk as scenario
 * documents with their own `format` and `version`, so the scenario format can evolve on its own.
 */
export type ScenarioForm = 'memory' | 'stored';

// Scenario errors name fields like "changes[2].lane.occurrence"; the workspace names JSON pointers.
function pointerOf(path: string): string {
  return path === '' ? '' : `/${path.replace(/\[(\d+)\]/g, '.$1').split('.').join('/')}`;
}

function readScenario(value: unknown, field: string, form: ScenarioForm): Scenario {
  try {
    if (form === 'stored') return scenarioFromJson(value, field);
    if (typeof value !== 'object' || value === null || Array.isArray(value)) throw new FieldCheckFailure(field, showValue(value), 'must be an object');
    const { format: _format, version: _version, ...scenario } = value as Record<string, unknown>;
    return scenarioFromJson({ ...scenario, format: SCENARIO_FORMAT, version: SCENARIO_VERSION }, field);
  } catch (error) {
    if (error instanceof ScenarioFormatError) throw new FieldCheckFailure(`${field}${pointerOf(error.path)}`, error.value, error.reason);
    throw error;
  }
}

/**
 * Checks a value that should be a current-version workspace document (already migrated) and returns a
 * fresh copy holding only the known fields. Throws WorkspaceFormatError naming `source` and the field.
 */
export function checkWorkspace(value: unknown, source: string, form: ScenarioForm = 'memory'): WorkspaceDocument {
  try {
    const o = checkObject(value, '', TOP_FIELDS);
    if (o.format !== WORKSPACE_FORMAT) {
      throw new FieldCheckFailure('/format', showValue(o.format), `must be "${WORKSPACE_FORMAT}"; this is not a Lanewright workspace`);
    }
    if (o.version !== WORKSPACE_VERSION) {
      throw new FieldCheckFailure('/version', showValue(o.version), `must be ${WORKSPACE_VERSION}`);
    }
    const scenarios = checkArray(o.scenarios, '/scenarios', MAX_SCENARIOS).map((s, i) => readScenario(s, `/scenarios/${i}`, form));
    const names = new Set<string>();
    scenarios.forEach((s, i) => {
      if (names.has(s.name)) throw new FieldCheckFailure(`/scenarios/${i}/name`, showValue(s.name), 'another scenario has this name; names must be unique');
      names.add(s.name);
    });
    const activeScenario = checkOptionalText(o.activeScenario, '/activeScenario', 200);
    if (activeScenario !== null && !names.has(activeScenario)) {
      throw new FieldCheckFailure('/activeScenario', showValue(activeScenario), 'names no scenario in this workspace');
    }
    return {
      format: WORKSPACE_FORMAT,
      version: WORKSPACE_VERSION,
      savedAt: o.savedAt === null ? null : checkIsoTimestamp(o.savedAt, '/savedAt'),
      files: checkFiles(o.files),
      settings: checkSettings(o.settings),
      scenarios,
      activeScenario,
    };
  } catch (error) {
    if (error instanceof FieldCheckFailure) throw new WorkspaceFormatError(source, error.field, error.value, error.reason);
    throw error;
  }
}

/**
 * Parses workspace file text: JSON, format marker, version (older versions are migrated, newer ones
 * refused with WorkspaceVersionError), then every field. `source` names the file in errors.
 */
export function parseWorkspace(text: string, source: string): { document: WorkspaceDocument; migratedFrom: number } {
  let value: unknown;
  try {
    value = JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  } catch (error) {
    throw new WorkspaceFormatError(source, '', null, `not valid JSON (${(error as Error).message})`);
  }
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new WorkspaceFormatError(source, '', showValue(value), 'must be a JSON object');
  }
  const record = value as Record<string, unknown>;
  if (record.format !== WORKSPACE_FORMAT) {
    throw new WorkspaceFormatError(source, '/format', record.format === undefined ? null : showValue(record.format), `must be "${WORKSPACE_FORMAT}"; this is not a Lanewright workspace`);
  }
  const { raw, migratedFrom } = migrateWorkspace(record, source);
  return { document: checkWorkspace(raw, source, 'stored'), migratedFrom };
}

/**
 * Workspace file text for a document: checked first (an invalid document is never written), two-space
 * indented so a diff of two saves is readable, ending in a newline.
 */
export function serializeWorkspace(document: WorkspaceDocument, source = 'document'): string {
  const checked = checkWorkspace(document, source);
  const stored = { ...checked, scenarios: checked.scenarios.map((s) => scenarioToJson(s)) };
  return `${JSON.stringify(stored, null, 2)}\n`;
}
