// Rebate headroom by one Dijkstra per distinct lane destination (Johnson's reweighting first),
// stopped once the origins of that destination's incoming lanes are settled. On a sparse network the
// last of those origins is usually far away, so each run settles most depots and the whole method
// grows as about depots x depots. Kept as the reference the bucketed method in headroom.ts is
// tested and benched against.

import type { Network } from '../network/types';
import { createDijkstraWorkspace, dijkstra } from '../routes/dijkstra';
import { restoreCost } from '../routes/johnson-potentials';
import { headroomSetup, type HeadroomOptions, type LaneFloors } from './headroom';

/** Floors for all lanes, the same as laneFloors gives. Throws RebateLoopPresentError when the network still has a loop. */
export function laneFloorsPerDestination(network: Network, options: HeadroomOptions = {}): LaneFloors {
  const n = network.depotCount;
  const { potential, reweighted, net, inStart, inLane } = headroomSetup(network, options.weights);
  let total = 0;
  for (let v = 0; v < n; v++) if (inStart[v + 1] > inStart[v]) total++;
  const floor = new Float64Array(network.laneCount).fill(NaN);
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
