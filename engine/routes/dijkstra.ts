// Dijkstra's shortest paths with a binary heap, for lane weights that are never negative (the
// reweighted network of Johnson's method). O((V + E) log V) per source; the workspace is reused
// across sources so thousands of runs allocate nothing.

import { MoneyOverflowError } from '../errors';
import type { Network } from '../network/types';
import { IndexedMinHeap } from './indexed-min-heap';

/** Reusable arrays for repeated runs on one network. */
export interface DijkstraWorkspace {
  /** Cost per depot after a run: exact where settled, +Infinity where unreached. */
  readonly dist: Float64Array;
  /** CSR position of the lane into each depot on its cheapest route, or -1. */
  readonly parentPos: Int32Array;
  /** 1 for depots whose cost is final. */
  readonly settled: Uint8Array;
  readonly heap: IndexedMinHeap;
  /** Per depot: the run number that made it a target (see `targets`). */
  readonly targetMark: Int32Array;
  run: number;
}

export function createDijkstraWorkspace(depotCount: number): DijkstraWorkspace {
  return {
    dist: new Float64Array(depotCount),
    parentPos: new Int32Array(depotCount),
    settled: new Uint8Array(depotCount),
    heap: new IndexedMinHeap(depotCount),
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
}

/**
 * Cheapest costs from `source`. Throws RangeError on a negative weight it meets (the caller must
 * reweight first) and MoneyOverflowError past the exact range. Returns the workspace it filled.
 */
export function dijkstra(network: Network, source: number, options: DijkstraOptions = {}): DijkstraWorkspace {
  const n = network.depotCount;
  const { outStart, outTo } = network;
  const weights = options.weights ?? network.outNet;
  const ws = options.workspace ?? createDijkstraWorkspace(n);
  const { dist, parentPos, settled, heap, targetMark } = ws;
  const MAX = Number.MAX_SAFE_INTEGER;
  dist.fill(Infinity);
  parentPos.fill(-1);
  settled.fill(0);
  heap.clear();

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
  heap.push(source, 0);
  while (heap.size > 0) {
    const u = heap.pop();
    settled[u] = 1;
    if (remaining > 0 && targetMark[u] === run && --remaining === 0) break;
    const du = dist[u];
    for (let p = outStart[u], end = outStart[u + 1]; p < end; p++) {
      const v = outTo[p];
      if (settled[v]) continue;
      const w = weights[p];
      if (w < 0) throw new RangeError(`dijkstra: negative weight ${w} on a lane from depot "${network.depotIds[u]}"`);
      const nd = du + w;
      if (nd < dist[v]) {
        if (nd > MAX) throw new MoneyOverflowError(`route cost to depot "${network.depotIds[v]}"`);
        dist[v] = nd;
        parentPos[v] = p;
        heap.push(v, nd);
      }
    }
  }
  return ws;
}
