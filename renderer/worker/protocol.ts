// Messages between the UI thread and the engine worker. Everything here is structured-clone data
// (typed arrays travel as transferables), so the same shapes serve the worker and unit tests.

import type { CsvDialect, EstimateRules, PlanningChoices } from '../../engine/index';
import type { Scenario } from '../model/scenario-edits';
import type { DispatchRequest, DispatchView } from './dispatch-loads';

/** A CSV file as text, with the name shown in reports. */
export interface NamedText {
  name: string;
  text: string;
  /** Where the host read it (desktop: absolute path), saved in the workspace; defaults to `name`. */
  path?: string;
}

/** One problem of an import, located as a spreadsheet shows it (header = row 1). */
export interface ImportIssue {
  file: string;
  row: number | null;
  column: string | null;
  value: string | null;
  reason: string;
  code: string;
}

export interface ImportReport {
  /** Per file: accepted + rejected = total data rows. */
  files: { file: string; kind: 'depots' | 'lanes' | 'loads' | 'vehicles'; total: number; accepted: number; rejected: number }[];
  /** Errors: each rejects a row (or the file). */
  issues: ImportIssue[];
  warnings: ImportIssue[];
  /** Items past the report's cap (counts stay exact). */
  omitted: number;
  /** Lane rows left out of the plan because they are not valid on the date or are for another class. */
  excluded: number;
  notes: string[];
  /** True when nothing usable could be built (the network on screen was not replaced). */
  fatal: boolean;
}

/** Which day and vehicle class the network is planned for ('' = the file's default class). */
export interface PlanChoice {
  date: string;
  vehicleClass: string;
  /** The planning settings panel's choices; absent = every default. */
  planning?: PlanningChoices;
}

/** The network as the UI draws and edits it; one entry per depot / lane, lanes in input order. */
export interface NetworkView {
  currency: string;
  exponent: number;
  depotIds: string[];
  depotNames: string[];
  lat: Float64Array;
  lon: Float64Array;
  laneFrom: Int32Array;
  laneTo: Int32Array;
  laneToll: Float64Array;
  laneFuel: Float64Array;
  laneFees: Float64Array;
  laneRebate: Float64Array;
  laneRow: Int32Array;
  laneRef: (string | undefined)[];
  laneDistanceKm: Float64Array;
  laneDriveMinutes: Float64Array;
  /** Vehicle classes the lanes file prices (empty when tolls do not depend on the class). */
  vehicleClasses: string[];
  /** The plan this view was built for, and its daily driving limit (minutes) for the long-drive caution. */
  plan: PlanChoice;
  driveLimitMinutes: number;
}

export interface PlanSettings {
  origin: string;
  /** null = no limit on the number of lanes. */
  maxLegs: number | null;
  vehicleClass: string;
  /** ISO 8601 date (YYYY-MM-DD). */
  dispatchDate: string;
  /** Planning settings (fuel, speed, driving limit, currency, ...); absent = every default. */
  planning?: PlanningChoices;
}

export interface LoopView {
  depots: number[];
  lanes: number[];
  netPerLap: number;
}

// Lanes in results (loop lanes, tree lanes, route lanes) are network lane indices; a lane the
// scenario adds is -2 minus its change's index (model/added-lanes.ts), -1 when it cannot be traced.

/** Result of one solve, per depot (index = depot index). */
export interface SolveView {
  settings: PlanSettings;
  origin: number;
  /** 0 unreachable, 1 reachable, 2 unbounded (engine STATUS_* codes). */
  status: Uint8Array;
  /** Exact cost in minor units; NaN where not reachable. */
  cost: Float64Array;
  legs: Int32Array;
  /** Sum of lane drive minutes along the route; NaN where unknown or unreachable. */
  driveMinutes: Float64Array;
  /** Caution flags per depot, FLAG_* bits of model/flags.ts. */
  flags: Uint8Array;
  /** Lanes drawn as the cheapest-route tree (each reachable depot's last lane). */
  treeLanes: Int32Array;
  loops: LoopView[];
  /** Same arrays for the scenario's base (no edits), when the scenario has edits. */
  base: { status: Uint8Array; cost: Float64Array; legs: Int32Array } | null;
  solveMs: number;
}

/** A lane's validity window, notes, clause and which of its values the plan estimated. */
export interface LaneDetailView {
  validFrom: string | null;
  validTo: string | null;
  distanceEstimated: boolean;
  fuelEstimated: boolean;
  driveEstimated: boolean;
  notes: string | null;
  clause: string | null;
}

/** One depot's route with its lanes in travel order. */
export interface RouteView {
  target: number;
  depots: number[];
  lanes: number[];
  /** Per lane (null for a lane a scenario adds); with the rules that made estimated values. */
  details?: (LaneDetailView | null)[];
  estimateRules?: EstimateRules;
}

export type ExportKind = 'routes-csv' | 'lanes-csv' | 'loops-csv' | 'geojson';

export type ToWorker =
  | { kind: 'load'; id: number; depots: NamedText; lanes: NamedText; acceptPartial: boolean; plan: PlanChoice }
  | { kind: 'replan'; id: number; plan: PlanChoice }
  | { kind: 'solve'; id: number; settings: PlanSettings; scenario: Scenario | null }
  /** `solveId`: the id of the solve request whose answer the route goes with (see session.ts). */
  | { kind: 'route'; id: number; target: number; solveId: number }
  /** `dialect`: how CSV files are written (RFC 4180 when absent). */
  | { kind: 'export'; id: number; what: ExportKind; dialect?: CsvDialect }
  | { kind: 'review'; id: number; scenario: Scenario | null }
  | { kind: 'dispatch'; id: number; request: DispatchRequest };

export interface WorkerErrorView {
  name: string;
  message: string;
}

export type FromWorker =
  | { kind: 'progress'; id: number; phase: string; fraction: number }
  | { kind: 'loaded'; id: number; network: NetworkView | null; report: ImportReport }
  | { kind: 'solved'; id: number; result: SolveView }
  | { kind: 'route'; id: number; route: RouteView | null }
  | { kind: 'exported'; id: number; fileName: string; mime: string; text: string }
  | { kind: 'reviewed'; id: number; review: unknown }
  | { kind: 'dispatched'; id: number; result: DispatchView }
  | { kind: 'error'; id: number; error: WorkerErrorView };
