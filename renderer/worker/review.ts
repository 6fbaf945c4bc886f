// Contract review for the review panel: every rebate loop in the whole network (not only those
// reachable from the chosen origin), one per strongly connected part that holds one.

import { findNegativeLoop } from '../../engine/loops/find-negative-loop';
import { componentHasCycle, strongComponents } from '../../engine/loops/strong-components';
import type { Network } from '../../engine/network/types';
import type { LoopView } from './protocol';

export interface ContractReviewView {
  loops: LoopView[];
}

/** Reviews the network under the scenario's weights. */
export function reviewContract(network: Network, weights?: Float64Array): ContractReviewView {
  const all = new Uint8Array(network.depotCount).fill(1);
  const { members } = strongComponents(network, all, weights);
  const loops: LoopView[] = [];
  for (const component of members) {
    if (!componentHasCycle(network, component, weights)) continue;
    const loop = findNegativeLoop(network, component, weights);
    if (loop) loops.push({ depots: loop.depots, lanes: loop.lanes, netPerLap: loop.netPerLap });
  }
  return { loops };
}
