// Running totals down the cheapest-route tree against the path walk they replace: the project's
// own per-route breakdown (routeBreakdown over routePath, unchanged) and a plain sum written here,
// on seeded random networks with and without rebate loops.

import { describe, expect, it } from 'vitest';
import { routeTotals, treeOrder } from '../../../engine/report/route-totals';
import { routeBreakdown } from '../../../engine/planning/route-breakdown';
import { cheapestRoutes, STATUS_REACHABLE } from '../../../engine/routes/cheapest-routes';
import { routePath } from '../../../engine/routes/route-path';
import { randomPricedNetwork } from './random-priced-network';

describe('route totals', () => {
  it('visits every reachable depot once, each after the depot before it on its route', () => {
    for (let seed = 1; seed <= 20; seed++) {
      const net = randomPricedNetwork(seed, 60, 200, seed % 2 === 0);
      const tree = cheapestRoutes(net, 0);
      const order = treeOrder(tree);
      const position = new Map<number, number>();
      order.forEach((d, i) => position.set(d, i));
      let reachable = 0;
      for (let d = 0; d < net.depotCount; d++) if (tree.status[d] === STATUS_REACHABLE) reachable++;
      expect(position.size).toBe(reachable);
      expect(order.length).toBe(reachable);
      for (const d of order) {
        if (tree.viaLane[d] === -1) continue;
        expect(position.get(net.laneFrom[tree.viaLane[d]])!).toBeLessThan(position.get(d)!);
      }
    }
  });

  it('equal the path-walk breakdown on 40 random networks, distances bit for bit', () => {
    let compared = 0;
    let unbounded = 0;
    for (let seed = 1; seed <= 40; seed++) {
      const net = randomPricedNetwork(seed, 30 + seed * 5, 120 + seed * 20, seed % 3 === 0);
      const tree = cheapestRoutes(net, seed % 7);
      const totals = routeTotals(net, tree);
      for (let d = 0; d < net.depotCount; d++) {
        if (tree.status[d] !== STATUS_REACHABLE) {
          if (tree.status[d] !== 0) unbounded++;
          expect(Number.isNaN(totals.toll[d]), `seed ${seed} depot ${d}`).toBe(true);
          continue;
        }
        const lanes = routePath(net, tree, d)!.lanes;
        const walk = routeBreakdown(net, lanes, null);
        expect([totals.toll[d], totals.fuel[d], totals.fees[d], totals.rebate[d]], `seed ${seed} depot ${d}`).toEqual([walk.toll, walk.fuel, walk.fees, walk.rebate]);
        expect(totals.toll[d] + totals.fuel[d] + totals.fees[d] - totals.rebate[d]).toBe(tree.cost[d]);
        // The plain sum in travel order, as a path walk adds it.
        let distance = 0;
        let drive = 0;
        for (const e of lanes) {
          distance += net.laneDistanceKm[e];
          drive += net.laneDriveMinutes[e];
        }
        expect(Object.is(totals.distanceKm[d], distance) || (Number.isNaN(distance) && Number.isNaN(totals.distanceKm[d]))).toBe(true);
        expect(Object.is(totals.driveMinutes[d], drive) || (Number.isNaN(drive) && Number.isNaN(totals.driveMinutes[d]))).toBe(true);
        compared++;
      }
    }
    expect(compared).toBeGreaterThan(1_000);
    expect(unbounded).toBeGreaterThan(0);
  });
});
