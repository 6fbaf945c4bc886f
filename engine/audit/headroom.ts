// Rebate headroom for every lane: the lowest net cost a lane u -> v can carry before some loop
// through it pays, given all other lanes, is -(cheapest cost from v back to u); with no way back
// there is no limit. All floors come from Johnson's method: one label-correcting solve for
// potentials, then a binary-heap Dijkstra from each distinct lane destination, stopped as soon as
// the origins of that destination's incoming lanes are settled.

import type { Network } from '../network/types';
import { createDijkstraWorkspace, dijkstra } from '../routes/dijkstra';
import { johnsonReweighting, restoreCost } from '../routes/johnson-potentials';

export interface HeadroomOptions {
  /** Net cost per CSR position (e.g. after a fix plan); defaults to the network's. */
  weights?: Float64Array;
  /** Called with (destinations done, distinct destinations). */
  onProgress?: (done: number, total: number) => void;
}

export interface LaneFloors {
  /** Per lane (input order): the lowest safe net in minor units, NaN for "no limit" or a closed lane. */
  floor: Float64Array;
  /** Per lane: the net cost the floors were computed against. */
  net: Float64Array;
  /** Number of Dijkstra runs (distinct lane destinations). */
  sources: number;
}

/** Floors for all lanes. Throws RebateLoopPresentError when the network still has a loop. */
export function laneFloors(network: Network, options: HeadroomOptions = {}): LaneFloors {
  const n = network.depotCount;
  const m = network.laneCount;
  const weights = options.weights ?? network.outNet;
  const { potential, reweighted } = johnsonReweighting(network, weights);

  const net = new Float64Array(m);
  const open = new Uint8Array(m);
  for (let p = 0; p < m; p++) {
    net[network.outLane[p]] = weights[p];
    open[network.outLane[p]] = weights[p] === Infinity ? 0 : 1;
  }
  // Lanes grouped by destination (counting sort), so one Dijkstra serves all lanes into a depot.
  const inStart = new Int32Array(n + 1);
  for (let e = 0; e < m; e++) if (open[e]) inStart[network.laneTo[e] + 1]++;
  for (let d = 0; d < n; d++) inStart[d + 1] += inStart[d];
  const fill = inStart.slice(0, n);
  const inLane = new Int32Array(inStart[n]);
  for (let e = 0; e < m; e++) if (open[e]) inLane[fill[network.laneTo[e]]++] = e;

  let total = 0;
  for (let v = 0; v < n; v++) if (inStart[v + 1] > inStart[v]) total++;
  const floor = new Float64Array(m).fill(NaN);
  const workspace = createDijkstraWorkspace(n);
  const targets: number[] = [];
  let done = 0;
  const every = Math.max(1, Math.floor(total / 100));
  options.onProgress?.(0, total);
  for (let v = 0; v < n; v++) {
    const first = inStart[v];
    const last = inStart[v + 1];
    if (first === last) continue;
    targets.length = 0;
    for (let i = first; i < last; i++) targets.push(network.laneFrom[inLane[i]]);
    const { dist } = dijkstra(network, v, { weights: reweighted, workspace, targets, tree: false });
    for (let i = first; i < last; i++) {
      const e = inLane[i];
      const u = network.laneFrom[e];
      if (dist[u] === Infinity) continue;
      const back = restoreCost(dist[u], potential, v, u);
      floor[e] = back === 0 ? 0 : -back;
    }
    done++;
    if (done % every === 0 || done === total) options.onProgress?.(done, total);
  }
  return { floor, net, sources: total };
}
