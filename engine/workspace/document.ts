// The workspace document: what a dispatcher saves and reopens (which files are loaded, the planning
// settings and the what-if scenarios). Shared by the Electron main process (reads and writes the file)
// and the renderer (edits it). Plain JSON data only, so it crosses IPC and storage unchanged.

import { EMPTY_PLANNING_CHOICES, type PlanningChoices } from '../planning/planning-choices';
import type { Scenario } from '../scenario/types';

/** Value of the `format` field; a file without it is not a workspace. */
export const WORKSPACE_FORMAT = 'lanewright-workspace';

/** Version written by this build. Older versions are migrated on read; newer ones are refused. */
export const WORKSPACE_VERSION = 3;

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
  /**
   * The day's loads file and the vehicles file of the Loads panel, or null. Added within version 1
   * as optional fields: missing = null (nothing to reopen). Written only when set, so a workspace
   * without loads is the same file an earlier build wrote and still opens there.
   */
  loads?: string | null;
  vehicles?: string | null;
}

/** The planning controls: the selected origin, dispatch date, vehicle class and maximum legs. */
export interface WorkspaceSettings {
  /** Depot id of the selected origin, or null before one is chosen. */
  origin: string | null;
  /** Dispatch date, ISO 8601 calendar date (YYYY-MM-DD), or null for "undated". */
  dispatchDate: string | null;
  /** Vehicle (toll) class label as the lanes file names it, or null for the file's default. */
  vehicleClass: string | null;
  /** Largest number of legs a route may use (a whole number from 1), or null for no limit. */
  maxLegs: number | null;
}

/**
 * Scenarios are the engine's `Scenario` (engine/scenario), embedded as they are; names are unique
 * within a workspace so `activeScenario` can name one.
 */
export type WorkspaceScenario = Scenario;

/**
 * The planning settings as typed in the settings panel (fuel price, consumption, driving limit,
 * detour factor, average speed, default toll, currency, exchange rates); null = the default.
 * Added in version 2.
 */
export type WorkspacePlanning = PlanningChoices;

/**
 * Sizes of the resizable panels in CSS pixels, as the dispatcher last set them: the results panel's
 * height and the plan-and-route panel's width; null = the app's default for the window. The app
 * clamps them to the window it opens in. Added in version 3.
 */
export interface WorkspaceLayout {
  lowerPx: number | null;
  sidePx: number | null;
}

/** Largest panel size kept (larger than any screen; a bigger value is a damaged file). */
export const MAX_PANEL_PX = 20_000;

/** The whole workspace as it is saved (version 3; version 2 had no `layout`, version 1 no `planning`). */
export interface WorkspaceDocument {
  format: typeof WORKSPACE_FORMAT;
  version: typeof WORKSPACE_VERSION;
  /** ISO 8601 timestamp of the last save, or null when never saved. */
  savedAt: string | null;
  files: WorkspaceFiles;
  settings: WorkspaceSettings;
  planning: WorkspacePlanning;
  layout: WorkspaceLayout;
  scenarios: WorkspaceScenario[];
  /** Name of the scenario being viewed, or null for the base contract. */
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
    planning: { ...EMPTY_PLANNING_CHOICES },
    layout: { lowerPx: null, sidePx: null },
    scenarios: [],
    activeScenario: null,
  };
}
