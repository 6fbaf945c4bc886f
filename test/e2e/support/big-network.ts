// A seeded synthetic network for the recompute timing: depots scattered over western Europe, each
// with lanes to nearby depots, positive costs and small rebates (no rebate loop). Invented data,
// used only to measure; the figures checked for correctness come from the sample and the engine.

import { seededRandom } from '../../support/seeded-random';

const money = (cents: number) => (cents / 100).toFixed(2);

/** Depots and lanes CSV texts with `depots` depots and `depots * perDepot` lanes. */
export function bigNetwork(depots: number, perDepot: number, seed = 20261202): { depotsText: string; lanesText: string } {
  const next = seededRandom(seed);
  const lat: number[] = [];
  const lon: number[] = [];
  const depotLines = ['id,name,lat,lon'];
  for (let i = 0; i < depots; i++) {
    lat.push(43 + next() * 11);
    lon.push(-1 + next() * 16);
    depotLines.push(`D${i},Synthetic depot ${i},${lat[i].toFixed(4)},${lon[i].toFixed(4)}`);
  }
  // Neighbours by position in a west-to-east order: cheap to find, and lanes stay short.
  const order = Array.from({ length: depots }, (_, i) => i).sort((a, b) => lon[a] - lon[b]);
  const rank = new Int32Array(depots);
  order.forEach((d, r) => (rank[d] = r));
  const laneLines = ['from,to,toll,fuel,fees,rebate'];
  for (let d = 0; d < depots; d++) {
    for (let k = 0; k < perDepot; k++) {
      let r = rank[d] + Math.round((next() - 0.5) * 60);
      r = Math.min(depots - 1, Math.max(0, r));
      let to = order[r];
      if (to === d) to = order[(r + 1) % depots];
      const fuel = 2000 + Math.floor(next() * 20000);
      const toll = Math.floor(next() * 6000);
      const fees = 500 + Math.floor(next() * 1500);
      // Rebates stay below the lane's own cost, so no loop can pay for itself.
      const rebate = next() < 0.2 ? Math.floor(next() * (fees + fuel / 4)) : 0;
      laneLines.push(`D${d},D${to},${money(toll)},${money(fuel)},${money(fees)},${money(rebate)}`);
    }
  }
  return { depotsText: depotLines.join('\n') + '\n', lanesText: laneLines.join('\n') + '\n' };
}
