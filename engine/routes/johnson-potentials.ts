// Johnson's reweighting (D. B. Johnson, "Efficient algorithms for shortest paths in sparse
// networks", J. ACM 24(1), 1977): one label-correcting solve from a virtual source joined to every
// depot gives potentials h; w'(u,v) = w(u,v) + h(u) - h(v) is then never negative, so each further
// source needs only Dijkstra. All quantities stay exact integers of minor units.

import { MoneyOverflowError, RebateLoopPresentError } from '../errors';
import type { Network } from '../network/types';
import { labelCorrect } from './label-correcting';

export interface JohnsonReweighting {
  /** h per depot: cheapest cost from the virtual source (always <= 0). */
  potential: Float64Array;
  /** w' per CSR position, >= 0; +Infinity where the lane is closed. */
  reweighted: Float64Array;
}

/**
 * Computes potentials and reweighted lane costs. Throws RebateLoopPresentError when the network
 * (with `weights`) has a rebate loop: no potentials exist then.
 */
export function johnsonReweighting(network: Network, weights: Float64Array = network.outNet): JohnsonReweighting {
  const n = network.depotCount;
  const all = new Int32Array(n);
  for (let d = 0; d < n; d++) all[d] = d;
  const solved = labelCorrect(network, { sources: all, weights, onLoop: 'stop' });
  if (solved.loops.length > 0) {
    throw new RebateLoopPresentError(solved.loops[0].depots.map((d) => network.depotIds[d]), 'johnson reweighting');
  }
  // Every depot is a source at cost 0, so every potential is finite and <= 0.
  const potential = solved.dist.slice(0, n);

  const { outStart, outTo } = network;
  const reweighted = new Float64Array(weights.length);
  for (let u = 0; u < n; u++) {
    const hu = potential[u];
    for (let p = outStart[u], end = outStart[u + 1]; p < end; p++) {
      const w = weights[p];
      if (w === Infinity) {
        reweighted[p] = Infinity;
        continue;
      }
      const r = w + hu - potential[outTo[p]];
      if (!Number.isSafeInteger(r)) throw new MoneyOverflowError('reweighted lane cost');
      // r >= 0 by the triangle inequality h(v) <= h(u) + w(u,v); -0 is normalised.
      reweighted[p] = r === 0 ? 0 : r;
    }
  }
  return { potential, reweighted };
}

/** The true cost of a cheapest route s -> t from its reweighted cost: d(s,t) = d'(s,t) - h(s) + h(t). */
export function restoreCost(reweightedCost: number, potential: Float64Array, source: number, target: number): number {
  const d = reweightedCost - potential[source] + potential[target];
  if (!Number.isSafeInteger(d)) throw new MoneyOverflowError('route cost restored from reweighting');
  return d === 0 ? 0 : d;
}
