// Net costs of a period network under a calendar fix plan. A plan cuts rebates per lane table row,
// so the same cut raises the row's net in every period and class it is planned in.

import type { Network } from '../../network/types';
import { labelCorrect } from '../../routes/label-correcting';
import { toRebateLoop, type RebateLoop } from '../../routes/rebate-loop';
import type { PeriodNetwork } from './period-networks';

/** Net per CSR position with `cut[row]` added to each lane's net; the network's own when `cut` is null. */
export function weightsWithCuts(net: PeriodNetwork, cut: Float64Array | null): Float64Array {
  const { network, record } = net;
  if (cut === null) return network.outNet;
  const weights = network.outNet.slice();
  for (let p = 0; p < weights.length; p++) weights[p] += cut[record[network.outLane[p]]];
  return weights;
}

const sourcesCache = new WeakMap<Network, Int32Array>();

/** One loop of the network under `weights` (from a solve over every depot), or null when it has none. */
export function firstLoop(network: Network, weights: Float64Array): RebateLoop | null {
  let sources = sourcesCache.get(network);
  if (!sources) {
    sources = Int32Array.from({ length: network.depotCount }, (_, d) => d);
    sourcesCache.set(network, sources);
  }
  const solved = labelCorrect(network, { sources, weights, onLoop: 'stop' });
  return solved.loops.length === 0 ? null : toRebateLoop(network, solved.loops[0], weights);
}

/** The first network (in the given order) that still has a loop under the cuts, with the loop; null when none has. */
export function firstLoopUnder(nets: readonly PeriodNetwork[], cut: Float64Array | null): { net: number; loop: RebateLoop } | null {
  for (let i = 0; i < nets.length; i++) {
    const loop = firstLoop(nets[i].network, weightsWithCuts(nets[i], cut));
    if (loop) return { net: i, loop };
  }
  return null;
}
