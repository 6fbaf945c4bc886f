// Small helper for tests: builds a Network from terse lane tuples with net costs in minor units.

import { buildNetwork } from '../../engine/network/build';
import type { Network } from '../../engine/network/types';
import type { Minor } from '../../engine/money/minor';

/** Lane as [from, to, net cost in minor units]; the net is put in `toll` (or `rebate` when negative). */
export type LaneTuple = [string, string, number];

export function networkOf(depotIds: readonly string[], lanes: readonly LaneTuple[]): Network {
  return buildNetwork(
    depotIds.map((id, i) => ({ id, name: id, lat: 0, lon: i * 0.01 })),
    lanes.map(([from, to, net], i) => ({
      from,
      to,
      toll: (net >= 0 ? net : 0) as Minor,
      fuel: 0 as Minor,
      fees: 0 as Minor,
      rebate: (net < 0 ? -net : 0) as Minor,
      sourceRow: i + 2,
    })),
  );
}

/** Depot ids "0".."n-1", for generated networks. */
export function numberedIds(n: number): string[] {
  return Array.from({ length: n }, (_, i) => String(i));
}
