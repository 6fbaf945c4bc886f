// One negative loop per group of depots (typically strongly connected components), all in a single
// label-correcting solve. Calling findNegativeLoop once per group costs O(depots) each time for the
// solver's arrays, which turns thousands of small components into a quadratic wait; here lanes
// between groups are closed, so each group is searched on its own inside one pass.

import type { Network } from '../network/types';
import { labelCorrect } from './label-correcting';
import { toRebateLoop, type RebateLoop } from './rebate-loop';

/**
 * For each group, one negative loop using only lanes inside that group, or null when it has none.
 * Groups must not share depots. A loop always lies inside one strongly connected component, so
 * with components as groups the answer is exact: a group gets a loop exactly when it holds one.
 */
export function findNegativeLoops(network: Network, groups: readonly (readonly number[])[], weights?: Float64Array): (RebateLoop | null)[] {
  const n = network.depotCount;
  const { outStart, outTo } = network;
  const base = weights ?? network.outNet;
  const groupOf = new Int32Array(n).fill(-1);
  const sources: number[] = [];
  groups.forEach((members, g) => {
    for (const d of members) {
      groupOf[d] = g;
      sources.push(d);
    }
  });
  const found: (RebateLoop | null)[] = groups.map(() => null);
  if (sources.length === 0) return found;

  const allowed = new Uint8Array(n);
  const isolated = Float64Array.from(base);
  for (const d of sources) {
    allowed[d] = 1;
    const g = groupOf[d];
    for (let p = outStart[d], end = outStart[d + 1]; p < end; p++) if (groupOf[outTo[p]] !== g) isolated[p] = Infinity;
  }

  // 'mark' goes on after a loop: the loop's group becomes unbounded (nothing outside it is
  // reachable now) and the other groups keep being searched.
  const result = labelCorrect(network, { sources, allowed, weights: isolated, onLoop: 'mark' });
  for (const loop of result.loops) {
    const g = groupOf[loop.depots[0]];
    if (found[g] === null) found[g] = toRebateLoop(network, loop, base);
  }
  return found;
}
