// "What moved" against brute force: on random solves and bases (status changes, cost changes of
// every size including non-whole and huge ones, route-only changes) the order is the plain
// comparator's: status changes first, then the largest cost change, then same-cost route changes,
// ties by depot.

import { describe, expect, it } from 'vitest';
import { movedDepots } from '../../../renderer/model/moved-depots';
import type { SolveView } from '../../../renderer/worker/protocol';
import { seededRandom } from '../../support/seeded-random';

function reference(solve: Pick<SolveView, 'status' | 'cost' | 'base'>): number[] {
  const base = solve.base!;
  const moved: { d: number; delta: number }[] = [];
  for (let d = 0; d < solve.status.length; d++) {
    if (base.status[d] !== solve.status[d]) moved.push({ d, delta: Infinity });
    else if (solve.status[d] === 1 && base.cost[d] !== solve.cost[d]) moved.push({ d, delta: Math.abs(solve.cost[d] - base.cost[d]) });
    else if (base.routeChanged[d] === 1) moved.push({ d, delta: 0 });
  }
  return moved.sort((a, b) => b.delta - a.delta || a.d - b.d).map((m) => m.d);
}

describe('movedDepots', () => {
  it.each([
    [1, 'whole'],
    [2, 'whole'],
    [3, 'fractions'],
    [4, 'huge'],
  ] as const)('lists what moved as the plain comparator does (seed %i, %s amounts)', (seed, amounts) => {
    const next = seededRandom(seed);
    const n = 500;
    const pick = <T>(xs: readonly T[]) => xs[Math.floor(next() * xs.length)];
    const amount = () => (amounts === 'fractions' && next() < 0.2 ? 10.5 : amounts === 'huge' && next() < 0.2 ? 2 ** 40 : pick([0, 100, 250, 250, 1000, Math.round(next() * 5000)]));
    const status = Uint8Array.from({ length: n }, () => pick([0, 1, 1, 1, 2]));
    const cost = Float64Array.from({ length: n }, amount);
    const base = {
      status: Uint8Array.from(status, (s) => (next() < 0.1 ? pick([0, 1, 2]) : s)),
      cost: Float64Array.from(cost, (c) => (next() < 0.5 ? amount() : c)),
      legs: new Int32Array(n),
      routeChanged: Uint8Array.from({ length: n }, () => (next() < 0.2 ? 1 : 0)),
    };
    const solve = { status, cost, base };
    const expected = reference(solve);
    expect(expected.length).toBeGreaterThan(50);
    expect(Array.from(movedDepots(solve))).toEqual(expected);
  });

  it('is empty without a base', () => {
    expect(movedDepots({ status: new Uint8Array(3), cost: new Float64Array(3), base: null }).length).toBe(0);
  });
});
