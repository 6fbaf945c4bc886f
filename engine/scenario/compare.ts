// Compares a scenario with the base from one origin: each depot's cost before and after, whether
// its cheapest route changed, and which rebate loops (network-wide) appear or disappear. Lanes are
// matched by LaneKey, so a lane the scenario only re-priced still counts as the same lane.

import { findDistinctLoops } from '../audit/distinct-loops';
import { subMinor, type Minor } from '../money/minor';
import { depotIndexOf } from '../network/build';
import type { Network } from '../network/types';
import { cheapestRoutes, statusName, STATUS_REACHABLE, STATUS_UNBOUNDED, type DepotStatus, type RouteTree } from '../routes/cheapest-routes';
import { routePath } from '../routes/route-path';
import { applyScenario, type AppliedScenario, type ApplyOptions, type ScenarioBase, type ScenarioProblem } from './apply';
import { laneKeyId, type LaneKey } from '../import/lane-key';
import { buildOverlay } from './overlay';
import { overlayNetwork, planRequestOf, type PlannedImport } from './overlay-network';
import type { Scenario } from './types';

export interface DepotComparison {
  depot: string;
  name: string;
  baseStatus: DepotStatus;
  scenarioStatus: DepotStatus;
  /** Exact costs in minor units where reachable, else null. */
  baseCost: number | null;
  scenarioCost: number | null;
  /** scenarioCost - baseCost when both are reachable, else null. */
  change: number | null;
  /** True when the lanes of the cheapest route differ (or the status does). */
  routeChanged: boolean;
  baseRoute: LaneKey[] | null;
  scenarioRoute: LaneKey[] | null;
}

export interface ComparedLoop {
  depots: string[];
  lanes: LaneKey[];
  /** Source rows of the lanes (0 for a lane the scenario added). */
  rows: number[];
  netPerLap: number;
  /** True when the origin reaches the loop (its costs are unbounded from there). */
  reachedFromOrigin: boolean;
}

export interface ScenarioComparison {
  scenario: string;
  origin: string;
  currency: string;
  problems: ScenarioProblem[];
  depots: DepotComparison[];
  loopsAppeared: ComparedLoop[];
  loopsDisappeared: ComparedLoop[];
  /** True when either side has more distinct loops than the cap. */
  loopCapReached: boolean;
  baseNetwork: Network;
  /** The scenario's network, its lane keys and the base lane (or row) of each lane (-1 = added). */
  applied: Pick<AppliedScenario, 'network' | 'laneKeys' | 'baseLaneOf'>;
}

export interface CompareOptions extends ApplyOptions {
  /** Most distinct loops looked for on each side (default 100). */
  loopCap?: number;
}

/** Applies `scenario` to `base` and compares both from the depot with id `originId`. */
export function compareScenario(base: ScenarioBase, scenario: Scenario, originId: string, options: CompareOptions = {}): ScenarioComparison {
  const applied = applyScenario(base, scenario, options);
  // The base goes through the same date filter, so only the scenario's changes differ.
  const unchanged = applyScenario(base, { name: 'base', description: null, changes: [] }, options);
  return compareSides(unchanged, applied, scenario.name, applied.problems, originId, options.loopCap);
}

/**
 * Compares a scenario laid over an import's whole lane table (overlay.ts) with the base, both
 * planned for the import's date and vehicle class: the CLI's `compare`.
 */
export function compareImport(imported: PlannedImport, scenario: Scenario, originId: string, options: { loopCap?: number } = {}): ScenarioComparison {
  const request = planRequestOf(imported);
  const overlay = buildOverlay(imported, scenario);
  const after = overlayNetwork(overlay, imported, request);
  const before = overlayNetwork(buildOverlay(imported, null), imported, request);
  return compareSides(
    { network: before.network, laneKeys: before.keys, baseLaneOf: before.baseRow },
    { network: after.network, laneKeys: after.keys, baseLaneOf: after.baseRow },
    scenario.name,
    overlay.problems,
    originId,
    options.loopCap,
  );
}

type Side = Pick<AppliedScenario, 'network' | 'laneKeys' | 'baseLaneOf'>;

function compareSides(unchanged: Side, applied: Side, scenarioName: string, problems: ScenarioProblem[], originId: string, cap: number | undefined): ScenarioComparison {
  const baseNetwork = unchanged.network;
  const baseKeys = unchanged.laneKeys;
  const scenarioNetwork = applied.network;
  const origin = depotIndexOf(baseNetwork, originId, 'compare --from');
  const before = cheapestRoutes(baseNetwork, origin);
  const after = cheapestRoutes(scenarioNetwork, depotIndexOf(scenarioNetwork, originId, 'compare --from'));

  const routeOf = (net: Network, tree: RouteTree, keys: LaneKey[], d: number) =>
    tree.status[d] === STATUS_REACHABLE ? routePath(net, tree, d)!.lanes.map((e) => keys[e]) : null;
  const sameRoute = (a: LaneKey[] | null, b: LaneKey[] | null) =>
    a !== null && b !== null && a.length === b.length && a.every((k, i) => laneKeyId(k) === laneKeyId(b[i]));

  const depots: DepotComparison[] = [];
  for (let d = 0; d < baseNetwork.depotCount; d++) {
    const baseCost = before.status[d] === STATUS_REACHABLE ? before.cost[d] : null;
    const scenarioCost = after.status[d] === STATUS_REACHABLE ? after.cost[d] : null;
    const baseRoute = routeOf(baseNetwork, before, baseKeys, d);
    const scenarioRoute = routeOf(scenarioNetwork, after, applied.laneKeys, d);
    depots.push({
      depot: baseNetwork.depotIds[d],
      name: baseNetwork.depotNames[d],
      baseStatus: statusName(before.status[d]),
      scenarioStatus: statusName(after.status[d]),
      baseCost,
      scenarioCost,
      change: baseCost !== null && scenarioCost !== null ? subMinor(scenarioCost as Minor, baseCost as Minor, `cost change at depot "${baseNetwork.depotIds[d]}"`) : null,
      routeChanged: before.status[d] !== after.status[d] || (baseRoute !== null && !sameRoute(baseRoute, scenarioRoute)),
      baseRoute,
      scenarioRoute,
    });
  }

  const loopsOf = (net: Network, keys: LaneKey[], tree: RouteTree) => {
    const found = findDistinctLoops(net, { cap });
    const byId = new Map<string, ComparedLoop>();
    for (const loop of found.loops) {
      const lanes = loop.lanes.map((e) => keys[e]);
      const id = lanes.map(laneKeyId).sort().join('\n');
      byId.set(id, {
        depots: loop.depots.map((x) => net.depotIds[x]),
        lanes,
        rows: loop.lanes.map((e) => net.laneRow[e]),
        netPerLap: loop.netPerLap,
        reachedFromOrigin: tree.status[loop.depots[0]] === STATUS_UNBOUNDED,
      });
    }
    return { byId, capReached: found.capReached };
  };
  const was = loopsOf(baseNetwork, baseKeys, before);
  const now = loopsOf(scenarioNetwork, applied.laneKeys, after);
  return {
    scenario: scenarioName,
    origin: originId,
    currency: baseNetwork.currency,
    problems,
    depots,
    loopsAppeared: [...now.byId].filter(([id]) => !was.byId.has(id)).map(([, loop]) => loop),
    loopsDisappeared: [...was.byId].filter(([id]) => !now.byId.has(id)).map(([, loop]) => loop),
    loopCapReached: was.capReached || now.capReached,
    baseNetwork,
    applied,
  };
}
