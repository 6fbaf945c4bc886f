// One planning solve as the UI shows it: scenario edits become a weight per lane position (the
// network is never rebuilt for a what-if), then the engine solves from the origin with or without
// a leg limit, and each depot gets its drive time and caution flags.

import { depotIndexOf } from '../../engine/index';
import type { Network } from '../../engine/index';
import { cheapestRoutes, STATUS_REACHABLE, STATUS_UNBOUNDED, type RouteTree } from '../../engine/index';
import { legLimitedRoutes, type LegLimitedRoutes } from '../../engine/index';
import { routePath } from '../../engine/index';
import { laneKeysOf, type LaneKey } from '../../engine/index';
import type { AppliedScenario } from '../../engine/index';
import { addedLaneRef } from '../model/added-lanes';
import { applyScenarioAmounts, hasChanges, laneNetMinor, type Scenario } from '../model/scenario-edits';
import { FLAG_DRIVE_UNKNOWN, FLAG_LIMIT_HIDES_LOOP, FLAG_LONG_DRIVE, FLAG_NEGATIVE_COST, FLAG_UNBOUNDED } from '../model/flags';
import type { PlanSettings, RouteView, SolveView } from './protocol';

export type Solved = RouteTree | LegLimitedRoutes;

/** Net cost per CSR position after the scenario's changes; closed lanes get +Infinity. Undefined when nothing is edited. */
export function scenarioWeights(network: Network, scenario: Scenario | null, keys?: { keys: LaneKey[]; index: ReadonlyMap<string, number> }): Float64Array | undefined {
  if (!hasChanges(scenario)) return undefined;
  const base = { toll: network.laneToll, fuel: network.laneFuel, fees: network.laneFees, rebate: network.laneRebate };
  const amounts = keys ? applyScenarioAmounts(base, keys.keys, scenario, keys.index) : applyScenarioAmounts(base, laneKeysOf(network), scenario);
  const weights = new Float64Array(network.laneCount);
  for (let p = 0; p < network.laneCount; p++) {
    const e = network.outLane[p];
    const net = laneNetMinor(amounts, e);
    if (!Number.isSafeInteger(net)) throw new RangeError(`scenario: net cost of the lane from row ${network.laneRow[e]} is out of the exact range`);
    weights[p] = amounts.closed[e] ? Infinity : net;
  }
  return weights;
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

/** The solve's per-depot view: drive time, flags and the tree to draw. */
export function solveView(network: Network, settings: PlanSettings, solved: Solved, solveMs: number, driveLimitMinutes: number): SolveView {
  const n = network.depotCount;
  const driveMinutes = new Float64Array(n).fill(NaN);
  const flags = new Uint8Array(n);
  const treeLaneList: number[] = [];
  const limited = 'maxLegs' in solved;
  // Files without drive times would flag every depot; the flag only means something when some lanes have them.
  const anyDriveData = network.laneDriveMinutes.some((m) => !Number.isNaN(m));
  for (let d = 0; d < n; d++) {
    if (solved.status[d] === STATUS_UNBOUNDED) flags[d] |= FLAG_UNBOUNDED;
    if (limited && solved.unlimitedStatus[d] === STATUS_UNBOUNDED) flags[d] |= FLAG_LIMIT_HIDES_LOOP;
    if (solved.status[d] !== STATUS_REACHABLE) continue;
    if (solved.cost[d] < 0) flags[d] |= FLAG_NEGATIVE_COST;
    const route = pathOf(network, solved, d);
    if (!route) continue;
    let minutes = 0;
    for (const lane of route.lanes) minutes += network.laneDriveMinutes[lane];
    driveMinutes[d] = route.lanes.length === 0 ? 0 : minutes;
    if (Number.isNaN(minutes)) {
      if (anyDriveData) flags[d] |= FLAG_DRIVE_UNKNOWN;
    }
    else if (minutes > driveLimitMinutes) flags[d] |= FLAG_LONG_DRIVE;
    if (route.lanes.length > 0) treeLaneList.push(route.lanes[route.lanes.length - 1]);
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
    solveMs,
  };
}

/**
 * How the UI names each lane of a network the scenario rebuilt: its base lane index, or for a lane
 * the scenario added `addedLaneRef(change index)`. applyScenario keys the k-th successful add-lane
 * change of a from/to/ref group with occurrence (base lanes in that group) + k, which traces it back.
 */
export function laneRefsOf(applied: AppliedScenario, scenario: Scenario, baseKeys: readonly LaneKey[]): Int32Array {
  const group = (from: string, to: string, ref: string | null) => JSON.stringify([from, to, ref]);
  const baseCount = new Map<string, number>();
  for (const k of baseKeys) baseCount.set(group(k.from, k.to, k.ref), k.occurrence);
  const failed = new Set(applied.problems.map((p) => p.changeIndex));
  const addsByGroup = new Map<string, number[]>();
  scenario.changes.forEach((c, i) => {
    if (c.kind !== 'add-lane' || failed.has(i)) return;
    const g = group(c.lane.from, c.lane.to, c.lane.ref);
    addsByGroup.set(g, [...(addsByGroup.get(g) ?? []), i]);
  });
  return Int32Array.from(applied.baseLaneOf, (b, e) => {
    if (b >= 0) return b;
    const k = applied.laneKeys[e];
    const g = group(k.from, k.to, k.ref);
    const change = addsByGroup.get(g)?.[k.occurrence - (baseCount.get(g) ?? 0) - 1];
    return change === undefined ? -1 : addedLaneRef(change);
  });
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
