// Reads and writes the workspace file: JSON text in, a checked and migrated WorkspaceDocument out,
// and back. Pure (no file access); the Electron main process and the browser host both use it.

import { MAX_PANEL_PX, WORKSPACE_FORMAT, WORKSPACE_VERSION, type WorkspaceDocument } from './document';
import { WorkspaceFormatError, WorkspaceVersionError } from './errors';
import { checkJson, json, JsonCheckFailure, parseJsonText, showValue } from '../json/zod-checker';
import { NewerVersionFailure, upgradeDocument, type UpgradeStep, type VersionedKind } from '../json/versioned';
import { SCENARIO_FORMAT, SCENARIO_VERSION, scenarioFromJson, scenarioToJson, withTollClasses } from '../scenario/document';
import { ScenarioFormatError } from '../errors';
import type { Scenario } from '../scenario/types';
import { EMPTY_PLANNING_CHOICES } from '../planning/planning-choices';

/** Longest file path accepted (Windows long paths reach 32,767). */
export const MAX_PATH_LENGTH = 32_767;
/** Most scenarios a workspace may hold. */
export const MAX_SCENARIOS = 500;
/** Largest maximum-legs setting. */
export const MAX_LEGS_LIMIT = 100_000;

/**
 * Upgrade steps keyed by the version they upgrade from; a format change adds `[n]: step` here and
 * bumps WORKSPACE_VERSION. 1 -> 2: the planning settings arrived; a version 1 file planned with the
 * defaults, so every choice is null (= default). 2 -> 3: the panel sizes arrived; a version 2 file
 * opens with the sizes the window already has (null = keep / default).
 */
export const WORKSPACE_UPGRADES: Readonly<Record<number, UpgradeStep>> = {
  1: (raw) => ({ ...raw, planning: { ...EMPTY_PLANNING_CHOICES } }),
  2: (raw) => ({ ...raw, layout: { lowerPx: null, sidePx: null } }),
};

const WORKSPACE_KIND: VersionedKind = { format: WORKSPACE_FORMAT, label: 'workspace', current: WORKSPACE_VERSION, steps: WORKSPACE_UPGRADES };

const filesSchema = json.object({
  depots: json.nullable(json.text(MAX_PATH_LENGTH)),
  lanes: json.nullable(json.text(MAX_PATH_LENGTH)),
  // Loads and vehicles came later within version 1: a file written before them has neither, and a
  // workspace without them is written without them (an earlier build still opens it).
  loads: json.optionalNullable(json.text(MAX_PATH_LENGTH)),
  vehicles: json.optionalNullable(json.text(MAX_PATH_LENGTH)),
});

const settingsSchema = json.object({
  origin: json.nullable(json.text(200)),
  dispatchDate: json.nullable(json.isoDate()),
  vehicleClass: json.nullable(json.text(60)),
  maxLegs: json.nullable(json.integer(1, MAX_LEGS_LIMIT)),
});

// Planning choices are kept as typed; readPlanningChoices says which ones it cannot use.
const choice = () => json.nullable(json.text(200));
const planningSchema = json.object({
  fuelPrice: choice(),
  fuelConsumption: choice(),
  drivingLimit: choice(),
  detourFactor: choice(),
  averageSpeed: choice(),
  defaultToll: choice(),
  currency: choice(),
  exchangeRates: choice(),
});

const layoutSchema = json.object({
  lowerPx: json.nullable(json.integer(0, MAX_PANEL_PX)),
  sidePx: json.nullable(json.integer(0, MAX_PANEL_PX)),
});

// Scenarios are checked by the scenario reader (their own format and version), then for unique names.
const workspaceSchema = json.object({
  format: json.exactly(WORKSPACE_FORMAT, `must be "${WORKSPACE_FORMAT}"; this is not a Lanewright workspace`),
  version: json.exactly(WORKSPACE_VERSION, `must be ${WORKSPACE_VERSION}`),
  savedAt: json.nullable(json.isoTimestamp()),
  files: filesSchema,
  settings: settingsSchema,
  planning: planningSchema,
  layout: layoutSchema,
  scenarios: json.list(json.anything(), MAX_SCENARIOS),
  activeScenario: json.nullable(json.text(200)),
});

/**
 * How scenarios appear: in memory (and over IPC) as the engine's `Scenario`; on disk as scenario
 * documents with their own `format` and `version`, so the scenario format can evolve on its own.
 */
export type ScenarioForm = 'memory' | 'stored';


function readScenario(value: unknown, field: string, form: ScenarioForm): Scenario {
  try {
    if (form === 'stored') return scenarioFromJson(value, field);
    if (typeof value !== 'object' || value === null || Array.isArray(value)) throw new JsonCheckFailure(field, showValue(value), 'must be an object');
    const { format: _format, version: _version, ...scenario } = value as Record<string, unknown>;
    return scenarioFromJson({ ...scenario, changes: withTollClasses(scenario.changes), format: SCENARIO_FORMAT, version: SCENARIO_VERSION }, field);
  } catch (error) {
    if (error instanceof ScenarioFormatError) throw new JsonCheckFailure(`${field}${error.path}`, error.value, error.reason);
    throw error;
  }
}

/**
 * Checks a value that should be a current-version workspace document (already migrated) and returns a
 * fresh copy holding only the known fields. Throws WorkspaceFormatError naming `source` and the field.
 */
export function checkWorkspace(value: unknown, source: string, form: ScenarioForm = 'memory'): WorkspaceDocument {
  try {
    const o = checkJson(workspaceSchema, value);
    const scenarios = o.scenarios.map((s, i) => readScenario(s, `/scenarios/${i}`, form));
    const names = new Set<string>();
    scenarios.forEach((s, i) => {
      if (names.has(s.name)) throw new JsonCheckFailure(`/scenarios/${i}/name`, showValue(s.name), 'another scenario has this name; names must be unique');
      names.add(s.name);
    });
    if (o.activeScenario !== null && !names.has(o.activeScenario)) {
      throw new JsonCheckFailure('/activeScenario', showValue(o.activeScenario), 'names no scenario in this workspace');
    }
    return { ...o, scenarios };
  } catch (error) {
    if (error instanceof JsonCheckFailure) throw new WorkspaceFormatError(source, error.pointer, error.value, error.reason);
    throw error;
  }
}

/**
 * Checks an in-memory workspace of this or an earlier version (the one browser mode keeps in its
 * storage, written by whichever build ran last): older versions are upgraded as a file is, newer
 * ones refused with WorkspaceVersionError.
 */
export function upgradeWorkspace(value: unknown, source: string): WorkspaceDocument {
  try {
    return checkWorkspace(upgradeDocument(value, WORKSPACE_KIND).raw, source, 'memory');
  } catch (error) {
    if (error instanceof NewerVersionFailure) throw new WorkspaceVersionError(source, error.found, error.supported);
    if (error instanceof JsonCheckFailure) throw new WorkspaceFormatError(source, error.pointer, error.value, error.reason);
    throw error;
  }
}

/**
 * Parses workspace file text: JSON, format marker, version (older versions are migrated, newer ones
 * refused with WorkspaceVersionError), then every field. `source` names the file in errors.
 */
export function parseWorkspace(text: string, source: string): { document: WorkspaceDocument; migratedFrom: number } {
  try {
    const { raw, migratedFrom } = upgradeDocument(parseJsonText(text), WORKSPACE_KIND);
    return { document: checkWorkspace(raw, source, 'stored'), migratedFrom };
  } catch (error) {
    if (error instanceof NewerVersionFailure) throw new WorkspaceVersionError(source, error.found, error.supported);
    if (error instanceof JsonCheckFailure) throw new WorkspaceFormatError(source, error.pointer, error.value, error.reason);
    throw error;
  }
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
