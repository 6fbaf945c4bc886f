// Dijkstra's shortest paths with a binary heap, for lane weights that are never negative (the
// reweighted network of Johnson's method). O((V + E) log V) per source; the workspace is reused
// across sources so thousands of runs allocate nothing.

import { MoneyOverflowError } from '../errors';
import type { Network } from '../network/types';

/** Reusable arrays for repeated runs on one network. */
export interface DijkstraWorkspace {
  /** Cost per depot after a run: exact where settled, +Infinity where unreached. */
  readonly dist: Float64Array;
  /** CSR position of the lane into each depot on its cheapest route, or -1. */
  readonly parentPos: Int32Array;
  /** 1 for depots whose cost is final. */
  readonly settled: Uint8Array;
  /** The binary heap: depots in heap order, with each entry's key beside it (no indirection when sifting). */
  readonly heap: Int32Array;
  readonly heapKey: Float64Array;
  /** Position of each depot in `heap`, or -1 when absent. */
  readonly heapPos: Int32Array;
  /** Per depot: the run number that made it a target (see `targets`). */
  readonly targetMark: Int32Array;
  run: number;
}

export function createDijkstraWorkspace(depotCount: number): DijkstraWorkspace {
  return {
    dist: new Float64Array(depotCount),
    parentPos: new Int32Array(depotCount),
    settled: new Uint8Array(depotCount),
    heap: new Int32Array(depotCount),
    heapKey: new Float64Array(depotCount),
    heapPos: new Int32Array(depotCount).fill(-1),
    targetMark: new Int32Array(depotCount),
    run: 0,
  };
}

export interface DijkstraOptions {
  /** Cost per CSR position (layout of network.outNet); +Infinity closes a lane. Must be >= 0. */
  weights?: Float64Array;
  workspace?: DijkstraWorkspace;
  /** Stop as soon as all these depots are settled; others may then hold provisional costs. */
  targets?: ArrayLike<number>;
  /** Record `parentPos` and `settled` (default true); costs alone are faster. */
  tree?: boolean;
}

/**
 * Cheapest costs from `source`. Throws RangeError when a negative weight would change a cost (the
 * caller must reweight first) and MoneyOverflowError past the exact range. Returns the workspace it
 * filled. The heap is written out inline: this loop runs once per lane destination in an audit.
 */
export function dijkstra(network: Network, source: number, options: DijkstraOptions = {}): DijkstraWorkspace {
  const n = network.depotCount;
  const { outStart, outTo } = network;
  const weights = options.weights ?? network.outNet;
  const ws = options.workspace ?? createDijkstraWorkspace(n);
  const { dist, parentPos, settled, heap, heapKey, heapPos, targetMark } = ws;
  const tree = options.tree !== false;
  const MAX = Number.MAX_SAFE_INTEGER;
  dist.fill(Infinity);
  heapPos.fill(-1);
  if (tree) {
    parentPos.fill(-1);
    settled.fill(0);
  }

  const run = ++ws.run;
  let remaining = -1;
  if (options.targets) {
    remaining = 0;
    for (let i = 0; i < options.targets.length; i++) {
      const t = options.targets[i];
      if (targetMark[t] !== run) {
        targetMark[t] = run;
        remaining++;
      }
    }
    if (remaining === 0) return ws;
  }

  dist[source] = 0;
  heap[0] = source;
  heapKey[0] = 0;
  heapPos[source] = 0;
  let count = 1;
  while (count > 0) {
    // Pop the cheapest depot and sift the last heap entry down from the top.
    const u = heap[0];
    heapPos[u] = -1;
    if (tree) settled[u] = 1;
    const last = heap[--count];
    if (count > 0) {
      const key = heapKey[count];
      let at = 0;
      for (;;) {
        let child = 2 * at + 1;
        if (child >= count) break;
        let childKey = heapKey[child];
        if (child + 1 < count && heapKey[child + 1] < childKey) childKey = heapKey[++child];
        if (childKey >= key) break;
        heap[at] = heap[child];
        heapKey[at] = childKey;
        heapPos[heap[at]] = at;
        at = child;
      }
      heap[at] = last;
      heapKey[at] = key;
      heapPos[last] = at;
    }
    if (remaining > 0 && targetMark[u] === run && --remaining === 0) break;

    const du = dist[u];
    for (let p = outStart[u], end = outStart[u + 1]; p < end; p++) {
      const v = outTo[p];
      const w = weights[p];
      const nd = du + w;
      // A settled depot is never improved by a weight >= 0, so no separate settled test is needed.
      if (!(nd < dist[v])) continue;
      if (w < 0) throw new RangeError(`dijkstra: negative weight ${w} on a lane from depot "${network.depotIds[u]}"`);
      if (nd > MAX) throw new MoneyOverflowError(`route cost to depot "${network.depotIds[v]}"`);
      dist[v] = nd;
      if (tree) parentPos[v] = p;
      // Insert v, or move it up after its key dropped.
      let at = heapPos[v];
      if (at === -1) at = count++;
      while (at > 0) {
        const parentAt = (at - 1) >> 1;
        const parentKey = heapKey[parentAt];
        if (parentKey <= nd) break;
        const parent = heap[parentAt];
        heap[at] = parent;
        heapKey[at] = parentKey;
        heapPos[parent] = at;
        at = parentAt;
      }
      heap[at] = v;
      heapKey[at] = nd;
      heapPos[v] = at;
    }
  }
  return ws;
}
