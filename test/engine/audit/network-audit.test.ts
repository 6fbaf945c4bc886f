import { describe, expect, it } from 'vitest';
import graphlib from 'graphlib';
import { auditNetwork } from '../../../engine/audit/network-audit';
import { auditReport } from '../../../engine/report/audit-report';
import { cheapestRoutes, STATUS_UNBOUNDED } from '../../../engine/routes/cheapest-routes';
import { randomNetwork } from './reference';

describe('network audit', () => {
  it('per loop: unbounded depots are exactly those reachable from it (graphlib), and each neutraliser zeroes the lap', () => {
    let checked = 0;
    for (let seed = 200; seed < 260; seed++) {
      const n = 4 + (seed % 9);
      const net = randomNetwork(seed, n, n * 2, false, 20);
      const audit = auditNetwork(net, { loopCap: 10 });
      const g = new graphlib.Graph({ directed: true });
      net.depotIds.forEach((id) => g.setNode(id));
      for (let e = 0; e < net.laneCount; e++) g.setEdge(net.depotIds[net.laneFrom[e]], net.depotIds[net.laneTo[e]]);
      for (const { loop, unboundedDepots, neutralisers } of audit.loops) {
        const fromLoop = graphlib.alg.dijkstra(g, net.depotIds[loop.depots[0]]);
        const reachable = net.depotIds.filter((id) => fromLoop[id].distance !== Infinity);
        expect(unboundedDepots.map((d) => net.depotIds[d]).sort(), `seed ${seed}`).toEqual(reachable.sort());
        // The same set the route solver marks unbounded from a depot on the loop.
        const tree = cheapestRoutes(net, loop.depots[0]);
        expect(unboundedDepots).toEqual(net.depotIds.map((_, d) => d).filter((d) => tree.status[d] === STATUS_UNBOUNDED));
        expect(neutralisers.map((x) => x.lane)).toEqual(loop.lanes);
        for (const x of neutralisers) {
          expect(loop.netPerLap + x.amount).toBe(0);
          expect(x.rebateCutSuffices).toBe(net.laneRebate[x.lane] >= x.amount);
        }
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(30);
  });

  it('the report keeps the issue JSON keys, rows as source rows and null for no limit', () => {
    const net = randomNetwork(3, 8, 20, false, 20);
    const report = auditReport(net, auditNetwork(net));
    expect(Object.keys(report)).toEqual(expect.arrayContaining(['loops', 'fix_plan', 'headroom', 'headroom_after_fix_plan', 'loop_cap_reached']));
    for (const loop of report.loops) expect(Object.keys(loop)).toEqual(expect.arrayContaining(['depots', 'lanes', 'net_per_lap_minor', 'unbounded_depots']));
    for (const f of report.fix_plan) expect(Object.keys(f)).toEqual(expect.arrayContaining(['row', 'from', 'to', 'net_minor', 'new_net_minor']));
    expect(report.headroom).toHaveLength(net.laneCount);
    for (const h of report.headroom) {
      expect(Object.keys(h)).toEqual(expect.arrayContaining(['row', 'from', 'to', 'net_minor', 'floor_minor']));
      expect(h.floor_minor === null || Number.isSafeInteger(h.floor_minor)).toBe(true);
      expect(h.row).toBeGreaterThanOrEqual(2);
    }
  });
});
