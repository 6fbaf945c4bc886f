// Dates that share a network: validitySpans puts two dates in one span only when every lane row is
// valid on both or on neither (checked by brute force over random validity windows), and planLoads
// then prices and solves once for both dates, while a lane valid on one date only still routes only
// that date's loads.

import { describe, expect, it } from 'vitest';
import { validitySpans } from '../../../engine/dispatch/day-pricing';
import { planLoads } from '../../../engine/dispatch/plan-loads';
import { importLoads, importVehicles } from '../../../engine/import/import-loads';
import { importNetwork } from '../../../engine/planning/import-network';
import { seededRandom } from '../../support/seeded-random';

const DEPOTS = 'id,name,lat,lon\nA,a,51,4\nB,b,52,4\nC,c,52,5\n';

describe('validitySpans', () => {
  it('gives two dates one span only when every row is valid on both or on neither (brute force)', () => {
    const random = seededRandom(20260915);
    // Day numbers from 2026-01-01 and their ISO 8601 text (the engine's own date numbers are not day counts).
    const base = 0;
    const text = (day: number) => new Date(Date.UTC(2026, 0, 1 + day)).toISOString().slice(0, 10);
    for (let trial = 0; trial < 40; trial++) {
      const rows = ['from,to,toll,fuel,fees,rebate,valid_from,valid_to'];
      const windows: [number, number][] = [];
      for (let r = 0; r < 1 + Math.floor(random() * 6); r++) {
        // 0 = no bound; days count from 1.
        const from = random() < 0.3 ? 0 : 1 + Math.floor(random() * 60);
        const to = random() < 0.3 ? 0 : Math.max(from, 1) + Math.floor(random() * 30);
        windows.push([from, to]);
        rows.push(`A,B,1.00,1.00,0,0,${from ? text(from) : ''},${to ? text(to) : ''}`);
      }
      const imported = importNetwork(DEPOTS, rows.join('\n') + '\n', { skipInvalid: true });
      const spanOf = validitySpans(imported.lanes);
      const valid = (d: number) => windows.map(([f, t]) => (f === 0 || f <= d) && (t === 0 || t >= d));
      let shared = 0;
      for (let d1 = base - 2; d1 < base + 95; d1 += 3) {
        for (let d2 = d1; d2 < base + 95; d2 += 7) {
          const same = JSON.stringify(valid(d1)) === JSON.stringify(valid(d2));
          if (spanOf(text(d1)) !== spanOf(text(d2))) continue;
          shared++;
          expect(same, `${text(d1)} ${text(d2)}`).toBe(true);
        }
      }
      expect(shared).toBeGreaterThan(0);
    }
  });
});

describe('planLoads over dates that share a network', () => {
  const LANES = 'from,to,toll,fuel,fees,rebate,valid_from,valid_to\nA,B,1.00,1.00,0,0,,\nB,C,1.00,1.00,0,0,,\nA,C,5.00,1.00,0,0,,\nA,C,0.50,0.50,0,0,2026-06-10,2026-06-10\n';
  const imported = importNetwork(DEPOTS, LANES, { plan: { date: '2026-06-01' } });
  const vehicles = importVehicles('vehicle,vehicle_class\n', { classes: [] });
  const plan = (text: string) => {
    const loads = importLoads(text, { depots: imported.network!.depotIndex, vehicles: vehicles.byId, classes: [], planDate: '2026-06-01' });
    return planLoads(imported, loads.loads, { date: '2026-06-01', vehicles: vehicles.byId });
  };

  it('prices and solves once for dates in one span, and states each date', () => {
    const p = plan('load,from,to,date\nL1,A,C,2026-06-01\nL2,A,C,2026-06-02\nL3,A,C,2026-06-09\n');
    expect(p.stats).toMatchObject({ pricedDays: 1, plainSolves: 1 });
    expect(p.loads.map((l) => [l.load.date, l.costMinor, l.path.join('>')])).toEqual([
      ['2026-06-01', 400, 'A>B>C'],
      ['2026-06-02', 400, 'A>B>C'],
      ['2026-06-09', 400, 'A>B>C'],
    ]);
    // The note on left-out rows names each date planned, not only the first.
    expect(p.notes.some((n) => n.includes('not valid on 2026-06-02 '))).toBe(true);
  });

  it('still prices a date apart when a lane is valid on it only', () => {
    const p = plan('load,from,to,date\nL1,A,C,2026-06-09\nL2,A,C,2026-06-10\nL3,A,C,2026-06-11\n');
    // Before, on and after the one-day window: three spans (after is priced again; the same rows, a safe miss).
    expect(p.stats.pricedDays).toBe(3);
    expect(p.loads.map((l) => [l.load.date, l.costMinor, l.path.join('>')])).toEqual([
      ['2026-06-09', 400, 'A>B>C'],
      ['2026-06-10', 100, 'A>C'],
      ['2026-06-11', 400, 'A>B>C'],
    ]);
  });
});
