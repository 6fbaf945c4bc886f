// The back costs headroom needs (cheapest v -> u for every lane u -> v, on Johnson-reduced costs,
// all >= 0) by bucketed balls, the one-to-many scheme of bucket-based many-to-many searches (Knopp,
// Sanders, Schultes, Schulz, Wagner, "Computing many-to-many shortest paths using highway
// hierarchies", ALENEX 2007), here without a hierarchy:
//  1. for every lane origin u, a backward Dijkstra settles the `size` depots nearest to u (its ball
//     B(u), exact costs to u) and keeps its radius R(u): every depot cheaper than R(u) to u is in B(u);
//  2. for every destination v, the balls of v's origins are dropped into buckets by depot, and one
//     forward Dijkstra from v meets them: a label l(w) (settled or not) at a depot w of B(u) offers
//     l(w) + d(w, u) for the pair (v, u), best(u) the lowest offer.
// Why it is exact: let L = d(v, u), and F the radius below which every depot is settled: the heap's
// top key, or the radius still needed (below) if smaller, since labels at or past that are kept out of
// the heap (their offers are still made). If L < F + R(u), then on a cheapest route v = w0 .. wk = u take
// the last wi with d(v, wi) < F (or, when none, wi = v with d(v, u) = L < R(u), so v is in B(u)): wi is
// settled, so w(i+1) got the exact label d(v, w(i+1)) and made its offers; either w(i+1) = u, or
// d(w(i+1), u) = L - d(v, w(i+1)) <= L - F < R(u), so w(i+1) is in B(u); the offer there is L. Every
// offer is a real route (as is a known upper bound the search may start from), so best(u) >= L always.
// Hence once best(u) <= F + R(u): were L < best(u), L < F + R(u) and the offer L would have been made,
// so best(u) = L. The radius still needed is the largest best(u) - R(u) over v's origins; the forward
// search stops when the heap's top reaches it (or the heap is empty: everything v reaches is settled).
// A pair whose back route is long simply grows the forward ball further, at worst to a plain Dijkstra
// from v, the previous method.
// Why it is faster: the previous search per pair grew a backward ball per lane; here each origin's
// ball is grown once for all its lanes, and each destination's forward ball once for all of its.
// Everything here reads typed arrays only, so slices of destinations can run in other threads.

import { MoneyOverflowError } from '../errors';
import type { Network } from '../network/types';

/** What the searches read, typed arrays only (they can be copied or shared into a worker thread). */
export interface HeadroomArrays {
  depotCount: number;
  /** Lanes out of depot d are positions outStart[d] .. outStart[d+1]-1: to outTo[p] at reduced cost outCost[p] (>= 0, +Infinity = closed). */
  outStart: Int32Array;
  outTo: Int32Array;
  outCost: Float64Array;
  /** The same lanes by destination: into d are positions inStart[d] .. inStart[d+1]-1, from inFrom[q] at inCost[q]. */
  inStart: Int32Array;
  inFrom: Int32Array;
  inCost: Float64Array;
  /** The pairs asked: destination v's are pairStart[v] .. pairStart[v+1]-1, pair k asking for the cheapest v -> pairOrigin[k]. */
  pairStart: Int32Array;
  pairOrigin: Int32Array;
  /**
   * Optional, per pair: the cost of some route v -> u known beforehand (an upper bound, +Infinity =
   * none) and a cost no route is below (a lower bound). The search starts from the first, which
   * lets it keep labels out of the heap from the start, and stops for a pair that reaches the second.
   */
  pairUpper?: Float64Array;
  pairLower?: Float64Array;
}

/** The backward balls, `size` entries per depot (depot u's at u * size ..). */
export interface BackBalls {
  size: number;
  /** Depots of each ball in the order settled, and their exact reduced cost to the ball's centre. */
  node: Int32Array;
  dist: Float64Array;
  /** Depots settled per ball (-1: not grown, the depot is no origin). */
  count: Int32Array;
  /** Per ball: every depot cheaper than this to its centre is in it (+Infinity: every depot that reaches it is). */
  radius: Float64Array;
}

/**
 * Entries per ball: about 1.8 x sqrt(depots) (a forward and a backward ball meet when their sizes
 * multiply to a few times the depot count, on the random sparse networks of the bench), at least 16
 * and at most 512, and fewer on very large networks so that all balls together stay within
 * `BALL_ENTRY_BUDGET` entries (12 bytes each). Measured on 5k/50k and 20k/200k: 96 vs 128 entries at
 * 5k settle 41 vs 37 depots per lane pair; 96 vs 256 at 20k settle 144 vs 77 (8.9 s vs 15 s CPU).
 * The size only moves work between the two sides, never changes a result.
 */
export const BALL_ENTRY_BUDGET = 8_000_000;
export function defaultBallSize(depotCount: number): number {
  const n = Math.max(1, depotCount);
  return Math.max(1, Math.min(512, Math.max(16, Math.round(1.8 * Math.sqrt(n))), Math.floor(BALL_ENTRY_BUDGET / n)));
}

/** Room for the balls of every depot; `alloc` gives the memory (an ArrayBuffer, or a SharedArrayBuffer to share with threads). */
export function createBackBalls(depotCount: number, size: number, alloc: (bytes: number) => ArrayBufferLike = (bytes) => new ArrayBuffer(bytes)): BackBalls {
  const entries = depotCount * size;
  const balls: BackBalls = {
    size,
    node: new Int32Array(alloc(entries * 4)),
    dist: new Float64Array(alloc(entries * 8)),
    count: new Int32Array(alloc(depotCount * 4)),
    radius: new Float64Array(alloc(depotCount * 8)),
  };
  balls.count.fill(-1);
  return balls;
}

/** Lanes into each depot, laid out like the out-lanes, with their cost from `weights` (per CSR position). */
export function reverseLanes(network: Network, weights: Float64Array): { inStart: Int32Array; inFrom: Int32Array; inCost: Float64Array } {
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

/** Reusable per-thread search arrays (one heap, run stamps, buckets that grow as needed). */
export interface BucketWorkspace {
  dist: Float64Array;
  stamp: Int32Array;
  heap: Int32Array;
  key: Float64Array;
  pos: Int32Array;
  run: number;
  head: Int32Array;
  headStamp: Int32Array;
  entryNext: Int32Array;
  entryPair: Int32Array;
  entryDist: Float64Array;
  best: Float64Array;
  radius: Float64Array;
  lower: Float64Array;
}

export function createBucketWorkspace(depotCount: number): BucketWorkspace {
  const n = depotCount;
  return {
    dist: new Float64Array(n),
    stamp: new Int32Array(n),
    heap: new Int32Array(n),
    key: new Float64Array(n),
    pos: new Int32Array(n),
    run: 0,
    head: new Int32Array(n),
    headStamp: new Int32Array(n),
    entryNext: new Int32Array(1024),
    entryPair: new Int32Array(1024),
    entryDist: new Float64Array(1024),
    best: new Float64Array(16),
    radius: new Float64Array(16),
    lower: new Float64Array(16),
  };
}

// The heap (a 4-ary min-heap of depots with a position index, so a key can drop in place) is written
// here rather than imported: it runs millions of times per audit and is kept beside its callers. Four
// children per node: a shallower heap for the many key drops; measured 8 % less CPU than a binary one
// on the 5k/50k bench network (1.07-1.09 s against 1.17-1.22 s, alternating runs).
/** Removes the top of a heap of `count + 1` entries (call with the count already decremented, >= 1) and sifts the last entry down. */
function siftDownFromTop(heap: Int32Array, key: Float64Array, pos: Int32Array, count: number): void {
  const last = heap[count];
  const lastKey = key[count];
  let at = 0;
  for (;;) {
    const firstChild = 4 * at + 1;
    if (firstChild >= count) break;
    let child = firstChild;
    let childKey = key[child];
    const end = firstChild + 4 < count ? firstChild + 4 : count;
    for (let c = firstChild + 1; c < end; c++) if (key[c] < childKey) (childKey = key[c]), (child = c);
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

/** Moves depot d with key k up from heap position `at` (a new last slot, or its slot after its key dropped). */
function siftUp(heap: Int32Array, key: Float64Array, pos: Int32Array, at: number, d: number, k: number): void {
  while (at > 0) {
    const parentAt = (at - 1) >> 2;
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

const MAX = Number.MAX_SAFE_INTEGER;

/** Grows the balls of the depots `from` .. `to`-1 that are the origin of some pair; returns the depots settled. */
export function growBackBalls(a: HeadroomArrays, balls: BackBalls, from: number, to: number, ws: BucketWorkspace): number {
  const { inStart, inFrom, inCost, pairOrigin } = a;
  const { size, node, dist: ballDist, count, radius } = balls;
  const { dist, stamp, heap, key, pos } = ws;
  const needed = new Uint8Array(a.depotCount);
  for (let k = 0; k < pairOrigin.length; k++) needed[pairOrigin[k]] = 1;
  let settledAll = 0;
  for (let u = from; u < to; u++) {
    if (!needed[u]) continue;
    const run = ++ws.run;
    stamp[u] = run;
    dist[u] = 0;
    heap[0] = u;
    key[0] = 0;
    pos[u] = 0;
    let heapCount = 1;
    let settled = 0;
    const base = u * size;
    // Once `size` depots carry labels, none cheaper than the largest of their first labels (`cap`) can
    // be left out of the ball's `size` nearest, so a new label above `cap` is not kept (labels only
    // drop, so the bound stays true). Every depot up to `cap` is still searched exactly, hence the
    // radius below is at most `cap`. This keeps the heap near `size` entries instead of ten times that.
    let labelled = 1;
    let firstMost = 0;
    let cap = Infinity;
    while (heapCount > 0 && settled < size) {
      const x = heap[0];
      const dx = key[0];
      if (--heapCount > 0) siftDownFromTop(heap, key, pos, heapCount);
      node[base + settled] = x;
      ballDist[base + settled] = dx;
      settled++;
      for (let q = inStart[x], end = inStart[x + 1]; q < end; q++) {
        const nd = dx + inCost[q];
        if (nd === Infinity) continue;
        const y = inFrom[q];
        if (stamp[y] === run) {
          if (!(nd < dist[y])) continue;
          dist[y] = nd;
          siftUp(heap, key, pos, pos[y], y, nd);
        } else {
          if (nd > cap) continue;
          if (nd > MAX) throw new MoneyOverflowError('route cost in headroom search');
          stamp[y] = run;
          dist[y] = nd;
          siftUp(heap, key, pos, heapCount++, y, nd);
          if (nd > firstMost) firstMost = nd;
          if (++labelled === size) cap = firstMost;
        }
      }
    }
    count[u] = settled;
    const top = heapCount > 0 ? key[0] : Infinity;
    radius[u] = top < cap ? top : cap;
    settledAll += settled;
  }
  return settledAll;
}

/** Back costs of a slice of destinations. */
export interface PairCosts {
  /** Per pair pairStart[from] .. pairStart[to]-1 (in that order): cheapest reduced cost v -> u, +Infinity = no route. */
  cost: Float64Array;
  /** Depots settled by the forward searches. */
  settled: number;
}

function grow(ws: BucketWorkspace, entries: number, pairs: number): void {
  if (entries > ws.entryNext.length) {
    const length = Math.max(entries, ws.entryNext.length * 2);
    ws.entryNext = new Int32Array(length);
    ws.entryPair = new Int32Array(length);
    ws.entryDist = new Float64Array(length);
  }
  if (pairs > ws.best.length) {
    const length = Math.max(pairs, ws.best.length * 2);
    ws.best = new Float64Array(length);
    ws.radius = new Float64Array(length);
    ws.lower = new Float64Array(length);
  }
}

// The largest best(u) - R(u) over v's pairs: the forward radius the search must reach. A pair whose
// best is at its lower bound is done (radius set to +Infinity).
function needed(best: Float64Array, radius: Float64Array, lower: Float64Array, pairs: number): number {
  let most = -Infinity;
  for (let j = 0; j < pairs; j++) {
    if (best[j] <= lower[j]) radius[j] = Infinity;
    if (radius[j] === Infinity) continue;
    const need = best[j] === Infinity ? Infinity : best[j] - radius[j];
    if (need > most) most = need;
  }
  return most;
}

/** Cheapest reduced cost v -> u for every pair of the destinations `from` .. `to`-1; the balls of their origins must be grown. */
export function pairCostsOfSlice(a: HeadroomArrays, balls: BackBalls, from: number, to: number, ws: BucketWorkspace): PairCosts {
  const { outStart, outTo, outCost, pairStart, pairOrigin, pairUpper, pairLower } = a;
  const { size, node: ballNode, dist: ballDist, count: ballCount, radius: ballRadius } = balls;
  const offset = pairStart[from];
  const cost = new Float64Array(pairStart[to] - offset);
  // Room for the largest destination of the slice, so the loop below reads one set of arrays.
  let mostEntries = 0;
  let mostPairs = 0;
  for (let v = from; v < to; v++) {
    let entries = 0;
    for (let k = pairStart[v]; k < pairStart[v + 1]; k++) entries += Math.max(0, ballCount[pairOrigin[k]]);
    mostEntries = Math.max(mostEntries, entries);
    mostPairs = Math.max(mostPairs, pairStart[v + 1] - pairStart[v]);
  }
  grow(ws, mostEntries, mostPairs);
  const { dist, stamp, heap, key, pos, head, headStamp, entryNext, entryPair, entryDist, best, radius, lower } = ws;
  let run = ws.run;
  let settledAll = 0;
  for (let v = from; v < to; v++) {
    const first = pairStart[v];
    const pairs = pairStart[v + 1] - first;
    if (pairs === 0) continue;
    run++;
    // Buckets: for each depot of an origin's ball, the (pair, cost to the origin) entries there.
    let t = 0;
    for (let j = 0; j < pairs; j++) {
      const u = pairOrigin[first + j];
      best[j] = pairUpper === undefined ? Infinity : pairUpper[first + j];
      lower[j] = pairLower === undefined ? -Infinity : pairLower[first + j];
      radius[j] = ballRadius[u];
      const base = u * size;
      for (let i = 0, end = ballCount[u]; i < end; i++) {
        const w = ballNode[base + i];
        entryPair[t] = j;
        entryDist[t] = ballDist[base + i];
        entryNext[t] = headStamp[w] === run ? head[w] : -1;
        head[w] = t;
        headStamp[w] = run;
        t++;
      }
    }
    // The forward search from v; v's own label 0 meets the balls that hold v.
    if (headStamp[v] === run) for (let s = head[v]; s !== -1; s = entryNext[s]) if (entryDist[s] < best[entryPair[s]]) best[entryPair[s]] = entryDist[s];
    stamp[v] = run;
    dist[v] = 0;
    heap[0] = v;
    key[0] = 0;
    pos[v] = 0;
    let heapCount = 1;
    let need = needed(best, radius, lower, pairs);
    let met = false;
    for (;;) {
      if (met) {
        need = needed(best, radius, lower, pairs);
        met = false;
      }
      if (heapCount === 0 || need <= key[0]) break;
      const x = heap[0];
      const dx = key[0];
      if (--heapCount > 0) siftDownFromTop(heap, key, pos, heapCount);
      settledAll++;
      for (let p = outStart[x], end = outStart[x + 1]; p < end; p++) {
        const nd = dx + outCost[p];
        if (nd === Infinity) continue;
        const y = outTo[p];
        // A label at or past the radius the search must reach is never settled (that radius only
        // shrinks), so it is not kept; it still makes its offers below. A depot stamped in this run
        // is in the heap or settled (settled ones are never improved: costs are >= 0).
        if (nd < need) {
          if (stamp[y] === run) {
            if (!(nd < dist[y])) continue;
            dist[y] = nd;
            siftUp(heap, key, pos, pos[y], y, nd);
          } else {
            if (nd > MAX) throw new MoneyOverflowError('route cost in headroom search');
            stamp[y] = run;
            dist[y] = nd;
            siftUp(heap, key, pos, heapCount++, y, nd);
          }
        }
        if (headStamp[y] === run) {
          for (let s = head[y]; s !== -1; s = entryNext[s]) {
            const offer = nd + entryDist[s];
            if (offer < best[entryPair[s]]) {
              best[entryPair[s]] = offer;
              met = true;
            }
          }
        }
      }
    }
    for (let j = 0; j < pairs; j++) {
      if (best[j] !== Infinity && best[j] > MAX) throw new MoneyOverflowError('route cost in headroom search');
      cost[first + j - offset] = best[j];
    }
  }
  ws.run = run;
  return { cost, settled: settledAll };
}
