// The overlay's network for one date and vehicle class: the planner (engine/planning) picks rows
// and tolls from the overlaid lane table exactly as it does for the import, so a what-if network is
// planned by the same rules as the base. When the scenario leaves the planned rows as they are, the
// base network is kept and only its weights change; otherwise the network is rebuilt.

import type { LaneKey } from '../import/lane-key';
import type { DepotRecord, LaneTable, ValidationItem } from '../import/types';
import { netCost } from '../money/net-cost';
import type { Network } from '../network/types';
import { planLanes, plannedRowToll, tollChoice } from '../planning/plan-network';
import type { PlannedNetwork, PlanningSettings, PlanRequest } from '../planning/types';
import { buildOverlay, type LaneOverlay } from './overlay';
import type { Scenario } from './types';

/** What planning needs besides the overlay: the import's depots, currency and lanes file name. */
export interface OverlayPlanBase {
  depots: readonly DepotRecord[];
  currency: string;
  exponent: number;
  /** Name used in plan problems; default lanes.csv. */
  lanesFile?: string;
}

export interface OverlayNetwork {
  network: Network;
  /** `plan.laneRecord[e]` is the overlay table row of lane e. */
  plan: PlannedNetwork;
  /** Key of each network lane (the key of its row, counted over the file). */
  keys: LaneKey[];
  /** Base lane table row each lane stands for, -1 for a lane the scenario added. */
  baseRow: Int32Array;
  /** Index of the add-lane change of each lane, -1 for a lane of the file. */
  addedBy: Int32Array;
  /** Problems of planning this date and class (e.g. a lane without a toll for the class); those rows are left out. */
  planProblems: ValidationItem[];
}

function planOverlay(overlay: LaneOverlay, base: OverlayPlanBase, request: PlanRequest, leaveOut: Uint8Array | undefined, build: boolean) {
  return planLanes({ depots: base.depots, lanes: overlay.table, currency: base.currency, exponent: base.exponent, lanesFile: base.lanesFile ?? 'lanes.csv', leaveOut }, request, () => build);
}

/** The network of `request`'s date and class under the overlay; closed rows are left out. */
export function overlayNetwork(overlay: LaneOverlay, base: OverlayPlanBase, request: PlanRequest): OverlayNetwork {
  const outcome = planOverlay(overlay, base, request, overlay.closed, true);
  const rows = outcome.plan.laneRecord;
  return {
    network: outcome.plan.network!,
    plan: outcome.plan,
    keys: Array.from(rows, (r) => overlay.keys[r]),
    baseRow: Int32Array.from(rows, (r) => overlay.sourceOf[r]),
    addedBy: Int32Array.from(rows, (r) => overlay.changeOf[r]),
    planProblems: outcome.errors,
  };
}

/** The amounts of a base plan's lanes under the overlay, for one date and class (one entry per base lane). */
export interface PlanAmounts {
  toll: Float64Array;
  fuel: Float64Array;
  fees: Float64Array;
  rebate: Float64Array;
  /** 1 for a lane the scenario closes, or whose row the scenario no longer plans for this date and class. */
  closed: Uint8Array;
  /** 1 for a lane some applied change touches. */
  changed: Uint8Array;
  /** 1 for a lane whose row the scenario no longer plans for this date and class (e.g. its validity moved). */
  notPlanned: Uint8Array;
  /**
   * Net cost per CSR position of the base network, +Infinity where closed; null when the overlay
   * plans other rows for this date and class (added lanes, validity, class copies): then the
   * network is rebuilt with overlayNetwork.
   */
  weights: Float64Array | null;
}

/** The base plan's own amounts, nothing closed or changed; the starting point of every PlanAmounts. */
function baseAmounts(network: Network): PlanAmounts {
  const n = network.laneCount;
  return {
    toll: network.laneToll.slice(),
    fuel: network.laneFuel.slice(),
    fees: network.laneFees.slice(),
    rebate: network.laneRebate.slice(),
    closed: new Uint8Array(n),
    changed: new Uint8Array(n),
    notPlanned: new Uint8Array(n),
    weights: null,
  };
}

/**
 * The base plan's lanes (`network`, whose lane e is table row `laneRecord[e]`) under the overlay,
 * planned for `request` by the planner's own rules.
 */
export function overlayPlanAmounts(overlay: LaneOverlay, base: OverlayPlanBase, request: PlanRequest, network: Network, laneRecord: Int32Array): PlanAmounts {
  const n = laneRecord.length;
  if (!overlay.reshaped && !overlay.changed.includes(1)) {
    // Nothing applied: the base plan's own amounts (re-planning would give the same).
    return { ...baseAmounts(network), weights: network.outNet.slice() };
  }
  if (!overlay.reshaped) {
    const repriced = repriceChangedRows(overlay, base, request, network, laneRecord);
    if (repriced) return repriced;
  }
  const { columns } = planOverlay(overlay, base, request, undefined, false);
  const t = overlay.table;
  let sameRows = columns.record.length === n;
  for (let e = 0; sameRows && e < n; e++) if (columns.record[e] !== laneRecord[e]) sameRows = false;
  // Planned entry of each base row (a class copy stands for the row it copies).
  const plannedOf = new Int32Array(overlay.baseCount).fill(-1);
  columns.record.forEach((r, i) => {
    const b = overlay.sourceOf[r];
    if (b >= 0) plannedOf[b] = i;
  });
  const out = baseAmounts(network);
  for (let e = 0; e < n; e++) {
    const i = plannedOf[laneRecord[e]];
    if (i === -1) {
      out.closed[e] = 1;
      out.notPlanned[e] = 1;
      out.changed[e] = 1;
      continue;
    }
    const r = columns.record[i];
    out.toll[e] = columns.toll[i];
    out.fuel[e] = columns.fuel[i];
    out.fees[e] = t.fees[r];
    out.rebate[e] = t.rebate[r];
    out.closed[e] = overlay.closed[r];
    out.changed[e] = overlay.changed[r] || r !== laneRecord[e] ? 1 : 0;
  }
  if (sameRows) {
    const weights = new Float64Array(n);
    for (let p = 0; p < n; p++) {
      const e = network.outLane[p];
      weights[p] = out.closed[e] ? Infinity : netCost(out.toll[e], out.fuel[e], out.fees[e], out.rebate[e], () => `net cost of the lane from row ${network.laneRow[e]}`);
    }
    out.weights = weights;
  }
  return out;
}

/**
 * The fast path of an edit: when every row a change touches is already planned, the planned rows
 * stay the same, so only those lanes are priced again (with the planner's own toll rule) instead of
 * planning the whole table. Null when it does not apply (the caller plans the table).
 */
function repriceChangedRows(overlay: LaneOverlay, base: OverlayPlanBase, request: PlanRequest, network: Network, laneRecord: Int32Array): PlanAmounts | null {
  const n = laneRecord.length;
  const t = overlay.table;
  const laneOfRow = new Int32Array(overlay.baseCount).fill(-1);
  for (let e = 0; e < n; e++) laneOfRow[laneRecord[e]] = e;
  const { chosen, defaultToll } = tollChoice(t, request, base.exponent);
  const out = baseAmounts(network);
  for (let r = 0; r < overlay.baseCount; r++) {
    if (!overlay.changed[r]) continue;
    const e = laneOfRow[r];
    const toll = plannedRowToll(t, r, chosen, defaultToll);
    // A row the base plan left out (or one without a toll now) may change the planned rows.
    if (e === -1 || Number.isNaN(toll)) return null;
    out.toll[e] = toll;
    // A blank fuel is the planner's estimate, which depends on the distance alone: the base's.
    out.fuel[e] = Number.isNaN(t.fuel[r]) ? network.laneFuel[e] : t.fuel[r];
    out.fees[e] = t.fees[r];
    out.rebate[e] = t.rebate[r];
    out.closed[e] = overlay.closed[r];
    out.changed[e] = 1;
  }
  const weights = network.outNet.slice();
  for (let p = 0; p < n; p++) {
    const e = network.outLane[p];
    if (!out.changed[e]) continue;
    weights[p] = out.closed[e] ? Infinity : netCost(out.toll[e], out.fuel[e], out.fees[e], out.rebate[e], () => `net cost of the lane from row ${network.laneRow[e]}`);
  }
  out.weights = weights;
  return out;
}

/** overlayPlanAmounts' weights alone: null when the network must be rebuilt. */
export function overlayWeights(overlay: LaneOverlay, base: OverlayPlanBase, request: PlanRequest, network: Network, laneRecord: Int32Array): Float64Array | null {
  return overlayPlanAmounts(overlay, base, request, network, laneRecord).weights;
}

/** An import's lane table with the date, class and settings it was planned for (an ImportResult is one). */
export interface PlannedImport extends OverlayPlanBase {
  lanes: LaneTable;
  plan: { date: string | null; vehicleClass: string | null; settings: PlanningSettings };
}

/** The plan request that re-plans `imported` for the same date, class and settings. */
export function planRequestOf(imported: PlannedImport): PlanRequest {
  const { date, vehicleClass, settings } = imported.plan;
  return { date: date ?? undefined, vehicleClass: vehicleClass ?? undefined, settings };
}

/** An import as the scenario makes it: what exports, the review and `export --scenario` work on. */
export interface ScenarioImport extends OverlayNetwork {
  overlay: LaneOverlay;
  depots: readonly DepotRecord[];
  /** The overlay's lane table; `leaveOut` marks its closed rows. */
  lanes: LaneTable;
  leaveOut: Uint8Array;
  currency: string;
  exponent: number;
}

/** Lays `scenario` over `imported` and plans it for the import's own date, class and settings. */
export function scenarioImport(imported: PlannedImport, scenario: Scenario | null): ScenarioImport {
  const overlay = buildOverlay(imported, scenario);
  const planned = overlayNetwork(overlay, imported, planRequestOf(imported));
  return { ...planned, overlay, depots: imported.depots, lanes: overlay.table, leaveOut: overlay.closed, currency: imported.currency, exponent: imported.exponent };
}
