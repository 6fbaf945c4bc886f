// Messages between the UI thread and the engine worker. Everything here is structured-clone data
// (typed arrays travel as transferables), so the same shapes serve the worker and unit tests.

import type { ChangeView, CsvDialect, EstimateRules, ExportChoice, LaneKey, PlanAmounts, PlanningChoices } from '../../engine/index';
import type { AddedLane } from '../model/added-lanes';
import type { Scenario } from '../model/scenario-edits';
import type { DispatchRequest, DispatchView } from './dispatch-loads';
import type { ContractReviewView } from './review';
import type { LaneGrid } from '../map/lane-grid';
import type { NetworkPaintArrays } from '../map/paint/protocol';

export type { ContractReviewView } from './review';

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

/**
 * The network as the UI draws and edits it; one entry per depot / lane, lanes in input order.
 * Per-lane and per-row data are typed arrays (transferred, not copied) or indices into short
 * string lists: 500,000 lane keys as objects took seconds to clone and froze the UI thread when
 * they arrived. A lane's key, ref, validity and class are read with model/lane-names.ts.
 */
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
  /** Row of the lanes file (index into `rows`) each lane was planned from. */
  laneRecord: Int32Array;
  laneDistanceKm: Float64Array;
  laneDriveMinutes: Float64Array;
  /** 1 where the lane's reverse is in the network too (the map draws the two side by side). */
  laneReverse: Uint8Array;
  /** The lanes binned by map cell (map/lane-grid.ts), for culling the lanes to a view. */
  laneGrid: LaneGrid;
  /** The distinct contract refs of the lanes file (`rows.refIndex` points here). */
  refNames: string[];
  /** The vehicle classes long-layout rows name (`rows.classIndex` points here). */
  rowClassNames: string[];
  /** Every row of the lanes file (every date and class), for the lane table's "every row" view. */
  rows: LaneRowsView;
  /** Vehicle classes the lanes file prices (empty when tolls do not depend on the class). */
  vehicleClasses: string[];
  /** The class whose tolls the plan uses (the file's first class when none was chosen); null = the toll column. */
  plannedClass: string | null;
  /** The plan this view was built for, and its daily driving limit (minutes) for the long-drive caution. */
  plan: PlanChoice;
  driveLimitMinutes: number;
  /**
   * Copies of the arrays the map's paint worker needs, made here so the UI thread passes them on
   * without copying (transferred once: empty afterwards; the map copies its own arrays then).
   */
  paint?: NetworkPaintArrays;
}

/** Every accepted row of the lanes file, in file order. */
export interface LaneRowsView {
  from: Int32Array;
  to: Int32Array;
  sourceRow: Int32Array;
  /** Index into `NetworkView.refNames`, -1 = no ref. */
  refIndex: Int32Array;
  /** The row's occurrence among rows with the same from, to and ref, counted over the whole file (its LaneKey). */
  occurrence: Int32Array;
  /** Inclusive validity as yyyymmdd numbers; 0 = open. */
  validFrom: Int32Array;
  validTo: Int32Array;
  /** Long layout: index into `NetworkView.rowClassNames` (-1 = every class); always -1 in the wide layout. */
  classIndex: Int32Array;
  /** The network lane the plan made of the row, -1 when the plan leaves it out (another date or class). */
  lane: Int32Array;
}

/**
 * The engine overlay's figures for a solve (engine/scenario/overlay.ts), so the UI computes none:
 * per network lane the amounts under the scenario for the planned class, per lanes-file row the
 * same for the "every row" view (empty arrays when every row is planned: then a row's amounts are
 * its lane's), and each change as text with whether it applied.
 */
export interface OverlayView extends Omit<PlanAmounts, 'weights'> {
  rows: { toll: Float64Array; fuel: Float64Array; fees: Float64Array; rebate: Float64Array; closed: Uint8Array; changed: Uint8Array };
  changes: ChangeView[];
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

// Lanes in results (loop lanes, tree lanes, route lanes) are network lane indices; a lane only the
// scenario plans is -2 minus its index in `SolveView.extraLanes` (model/added-lanes.ts).

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
  /**
   * The depots in the results table's first order (model/results-table.ts `DEFAULT_QUERY`: cost,
   * cheapest first), sorted here in the worker so a solve costs the UI thread no sort of every depot.
   */
  tableOrder?: Int32Array;
  loops: LoopView[];
  /**
   * Same arrays for the scenario's base (no edits), when the scenario has edits, and per depot
   * whether its cheapest route changed (1) as `lanewright compare` says it: other lanes, or another status.
   */
  base: { status: Uint8Array; cost: Float64Array; legs: Int32Array; routeChanged: Uint8Array } | null;
  /**
   * Lanes in the plan only because of the scenario (added lanes, rows a validity change brings into
   * the date), from the engine's overlay; results name the k-th as `addedLaneRef(k)`.
   */
  extraLanes: AddedLane[];
  /** The lane amounts and changes the solve was made with. */
  overlay: OverlayView;
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

/**
 * What the worker exports: every Export menu entry but the two the UI makes (the scenario file, and
 * the review report from a `review` request). `review-csv` and `calendar-review-csv` are the contract
 * review last made (the Contract review tab); `compare-csv` compares the active scenario with the base
 * from the origin.
 */
export type ExportKind = Exclude<ExportChoice, 'scenario-json' | 'review-html'>;

export interface WorkerErrorView {
  name: string;
  message: string;
}

/** The import: the pair of files, whether rejected rows may be left out, and the day and class to plan. */
export interface LoadRequest {
  depots: NamedText;
  lanes: NamedText;
  acceptPartial: boolean;
  plan: PlanChoice;
}

/** The answer to an import or a re-plan: the network (null when it is held back or refused) and the report. */
export interface LoadedAnswer {
  network: NetworkView | null;
  report: ImportReport;
}

/**
 * Every request the worker answers, by kind: what the UI sends and the one answer it gets, like
 * the IPC contract's `Channels`. A caller names the request; the answer's type follows from it.
 */
export interface WorkerRequests {
  load: { request: LoadRequest; answer: LoadedAnswer };
  replan: { request: { plan: PlanChoice }; answer: LoadedAnswer };
  solve: { request: { settings: PlanSettings; scenario: Scenario | null }; answer: { result: SolveView } };
  /** `solveId`: the id of the solve request whose answer the route goes with (see session.ts). */
  route: { request: { target: number; solveId: number }; answer: { route: RouteView | null } };
  /** `dialect`: how CSV files are written (RFC 4180 when absent). */
  export: { request: { what: ExportKind; dialect?: CsvDialect }; answer: { fileName: string; mime: string; text: string } };
  review: { request: { scenario: Scenario | null; fixBy?: 'lane' | 'clause' }; answer: { review: ContractReviewView } };
  dispatch: { request: { request: DispatchRequest }; answer: { result: DispatchView } };
}

export type RequestKind = keyof WorkerRequests;

/** The message kind of each request's answer; the client refuses an answer of another kind. */
export const ANSWER_KIND = {
  load: 'loaded',
  replan: 'loaded',
  solve: 'solved',
  route: 'route',
  export: 'exported',
  review: 'reviewed',
  dispatch: 'dispatched',
} as const satisfies Record<RequestKind, string>;

export type RequestOf<K extends RequestKind> = WorkerRequests[K]['request'];

/** The answer message to a request of kind K. */
export type Answer<K extends RequestKind> = { kind: (typeof ANSWER_KIND)[K]; id: number } & WorkerRequests[K]['answer'];

export type ToWorker = { [K in RequestKind]: { kind: K; id: number } & RequestOf<K> }[RequestKind];

export type FromWorker =
  | { kind: 'progress'; id: number; phase: string; fraction: number }
  | { [K in RequestKind]: Answer<K> }[RequestKind]
  | { kind: 'error'; id: number; error: WorkerErrorView };
