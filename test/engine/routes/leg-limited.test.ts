// Cheapest costs within a leg limit, checked against a brute-force dynamic program written here
// (every lane relaxed in every round, from a full table) and, on tiny networks, against an
// enumeration of every walk. Walks may repeat depots, so rebate loops count within the limit.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cheapestRoutes, STATUS_REACHABLE, STATUS_UNREACHABLE } from '../../../engine/routes/cheapest-routes';
import { legLimitedRoutes } from '../../../engine/routes/leg-limited';
import { loopKey } from '../../../engine/routes/rebate-loop';
import { networkOf } from '../../support/network-builder';
import { anyNetwork, loopFreeNetwork, toNetwork, type Spec } from './reference-graphs';

const SEED = 20_261_204;

/** table[k][v] = cheapest walk from the origin to v with at most k lanes (Infinity when none). */
function bruteForceTable(spec: Spec, maxLegs: number): number[][] {
  const table = [Array.from({ length: spec.n }, (_, d) => (d === spec.origin ? 0 : Infinity))];
  for (let k = 1; k <= maxLegs; k++) {
    const row = table[k - 1].slice();
    for (const [u, v, w] of spec.lanes) row[v] = Math.min(row[v], table[k - 1][u] + w);
    table.push(row);
  }
  return table;
}

/** Cheapest walk with at most maxLegs lanes by trying every walk. */
function enumerateWalks(spec: Spec, maxLegs: number): number[] {
  const best = Array.from({ length: spec.n }, () => Infinity);
  const walk = (d: number, cost: number, left: number) => {
    best[d] = Math.min(best[d], cost);
    if (left === 0) return;
    for (const [u, v, w] of spec.lanes) if (u === d) walk(v, cost + w, left - 1);
  };
  walk(spec.origin, 0, maxLegs);
  return best;
}

const limitedCosts = (spec: Spec, maxLegs: number) => {
  const solved = legLimitedRoutes(toNetwork(spec), spec.origin, maxLegs);
  return { solved, costs: Array.from(solved.cost, (c, d) => (solved.status[d] === STATUS_REACHABLE ? c : Infinity)) };
};

describe('leg-limited costs', () => {
  it('equal the brute-force dynamic program, loops included; paths respect the limit and sum to the cost', () => {
    fc.assert(
      fc.property(anyNetwork(10, 30, -8, 20), fc.integer({ min: 0, max: 12 }), (spec, maxLegs) => {
        const { solved, costs } = limitedCosts(spec, maxLegs);
        expect(costs).toEqual(bruteForceTable(spec, maxLegs)[maxLegs]);
        for (let d = 0; d < spec.n; d++) {
          const path = solved.path(d);
          if (solved.status[d] === STATUS_UNREACHABLE) {
            expect(path).toBeNull();
            continue;
          }
          const { depots, lanes } = path!;
          expect(lanes.length).toBeLessThanOrEqual(maxLegs);
          expect(lanes.length).toBe(solved.legs[d]);
          expect([depots[0], depots[depots.length - 1]]).toEqual([spec.origin, d]);
          let sum = 0;
          lanes.forEach((lane, i) => {
            const [from, to, w] = spec.lanes[lane];
            expect([from, to]).toEqual([depots[i], depots[i + 1]]);
            sum += w;
          });
          expect(sum).toBe(solved.cost[d]);
        }
      }),
      { seed: SEED, numRuns: 2500 },
    );
  });

  it('equal an enumeration of every walk on tiny networks', () => {
    fc.assert(
      fc.property(anyNetwork(5, 9, -6, 9), fc.integer({ min: 0, max: 5 }), (spec, maxLegs) => {
        expect(limitedCosts(spec, maxLegs).costs).toEqual(enumerateWalks(spec, maxLegs));
      }),
      { seed: SEED + 1, numRuns: 1500 },
    );
  });

  it('with a limit of V-1 or more on a loop-free network, equal the unlimited solve', () => {
    fc.assert(
      fc.property(loopFreeNetwork(12, 40), fc.integer({ min: 0, max: 3 }), (spec, extra) => {
        const unlimited = cheapestRoutes(toNetwork(spec), spec.origin);
        const { costs } = limitedCosts(spec, spec.n - 1 + extra);
        expect(costs).toEqual(Array.from(unlimited.cost, (c, d) => (unlimited.status[d] === STATUS_REACHABLE ? c : Infinity)));
      }),
      { seed: SEED + 2, numRuns: 1500 },
    );
  });

  it('still report the rebate loops and the unlimited statuses', () => {
    fc.assert(
      fc.property(anyNetwork(10, 30, -8, 20), fc.integer({ min: 0, max: 8 }), (spec, maxLegs) => {
        const unlimited = cheapestRoutes(toNetwork(spec), spec.origin);
        const { solved } = limitedCosts(spec, maxLegs);
        expect(Array.from(solved.unlimitedStatus)).toEqual(Array.from(unlimited.status));
        expect(solved.loops.map(loopKey)).toEqual(unlimited.loops.map(loopKey));
      }),
      { seed: SEED + 3, numRuns: 800 },
    );
  });

  it('a rebate loop pays off within the limit, and the costs stay finite', () => {
    // A -> B costs 1.00, B -> A earns a 3.00 rebate: each lap A>B>A nets -2.00.
    const net = networkOf(['A', 'B'], [['A', 'B', 100], ['B', 'A', -300]]);
    const solved = legLimitedRoutes(net, 0, 3);
    expect(Array.from(solved.cost)).toEqual([-200, -100]);
    expect(solved.path(1)!.depots).toEqual([0, 1, 0, 1]);
    expect(solved.loops).toHaveLength(1);
    expect(solved.loops[0].netPerLap).toBe(-200);
  });

  it('a limit of 0 reaches only the origin; a bad limit is refused', () => {
    const net = networkOf(['A', 'B'], [['A', 'B', 5]]);
    const solved = legLimitedRoutes(net, 0, 0);
    expect(Array.from(solved.status)).toEqual([STATUS_REACHABLE, STATUS_UNREACHABLE]);
    expect(solved.path(0)).toEqual({ depots: [0], lanes: [] });
    expect(() => legLimitedRoutes(net, 0, -1)).toThrow(RangeError);
    expect(() => legLimitedRoutes(net, 0, 1.5)).toThrow(RangeError);
  });
});
