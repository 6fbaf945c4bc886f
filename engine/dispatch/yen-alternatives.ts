// Next-cheapest loopless routes for one load: Yen's k shortest simple paths (J. Y. Yen, "Finding the
// k shortest loopless paths in a network", Management Science 17(11), 1971). Each spur search is
// Dijkstra (engine/routes/dijkstra) on Johnson-reweighted costs w' = w + h(u) - h(v), where h is the
// load's own solve (the cheapest cost from its origin): exact and never negative on every lane
// between depots that solve reached with a bounded cost, which is all a loopless route to a
// bounded depot can use. A route's true cost is summed exactly from its lanes' own costs.

import { MoneyOverflowError } from '../errors';
import type { Network } from '../network/types';
import { STATUS_REACHABLE, type RouteTree } from '../routes/cheapest-routes';
import { createDijkstraWorkspace, dijkstra, type DijkstraWorkspace } from '../routes/dijkstra';

/** Shared by every load of one solve: reweighted costs and the lane -> CSR position map. */
export interface YenContext {
  network: Network;
  /** True lane costs per CSR position (+Infinity closed). */
  weights: Float64Array;
  /** Reweighted costs per CSR position; mutated during a search and restored after each spur. */
  reweighted: Float64Array;
  potential: Float64Array;
  positionOf: Int32Array;
  workspace: DijkstraWorkspace;
  origin: number;
}

export function prepareYen(network: Network, tree: RouteTree, weights: Float64Array = network.outNet): YenContext {
  const n = network.depotCount;
  const potential = new Float64Array(n);
  for (let d = 0; d < n; d++) potential[d] = tree.status[d] === STATUS_REACHABLE ? tree.cost[d] : NaN;
  const reweighted = new Float64Array(weights.length).fill(Infinity);
  const positionOf = new Int32Array(network.laneCount);
  const { outStart, outTo, outLane } = network;
  for (let u = 0; u < n; u++) {
    for (let p = outStart[u], end = outStart[u + 1]; p < end; p++) {
      positionOf[outLane[p]] = p;
      const v = outTo[p];
      const w = weights[p];
      if (w === Infinity || Number.isNaN(potential[u]) || Number.isNaN(potential[v])) continue;
      const r = w + potential[u] - potential[v];
      if (!Number.isSafeInteger(r)) throw new MoneyOverflowError('reweighted lane cost');
      reweighted[p] = r === 0 ? 0 : r;
    }
  }
  return { network, weights, reweighted, potential, positionOf, workspace: createDijkstraWorkspace(n), origin: tree.origin };
}

export interface RouteOption {
  /** Lane indices in travel order. */
  lanes: number[];
  costMinor: number;
}

export interface YenResult {
  /** Up to k routes after the best, in cost order (ties: fewer lanes first, then lane order). */
  alternatives: RouteOption[];
  /** What ended the search: k found, no more loopless routes, or the spur-search budget. */
  stoppedBy: 'k' | 'exhausted' | 'budget';
  searches: number;
}

const keyOf = (lanes: readonly number[]) => lanes.join(',');

function better(a: RouteOption, b: RouteOption): boolean {
  if (a.costMinor !== b.costMinor) return a.costMinor < b.costMinor;
  if (a.lanes.length !== b.lanes.length) return a.lanes.length < b.lanes.length;
  return keyOf(a.lanes) < keyOf(b.lanes);
}

/**
 * Up to `k` next-cheapest loopless routes from the context's origin to `target`, after `best` (the
 * cheapest route, lane indices). `maxSearches` bounds the Dijkstra runs.
 */
export function yenAlternatives(ctx: YenContext, target: number, best: RouteOption, k: number, maxSearches = 5000): YenResult {
  const { network, weights, reweighted, potential, positionOf, workspace } = ctx;
  const { outStart, laneFrom, laneTo } = network;
  if (Number.isNaN(potential[target])) throw new RangeError('yen: the target is not reached with a bounded cost');
  const found: RouteOption[] = [best];
  const seen = new Set<string>([keyOf(best.lanes)]);
  const candidates: RouteOption[] = [];
  let searches = 0;
  const saved: number[] = [];
  const close = (p: number) => {
    if (reweighted[p] === Infinity) return;
    saved.push(p, reweighted[p]);
    reweighted[p] = Infinity;
  };
  const restore = () => {
    for (let i = saved.length - 2; i >= 0; i -= 2) reweighted[saved[i]] = saved[i + 1];
    saved.length = 0;
  };
  const costOf = (lanes: readonly number[]) => {
    let c = 0;
    for (const e of lanes) c += weights[positionOf[e]];
    if (!Number.isSafeInteger(c)) throw new MoneyOverflowError('alternative route cost');
    return c;
  };

  while (found.length <= k) {
    const prev = found[found.length - 1];
    const depots = [ctx.origin, ...prev.lanes.map((e) => laneTo[e])];
    for (let i = 0; i < prev.lanes.length; i++) {
      if (searches >= maxSearches) return { alternatives: found.slice(1), stoppedBy: 'budget', searches };
      const spur = depots[i];
      const root = prev.lanes.slice(0, i);
      const rootKey = keyOf(root);
      for (const f of found) if (f.lanes.length > i && keyOf(f.lanes.slice(0, i)) === rootKey) close(positionOf[f.lanes[i]]);
      for (let j = 0; j < i; j++) for (let p = outStart[depots[j]], end = outStart[depots[j] + 1]; p < end; p++) close(p);
      searches++;
      const ws = dijkstra(network, spur, { weights: reweighted, workspace, targets: [target] });
      if (ws.dist[target] !== Infinity) {
        const spurLanes: number[] = [];
        for (let d = target; d !== spur; ) {
          const e = network.outLane[ws.parentPos[d]];
          spurLanes.push(e);
          d = laneFrom[e];
        }
        spurLanes.reverse();
        const lanes = root.concat(spurLanes);
        const key = keyOf(lanes);
        if (!seen.has(key)) {
          seen.add(key);
          candidates.push({ lanes, costMinor: costOf(lanes) });
        }
      }
      restore();
    }
    if (candidates.length === 0) return { alternatives: found.slice(1), stoppedBy: 'exhausted', searches };
    let at = 0;
    for (let c = 1; c < candidates.length; c++) if (better(candidates[c], candidates[at])) at = c;
    found.push(candidates[at]);
    candidates.splice(at, 1);
  }
  return { alternatives: found.slice(1), stoppedBy: 'k', searches };
}

/** Lanes of `route` that are not on `best`, in travel order: where the alternative departs. */
export function departingLanes(best: readonly number[], route: readonly number[]): number[] {
  const onBest = new Set(best);
  return route.filter((e) => !onBest.has(e));
}
