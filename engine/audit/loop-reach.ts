// The depots a rebate loop makes unbounded: every depot reachable from the loop, because a route
// can circle the loop any number of times before leaving it. Every origin that reaches the loop
// sees these depots as unbounded, so the set belongs to the loop, not to an origin.

import type { Network } from '../network/types';

/** Depots reachable from any of `seeds` over open lanes (finite weight), sorted by index. */
export function reachableFrom(network: Network, seeds: readonly number[], weights: Float64Array = network.outNet): number[] {
  const seen = new Uint8Array(network.depotCount);
  const stack: number[] = [];
  for (const s of seeds) {
    if (!seen[s]) {
      seen[s] = 1;
      stack.push(s);
    }
  }
  const { outStart, outTo } = network;
  while (stack.length > 0) {
    const u = stack.pop()!;
    for (let p = outStart[u], end = outStart[u + 1]; p < end; p++) {
      const v = outTo[p];
      if (!seen[v] && weights[p] !== Infinity) {
        seen[v] = 1;
        stack.push(v);
      }
    }
  }
  const out: number[] = [];
  for (let d = 0; d < network.depotCount; d++) if (seen[d]) out.push(d);
  return out;
}
