// The workspace document: what a dispatcher saves and reopens (which files are loaded, the planning
// settings and the what-if scenarios). Shared by the Electron main process (reads and writes the file)
// and the renderer (edits it). Plain JSON data only, so it crosses IPC and storage unchanged.

/** Value of the `format` field; a file without it is not a workspace. */
export const WORKSPACE_FORMAT = 'lanewright-workspace';

/** Version written by this build. Older versions are migrated on read; newer ones are refused. */
export const WORKSPACE_VERSION = 1;

/** File name extension used by the save dialog. */
export const WORKSPACE_EXTENSION = 'lwspace.json';

/**
 * Where the input files live. Paths are absolute while the app runs; on disk they are stored relative
 * to the workspace file when they share a folder tree, so a copied project folder still opens.
 * In browser mode the "path" is the file name the user picked.
 */
export interface WorkspaceFiles {
  depots: string | null;
  lanes: string | null;
}

/** The planning controls: the selected origin, dispatch date, vehicle class and maximum legs. */
export interface PlanningSettings {
  /** Depot id of the selected origin, or null before one is chosen. */
  origin: string | null;
  /** Dispatch date, ISO 8601 calendar date (YYYY-MM-DD), or null for "undated". */
  dispatchDate: string | null;
  /** Vehicle (toll) class label as the lanes file names it, or null for the file's default. */
  vehicleClass: string | null;
  /** Largest number of legs a route may use (a whole number from 1), or null for no limit. */
  maxLegs: number | null;
}

/** The lane amount a scenario edit changes. */
export type LaneAmountField = 'toll' | 'fuel' | 'fees' | 'rebate';

/**
 * One edit in a scenario: a lane amount set to a new value. The lane is named by its row in the
 * lanes file (header = row 1), with its reference kept as a check that the file has not changed.
 */
export interface ScenarioLaneEdit {
  laneRow: number;
  laneRef: string | null;
  field: LaneAmountField;
  /** New amount, integer minor units. */
  amountMinor: number;
  /** Optional note from the analyst on why the value changed. */
  note: string | null;
}

/** A named set of lane edits evaluated against the base contract. */
export interface WorkspaceScenario {
  id: string;
  name: string;
  edits: ScenarioLaneEdit[];
}

/** The whole workspace as it is saved (version 1). */
export interface WorkspaceDocument {
  format: typeof WORKSPACE_FORMAT;
  version: typeof WORKSPACE_VERSION;
  /** ISO 8601 timestamp of the last save, or null when never saved. */
  savedAt: string | null;
  files: WorkspaceFiles;
  settings: PlanningSettings;
  scenarios: WorkspaceScenario[];
  /** Id of the scenario being viewed, or null for the base contract. */
  activeScenario: string | null;
}

/** A fresh workspace with nothing loaded. */
export function emptyWorkspace(): WorkspaceDocument {
  return {
    format: WORKSPACE_FORMAT,
    version: WORKSPACE_VERSION,
    savedAt: null,
    files: { depots: null, lanes: null },
    settings: { origin: null, dispatchDate: null, vehicleClass: null, maxLegs: null },
    scenarios: [],
    activeScenario: null,
  };
}
