// The label-correcting core on its own, against js-graph-algorithms' Bellman-Ford and graphlib's
// reachability on random networks that often hold several negative loops: the solve returns to its
// caller at each loop and resumes (engine/routes/label-correcting.ts), so these cases check that the
// resumed search, the tree it leaves and the loops it records are what a plain V-round solve implies.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DETACHED, IN_TREE, UNBOUNDED, labelCorrect, type LoopFound } from '../../../engine/routes/label-correcting';
import type { Network } from '../../../engine/network/types';
import { anyNetwork, jsBellmanFord, toNetwork, unboundedByReference, type Spec } from './reference-graphs';

const SEED = 20_261_203;

/** The spec with one more depot (index n) joined by zero-cost lanes to every source: the reference's view of a many-source solve. */
function withVirtualSource(spec: Spec, sources: readonly number[]): Spec {
  return { n: spec.n + 1, origin: spec.n, lanes: [...spec.lanes, ...sources.map((s) => [spec.n, s, 0] as [number, number, number])] };
}

const originOf = (network: Network, p: number) => network.laneFrom[network.outLane[p]];

// Two to four random blocks, each with a source of its own, and a few lanes from each block to the
// next: loops in several blocks are met one after another in the same solve.
const manySources = fc
  .record({
    blocks: fc.array(anyNetwork(7, 18, -8, 20), { minLength: 2, maxLength: 4 }),
    bridges: fc.array(fc.tuple(fc.nat(), fc.nat(), fc.integer({ min: -5, max: 20 })), { maxLength: 4 }),
  })
  .map(({ blocks, bridges }) => {
    const lanes: [number, number, number][] = [];
    const sources: number[] = [];
    const starts: number[] = [];
    let n = 0;
    for (const block of blocks) {
      starts.push(n);
      for (const [u, v, w] of block.lanes) lanes.push([n + u, n + v, w]);
      sources.push(n + block.origin);
      n += block.n;
    }
    for (const [a, b, w] of bridges) {
      const i = a % (blocks.length - 1);
      lanes.push([starts[i] + (a % blocks[i].n), starts[i + 1] + (b % blocks[i + 1].n), w]);
    }
    return { spec: { n, lanes, origin: sources[0] } as Spec, sources };
  });

/** A recorded loop is a closed walk: each lane leaves the depot before it and enters the next, and one lap nets a rebate. */
function expectClosedLoop(network: Network, loop: LoopFound): void {
  const k = loop.positions.length;
  expect(loop.depots).toHaveLength(k);
  expect(new Set(loop.depots).size, 'no depot twice in a loop').toBe(k);
  let lap = 0;
  loop.positions.forEach((p, i) => {
    expect(originOf(network, p)).toBe(loop.depots[i]);
    expect(network.outTo[p]).toBe(loop.depots[(i + 1) % k]);
    lap += network.outNet[p];
  });
  expect(lap).toBeLessThan(0);
}

/**
 * Brute force for small networks, sharing nothing with the engine: Floyd-Warshall over every pair
 * and a boolean reachability closure. Depot k lies on a negative closed walk exactly when its
 * all-pairs cost to itself ends below zero, and a depot is unbounded from the origin exactly when
 * such a k is reachable from the origin and reaches it. Costs stay exact integers at these sizes.
 */
function bruteForce(spec: Spec): { unbounded: Set<number>; reachable: Set<number>; cost: number[] } {
  const { n, origin } = spec;
  const all = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? 0 : Infinity)));
  const reach = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => i === j));
  for (const [u, v, w] of spec.lanes) {
    all[u][v] = Math.min(all[u][v], w);
    reach[u][v] = true;
  }
  for (let k = 0; k < n; k++) {
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        if (all[i][k] + all[k][j] < all[i][j]) all[i][j] = all[i][k] + all[k][j];
        if (reach[i][k] && reach[k][j]) reach[i][j] = true;
      }
    }
  }
  const unbounded = new Set<number>();
  const reachable = new Set<number>();
  for (let d = 0; d < n; d++) {
    if (reach[origin][d]) reachable.add(d);
    for (let k = 0; k < n; k++) if (reach[origin][k] && all[k][k] < 0 && reach[k][d]) unbounded.add(d);
  }
  return { unbounded, reachable, cost: all[origin] };
}

describe('labelCorrect against reference libraries', () => {
  it("'mark': unbounded set, costs, tree and every loop recorded agree with the reference, from one or several sources", () => {
    let severalLoops = 0;
    fc.assert(
      fc.property(manySources, ({ spec, sources }) => {
        const network = toNetwork(spec);
        const result = labelCorrect(network, { sources, onLoop: 'mark' });
        const reference = withVirtualSource(spec, sources);
        const unbounded = unboundedByReference(reference);
        const { cost } = jsBellmanFord(reference);
        if (result.loops.length >= 2) severalLoops++;
        for (let d = 0; d < spec.n; d++) {
          const s = result.state[d];
          expect(s, `depot ${d} left detached`).not.toBe(DETACHED);
          expect(s === UNBOUNDED, `depot ${d} unbounded`).toBe(unbounded.has(d));
          if (unbounded.has(d)) continue;
          expect(s === IN_TREE, `depot ${d} reached`).toBe(cost[d] !== Infinity);
          if (s !== IN_TREE) continue;
          expect(result.dist[d], `cost of depot ${d}`).toBe(cost[d]);
          // The tree is tight: each depot's cost is its parent's plus the lane into it, one leg deeper.
          const p = result.parentPos[d];
          if (p === -1) {
            expect(sources.includes(d) || spec.n === 1).toBe(true);
            expect(result.dist[d]).toBe(0);
          } else {
            const parent = originOf(network, p);
            expect(network.outTo[p]).toBe(d);
            expect(result.dist[parent] + network.outNet[p]).toBe(result.dist[d]);
            expect(result.depth[d]).toBe(result.depth[parent] + 1);
          }
        }
        expect(result.loops.length > 0).toBe(unbounded.size > 0);
        for (const loop of result.loops) {
          expectClosedLoop(network, loop);
          for (const d of loop.depots) expect(result.state[d]).toBe(UNBOUNDED);
        }
      }),
      { seed: SEED, numRuns: 800 },
    );
    expect(severalLoops).toBeGreaterThan(50); // the search really resumed after a loop
  });

  it("'stop': one loop exactly when a negative loop is reachable from the sources", () => {
    fc.assert(
      fc.property(manySources, ({ spec, sources }) => {
        const result = labelCorrect(toNetwork(spec), { sources, onLoop: 'stop' });
        const unbounded = unboundedByReference(withVirtualSource(spec, sources));
        expect(result.loops).toHaveLength(unbounded.size > 0 ? 1 : 0);
      }),
      { seed: SEED, numRuns: 1000 },
    );
  });

  it("'mark' from one origin: unbounded set, costs and loops equal brute force, also when a loop runs back through the origin", () => {
    let originUnbounded = 0;
    let originBounded = 0;
    fc.assert(
      fc.property(anyNetwork(8, 22, -9, 20), (spec) => {
        const network = toNetwork(spec);
        const result = labelCorrect(network, { sources: [spec.origin], onLoop: 'mark' });
        const brute = bruteForce(spec);
        if (brute.unbounded.has(spec.origin)) originUnbounded++;
        else if (brute.unbounded.size > 0) originBounded++;
        for (let d = 0; d < spec.n; d++) {
          const s = result.state[d];
          expect(s === UNBOUNDED, `depot ${d} unbounded`).toBe(brute.unbounded.has(d));
          if (brute.unbounded.has(d)) continue;
          expect(s === IN_TREE, `depot ${d} reached`).toBe(brute.reachable.has(d));
          if (s === IN_TREE) expect(result.dist[d], `cost of depot ${d}`).toBe(brute.cost[d]);
        }
        expect(result.loops.length > 0).toBe(brute.unbounded.size > 0);
        for (const loop of result.loops) expectClosedLoop(network, loop);
      }),
      { seed: SEED, numRuns: 1500 },
    );
    // Both ways out of a loop were taken: the origin itself unbounded (the solve ends there) and not.
    expect(originUnbounded).toBeGreaterThan(100);
    expect(originBounded).toBeGreaterThan(20);
  });

  it("'stop' from one origin returns the loop as a closed walk of lanes with a net rebate", () => {
    fc.assert(
      fc.property(anyNetwork(8, 22, -9, 20), (spec) => {
        const network = toNetwork(spec);
        const result = labelCorrect(network, { sources: [spec.origin], onLoop: 'stop' });
        const brute = bruteForce(spec);
        expect(result.loops).toHaveLength(brute.unbounded.size > 0 ? 1 : 0);
        for (const loop of result.loops) expectClosedLoop(network, loop);
      }),
      { seed: SEED, numRuns: 1000 },
    );
  });

  it('every depot waits in the queue at once (a star from the origin, then cheaper lanes back down the line)', () => {
    const n = 50;
    const lanes: [number, number, number][] = [];
    for (let d = 1; d < n; d++) lanes.push([0, d, 1_000]);
    for (let d = n - 1; d > 1; d--) lanes.push([d, d - 1, -3]);
    const spec: Spec = { n, origin: 0, lanes };
    const result = labelCorrect(toNetwork(spec), { sources: [0] });
    expect(Array.from(result.dist.subarray(0, n))).toEqual(jsBellmanFord(spec).cost);
    expect(result.loops).toEqual([]);
  });
});
