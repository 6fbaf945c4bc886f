// For a load its vehicle cannot reach: the route from its origin that uses the fewest lanes closed
// to the vehicle (0-1 breadth-first search: open lanes cost 0, closed lanes 1, money ignored). The
// closed lanes on it are what blocks the load; a depot it does not reach has no route at all.

import type { Network } from '../network/types';

export interface FewestClosedTree {
  /** Closed lanes on the best route to each depot; -1 where no route exists even with every lane open. */
  closedCount: Int32Array;
  /** Lane index into each depot on that route, -1 at the origin and where unreached. */
  viaLane: Int32Array;
  origin: number;
}

/** One search from `origin` serves every load of a group. `closed[e]` = 1 for a closed network lane. */
export function fewestClosedTree(network: Network, origin: number, closed: Uint8Array): FewestClosedTree {
  const n = network.depotCount;
  const { outStart, outTo, outLane } = network;
  const count = new Int32Array(n).fill(-1);
  const via = new Int32Array(n).fill(-1);
  // Deque in a ring: a depot is pushed only when its count drops, at most once per lane into it, so
  // laneCount + n + 1 slots always hold every entry at once.
  const done = new Uint8Array(n);
  const dist = new Int32Array(n).fill(0x7fffffff);
  const size = network.laneCount + n + 1;
  const ring = new Int32Array(size);
  let head = 0;
  let tail = 0;
  dist[origin] = 0;
  ring[tail] = origin;
  tail = (tail + 1) % size;
  while (head !== tail) {
    const u = ring[head];
    head = (head + 1) % size;
    if (done[u]) continue;
    done[u] = 1;
    count[u] = dist[u];
    for (let p = outStart[u], end = outStart[u + 1]; p < end; p++) {
      const v = outTo[p];
      const e = outLane[p];
      const w = closed[e];
      const nd = dist[u] + w;
      if (done[v] || nd >= dist[v]) continue;
      dist[v] = nd;
      via[v] = e;
      if (w === 0) {
        head = (head - 1 + size) % size;
        ring[head] = v;
      } else {
        ring[tail] = v;
        tail = (tail + 1) % size;
      }
    }
  }
  for (let d = 0; d < n; d++) if (!done[d]) via[d] = -1;
  return { closedCount: count, viaLane: via, origin };
}

/** Lane indices of the route to `target` in travel order; null when unreached. */
export function fewestClosedPath(network: Network, tree: FewestClosedTree, target: number): number[] | null {
  if (tree.closedCount[target] < 0) return null;
  const lanes: number[] = [];
  for (let d = target, steps = 0; d !== tree.origin; steps++) {
    if (steps > network.depotCount) throw new Error('fewest-closed: predecessor chain is broken');
    const e = tree.viaLane[d];
    lanes.push(e);
    d = network.laneFrom[e];
  }
  return lanes.reverse();
}
