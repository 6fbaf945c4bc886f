// The solve's per-depot view: drive minutes are running totals down the cheapest-route tree, which
// must equal a walk of each depot's path (the brute-force reference: the engine's routePath) bit for
// bit, including NaN where a lane has no drive time, and the tree lanes are each depot's last lane.

import { describe, expect, it } from 'vitest';
import { importNetwork } from '../../../engine/planning/import-network';
import { cheapestRoutes } from '../../../engine/routes/cheapest-routes';
import { routePath } from '../../../engine/routes/route-path';
import { buildOverlay } from '../../../engine/scenario/overlay';
import { scenarioSolveInput, solveView } from '../../../renderer/worker/solve-plan';
import type { OverlayView } from '../../../renderer/worker/protocol';
import { seededRandom } from '../../support/seeded-random';

function randomFiles(seed: number, depots: number, lanes: number): { depots: string; lanes: string } {
  const next = seededRandom(seed);
  const d = ['id,name,lat,lon', ...Array.from({ length: depots }, (_, i) => `D${i},Depot ${i},${(45 + next() * 5).toFixed(3)},${(2 + next() * 5).toFixed(3)}`)];
  const l = ['from,to,toll,fuel,fees,rebate,distance_km,drive_minutes'];
  for (let e = 0; e < lanes; e++) {
    const a = Math.floor(next() * depots);
    const b = Math.floor(next() * depots);
    // Some lanes without a drive time, and odd minutes, so NaN and rounding both show.
    const minutes = next() < 0.1 ? '' : (next() * 300).toFixed(1);
    l.push(`D${a},D${b},${(next() * 20).toFixed(2)},${(next() * 50).toFixed(2)},1.00,0.00,${(next() * 200).toFixed(1)},${minutes}`);
  }
  return { depots: d.join('\n') + '\n', lanes: l.join('\n') + '\n' };
}

describe('solveView', () => {
  it.each([1, 2, 3])('drive minutes equal a walk of each path (seed %i)', (seed) => {
    const files = randomFiles(seed, 300, 1500);
    const imported = importNetwork(files.depots, files.lanes, { plan: { date: '2026-08-15' }, skipInvalid: true });
    const network = imported.network!;
    const tree = cheapestRoutes(network, 0);
    const overlay = buildOverlay(imported, null) as unknown as OverlayView;
    const view = solveView(network, { origin: 'D0', maxLegs: null, vehicleClass: '', dispatchDate: '2026-08-15' }, tree, 0, 9 * 60, overlay);
    const last: number[] = [];
    let reached = 0;
    for (let d = 0; d < network.depotCount; d++) {
      const path = routePath(network, tree, d);
      if (!path) {
        expect(view.driveMinutes[d]).toBeNaN();
        continue;
      }
      reached++;
      let sum = 0;
      for (const lane of path.lanes) sum += network.laneDriveMinutes[lane];
      expect(Object.is(view.driveMinutes[d], path.lanes.length === 0 ? 0 : sum), `depot ${d}`).toBe(true);
      if (path.lanes.length > 0) last.push(path.lanes[path.lanes.length - 1]);
    }
    expect(reached).toBeGreaterThan(100);
    expect(Array.from(view.treeLanes)).toEqual(last);
  });
});

describe('scenarioSolveInput', () => {
  const depots = 'id,name,lat,lon\nA,Alpha,50.0,4.0\nB,Bravo,50.5,4.5\n';
  it('sends no per-row amounts when every row of the file is planned (the lane table reads the lanes)', () => {
    const imported = importNetwork(depots, 'from,to,toll,fuel,fees,rebate\nA,B,1.00,2.00,0,0\nB,A,3.00,4.00,0,0\n', { plan: { date: '2026-08-15' } });
    const input = scenarioSolveInput(imported, imported.network!, null);
    expect(input.overlay.rows.toll.length).toBe(0);
    expect(Array.from(input.overlay.toll)).toEqual([100, 300]);
  });
  it('sends every row when the plan leaves a row out, with that row’s own amounts', () => {
    const lanes = 'from,to,toll,fuel,fees,rebate,valid_from,valid_to\nA,B,1.00,2.00,0,0,,\nB,A,3.00,4.00,0,0,2027-01-01,\n';
    const imported = importNetwork(depots, lanes, { plan: { date: '2026-08-15' } });
    const input = scenarioSolveInput(imported, imported.network!, null);
    expect(Array.from(input.overlay.rows.toll)).toEqual([100, 300]);
    expect(Array.from(input.overlay.toll)).toEqual([100]);
  });
});
