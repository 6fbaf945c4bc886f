// Seeded random networks whose lanes carry every cost component, a distance and a drive time (some
// missing), for the routes report tests. With `loops`, some lanes carry rebates large enough to make
// rebate loops, so some depots are unbounded.

import { buildNetwork } from '../../../engine/network/build';
import type { DepotInput, LaneInput, Network } from '../../../engine/network/types';
import type { Minor } from '../../../engine/money/minor';
import { seededRandom } from '../../support/seeded-random';

export function randomPricedNetwork(seed: number, depotCount: number, laneCount: number, loops: boolean): Network {
  const r = seededRandom(seed);
  const pick = (k: number) => Math.floor(r() * k);
  const depots: DepotInput[] = Array.from({ length: depotCount }, (_, d) => ({ id: `D${d}`, name: `Depot ${d}`, lat: 50, lon: 4 + d * 0.01 }));
  const lanes: LaneInput[] = [];
  for (let e = 0; e < laneCount; e++) {
    // The first lanes form a chain from D0 so most depots are reachable and paths are long.
    const u = e < depotCount - 1 ? e : pick(depotCount);
    const v = e < depotCount - 1 ? e + 1 : pick(depotCount);
    const toll = pick(5_000);
    const fuel = pick(9_000);
    const fees = pick(300);
    const rebate = loops ? pick(18_000) : pick(Math.min(toll + fuel + fees, 6_000)) * (r() < 0.3 ? 1 : 0);
    lanes.push({
      from: `D${u}`,
      to: `D${v}`,
      toll: toll as Minor,
      fuel: fuel as Minor,
      fees: fees as Minor,
      rebate: rebate as Minor,
      sourceRow: e + 2,
      ref: r() < 0.5 ? `R${e}` : undefined,
      // Distances with one decimal, as files give them, so sums carry float noise; some unknown.
      distanceKm: r() < 0.05 ? undefined : pick(4_000) / 10,
      driveMinutes: r() < 0.05 ? undefined : pick(3_000) / 7,
    });
  }
  return buildNetwork(depots, lanes);
}
