// The lane patterns the bench networks are made of, shared by the in-memory families
// (route-families.ts) and the CSV files whole-command benches read (network-files.ts), so a grid or a
// ring with random lanes is the same network in both from the same seed. Each calls `lane(u, v, base)`
// for every lane in file order, drawing from `rand` in one fixed order.

type Rand = () => number;
type Lane = (u: number, v: number, base: number) => void;

/** Potentials for rebates (net = base + p(u) - p(v), so no loop): one depot in ten gets 0 to 2,999. */
export function sparsePotentials(depotCount: number, rand: Rand): Float64Array {
  const potential = new Float64Array(depotCount);
  for (let d = 0; d < depotCount; d++) potential[d] = rand() < 0.1 ? Math.floor(rand() * 3_000) : 0;
  return potential;
}

/**
 * Road-like grid: side x side depots, lanes both ways to the four neighbours, one base cost of 8.00
 * to 23.99 per neighbouring pair. Returns the centre depot (the origin the benches plan from).
 */
export function gridLanes(side: number, rand: Rand, lane: Lane): number {
  for (let r = 0; r < side; r++) {
    for (let c = 0; c < side; c++) {
      const d = r * side + c;
      if (c + 1 < side) {
        const base = 800 + Math.floor(rand() * 1_600);
        lane(d, d + 1, base);
        lane(d + 1, d, base);
      }
      if (r + 1 < side) {
        const base = 800 + Math.floor(rand() * 1_600);
        lane(d, d + side, base);
        lane(d + side, d, base);
      }
    }
  }
  return Math.floor(side / 2) * side + Math.floor(side / 2);
}

/** `laneCount` lanes: a ring through every depot first (so all are reachable from any), then random lanes; bases 0 to 99.99. */
export function ringLanes(depotCount: number, laneCount: number, rand: Rand, lane: Lane): void {
  for (let e = 0; e < laneCount; e++) {
    const u = e < depotCount ? e : Math.floor(rand() * depotCount);
    const v = e < depotCount ? (e + 1) % depotCount : Math.floor(rand() * depotCount);
    lane(u, v, Math.floor(rand() * 10_000));
  }
}
