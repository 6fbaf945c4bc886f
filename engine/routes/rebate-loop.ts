// A rebate loop as every report shows it: depots in travel order, lane indices, exact net per lap.
// Loops are rotated to start at their lowest depot index so the same loop always reads the same.

import { sumMinor, type Minor } from '../money/minor';
import type { Network } from '../network/types';
import type { LoopFound } from './label-correcting';

export interface RebateLoop {
  /** Depot indices in travel order; the last lane returns to the first depot. */
  depots: number[];
  /** Lane indices (input order), lanes[i] goes from depots[i] to depots[(i+1) % length]. */
  lanes: number[];
  /** Net cost of one lap, always negative. */
  netPerLap: Minor;
}

/** Converts a loop found by the solver into lane terms, rotated to a canonical start; the lap is summed with `weights`. */
export function toRebateLoop(network: Network, found: LoopFound, weights: Float64Array = network.outNet): RebateLoop {
  const lanes = found.positions.map((p) => network.outLane[p]);
  let start = 0;
  for (let i = 1; i < found.depots.length; i++) if (found.depots[i] < found.depots[start]) start = i;
  const rotate = <T>(xs: T[]) => xs.slice(start).concat(xs.slice(0, start));
  const rotatedLanes = rotate(lanes);
  return {
    depots: rotate(found.depots),
    lanes: rotatedLanes,
    netPerLap: sumMinor(found.positions.map((p) => weights[p]), 'net cost of a rebate loop'),
  };
}

/** Key that is equal for two loops made of the same lanes. */
export function loopKey(loop: RebateLoop): string {
  return loop.lanes.slice().sort((a, b) => a - b).join(',');
}
