// Finds distinct rebate loops anywhere in the network, not just the first one. Loops live inside
// strongly connected components, so each component is searched on its own. After a loop is found,
// the search branches: for each of its lanes, search again with that lane closed (plus the lanes
// closed on the way there). Any other loop lacks at least one lane of the found one, so it stays
// findable in some branch; the branching stops at a cap and says whether more loops exist.

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
  onProgress?: (done: number, total: number) => void;
}

export interface DistinctLoops {
  /** Loops in the order found; the first loop of every component that has one comes first. */
  loops: RebateLoop[];
  /** Component number (as in `components`) of each loop. */
  componentOfLoop: number[];
  /** True when another distinct loop exists beyond the cap, or might (a search budget ran out). */
  capReached: boolean;
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
  const { componentOf, members } = strongComponents(network, undefined, base);
  const positionOf = new Int32Array(network.laneCount);
  for (let p = 0; p < network.laneCount; p++) positionOf[network.outLane[p]] = p;

  const weights = base.slice();
  const loops: RebateLoop[] = [];
  const componentOfLoop: number[] = [];
  const known = new Set<string>();
  const tried = new Set<string>();
  const queue: Branch[] = [];

  const search = (branch: Branch): RebateLoop | null => {
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
    componentOfLoop.push(component);
    expand(root, loop);
  });

  // Breadth-first over branches; past the cap, keep probing only to learn whether one more exists.
  let probes = 0;
  for (let head = 0; head < queue.length && !capReached; head++) {
    if ((loops.length >= cap && ++probes > probeBudget) || head >= searchBudget) {
      capReached = true;
      break;
    }
    if (head % 16 === 0) options.onProgress?.(candidates.length + head, candidates.length + Math.min(queue.length, searchBudget));
    const branch = queue[head];
    const loop = search(branch);
    if (!loop) continue;
    const key = loopKey(loop);
    if (!known.has(key)) {
      if (loops.length >= cap) {
        capReached = true;
        break;
      }
      known.add(key);
      loops.push(loop);
      componentOfLoop.push(branch.component);
    }
    expand(branch, loop);
  }
  options.onProgress?.(1, 1);
  return { loops, componentOfLoop, capReached, componentOf, components: members };
}
