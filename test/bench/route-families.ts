// The seeded networks the routes bench solves, one generator per family, shared by the in-process
// suite (suites/routes.ts) and the fresh-process first-call driver (solver-first-call.ts), so both
// and the C++ reference solve exactly the same lanes from the same origin.

import { buildNetwork } from '../../engine/network/build';
import type { DepotInput, LaneInput, Network } from '../../engine/network/types';
import type { Minor } from '../../engine/money/minor';
import { seeded } from './harness';
import { gridLanes, ringLanes, sparsePotentials } from './network-shapes';

export interface Generated {
  network: Network;
  origin: number;
}

/** Builds a network from (from, to, net) triples given as parallel arrays; positive nets go to toll, negative to rebate. */
export function compile(depotCount: number, from: Int32Array, to: Int32Array, net: Float64Array): Network {
  const depots: DepotInput[] = new Array(depotCount);
  for (let d = 0; d < depotCount; d++) depots[d] = { id: `D${d}`, name: `Depot ${d}`, lat: 0, lon: 0 };
  const lanes: LaneInput[] = new Array(from.length);
  const zero = 0 as Minor;
  for (let e = 0; e < from.length; e++) {
    const w = net[e];
    lanes[e] = {
      from: `D${from[e]}`,
      to: `D${to[e]}`,
      toll: (w > 0 ? w : 0) as Minor,
      fuel: zero,
      fees: zero,
      rebate: (w < 0 ? -w : 0) as Minor,
      sourceRow: e + 2,
    };
  }
  return buildNetwork(depots, lanes);
}

/**
 * Random sparse network with negative lanes but no negative loop: w = w0 + p(u) - p(v), w0 >= 0
 * (a loop's potentials cancel, so every loop costs sum(w0) >= 0). A ring keeps every depot reachable.
 * `potentialRange` sets how many lanes carry a net rebate (20,000: about a third; 1,000,000: about half).
 */
export function randomSparse(depotCount: number, laneCount: number, seed: number, potentialRange = 20_000): Generated {
  const rand = seeded(seed);
  const potential = new Float64Array(depotCount);
  for (let d = 0; d < depotCount; d++) potential[d] = Math.floor(rand() * potentialRange);
  const from = new Int32Array(laneCount);
  const to = new Int32Array(laneCount);
  const net = new Float64Array(laneCount);
  let e = 0;
  ringLanes(depotCount, laneCount, rand, (u, v, base) => {
    from[e] = u;
    to[e] = v;
    net[e++] = base + potential[u] - potential[v];
  });
  return { network: compile(depotCount, from, to, net), origin: 0 };
}

/**
 * Road-like grid: depots on a side x side lattice, lanes both ways to the four neighbours with
 * costs that grow with distance, plus rebates on some lanes (again by potentials, so no loop).
 */
export function roadGrid(side: number, seed: number): Generated {
  const rand = seeded(seed);
  const depotCount = side * side;
  const potential = sparsePotentials(depotCount, rand);
  const from: number[] = [];
  const to: number[] = [];
  const net: number[] = [];
  const centre = gridLanes(side, rand, (u, v, base) => {
    from.push(u);
    to.push(v);
    net.push(base + potential[u] - potential[v]);
  });
  return { network: compile(depotCount, Int32Array.from(from), Int32Array.from(to), Float64Array.from(net)), origin: centre };
}

/** A loop-free random network plus one three-lane rebate loop (net -1 per lap) reachable from the origin. */
export function withRebateLoop(depotCount: number, laneCount: number, seed: number): Generated {
  const base = randomSparse(depotCount, laneCount - 3, seed);
  const n = base.network;
  const from = Int32Array.from({ length: laneCount }, (_, e) => (e < n.laneCount ? n.laneFrom[e] : 0));
  const to = Int32Array.from({ length: laneCount }, (_, e) => (e < n.laneCount ? n.laneTo[e] : 0));
  const net = Float64Array.from({ length: laneCount }, (_, e) => (e < n.laneCount ? n.laneNet[e] : 0));
  const [a, b, c] = [depotCount >> 1, (depotCount >> 1) + 7, (depotCount >> 1) + 13];
  const loop: [number, number, number][] = [[a, b, 400], [b, c, 300], [c, a, -701]];
  loop.forEach(([u, v, w], i) => {
    const e = n.laneCount + i;
    from[e] = u;
    to[e] = v;
    net[e] = w;
  });
  return { network: compile(depotCount, from, to, net), origin: 0 };
}

/** A rebate loop at depot 0 <-> 1, then a chain of two-depot parts; every tenth part holds a rebate loop. */
export function chainOfPairs(depotCount: number): Network {
  const from: number[] = [0, 1];
  const to: number[] = [1, 0];
  const net: number[] = [500, -600];
  for (let i = 2; i + 1 < depotCount; i += 2) {
    from.push(i - 1, i, i + 1);
    to.push(i, i + 1, i);
    net.push(100, 300, i % 20 === 2 ? -400 : 300);
  }
  return compile(depotCount, Int32Array.from(from), Int32Array.from(to), Float64Array.from(net));
}

/**
 * The families the solver's first-call figures cover (suites/routes.ts runs each in a fresh process).
 * Sizes match the in-process cases; "rebate-heavy" gives about half the lanes a net rebate.
 */
export const SOLVER_FAMILIES: Readonly<Record<string, () => Generated>> = {
  'random 100k/1M': () => randomSparse(100_000, 1_000_000, 11),
  'grid 500x500': () => roadGrid(500, 23),
  'rebate-heavy 100k/1M': () => randomSparse(100_000, 1_000_000, 53, 1_000_000),
  'rebate loop 20k/100k': () => withRebateLoop(20_000, 100_000, 37),
  'loop at origin, chain 100k': () => ({ network: chainOfPairs(100_000), origin: 0 }),
};
