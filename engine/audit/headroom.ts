// Rebate headroom for every lane: the lowest net cost a lane u -> v can carry before some loop
// through it pays, given all other lanes, is -(cheapest cost from v back to u); with no way back
// there is no limit. One label-correcting solve gives Johnson's potentials; then the back cost of
// every distinct (v, u) pair comes from bucketed balls on the reweighted costs (headroom-buckets.ts):
// a small backward ball per lane origin, grown once, and one forward search per destination that
// stops as soon as it has met the balls of all its origins exactly. The work is cut into slices of
// destinations (pure, typed arrays only) so front ends can spread them over threads. A Dijkstra per
// destination, kept in headroom-per-destination.ts as the reference, has to reach the farthest origin.

import type { Network } from '../network/types';
import { createBackBalls, createBucketWorkspace, defaultBallSize, growBackBalls, pairCostsOfSlice, reverseLanes, type HeadroomArrays } from './headroom-buckets';
import { johnsonReweighting, restoreCost } from '../routes/johnson-potentials';

export interface HeadroomOptions {
  /** Net cost per CSR position (e.g. after a fix plan); defaults to the network's. */
  weights?: Float64Array;
  /** Called with (searches done, searches to run); the total is given first, with 0 done. */
  onProgress?: (done: number, total: number) => void;
  /** Depots per backward ball (headroom-buckets.ts); tests set it small to exercise long searches. */
  ballSize?: number;
  /** Runs the searches, perhaps over several threads (main/ gives one); default: this thread. */
  runner?: HeadroomRunner;
}

/**
 * Runs a headroom plan's searches: grows the ball of every lane origin (`growBackBalls`), then the
 * back cost of every pair (`pairCostsOfSlice`), in slices of its choosing. A front end may spread the
 * slices over threads; every pair's cost depends on nothing else, so the result equals one thread's.
 */
export interface HeadroomRunner {
  run(arrays: HeadroomArrays, ballSize: number, onProgress?: (done: number, total: number) => void): { cost: Float64Array; settled: number };
}

/** The runner on the calling thread. */
export const singleThreadRunner: HeadroomRunner = {
  run(arrays, ballSize, onProgress) {
    const n = arrays.depotCount;
    const total = arrays.pairOrigin.length;
    const workspace = createBucketWorkspace(n);
    const balls = createBackBalls(n, ballSize);
    let settled = growBackBalls(arrays, balls, 0, n, workspace);
    const cost = new Float64Array(total);
    // Slices of about 1% of the pairs, for progress.
    for (const [from, to] of destinationSlices(arrays, Math.min(100, total))) {
      const slice = pairCostsOfSlice(arrays, balls, from, to, workspace);
      cost.set(slice.cost, arrays.pairStart[from]);
      settled += slice.settled;
      onProgress?.(arrays.pairStart[to], total);
    }
    return { cost, settled };
  },
};

export interface LaneFloors {
  /** Per lane (input order): the lowest safe net in minor units, NaN for "no limit" or a closed lane. */
  floor: Float64Array;
  /** Per lane: the net cost the floors were computed against. */
  net: Float64Array;
  /** Number of searches run (distinct lane destinations, or distinct (destination, origin) pairs). */
  sources: number;
  /** Depots settled over all searches, when the method counts them (a measure of the work done). */
  settled?: number;
}

/** What both headroom methods start from: potentials, reweighted costs, and open lanes by destination. */
export interface HeadroomSetup {
  potential: Float64Array;
  reweighted: Float64Array;
  /** Per lane (input order): the net cost used. */
  net: Float64Array;
  /** Open lanes into depot v are inLane[inStart[v] .. inStart[v+1]-1]. */
  inStart: Int32Array;
  inLane: Int32Array;
}

/** Johnson's reweighting and the open lanes grouped by destination. Throws RebateLoopPresentError on a loop. */
export function headroomSetup(network: Network, weights: Float64Array = network.outNet): HeadroomSetup {
  const n = network.depotCount;
  const m = network.laneCount;
  const { potential, reweighted } = johnsonReweighting(network, weights);
  const net = new Float64Array(m);
  const open = new Uint8Array(m);
  for (let p = 0; p < m; p++) {
    net[network.outLane[p]] = weights[p];
    open[network.outLane[p]] = weights[p] === Infinity ? 0 : 1;
  }
  // Lanes grouped by destination (counting sort), so lanes sharing a destination and an origin share a search.
  const inStart = new Int32Array(n + 1);
  for (let e = 0; e < m; e++) if (open[e]) inStart[network.laneTo[e] + 1]++;
  for (let d = 0; d < n; d++) inStart[d + 1] += inStart[d];
  const fill = inStart.slice(0, n);
  const inLane = new Int32Array(inStart[n]);
  for (let e = 0; e < m; e++) if (open[e]) inLane[fill[network.laneTo[e]]++] = e;
  return { potential, reweighted, net, inStart, inLane };
}

/** The searches headroom runs on a network: typed arrays for the slice function, and the lanes each pair answers for. */
export interface HeadroomPlan {
  setup: HeadroomSetup;
  arrays: HeadroomArrays;
  /** Per position i of setup.inLane: the pair whose back cost gives that lane's floor. */
  pairOf: Int32Array;
}

/** Distinct (destination, origin) pairs by destination (parallel lanes need one search between them) and the reverse lanes. */
export function headroomPlan(network: Network, weights: Float64Array = network.outNet): HeadroomPlan {
  const n = network.depotCount;
  const setup = headroomSetup(network, weights);
  const { reweighted, inStart, inLane } = setup;
  const pairOf = new Int32Array(inLane.length);
  const lastPairAt = new Int32Array(n).fill(-1);
  const pairStart = new Int32Array(n + 1);
  const pairOrigin = new Int32Array(inLane.length);
  let pairs = 0;
  for (let v = 0; v < n; v++) {
    pairStart[v] = pairs;
    for (let i = inStart[v]; i < inStart[v + 1]; i++) {
      const u = network.laneFrom[inLane[i]];
      const seen = lastPairAt[u];
      if (seen !== -1 && seen >= pairStart[v]) {
        pairOf[i] = seen;
        continue;
      }
      lastPairAt[u] = pairs;
      pairOf[i] = pairs;
      pairOrigin[pairs++] = u;
    }
  }
  pairStart[n] = pairs;
  const reverse = reverseLanes(network, reweighted);
  const arrays: HeadroomArrays = {
    depotCount: n,
    outStart: network.outStart,
    outTo: network.outTo,
    outCost: reweighted,
    inStart: reverse.inStart,
    inFrom: reverse.inFrom,
    inCost: reverse.inCost,
    pairStart,
    pairOrigin: pairOrigin.slice(0, pairs),
  };
  return { setup, arrays, pairOf };
}

/** Floors from the back cost of every pair (as pairCostsOfSlice gives them, all slices in order). */
export function floorsFromPairCosts(network: Network, plan: HeadroomPlan, cost: Float64Array): Float64Array {
  const { setup, arrays, pairOf } = plan;
  const floor = new Float64Array(network.laneCount).fill(NaN);
  const { inLane } = setup;
  for (let i = 0; i < inLane.length; i++) {
    const k = pairOf[i];
    if (cost[k] === Infinity) continue;
    const e = inLane[i];
    const back = restoreCost(cost[k], setup.potential, network.laneTo[e], arrays.pairOrigin[k]);
    floor[e] = back === 0 ? 0 : -back;
  }
  return floor;
}

/** Destination ranges [from, to) holding about `pairs` pairs each, the slices handed to searches or threads. */
export function destinationSlices(arrays: HeadroomArrays, slices: number): [number, number][] {
  const n = arrays.depotCount;
  const total = arrays.pairStart[n];
  const out: [number, number][] = [];
  let from = 0;
  for (let s = 1; s <= slices && from < n; s++) {
    const goal = Math.ceil((total * s) / slices);
    let to = from;
    while (to < n && (arrays.pairStart[to] < goal || to === from)) to++;
    if (s === slices) to = n;
    out.push([from, to]);
    from = to;
  }
  return out;
}

/** Floors for all lanes. Throws RebateLoopPresentError when the network still has a loop. */
export function laneFloors(network: Network, options: HeadroomOptions = {}): LaneFloors {
  const plan = headroomPlan(network, options.weights);
  const total = plan.arrays.pairOrigin.length;
  options.onProgress?.(0, total);
  const runner = options.runner ?? singleThreadRunner;
  const { cost, settled } = runner.run(plan.arrays, options.ballSize ?? defaultBallSize(network.depotCount), options.onProgress);
  return { floor: floorsFromPairCosts(network, plan, cost), net: plan.setup.net, sources: total, settled };
}
