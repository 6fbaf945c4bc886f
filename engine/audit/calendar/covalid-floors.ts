// Floors of many period networks in one search per destination. The networks share most lanes, so
// instead of one Dijkstra per network, labels carry the set of networks their path is valid in (a
// bit mask): a lane keeps only the networks that hold it, and a label is dropped when the depot was
// already settled for a superset of its networks (at no higher cost, since labels leave the heap in
// cost order). The first label settled at u valid in a network of lane u -> v gives the cheapest back
// path v -> u over those networks: the highest floor, and the networks that set it. Costs are
// Johnson-reweighted with potentials of the union (valid for every network, as each is part of it).

import type { Network } from '../../network/types';
import { johnsonReweighting, restoreCost } from '../../routes/johnson-potentials';
import { laneSetNetwork } from './lane-set-network';
import { firstLoop } from './period-weights';

/** Lanes of several networks (at most 30): each at one net, with the bit of every network holding it at that net. */
export interface MaskedLanes {
  from: Int32Array;
  to: Int32Array;
  net: Float64Array;
  mask: Int32Array;
  /** LaneTable row, carried through. */
  row: Int32Array;
}

export interface CovalidFloors {
  /** Per masked lane: -(cheapest back path over its networks); NaN when none has one. */
  floor: Float64Array;
  /** Per masked lane: the networks in which that back path exists (0 when none). */
  setIn: Int32Array;
}

/**
 * Null when the union of the networks has a loop (no common potentials), or when the labels do not
 * pay: after the first searches, more than a third as many labels settle per depot as there are
 * networks (paths valid in many different sets of networks); then solve the networks one by one.
 */
export function covalidFloors(template: Network, lanes: MaskedLanes, networks: number): CovalidFloors | null {
  const union = laneSetNetwork(template, lanes.from, lanes.to, lanes.net, lanes.row);
  if (firstLoop(union, union.outNet) !== null) return null;
  const { potential, reweighted } = johnsonReweighting(union);
  const n = union.depotCount;
  const m = union.laneCount;
  const { outStart, outTo, outLane } = union;
  const posMask = new Int32Array(m);
  for (let p = 0; p < m; p++) posMask[p] = lanes.mask[outLane[p]];

  // Lanes by destination: each destination is one search with its lanes' origins as targets.
  const inStart = new Int32Array(n + 1);
  for (let e = 0; e < m; e++) inStart[lanes.to[e] + 1]++;
  for (let d = 0; d < n; d++) inStart[d + 1] += inStart[d];
  const fill = inStart.slice(0, n);
  const inLane = new Int32Array(m);
  for (let e = 0; e < m; e++) inLane[fill[lanes.to[e]]++] = e;

  let all = 0;
  for (let e = 0; e < m; e++) all |= lanes.mask[e];
  const floor = new Float64Array(m).fill(NaN);
  const setIn = new Int32Array(m);
  const heap = new LabelHeap();
  // Masks settled per depot; reset for the depots touched by each search.
  const settled: number[][] = Array.from({ length: n }, () => []);
  const touched: number[] = [];
  const waiting = new Int32Array(n);
  const dominated = (x: number, mask: number) => settled[x].some((s) => (s | mask) === s);

  let searches = 0;
  let labels = 0;
  let depots = 0;
  for (let v = 0; v < n; v++) {
    const first = inStart[v];
    const last = inStart[v + 1];
    if (first === last) continue;
    if (++searches === 50 && labels > (depots * networks) / 3) return null;
    let open = 0;
    for (let i = first; i < last; i++) {
      const u = lanes.from[inLane[i]];
      if (waiting[u]++ === 0) touched.push(u);
      open++;
    }
    heap.clear();
    heap.push(v, 0, all);
    while (open > 0 && heap.size > 0) {
      const { node: x, cost: d, mask } = heap.pop();
      if (dominated(x, mask)) continue;
      if (settled[x].length === 0) {
        touched.push(x);
        depots++;
      }
      settled[x].push(mask);
      labels++;
      if (waiting[x] > 0) {
        for (let i = first; i < last; i++) {
          const e = inLane[i];
          if (lanes.from[e] !== x || setIn[e] !== 0) continue;
          const common = mask & lanes.mask[e];
          if (common === 0) continue;
          setIn[e] = common;
          const back = restoreCost(d, potential, v, x);
          floor[e] = back === 0 ? 0 : -back;
          open--;
        }
      }
      for (let p = outStart[x], end = outStart[x + 1]; p < end; p++) {
        const next = mask & posMask[p];
        if (next === 0) continue;
        const y = outTo[p];
        if (dominated(y, next)) continue;
        heap.push(y, d + reweighted[p], next);
      }
    }
    for (const x of touched) {
      settled[x].length = 0;
      waiting[x] = 0;
    }
    touched.length = 0;
  }
  return { floor, setIn };
}

/** A binary heap of (depot, cost, mask) labels by cost. */
class LabelHeap {
  private node = new Int32Array(1024);
  private cost = new Float64Array(1024);
  private mask = new Int32Array(1024);
  size = 0;

  clear(): void {
    this.size = 0;
  }

  push(node: number, cost: number, mask: number): void {
    if (this.size === this.node.length) {
      const grow = <T extends Int32Array | Float64Array>(a: T): T => {
        const b = new (a.constructor as new (k: number) => T)(a.length * 2);
        b.set(a);
        return b;
      };
      this.node = grow(this.node);
      this.cost = grow(this.cost);
      this.mask = grow(this.mask);
    }
    let i = this.size++;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (this.cost[parent] <= cost) break;
      this.node[i] = this.node[parent];
      this.cost[i] = this.cost[parent];
      this.mask[i] = this.mask[parent];
      i = parent;
    }
    this.node[i] = node;
    this.cost[i] = cost;
    this.mask[i] = mask;
  }

  pop(): { node: number; cost: number; mask: number } {
    const top = { node: this.node[0], cost: this.cost[0], mask: this.mask[0] };
    const n = --this.size;
    if (n > 0) {
      const node = this.node[n];
      const cost = this.cost[n];
      const mask = this.mask[n];
      let i = 0;
      for (;;) {
        let child = 2 * i + 1;
        if (child >= n) break;
        if (child + 1 < n && this.cost[child + 1] < this.cost[child]) child++;
        if (this.cost[child] >= cost) break;
        this.node[i] = this.node[child];
        this.cost[i] = this.cost[child];
        this.mask[i] = this.mask[child];
        i = child;
      }
      this.node[i] = node;
      this.cost[i] = cost;
      this.mask[i] = mask;
    }
    return top;
  }
}
