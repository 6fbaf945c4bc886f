// Queue-based label-correcting shortest paths (Bellman-Ford family) with Tarjan's subtree
// disassembly, the variant Cherkassky and Goldberg found most robust ("Negative-cycle detection
// algorithms", Mathematical Programming 85, 1999). When a depot's cost drops, its whole subtree in
// the current shortest-path tree is detached; finding the scanning depot inside that subtree proves
// a negative loop at once, usually long before the V rounds a plain Bellman-Ford needs.
// Worst case stays O(V*E). Every solver in the engine that needs labels goes through here.
//
// Written for V8's first call as much as for the warm one (a dispatcher's solve is often the first
// in its process or worker): the hot loop (`scanUntilLoop`) is a small function of locals and typed
// arrays only, with no closures, no module-level constants read per lane and no cold path inside.
// It returns when a lane closes a loop (or leaves the exact money range), and the cold work (loop
// extraction, marking the region unbounded, the overflow error) runs in separate functions, so a
// loop found after V8 optimised the loop never sends it back to the interpreter. `npm run bench --
// routes` prints the first call in a fresh process beside a C++ build of the same algorithm.

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

/**
 * Everything one solve works on, in one object of fixed shape so the helpers take it whole. The
 * shortest-path tree is also kept as a preorder thread (`next`/`prev`): a circular doubly linked
 * list through the root, so a depot's subtree is the run after it with greater depth, and the root
 * ends every run.
 */
class Labels {
  readonly dist: Float64Array;
  readonly parentPos: Int32Array;
  readonly depth: Int32Array;
  readonly next: Int32Array;
  readonly prev: Int32Array;
  readonly state: Uint8Array;
  /** FIFO ring of depots to scan; a depot is in it at most once (`queued`), so n + 1 slots never fill. */
  readonly queue: Int32Array;
  readonly queued: Uint8Array;
  /** [head, tail] of the ring, kept here so the scan can return and resume. */
  readonly ends: Int32Array;
  /** [relaxations, scans]. */
  readonly counts: Float64Array;
  readonly root: number;

  constructor(size: number, root: number) {
    this.dist = new Float64Array(size).fill(Infinity);
    this.parentPos = new Int32Array(size).fill(-1);
    this.depth = new Int32Array(size);
    this.next = new Int32Array(size);
    this.prev = new Int32Array(size);
    this.state = new Uint8Array(size);
    this.queue = new Int32Array(size);
    this.queued = new Uint8Array(size);
    this.ends = new Int32Array(2);
    this.counts = new Float64Array(2);
    this.root = root;
  }
}

/** Runs the label-correcting solve. See the file header for the method. */
export function labelCorrect(network: Network, options: LabelCorrectingOptions): LabelCorrectingResult {
  const n = network.depotCount;
  const weights = options.weights === undefined ? network.outNet : options.weights;
  const stopAtLoop = options.onLoop === 'stop';
  const sources = options.sources;
  // Root of the tree: the single source itself, or a virtual depot n joined to every source.
  const root = sources.length === 1 ? sources[0] : n;
  const labels = new Labels(n + 1, root);
  const { dist, state, next, prev } = labels;
  const loops: LoopFound[] = [];

  const allowed = options.allowed;
  if (allowed !== undefined) {
    for (let d = 0; d < n; d++) if (allowed[d] === 0) state[d] = EXCLUDED;
  }
  state[root] = IN_TREE;
  dist[root] = 0;
  next[root] = root;
  prev[root] = root;
  if (root === n) {
    for (let i = 0; i < sources.length; i++) {
      const s = sources[i];
      if (state[s] !== UNSEEN) continue;
      dist[s] = 0;
      labels.depth[s] = 1;
      state[s] = IN_TREE;
      linkAfter(labels, n, s);
      enqueue(labels, s);
    }
  } else {
    enqueue(labels, root);
  }

  // Only ever allocated when a loop is met: the depth-first stack of markUnbounded.
  let stack: Int32Array | null = null;
  for (;;) {
    const { parentPos, depth, queue, queued, ends, counts } = labels;
    const p = scanUntilLoop(network.outStart, network.outTo, weights, dist, parentPos, depth, next, prev, state, queue, queued, ends, counts, root, queue.length, ends[0], ends[1]);
    if (p < 0) break;
    // Lane p, u -> v, improved v past the exact range or closed a loop; u is the depot being scanned.
    const u = network.laneFrom[network.outLane[p]];
    const v = network.outTo[p];
    const nd = dist[u] + weights[p];
    if (nd > Number.MAX_SAFE_INTEGER || nd < -Number.MAX_SAFE_INTEGER) throw new MoneyOverflowError(`route cost to depot "${network.depotIds[v]}"`);
    const loop = takeLoop(network, labels, u, v, p);
    loops.push(loop);
    if (stopAtLoop) break;
    if (stack === null) stack = new Int32Array(n + 1);
    // u itself is now unbounded, so the scan resumes with the next depot in the queue.
    const seeded = markSeeds(labels, loop.depots, stack);
    markUnbounded(network.outStart, network.outTo, weights, state, next, prev, stack, seeded);
    // Every depot in the tree or ever labelled is reachable from the root, so once the root is
    // unbounded nothing is left to scan: the queue holds only unbounded depots.
    if (state[root] === UNBOUNDED) break;
  }

  return {
    dist,
    parentPos: labels.parentPos,
    depth: labels.depth,
    state,
    loops,
    relaxations: labels.counts[0],
    scans: labels.counts[1],
  };
}

/**
 * The hot loop: scans depots off the queue and relaxes their lanes until the queue is empty (returns
 * -1) or a lane must be handled by the caller (returns its CSR position): a lane that would take a
 * cost past the exact range, a lane from a depot to itself with a net rebate, or a lane u -> v whose
 * v has u in its subtree (the tree path v..u plus the lane is a negative loop). The depot being
 * scanned is then the lane's origin, already taken off the queue.
 */
// Everything arrives as a parameter, so nothing runs before the loop: V8 gives a function its
// feedback vector only after it has run a while, so on the first call whatever precedes the loop
// records no types, and optimised code compiled from that feedback bails out at such a step on the
// next call (first seen as a deopt at the `labels.dist` read when the scan resumed after a loop).
// State codes are literals (UNSEEN 0, IN_TREE 1, DETACHED 2, UNBOUNDED 3, EXCLUDED 4): a module
// constant is a module-cell load with a hole check on every read in the interpreter.
function scanUntilLoop(
  outStart: Int32Array,
  outTo: Int32Array,
  weights: Float64Array,
  dist: Float64Array,
  parentPos: Int32Array,
  depth: Int32Array,
  next: Int32Array,
  prev: Int32Array,
  state: Uint8Array,
  queue: Int32Array,
  queued: Uint8Array,
  ends: Int32Array,
  counts: Float64Array,
  root: number,
  cap: number,
  head: number,
  tail: number,
): number {
  while (head !== tail) {
    const u = queue[head];
    head = head + 1 === cap ? 0 : head + 1;
    ends[0] = head;
    queued[u] = 0;
    if (state[u] !== 1) continue;
    counts[1] += 1;
    const du = dist[u];
    const depthV = depth[u] + 1;
    const end = outStart[u + 1];
    let p = outStart[u];
    for (;;) {
      // The lanes that improve nothing (most of them) run through this small innermost loop alone,
      // with few live values; the relaxation below runs once per improvement. Warm solves in one
      // process, alternating with the single-loop form: grid and rebate loop about 7 % faster,
      // random unchanged (V8 still checks each array's kind once per lane either way).
      let v = 0;
      let nd = 0;
      for (; p < end; p++) {
        v = outTo[p];
        nd = du + weights[p];
        // Strictly cheaper only: an equal cost keeps the existing predecessor, so zero-cost loops
        // never rewire a path into a circle. UNBOUNDED and EXCLUDED depots take no label.
        if (nd < dist[v] && state[v] < 3) break;
      }
      if (p === end) break;
      const sv = state[v];
      counts[0] += 1;
      if (v === u || nd > 9007199254740991 || nd < -9007199254740991) return p; // Number.MAX_SAFE_INTEGER
      // Detach v's subtree: its labels are stale now that v gets cheaper. If u is in it, the tree
      // path v..u plus this lane is a negative loop: the caller takes it from here.
      // Every step of this walk runs for every improvement: a depot not in the tree starts (and
      // stops) at the root, where each store writes back what is there. V8 optimises this loop
      // from the types each operation has recorded, and on a large network that can happen before
      // any depot in the tree has improved; an operation with nothing recorded then makes the
      // optimised code bail out (seen on the random bench families), so none may be skipped.
      const inTree = sv === 1;
      const dv = depth[v];
      const nextV = next[v];
      let x = inTree ? nextV : root;
      for (;;) {
        const sx = state[x];
        const following = next[x];
        const deeper = depth[x] > dv;
        const stop = x === root || !deeper;
        const atU = x === u;
        state[x] = stop || atU ? sx : 2;
        if (stop) break;
        if (atU) return p;
        x = following;
      }
      // Unlink the run v .. (last descendant); x is the first depot after it. Off the tree, x is
      // the root and this relinks the root to its own predecessor, which changes nothing.
      const before = prev[inTree ? v : x];
      next[before] = x;
      prev[x] = before;
      dist[v] = nd;
      parentPos[v] = p;
      depth[v] = depthV;
      state[v] = 1;
      const after = next[u];
      next[u] = v;
      prev[v] = u;
      next[v] = after;
      prev[after] = v;
      if (queued[v] === 0) {
        queued[v] = 1;
        queue[tail] = v;
        tail = tail + 1 === cap ? 0 : tail + 1;
        ends[1] = tail;
      }
      p++;
    }
  }
  return -1;
}

function enqueue(labels: Labels, d: number): void {
  const { queue, ends } = labels;
  labels.queued[d] = 1;
  queue[ends[1]] = d;
  ends[1] = ends[1] + 1 === queue.length ? 0 : ends[1] + 1;
}

function linkAfter(labels: Labels, a: number, d: number): void {
  const { next, prev } = labels;
  const b = next[a];
  next[a] = d;
  prev[d] = a;
  next[d] = b;
  prev[b] = d;
}

/**
 * The loop closed by lane p (u -> v): the tree path v -> ... -> u plus that lane. scanUntilLoop had
 * marked the depots between v and u in preorder detached; they are in the tree again (the caller
 * marks them unbounded or stops). Each depot's tree parent is the origin of the lane into it
 * (`parentPos`), so the hot loop keeps no parent array of its own.
 */
function takeLoop(network: Network, labels: Labels, u: number, v: number, p: number): LoopFound {
  const { state, next, parentPos } = labels;
  const { laneFrom, outLane } = network;
  if (u !== v) for (let y = next[v]; y !== u; y = next[y]) state[y] = IN_TREE;
  const positions: number[] = [p];
  const depots: number[] = [u];
  for (let x = u; x !== v; ) {
    const into = parentPos[x];
    x = laneFrom[outLane[into]];
    positions.push(into);
    depots.push(x);
  }
  positions.reverse();
  depots.reverse();
  return { depots, positions };
}

/** Marks the loop's depots unbounded, takes them out of the tree and pushes them; returns how many. */
function markSeeds(labels: Labels, seeds: readonly number[], stack: Int32Array): number {
  const { state, next, prev } = labels;
  let top = 0;
  for (const x of seeds) {
    if (state[x] === UNBOUNDED || state[x] === EXCLUDED) continue;
    if (state[x] === IN_TREE) {
      const a = prev[x];
      const b = next[x];
      next[a] = b;
      prev[b] = a;
    }
    state[x] = UNBOUNDED;
    stack[top++] = x;
  }
  return top;
}

/**
 * Marks every depot reachable over open lanes from the `top` depots on `stack` unbounded and takes
 * it out of the tree. A depot is marked when pushed, so each is pushed once and `stack` (n + 1
 * entries) never fills. Parameters only, as in scanUntilLoop, and the same literal state codes.
 */
function markUnbounded(
  outStart: Int32Array,
  outTo: Int32Array,
  weights: Float64Array,
  state: Uint8Array,
  next: Int32Array,
  prev: Int32Array,
  stack: Int32Array,
  top: number,
): void {
  while (top > 0) {
    const x = stack[--top];
    for (let p = outStart[x], end = outStart[x + 1]; p < end; p++) {
      const y = outTo[p];
      const sy = state[y];
      if (sy > 2 || weights[p] === Infinity) continue;
      if (sy === 1) {
        const a = prev[y];
        const b = next[y];
        next[a] = b;
        prev[b] = a;
      }
      state[y] = 3;
      stack[top++] = y;
    }
  }
}
