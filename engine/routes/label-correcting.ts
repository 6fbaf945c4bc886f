// Queue-based label-correcting shortest paths (Bellman-Ford family) with Tarjan's subtree
// disassembly, the variant Cherkassky and Goldberg found most robust ("Negative-cycle detection
// algorithms", Mathematical Programming 85, 1999). When a depot's cost drops, its whole subtree in
// the current shortest-path tree is detached; finding the scanning depot inside that subtree proves
// a negative loop at once, usually long before the V rounds a plain Bellman-Ford needs.
// Worst case stays O(V*E). Every solver in the engine that needs labels goes through here.

import { MoneyOverflowError } from '../errors';
import type { Network } from '../network/types';

/** Depot states during and after a solve. */
export const UNSEEN = 0;
export const IN_TREE = 1;
export const DETACHED = 2;
export const UNBOUNDED = 3;
export const EXCLUDED = 4;

export interface LabelCorrectingOptions {
  /** Depots that start at cost 0. One source is the tree root; several hang under a virtual root. */
  sources: ArrayLike<number>;
  /** Cost at each CSR position (same layout as network.outNet); +Infinity closes a lane. */
  weights?: Float64Array;
  /** Depots marked 0 here take no part. */
  allowed?: Uint8Array;
  /** On a negative loop: mark all it reaches unbounded and go on ('mark'), or return at once ('stop'). */
  onLoop?: 'mark' | 'stop';
}

/** A negative loop as found: depots in travel order and the CSR positions of its lanes. */
export interface LoopFound {
  depots: number[];
  positions: number[];
}

export interface LabelCorrectingResult {
  /** Cost per depot (valid where state is IN_TREE). Arrays have depotCount + 1 entries; the last is the virtual root. */
  dist: Float64Array;
  /** CSR position of the lane into each depot on its cheapest route, or -1. */
  parentPos: Int32Array;
  /** Number of lanes on each depot's cheapest route. */
  depth: Int32Array;
  state: Uint8Array;
  loops: LoopFound[];
  relaxations: number;
  scans: number;
}

/** Runs the label-correcting solve. See the file header for the method. */
export function labelCorrect(network: Network, options: LabelCorrectingOptions): LabelCorrectingResult {
  const n = network.depotCount;
  const { outStart, outTo } = network;
  const weights = options.weights ?? network.outNet;
  const onLoop = options.onLoop ?? 'mark';
  const MAX = Number.MAX_SAFE_INTEGER;

  const dist = new Float64Array(n + 1).fill(Infinity);
  const parentPos = new Int32Array(n + 1).fill(-1);
  const parent = new Int32Array(n + 1).fill(-1);
  const depth = new Int32Array(n + 1);
  // Preorder thread of the shortest-path tree: a circular doubly linked list through the root, so
  // a depot's subtree is the run after it with greater depth, and the root ends every run.
  const next = new Int32Array(n + 1);
  const prev = new Int32Array(n + 1);
  const state = new Uint8Array(n + 1);
  const queue = new Int32Array(n + 1);
  const queued = new Uint8Array(n + 1);
  let head = 0;
  let tail = 0;
  const cap = n + 1;
  const loops: LoopFound[] = [];
  let relaxations = 0;
  let scans = 0;

  if (options.allowed) {
    for (let d = 0; d < n; d++) if (!options.allowed[d]) state[d] = EXCLUDED;
  }

  const enqueue = (d: number) => {
    queued[d] = 1;
    queue[tail] = d;
    tail = tail + 1 === cap ? 0 : tail + 1;
  };
  const linkAfter = (a: number, d: number) => {
    const b = next[a];
    next[a] = d;
    prev[d] = a;
    next[d] = b;
    prev[b] = d;
  };

  // Root of the tree: the single source itself, or a virtual depot n joined to every source.
  const sources = options.sources;
  const root = sources.length === 1 ? sources[0] : n;
  state[root] = IN_TREE;
  dist[root] = 0;
  next[root] = root;
  prev[root] = root;
  if (root === n) {
    for (let i = 0; i < sources.length; i++) {
      const s = sources[i];
      if (state[s] !== UNSEEN) continue;
      dist[s] = 0;
      depth[s] = 1;
      parent[s] = n;
      state[s] = IN_TREE;
      linkAfter(n, s);
      enqueue(s);
    }
  } else {
    enqueue(root);
  }

  // Marks every depot reachable from the loop unbounded and takes it out of the tree.
  const markUnbounded = (seeds: number[]) => {
    const stack = seeds.slice();
    while (stack.length > 0) {
      const x = stack.pop()!;
      if (state[x] === UNBOUNDED || state[x] === EXCLUDED) continue;
      if (state[x] === IN_TREE) {
        const a = prev[x];
        const b = next[x];
        next[a] = b;
        prev[b] = a;
      }
      state[x] = UNBOUNDED;
      for (let p = outStart[x], end = outStart[x + 1]; p < end; p++) {
        const y = outTo[p];
        if (state[y] !== UNBOUNDED && state[y] !== EXCLUDED && weights[p] !== Infinity) stack.push(y);
      }
    }
  };

  // The loop is the tree path v -> ... -> u plus the lane at position `closing` (u -> v).
  const recordLoop = (u: number, v: number, closing: number): LoopFound => {
    const positions: number[] = [closing];
    const depots: number[] = [u];
    for (let x = u; x !== v; x = parent[x]) {
      positions.push(parentPos[x]);
      depots.push(parent[x]);
    }
    positions.reverse();
    depots.reverse();
    const loop = { depots, positions };
    loops.push(loop);
    return loop;
  };

  scanning: while (head !== tail) {
    const u = queue[head];
    head = head + 1 === cap ? 0 : head + 1;
    queued[u] = 0;
    if (state[u] !== IN_TREE) continue;
    scans++;
    const du = dist[u];
    for (let p = outStart[u], end = outStart[u + 1]; p < end; p++) {
      const v = outTo[p];
      const nd = du + weights[p];
      // Strictly cheaper only: an equal cost keeps the existing predecessor, so zero-cost loops
      // never rewire a path into a circle.
      if (!(nd < dist[v])) continue;
      const sv = state[v];
      if (sv === UNBOUNDED || sv === EXCLUDED) continue;
      relaxations++;
      if (nd > MAX || nd < -MAX) throw new MoneyOverflowError(`route cost to depot "${network.depotIds[v]}"`);

      if (v === u) {
        // A lane from a depot to itself with a net rebate is a loop of one lane.
        recordLoop(u, u, p);
        if (onLoop === 'stop') break scanning;
        markUnbounded([u]);
        continue scanning;
      }

      if (sv === IN_TREE) {
        // Detach v's subtree: its labels are stale now that v gets cheaper. If u is in it, the
        // tree path v..u plus this lane is a negative loop.
        const dv = depth[v];
        let x = next[v];
        let foundU = false;
        while (depth[x] > dv && x !== root) {
          state[x] = DETACHED;
          if (x === u) {
            foundU = true;
            break;
          }
          x = next[x];
        }
        if (foundU) {
          for (let y = next[v]; ; y = next[y]) {
            state[y] = IN_TREE;
            if (y === u) break;
          }
          const loop = recordLoop(u, v, p);
          if (onLoop === 'stop') break scanning;
          markUnbounded(loop.depots);
          continue scanning; // u itself is now unbounded
        }
        // Unlink the run v .. (last descendant); x is the first depot after it.
        const before = prev[v];
        next[before] = x;
        prev[x] = before;
      }

      dist[v] = nd;
      parent[v] = u;
      parentPos[v] = p;
      depth[v] = depth[u] + 1;
      state[v] = IN_TREE;
      linkAfter(u, v);
      if (!queued[v]) enqueue(v);
    }
  }

  return { dist, parentPos, depth, state, loops, relaxations, scans };
}
