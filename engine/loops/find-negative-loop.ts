// Finds one negative loop inside a set of depots, or proves there is none: a label-correcting
// solve from a virtual source joined to every member by a zero-cost lane, stopped at the first loop.

import type { Network } from '../network/types';
import { labelCorrect } from '../routes/label-correcting';
import { toRebateLoop, type RebateLoop } from '../routes/rebate-loop';

/** One negative loop among `members` (using only lanes between members), or null when none exists. */
export function findNegativeLoop(network: Network, members: readonly number[], weights?: Float64Array): RebateLoop | null {
  const allowed = new Uint8Array(network.depotCount);
  for (const d of members) allowed[d] = 1;
  const result = labelCorrect(network, { sources: members, allowed, weights, onLoop: 'stop' });
  if (result.loops.length === 0) return null;
  const found = result.loops[0];
  return toRebateLoop(network, found, weights);
}
