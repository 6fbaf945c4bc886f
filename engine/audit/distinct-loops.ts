// Finds distinct rebate loops anywhere in the network, not just the first one. Loops live inside
// strongly connected components, so each component is searched on its own. After a loop is found,
// the search branches: for each of its lanes, search again with that lane closed (plus the lanes
// closed on the way there). Any other loop lacks at least one lane of the found one, so it stays
// findable in some branch. The branching is bounded three ways, and says which one stopped it: a
// count (the cap), a work budget (depots and lanes examined by the searches) and a memory bound
// (branches waiting plus loop lanes kept), so any cap finishes in seconds within a stated memory.

import { componentHasCycle, strongComponents } from '../network/strong-components';
import { findNegativeLoop } from '../loops/find-negative-loop';
import { findNegativeLoops } from '../routes/find-negative-loops';
import { loopKey, type RebateLoop } from '../routes/rebate-loop';
import type { Network } from '../network/types';
import { labelCorrect, UNBOUNDED } from '../routes/label-correcting';

export interface DistinctLoopsOptions {
  /** Most loops to report (default 100); the first loop of each component is reported even past it. */
  cap?: number;
  /** Cost per CSR position; defaults to the network's net costs. */
  weights?: Float64Array;
  /** Most searches to run once the cap is reached, to tell whether another loop exists (default 200). */
  probeBudget?: number;
  /** Most branch searches in all (default 20 per loop of the cap); a search cut short sets capReached. */
  searchBudget?: number;
  /** Most work, in depots plus lanes of the component each search examines (default DEFAULT_LOOP_WORK_BUDGET). */
  workBudget?: number;
  /** Most numbers kept for branches waiting and for the loops found (default DEFAULT_LOOP_MEMORY_BOUND). */
  memoryBound?: number;
  onProgress?: (done: number, total: number) => void;
}

/**
 * What ended the search: every branch explored ('complete'), another distinct loop found past the
 * cap ('cap': more loops exist), the cap reached with the probe budget spent before another loop
 * was found or ruled out ('cap-unsettled'), or a budget that ran out first ('work-budget',
 * 'memory-bound': more loops may exist, the count was not reached).
 */
export type LoopSearchStop = 'complete' | 'cap' | 'cap-unsettled' | 'work-budget' | 'memory-bound';

/**
 * Default work budget: 20 million depots and lanes examined, a few seconds (measured: 12 depots, every
 * lane a net rebate, about 100,000 searches). Enough for every loop of a contract that is merely wrong.
 */
export const DEFAULT_LOOP_WORK_BUDGET = 20_000_000;

/** Default memory bound: 4 million numbers (lane positions of waiting branches and of loops kept), under 100 MB. */
export const DEFAULT_LOOP_MEMORY_BOUND = 4_000_000;

export interface DistinctLoops {
  /** Loops in the order found; the first loop of every component that has one comes first. */
  loops: RebateLoop[];
  /** Component number (as in `components`) of each loop. */
  componentOfLoop: number[];
  /** True when another distinct loop exists beyond the cap, or might (a search budget ran out). */
  capReached: boolean;
  /** What ended the search (see LoopSearchStop); `capReached` is true for every value but 'complete'. */
  stoppedBy: LoopSearchStop;
  /** Searches run and work done (depots plus lanes examined), against the budget. */
  searches: number;
  work: number;
  componentOf: Int32Array;
  components: number[][];
}

interface Branch {
  component: number;
  /** CSR positions closed for this search. */
  closed: number[];
}

/** Distinct negative loops, up to the cap. */
export function findDistinctLoops(network: Network, options: DistinctLoopsOptions = {}): DistinctLoops {
  const cap = Math.max(1, options.cap ?? 100);
  const base = options.weights ?? network.outNet;
  const probeBudget = options.probeBudget ?? 200;
  const searchBudget = options.searchBudget ?? 20 * cap;
  const workBudget = options.workBudget ?? DEFAULT_LOOP_WORK_BUDGET;
  const memoryBound = options.memoryBound ?? DEFAULT_LOOP_MEMORY_BOUND;
  const { componentOf, members } = strongComponents(network, undefined, base);
  const positionOf = new Int32Array(network.laneCount);
  for (let p = 0; p < network.laneCount; p++) positionOf[network.outLane[p]] = p;

  const weights = base.slice();
  const loops: RebateLoop[] = [];
  const componentOfLoop: number[] = [];
  const known = new Set<string>();
  const tried = new Set<string>();
  const queue: (Branch | undefined)[] = [];
  // Numbers held: closed positions of waiting branches (and their keys in `tried`), lanes of loops kept.
  let held = 0;
  let work = 0;
  let searches = 0;
  const sizeOf = members.map((m) => m.length);
  // Lanes inside each component: what a search of it walks, besides its depots.
  const lanesIn = new Float64Array(members.length);
  for (let p = 0; p < network.laneCount; p++) {
    const c = componentOf[network.laneFrom[network.outLane[p]]];
    if (c >= 0 && componentOf[network.outTo[p]] === c) lanesIn[c]++;
  }

  const search = (branch: Branch): RebateLoop | null => {
    searches++;
    work += sizeOf[branch.component] + lanesIn[branch.component];
    for (const p of branch.closed) weights[p] = Infinity;
    const loop = findNegativeLoop(network, members[branch.component], weights);
    for (const p of branch.closed) weights[p] = base[p];
    return loop;
  };
  const expand = (branch: Branch, loop: RebateLoop) => {
    for (const lane of loop.lanes) {
      const closed = branch.closed.concat(positionOf[lane]).sort((a, b) => a - b);
      const id = `${branch.component}:${closed.join(',')}`;
      if (tried.has(id)) continue;
      tried.add(id);
      queue.push({ component: branch.component, closed });
      held += 2 * closed.length;
    }
  };

  // One solve over the whole network first: a component holding a loop always ends up unbounded, so
  // components left in the tree need no search of their own (the common, loop-free case costs one solve).
  const all = Int32Array.from({ length: network.depotCount }, (_, d) => d);
  const state = labelCorrect(network, { sources: all, weights: base, onLoop: 'mark' }).state;
  // First pass: one loop per component, so every component with a loop is reported even under a small cap.
  const candidates = members.map((m, c) => c).filter((c) => state[members[c][0]] === UNBOUNDED && componentHasCycle(network, members[c], base));
  let capReached = false;
  // All first searches share one solve: one call per component would allocate network-sized arrays
  // each time, which is quadratic when thousands of small components hold loops.
  const firstLoops = findNegativeLoops(network, candidates.map((c) => members[c]), base);
  candidates.forEach((component, i) => {
    options.onProgress?.(i, candidates.length);
    const root: Branch = { component, closed: [] };
    const loop = firstLoops[i];
    if (!loop) return;
    known.add(loopKey(loop));
    loops.push(loop);
    held += loop.lanes.length;
    componentOfLoop.push(component);
    expand(root, loop);
  });

  // Breadth-first over branches; past the cap, keep probing only to learn whether one more exists.
  let probes = 0;
  let stoppedBy: LoopSearchStop = 'complete';
  for (let head = 0; head < queue.length; head++) {
    if ((loops.length >= cap && ++probes > probeBudget) || head >= searchBudget) {
      stoppedBy = loops.length >= cap ? 'cap-unsettled' : 'work-budget';
      break;
    }
    if (work >= workBudget) {
      stoppedBy = loops.length >= cap ? 'cap-unsettled' : 'work-budget';
      break;
    }
    if (held > memoryBound) {
      stoppedBy = loops.length >= cap ? 'cap-unsettled' : 'memory-bound';
      break;
    }
    if (head % 16 === 0) options.onProgress?.(candidates.length + head, candidates.length + Math.min(queue.length, searchBudget));
    const branch = queue[head]!;
    // A branch searched is not kept: only those waiting count against the memory bound (its key
    // stays in `tried`, so it is counted there until the end).
    queue[head] = undefined;
    held -= branch.closed.length;
    const loop = search(branch);
    if (!loop) continue;
    const key = loopKey(loop);
    if (!known.has(key)) {
      if (loops.length >= cap) {
        stoppedBy = 'cap';
        break;
      }
      known.add(key);
      loops.push(loop);
      held += loop.lanes.length;
      componentOfLoop.push(branch.component);
    }
    expand(branch, loop);
  }
  capReached = stoppedBy !== 'complete';
  options.onProgress?.(1, 1);
  return { loops, componentOfLoop, capReached, stoppedBy, searches, work, componentOf, components: members };
}
