// One planning solve as the UI shows it: the engine's overlay gives the scenario's amounts as a
// weight per lane position (the network is rebuilt only when the scenario changes which rows are
// planned), then the engine solves from the origin with or without a leg limit, and each depot
// gets its drive time and caution flags. The overlay's figures travel with the answer.

import { depotIndexOf } from '../../engine/index';
import type { Network } from '../../engine/index';
import { cheapestRoutes, STATUS_REACHABLE, STATUS_UNBOUNDED, type RouteTree } from '../../engine/index';
import { legLimitedRoutes, type LegLimitedRoutes } from '../../engine/index';
import { routePath } from '../../engine/index';
import type { ImportResult, OverlayIndex, OverlayNetwork } from '../../engine/index';
import { buildOverlay, describeChanges, overlayNetwork, overlayPlanAmounts, overlayRowAmounts, planRequestOf } from '../../engine/index';
import { addedLaneRef } from '../model/added-lanes';
import { hasChanges, type Scenario } from '../model/scenario-edits';
import { FLAG_DRIVE_UNKNOWN, FLAG_LIMIT_HIDES_LOOP, FLAG_LONG_DRIVE, FLAG_NEGATIVE_COST, FLAG_UNBOUNDED } from '../model/flags';
import type { OverlayView, PlanSettings, RouteView, SolveView } from './protocol';

export type Solved = RouteTree | LegLimitedRoutes;

/** The scenario over the import for its planned date and class: amounts, weights, and the network to solve when rebuilt. */
export interface ScenarioSolveInput {
  overlay: OverlayView;
  /** Per CSR position of the base network; undefined without changes. */
  weights: Float64Array | undefined;
  /** Set when the scenario changes which rows are planned: solve this network instead. */
  rebuilt: OverlayNetwork | null;
}

/** Lays the scenario over the import with the engine's overlay; see the file header. */
export function scenarioSolveInput(imported: ImportResult, network: Network, scenario: Scenario | null, index?: OverlayIndex): ScenarioSolveInput {
  const changed = hasChanges(scenario);
  const request = planRequestOf(imported);
  const overlay = buildOverlay(imported, changed ? scenario : null, index);
  const amounts = overlayPlanAmounts(overlay, imported, request, network, imported.plan.laneRecord);
  const base = overlay.baseCount;
  // Row amounts are read only for rows the plan leaves out (the lane table's "every row" view);
  // when every row is planned they would be 500,000 copies per recompute that nothing reads.
  const everyRowPlanned = imported.plan.laneRecord.length === base;
  const rows = everyRowPlanned ? null : overlayRowAmounts(overlay, imported.plan.vehicleClass);
  const view: OverlayView = {
    toll: amounts.toll,
    fuel: amounts.fuel,
    fees: amounts.fees,
    rebate: amounts.rebate,
    closed: amounts.closed,
    changed: amounts.changed,
    notPlanned: amounts.notPlanned,
    rows: rows
      ? { toll: rows.toll.slice(0, base), fuel: rows.fuel.slice(0, base), fees: rows.fees.slice(0, base), rebate: rows.rebate.slice(0, base), closed: overlay.closed.slice(0, base), changed: overlay.changed.slice(0, base) }
      : { toll: new Float64Array(0), fuel: new Float64Array(0), fees: new Float64Array(0), rebate: new Float64Array(0), closed: new Uint8Array(0), changed: new Uint8Array(0) },
    changes: changed ? describeChanges(imported, overlay, scenario!, network.exponent, index) : [],
  };
  if (!changed) return { overlay: view, weights: undefined, rebuilt: null };
  if (amounts.weights) return { overlay: view, weights: amounts.weights, rebuilt: null };
  return { overlay: view, weights: undefined, rebuilt: overlayNetwork(overlay, imported, request) };
}

/** The typed arrays of a solve view (its own copies, overlay included), for postMessage's transfer list. */
export function solveTransferables(view: SolveView): ArrayBuffer[] {
  const own = [view.status, view.cost, view.legs, view.driveMinutes, view.flags, view.treeLanes, ...(view.base ? [view.base.status, view.base.cost, view.base.legs] : [])];
  return [...own.map((a) => a.buffer as ArrayBuffer), ...overlayTransferables(view.overlay)];
}

/** The typed arrays of an overlay view, for postMessage's transfer list. */
export function overlayTransferables(view: OverlayView): ArrayBuffer[] {
  const r = view.rows;
  return [view.toll, view.fuel, view.fees, view.rebate, view.closed, view.changed, view.notPlanned, r.toll, r.fuel, r.fees, r.rebate, r.closed, r.changed].map((a) => a.buffer as ArrayBuffer);
}

/** Runs the engine solve for the settings. */
export function solveFor(network: Network, settings: PlanSettings, weights?: Float64Array): Solved {
  const origin = depotIndexOf(network, settings.origin, 'origin');
  return settings.maxLegs === null ? cheapestRoutes(network, origin, weights) : legLimitedRoutes(network, origin, settings.maxLegs, weights);
}

/** Lanes of a depot's route in travel order, or null when it has none. */
export function pathOf(network: Network, solved: Solved, target: number): RouteView | null {
  if (solved.status[target] !== STATUS_REACHABLE) return null;
  const path = 'maxLegs' in solved ? solved.path(target) : routePath(network, solved, target);
  return path ? { target, depots: path.depots, lanes: path.lanes } : null;
}

/**
 * Drive minutes per depot as running totals down the cheapest-route tree: depots in order of legs,
 * the parent's total plus the own lane (the same additions in the same order as a walk of each
 * path, so equal bit for bit). A walk per depot cost O(depots x legs): seconds at 50,000 depots.
 */
function treeDriveMinutes(network: Network, tree: RouteTree): Float64Array {
  const n = network.depotCount;
  const minutes = new Float64Array(n).fill(NaN);
  let maxLegs = 0;
  for (let d = 0; d < n; d++) if (tree.status[d] === STATUS_REACHABLE && tree.legs[d] > maxLegs) maxLegs = tree.legs[d];
  const start = new Int32Array(maxLegs + 2);
  for (let d = 0; d < n; d++) if (tree.status[d] === STATUS_REACHABLE) start[tree.legs[d] + 1]++;
  for (let k = 1; k < start.length; k++) start[k] += start[k - 1];
  const order = new Int32Array(start[start.length - 1]);
  const fill = start.slice(0, maxLegs + 1);
  for (let d = 0; d < n; d++) if (tree.status[d] === STATUS_REACHABLE) order[fill[tree.legs[d]]++] = d;
  for (const d of order) {
    const lane = tree.viaLane[d];
    minutes[d] = lane < 0 ? 0 : minutes[network.laneFrom[lane]] + network.laneDriveMinutes[lane];
  }
  return minutes;
}

/** The solve's per-depot view: drive time, flags and the tree to draw. */
export function solveView(network: Network, settings: PlanSettings, solved: Solved, solveMs: number, driveLimitMinutes: number, overlay: OverlayView): SolveView {
  const n = network.depotCount;
  const limited = 'maxLegs' in solved;
  const driveMinutes = limited ? new Float64Array(n).fill(NaN) : treeDriveMinutes(network, solved);
  const flags = new Uint8Array(n);
  const treeLaneList: number[] = [];
  // Files without drive times would flag every depot; the flag only means something when some lanes have them.
  const anyDriveData = network.laneDriveMinutes.some((m) => !Number.isNaN(m));
  for (let d = 0; d < n; d++) {
    if (solved.status[d] === STATUS_UNBOUNDED) flags[d] |= FLAG_UNBOUNDED;
    if (limited && solved.unlimitedStatus[d] === STATUS_UNBOUNDED) flags[d] |= FLAG_LIMIT_HIDES_LOOP;
    if (solved.status[d] !== STATUS_REACHABLE) continue;
    if (solved.cost[d] < 0) flags[d] |= FLAG_NEGATIVE_COST;
    let last = -1;
    if (limited) {
      // A leg-limited route is not a tree path: its lanes come from the solve's own path.
      const route = pathOf(network, solved, d);
      if (!route) continue;
      let sum = 0;
      for (const lane of route.lanes) sum += network.laneDriveMinutes[lane];
      driveMinutes[d] = route.lanes.length === 0 ? 0 : sum;
      last = route.lanes.length > 0 ? route.lanes[route.lanes.length - 1] : -1;
    } else last = solved.viaLane[d];
    const minutes = driveMinutes[d];
    if (Number.isNaN(minutes)) {
      if (anyDriveData) flags[d] |= FLAG_DRIVE_UNKNOWN;
    }
    else if (minutes > driveLimitMinutes) flags[d] |= FLAG_LONG_DRIVE;
    if (last >= 0) treeLaneList.push(last);
  }
  return {
    settings,
    origin: solved.origin,
    status: solved.status.slice(),
    cost: solved.cost.slice(),
    legs: solved.legs.slice(),
    driveMinutes,
    flags,
    treeLanes: Int32Array.from(treeLaneList),
    loops: solved.loops.map((loop) => ({ depots: loop.depots, lanes: loop.lanes, netPerLap: loop.netPerLap })),
    base: null,
    overlay,
    solveMs,
  };
}

/**
 * How the UI names each lane of a network the scenario rebuilt: the base network lane of its row
 * (`laneOfRow`), or for a lane the scenario added `addedLaneRef(change index)`; -1 for a row the
 * base plan does not have (e.g. one a validity change brings into the date).
 */
export function laneRefsOf(rebuilt: OverlayNetwork, laneOfRow: Int32Array): Int32Array {
  return Int32Array.from(rebuilt.baseRow, (row, e) => (row >= 0 ? laneOfRow[row] : rebuilt.addedBy[e] >= 0 ? addedLaneRef(rebuilt.addedBy[e]) : -1));
}

/**
 * A solve made on a network the scenario rebuilt, with its lanes renamed as the UI knows them
 * (`laneRefsOf`); an added lane that cannot be traced (-1) is left out of the tree.
 */
export function onBaseLanes(view: SolveView, laneRefs: Int32Array): SolveView {
  return {
    ...view,
    treeLanes: Int32Array.from(view.treeLanes, (e) => laneRefs[e]).filter((e) => e !== -1),
    loops: view.loops.map((loop) => ({ ...loop, lanes: loop.lanes.map((e) => laneRefs[e]) })),
  };
}
