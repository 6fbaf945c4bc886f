// Bidirectional Dijkstra on lane costs that are never negative (Johnson-reweighted): a forward
// search from the origin over lanes out of each depot and a backward search from the destination over
// lanes into it, growing the side with the smaller radius, stopped once the two smallest heap keys
// add up to at least the best meeting found (Pohl, "Bi-directional search", Machine Intelligence 6,
// 1971; the stopping rule as usually taught for non-negative costs). The forward side may be kept for
// several destinations from one origin (`startForward`, then `searchTo` per destination): what it has
// settled stays exact, so later searches start from the ball earlier ones grew. Depots reached past
// the other side's radius are not queued on the backward side (no cheaper route can pass them). The
// workspace is reset by run stamps, so thousands of searches allocate nothing and clear nothing.

import { MoneyOverflowError } from '../errors';
import type { Network } from '../network/types';

/** Lanes into each depot, in the layout of the out-lanes (compressed sparse rows). */
export interface ReverseLanes {
  /** Lanes into depot d are positions inStart[d] .. inStart[d+1]-1. */
  readonly inStart: Int32Array;
  /** Origin depot of the lane at each position. */
  readonly inFrom: Int32Array;
  /** Cost of the lane at each position (taken from the weights given, +Infinity = closed). */
  readonly inCost: Float64Array;
}

/** Builds the reverse lanes for `weights` (a cost per CSR position, layout of network.outNet). */
export function reverseLanes(network: Network, weights: Float64Array): ReverseLanes {
  const n = network.depotCount;
  const { outStart, outTo } = network;
  const inStart = new Int32Array(n + 1);
  for (let p = 0; p < outTo.length; p++) inStart[outTo[p] + 1]++;
  for (let d = 0; d < n; d++) inStart[d + 1] += inStart[d];
  const fill = inStart.slice(0, n);
  const inFrom = new Int32Array(outTo.length);
  const inCost = new Float64Array(outTo.length);
  for (let u = 0; u < n; u++) {
    for (let p = outStart[u], end = outStart[u + 1]; p < end; p++) {
      const at = fill[outTo[p]]++;
      inFrom[at] = u;
      inCost[at] = weights[p];
    }
  }
  return { inStart, inFrom, inCost };
}

/** Reusable arrays for many searches on one network: per side costs, run stamps and a binary heap. */
export interface BidirectionalWorkspace {
  readonly fDist: Float64Array;
  readonly fStamp: Int32Array;
  readonly fHeap: Int32Array;
  readonly fKey: Float64Array;
  readonly fPos: Int32Array;
  readonly bDist: Float64Array;
  readonly bStamp: Int32Array;
  readonly bHeap: Int32Array;
  readonly bKey: Float64Array;
  readonly bPos: Int32Array;
  /** Stamp of the current forward search (one per origin) and of the current backward one (one per destination). */
  fRun: number;
  bRun: number;
  fCount: number;
  /** Depots settled by the last `searchTo` (both sides). */
  settled: number;
}

export function createBidirectionalWorkspace(depotCount: number): BidirectionalWorkspace {
  const n = depotCount;
  return {
    fDist: new Float64Array(n),
    fStamp: new Int32Array(n),
    fHeap: new Int32Array(n),
    fKey: new Float64Array(n),
    fPos: new Int32Array(n),
    bDist: new Float64Array(n),
    bStamp: new Int32Array(n),
    bHeap: new Int32Array(n),
    bKey: new Float64Array(n),
    bPos: new Int32Array(n),
    fRun: 0,
    bRun: 0,
    fCount: 0,
    settled: 0,
  };
}

// Removes the top of a heap of `count` entries (count >= 1) and sifts the last entry down.
function siftDownFromTop(heap: Int32Array, key: Float64Array, pos: Int32Array, count: number): void {
  const last = heap[count];
  const lastKey = key[count];
  let at = 0;
  for (;;) {
    let child = 2 * at + 1;
    if (child >= count) break;
    let childKey = key[child];
    if (child + 1 < count && key[child + 1] < childKey) childKey = key[++child];
    if (childKey >= lastKey) break;
    const moved = heap[child];
    heap[at] = moved;
    key[at] = childKey;
    pos[moved] = at;
    at = child;
  }
  heap[at] = last;
  key[at] = lastKey;
  pos[last] = at;
}

// Moves depot d with cost k up from heap position `at` (a new last slot, or its slot after its cost dropped).
function siftUp(heap: Int32Array, key: Float64Array, pos: Int32Array, at: number, d: number, k: number): void {
  while (at > 0) {
    const parentAt = (at - 1) >> 1;
    const parentKey = key[parentAt];
    if (parentKey <= k) break;
    const parent = heap[parentAt];
    heap[at] = parent;
    key[at] = parentKey;
    pos[parent] = at;
    at = parentAt;
  }
  heap[at] = d;
  key[at] = k;
  pos[d] = at;
}

/** Starts a forward search from `origin`; every `searchTo` until the next start shares it. */
export function startForward(ws: BidirectionalWorkspace, origin: number): void {
  const run = ++ws.fRun;
  ws.fStamp[origin] = run;
  ws.fDist[origin] = 0;
  ws.fHeap[0] = origin;
  ws.fKey[0] = 0;
  ws.fPos[origin] = 0;
  ws.fCount = 1;
}

/**
 * Cheapest cost from the origin of the forward search started last to `destination`, with costs
 * `weights` (per CSR position, all >= 0, +Infinity = closed) and `reverse` built from the same
 * weights; +Infinity when there is no route. Throws MoneyOverflowError past the exact range. The two
 * sides are written out separately: this runs once per lane in an audit, and one shape per loop keeps it fast.
 */
export function searchTo(network: Network, weights: Float64Array, reverse: ReverseLanes, destination: number, ws: BidirectionalWorkspace): number {
  const { outStart, outTo } = network;
  const { inStart, inFrom, inCost } = reverse;
  const { fDist, fStamp, fHeap, fKey, fPos, bDist, bStamp, bHeap, bKey, bPos } = ws;
  const fRun = ws.fRun;
  const bRun = ++ws.bRun;
  const MAX = Number.MAX_SAFE_INTEGER;
  let fCount = ws.fCount;
  bStamp[destination] = bRun;
  bDist[destination] = 0;
  bHeap[0] = destination;
  bKey[0] = 0;
  bPos[destination] = 0;
  let bCount = 1;
  // The forward ball may already reach the destination (a label is a route, so a bound).
  let best = fStamp[destination] === fRun ? fDist[destination] : Infinity;
  let settled = 0;

  for (;;) {
    // An empty forward heap means every depot the origin reaches is settled: its labels are exact.
    const fTop = fCount > 0 ? fKey[0] : Infinity;
    if (bCount === 0 || fTop + bKey[0] >= best) break;
    settled++;
    // Grow the side with the smaller radius: the forward ball, shared by every destination of this
    // origin, then grows only as far as some destination needs (measured on the bench networks, this
    // settles fewer depots than balancing the heap sizes). A depot already settled on a side is never
    // improved again there, because costs are >= 0.
    if (fCount > 0 && fTop <= bKey[0]) {
      const x = fHeap[0];
      const dx = fTop;
      if (--fCount > 0) siftDownFromTop(fHeap, fKey, fPos, fCount);
      // Not pruned: later destinations share this side, so it settles in plain Dijkstra order.
      for (let p = outStart[x], end = outStart[x + 1]; p < end; p++) {
        const nd = dx + weights[p];
        if (nd === Infinity) continue;
        const y = outTo[p];
        if (bStamp[y] === bRun && nd + bDist[y] < best) best = nd + bDist[y];
        if (fStamp[y] === fRun) {
          if (!(nd < fDist[y])) continue;
          fDist[y] = nd;
          siftUp(fHeap, fKey, fPos, fPos[y], y, nd);
        } else {
          if (nd > MAX) throw new MoneyOverflowError('route cost in bidirectional search');
          fStamp[y] = fRun;
          fDist[y] = nd;
          siftUp(fHeap, fKey, fPos, fCount++, y, nd);
        }
      }
    } else {
      const x = bHeap[0];
      const dx = bKey[0];
      if (--bCount > 0) siftDownFromTop(bHeap, bKey, bPos, bCount);
      for (let p = inStart[x], end = inStart[x + 1]; p < end; p++) {
        const nd = dx + inCost[p];
        if (nd === Infinity) continue;
        const y = inFrom[p];
        if (fStamp[y] === fRun && nd + fDist[y] < best) best = nd + fDist[y];
        // Past the forward radius nothing cheaper can come through y: a cheaper start of the route
        // to y would lie inside the forward side's settled ball, and was just counted above.
        if (nd + fTop >= best) continue;
        if (bStamp[y] === bRun) {
          if (!(nd < bDist[y])) continue;
          bDist[y] = nd;
          siftUp(bHeap, bKey, bPos, bPos[y], y, nd);
        } else {
          if (nd > MAX) throw new MoneyOverflowError('route cost in bidirectional search');
          bStamp[y] = bRun;
          bDist[y] = nd;
          siftUp(bHeap, bKey, bPos, bCount++, y, nd);
        }
      }
    }
  }
  ws.fCount = fCount;
  ws.settled = settled;
  return best;
}

/** Cheapest cost from `origin` to `destination` (see searchTo); +Infinity when there is no route. */
export function bidirectionalDijkstra(
  network: Network,
  weights: Float64Array,
  reverse: ReverseLanes,
  origin: number,
  destination: number,
  ws: BidirectionalWorkspace,
): number {
  startForward(ws, origin);
  return searchTo(network, weights, reverse, destination, ws);
}
