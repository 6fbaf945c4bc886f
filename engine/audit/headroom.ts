// Rebate headroom for every lane: the lowest net cost a lane u -> v can carry before some loop
// through it pays, given all other lanes, is -(cheapest cost from v back to u); with no way back
// there is no limit. One label-correcting solve gives Johnson's potentials; then each distinct
// (v, u) pair gets a bidirectional Dijkstra on the reweighted costs (the forward ball from v shared by
// all of v's origins), which settles two small balls around v and u instead of most of the network
// (a Dijkstra per destination, kept in headroom-per-destination.ts as the reference, has to reach
// the farthest origin of any lane into v).

import type { Network } from '../network/types';
import { createBidirectionalWorkspace, reverseLanes, searchTo, startForward } from '../routes/bidirectional-dijkstra';
import { johnsonReweighting, restoreCost } from '../routes/johnson-potentials';

export interface HeadroomOptions {
  /** Net cost per CSR position (e.g. after a fix plan); defaults to the network's. */
  weights?: Float64Array;
  /** Called with (searches done, searches to run); the total is given first, with 0 done. */
  onProgress?: (done: number, total: number) => void;
}

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

/** Floors for all lanes. Throws RebateLoopPresentError when the network still has a loop. */
export function laneFloors(network: Network, options: HeadroomOptions = {}): LaneFloors {
  const n = network.depotCount;
  const { potential, reweighted, net, inStart, inLane } = headroomSetup(network, options.weights);
  const reverse = reverseLanes(network, reweighted);
  const floor = new Float64Array(network.laneCount).fill(NaN);
  const workspace = createBidirectionalWorkspace(n);

  // Distinct (destination, origin) pairs: parallel lanes need one search between them.
  const pairOf = new Int32Array(inLane.length);
  const lastPairAt = new Int32Array(n).fill(-1);
  const pairOrigin: number[] = [];
  const pairDestination: number[] = [];
  for (let v = 0; v < n; v++) {
    for (let i = inStart[v]; i < inStart[v + 1]; i++) {
      const u = network.laneFrom[inLane[i]];
      const seen = lastPairAt[u];
      if (seen !== -1 && pairDestination[seen] === v) {
        pairOf[i] = seen;
        continue;
      }
      lastPairAt[u] = pairOrigin.length;
      pairOf[i] = pairOrigin.length;
      pairOrigin.push(u);
      pairDestination.push(v);
    }
  }
  const total = pairOrigin.length;
  const back = new Float64Array(total);
  let settled = 0;
  const every = Math.max(1, Math.floor(total / 100));
  options.onProgress?.(0, total);
  for (let k = 0; k < total; k++) {
    // floor(u -> v) = -(cheapest v -> u): search from the lane's destination back to its origin. The
    // pairs come grouped by destination, so its forward ball is grown once for all its origins.
    if (k === 0 || pairDestination[k] !== pairDestination[k - 1]) startForward(workspace, pairDestination[k]);
    back[k] = searchTo(network, reweighted, reverse, pairOrigin[k], workspace);
    settled += workspace.settled;
    if ((k + 1) % every === 0 || k + 1 === total) options.onProgress?.(k + 1, total);
  }
  for (let i = 0; i < inLane.length; i++) {
    const k = pairOf[i];
    if (back[k] === Infinity) continue;
    const cost = restoreCost(back[k], potential, pairDestination[k], pairOrigin[k]);
    floor[inLane[i]] = cost === 0 ? 0 : -cost;
  }
  return { floor, net, sources: total, settled };
}
