// The compiled network: every lane kept once, grouped by origin depot in input order, with exact
// net costs; bad depot references are refused by class.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildNetwork, depotIndexOf } from '../../../engine/network/build';
import { MoneyOverflowError, NetworkBuildError, UnknownDepotError } from '../../../engine/errors';
import { parseMinor, ZERO, type Minor } from '../../../engine/money/minor';
import type { LaneInput } from '../../../engine/network/types';
import { anyNetwork, toNetwork } from '../routes/reference-graphs';

const depot = (id: string) => ({ id, name: `Depot ${id}`, lat: 51.9, lon: 4.1 });
const lane = (from: string, to: string, amounts: Partial<Record<'toll' | 'fuel' | 'fees' | 'rebate', string>>, sourceRow: number): LaneInput => ({
  from,
  to,
  toll: amounts.toll ? parseMinor(amounts.toll) : ZERO,
  fuel: amounts.fuel ? parseMinor(amounts.fuel) : ZERO,
  fees: amounts.fees ? parseMinor(amounts.fees) : ZERO,
  rebate: amounts.rebate ? parseMinor(amounts.rebate) : ZERO,
  sourceRow,
});

describe('buildNetwork', () => {
  it('net cost is toll + fuel + fees - rebate, exactly', () => {
    const net = buildNetwork([depot('A'), depot('B')], [lane('A', 'B', { toll: '12.35', fuel: '58.40', fees: '0.10', rebate: '20.05' }, 2)]);
    expect(net.laneNet[0]).toBe(5080);
    expect(net.outNet[0]).toBe(5080);
    expect(net.laneRow[0]).toBe(2);
  });

  it('keeps parallel lanes and groups lanes by origin in input order', () => {
    const net = buildNetwork(
      [depot('A'), depot('B'), depot('C')],
      [lane('B', 'C', { toll: '1' }, 2), lane('A', 'B', { toll: '2' }, 3), lane('B', 'C', { toll: '1' }, 4), lane('A', 'C', { toll: '3' }, 5)],
    );
    expect(net.laneCount).toBe(4);
    expect(Array.from(net.outStart)).toEqual([0, 2, 4, 4]);
    expect(Array.from(net.outLane)).toEqual([1, 3, 0, 2]);
    expect(Array.from(net.outTo)).toEqual([1, 2, 2, 2]);
  });

  it('every lane appears once in the compressed rows, under its origin', () => {
    fc.assert(
      fc.property(anyNetwork(20, 60, -50, 50), (spec) => {
        const net = toNetwork(spec);
        const seen = new Array(spec.lanes.length).fill(0);
        for (let d = 0; d < spec.n; d++) {
          let last = -1;
          for (let p = net.outStart[d]; p < net.outStart[d + 1]; p++) {
            const e = net.outLane[p];
            seen[e]++;
            expect(e).toBeGreaterThan(last); // stable: input order within a depot
            last = e;
            expect(spec.lanes[e]).toEqual([d, net.outTo[p], net.outNet[p]]);
          }
        }
        expect(seen.every((count) => count === 1)).toBe(true);
        expect(net.outStart[spec.n]).toBe(spec.lanes.length);
      }),
      { seed: 20_261_205, numRuns: 300 },
    );
  });

  it('refuses duplicate depots, unknown depots and a net cost beyond the exact range', () => {
    expect(() => buildNetwork([depot('A'), depot('A')], [])).toThrow(NetworkBuildError);
    try {
      buildNetwork([depot('A')], [lane('A', 'Z', {}, 7)]);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(UnknownDepotError);
      expect((error as UnknownDepotError).depotId).toBe('Z');
    }
    const huge = Number.MAX_SAFE_INTEGER as Minor;
    expect(() => buildNetwork([depot('A'), depot('B')], [{ ...lane('A', 'B', {}, 2), toll: huge, fuel: huge }])).toThrow(MoneyOverflowError);
    const net = buildNetwork([depot('A')], []);
    expect(depotIndexOf(net, 'A')).toBe(0);
    expect(() => depotIndexOf(net, 'Q')).toThrow(UnknownDepotError);
  });
});
