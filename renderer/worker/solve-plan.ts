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
import { addedLaneRef, type AddedLane } from '../model/added-lanes';
import { laneKeyId } from '../../engine/index';
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
    if (solved.status[d] !== STATUS_REACHABLE) continue;
    // Only a cost on screen can be hidden: a depot the limit leaves unreachable shows no cost at all.
    if (limited && solved.unlimitedStatus[d] === STATUS_UNBOUNDED) flags[d] |= FLAG_LIMIT_HIDES_LOOP;
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
    extraLanes: [],
    overlay,
    solveMs,
  };
}

/**
 * Per depot, 1 when its cheapest route under the scenario differs from the base's: another status,
 * or other lanes (a re-priced lane is the same lane), as `compareImport` decides it for the CLI.
 * `laneRefs` names the scenario network's lanes as base lanes when it was rebuilt (else null).
 */
export function routeChanges(baseNetwork: Network, base: Solved, network: Network, solved: Solved, laneRefs: Int32Array | null): Uint8Array {
  if (!('maxLegs' in base) && !('maxLegs' in solved)) return treeRouteChanges(baseNetwork, base, solved, laneRefs);
  const n = baseNetwork.depotCount;
  const changed = new Uint8Array(n);
  for (let d = 0; d < n; d++) {
    if (base.status[d] !== solved.status[d]) {
      changed[d] = 1;
      continue;
    }
    if (solved.status[d] !== STATUS_REACHABLE) continue;
    const before = pathOf(baseNetwork, base, d)?.lanes ?? [];
    const after = pathOf(network, solved, d)?.lanes ?? [];
    const same = before.length === after.length && after.every((e, i) => (laneRefs ? laneRefs[e] : e) === before[i]);
    if (!same) changed[d] = 1;
  }
  return changed;
}

/**
 * routeChanges on two route trees in one pass down the tree (depots in order of legs): a route
 * changed when its last lane differs or the route to that lane's start changed. Equal to comparing
 * whole paths (route-changed.test.ts), without walking one per depot.
 */
function treeRouteChanges(baseNetwork: Network, base: RouteTree, solved: RouteTree, laneRefs: Int32Array | null): Uint8Array {
  const n = baseNetwork.depotCount;
  const changed = new Uint8Array(n);
  // Depots reachable on both sides, bucketed by their legs in the base tree.
  let maxLegs = 0;
  for (let d = 0; d < n; d++) if (base.status[d] === STATUS_REACHABLE && base.legs[d] > maxLegs) maxLegs = base.legs[d];
  const buckets: number[][] = Array.from({ length: maxLegs + 1 }, () => []);
  for (let d = 0; d < n; d++) {
    if (base.status[d] !== solved.status[d]) changed[d] = 1;
    else if (solved.status[d] === STATUS_REACHABLE) buckets[base.legs[d]].push(d);
  }
  for (const bucket of buckets) {
    for (const d of bucket) {
      const before = base.viaLane[d];
      const after = solved.viaLane[d] < 0 ? solved.viaLane[d] : laneRefs ? laneRefs[solved.viaLane[d]] : solved.viaLane[d];
      if (before !== after) changed[d] = 1;
      else if (before >= 0) changed[d] = changed[baseNetwork.laneFrom[before]];
    }
  }
  return changed;
}

/** How the UI names the lanes of a network the scenario rebuilt, and the lanes the base plan lacks. */
export interface RebuiltLanes {
  /** Per rebuilt lane: the base network lane of its row, or `addedLaneRef(k)` for `extra[k]`. */
  laneRefs: Int32Array;
  /** Lanes in the plan only because of the scenario: added lanes and rows brought into the date. */
  extra: AddedLane[];
}

/**
 * Names each lane of a network the scenario rebuilt (see RebuiltLanes). A lane whose row the base
 * plan has is that base lane; every other lane (one the scenario adds, or a file row a validity
 * change brings into the date) is listed in `extra` with its values from the overlay's network.
 */
export function rebuiltLanesOf(rebuilt: OverlayNetwork, laneOfRow: Int32Array, imported: ImportResult, scenario: Scenario): RebuiltLanes {
  const net = rebuilt.network;
  const baseIndex = imported.network?.depotIndex ?? net.depotIndex;
  const validityChange = new Map<string, number>();
  scenario.changes.forEach((c, i) => {
    if (c.kind === 'set-validity') validityChange.set(laneKeyId(c.lane), i);
  });
  const extra: AddedLane[] = [];
  const laneRefs = Int32Array.from(rebuilt.baseRow, (row, e) => {
    if (row >= 0 && laneOfRow[row] >= 0) return laneOfRow[row];
    const ref = addedLaneRef(extra.length);
    const key = rebuilt.keys[e];
    const added = rebuilt.addedBy[e];
    const change = added >= 0 ? added : (validityChange.get(laneKeyId(key)) ?? -1);
    const found = change >= 0 ? scenario.changes[change] : undefined;
    const validity = found && found.kind !== 'close-lane' && found.kind !== 'set-amount' ? (found.kind === 'add-lane' ? found.lane : found) : null;
    extra.push({
      ref,
      kind: added >= 0 ? 'added' : 'row',
      changeIndex: change,
      sourceRow: added >= 0 || row < 0 ? null : imported.lanes.sourceRow[row],
      lane: {
        from: key.from,
        to: key.to,
        ref: key.ref,
        tollMinor: net.laneToll[e],
        fuelMinor: net.laneFuel[e],
        feesMinor: net.laneFees[e],
        rebateMinor: net.laneRebate[e],
        validFrom: validity?.validFrom ?? null,
        validTo: validity?.validTo ?? null,
        distanceKm: Number.isNaN(net.laneDistanceKm[e]) ? null : net.laneDistanceKm[e],
        driveMinutes: Number.isNaN(net.laneDriveMinutes[e]) ? null : net.laneDriveMinutes[e],
      },
      from: baseIndex.get(key.from) ?? -1,
      to: baseIndex.get(key.to) ?? -1,
      netMinor: net.laneNet[e],
    });
    return ref;
  });
  return { laneRefs, extra };
}

/**
 * A solve made on a network the scenario rebuilt, with its lanes renamed as the UI knows them
 * (`rebuiltLanesOf`) and the lanes only the scenario plans listed with it.
 */
export function onBaseLanes(view: SolveView, { laneRefs, extra }: RebuiltLanes): SolveView {
  return {
    ...view,
    extraLanes: extra,
    treeLanes: Int32Array.from(view.treeLanes, (e) => laneRefs[e]).filter((e) => e !== -1),
    loops: view.loops.map((loop) => ({ ...loop, lanes: loop.lanes.map((e) => laneRefs[e]) })),
  };
}
