// Restricted routes against a reference: random networks (negative lanes, no loop) with random lane
// limits, random vehicles and loads go through the real importers and planLoads; the lanes each
// vehicle may use are filtered here by hand and solved with js-graph-algorithms' Bellman-Ford, which
// decides planned / blocked / no-route, the cost and what the limits cost.

import { describe, expect, it } from 'vitest';
import { planLoads } from '../../../engine/dispatch/plan-loads';
import { importLoads, importVehicles } from '../../../engine/import/import-loads';
import { importNetwork } from '../../../engine/planning/import-network';
import { seededRandom } from '../../support/seeded-random';
import { jsBellmanFord } from '../routes/reference-graphs';

// ADR 8.6.4 codes whose row has no condition, written out by hand (UNECE ADR 2023, from memory).
const FORBIDDEN: Record<string, string[]> = { B: ['B', 'C', 'D', 'E'], C: ['C', 'D', 'E'], D: ['D', 'E'], E: ['E'], '-': [] };

interface Lane { u: number; v: number; w: number; height: number | null; weight: number | null; tunnel: string | null; noDg: boolean }
interface Vehicle { id: string; height: number; weight: number; code: string | null }

const money = (minor: number) => (minor / 100).toFixed(2);

function scenario(seed: number) {
  const rand = seededRandom(seed);
  const int = (lo: number, hi: number) => lo + Math.floor(rand() * (hi - lo + 1));
  const pick = <T>(xs: readonly T[]) => xs[int(0, xs.length - 1)];
  const n = int(2, 9);
  const potential = Array.from({ length: n }, () => int(-40, 40));
  const lanes: Lane[] = Array.from({ length: int(0, 22) }, () => {
    const u = int(0, n - 1);
    const v = int(0, n - 1);
    return {
      u,
      v,
      w: int(0, 30) + potential[u] - potential[v],
      height: rand() < 0.3 ? int(35, 45) / 10 : null,
      weight: rand() < 0.2 ? int(10, 44) : null,
      tunnel: rand() < 0.2 ? pick(['A', 'B', 'C', 'D', 'E']) : null,
      noDg: rand() < 0.1,
    };
  });
  const vehicles: Vehicle[] = Array.from({ length: 3 }, (_, i) => ({ id: `V${i}`, height: int(35, 45) / 10, weight: int(10, 44), code: rand() < 0.5 ? pick(Object.keys(FORBIDDEN)) : null }));
  const loads = Array.from({ length: 8 }, (_, i) => {
    const from = int(0, n - 1);
    let to = int(0, n - 1);
    if (to === from) to = (to + 1) % n;
    return { id: `L${i}`, from, to, vehicle: pick(vehicles) };
  });
  return { n, lanes, vehicles, loads };
}

function open(lane: Lane, v: Vehicle): boolean {
  if (lane.height !== null && v.height > lane.height) return false;
  if (lane.weight !== null && v.weight > lane.weight) return false;
  if (lane.tunnel !== null && v.code !== null && FORBIDDEN[v.code].includes(lane.tunnel)) return false;
  if (lane.noDg && v.code !== null) return false;
  return true;
}

describe('planLoads against hand-filtered lanes and js-graph-algorithms Bellman-Ford', () => {
  const seen = { planned: 0, blocked: 0, 'no-route': 0, unbounded: 0, costlier: 0 };
  for (let seed = 1; seed <= 120; seed++) {
    it(`random network ${seed}`, () => {
      const s = scenario(seed);
      const depots = ['id,name,lat,lon', ...Array.from({ length: s.n }, (_, d) => `D${d},Depot ${d},50.${d},4.${d}`)].join('\n');
      const lanes = [
        'from,to,toll,fuel,fees,rebate,distance_km,drive_minutes,max_height_m,max_weight_t,tunnel_category,no_dangerous_goods',
        ...s.lanes.map((l) => [`D${l.u}`, `D${l.v}`, money(Math.max(l.w, 0)), '0.00', '0.00', money(Math.max(-l.w, 0)), 10, 10, l.height ?? '', l.weight ?? '', l.tunnel ?? '', l.noDg ? 'yes' : ''].join(',')),
      ].join('\n');
      const imported = importNetwork(depots, lanes, { plan: { date: '2026-03-01' } });
      expect(imported.report.errors).toEqual([]);
      const vehicles = importVehicles(
        ['vehicle,height_m,width_m,length_m,weight_t,axle_load_t,tunnel_code', ...s.vehicles.map((v) => `${v.id},${v.height},2.5,12,${v.weight},10,${v.code ?? ''}`)].join('\n'),
        { classes: imported.vehicleClasses },
      );
      expect(vehicles.report.errors).toEqual([]);
      const loads = importLoads(['load,from,to,vehicle', ...s.loads.map((l) => `${l.id},D${l.from},D${l.to},${l.vehicle.id}`)].join('\n'), {
        depots: imported.network!.depotIndex,
        vehicles: vehicles.byId,
        classes: imported.vehicleClasses,
        planDate: '2026-03-01',
      });
      expect(loads.report.accepted).toBe(s.loads.length);
      const plan = planLoads(imported, loads.loads, { date: '2026-03-01', vehicles: vehicles.byId });

      const all = s.lanes.map((l) => [l.u, l.v, l.w] as [number, number, number]);
      s.loads.forEach((load, i) => {
        const got = plan.loads[i];
        seen[got.status]++;
        if ((got.limitsExtraMinor ?? 0) > 0) seen.costlier++;
        const free = jsBellmanFord({ n: s.n, lanes: all, origin: load.from }).cost[load.to];
        const allowed = s.lanes.filter((l) => open(l, load.vehicle)).map((l) => [l.u, l.v, l.w] as [number, number, number]);
        const restricted = jsBellmanFord({ n: s.n, lanes: allowed, origin: load.from }).cost[load.to];
        if (restricted !== Infinity) {
          expect({ status: got.status, cost: got.costMinor, extra: got.limitsExtraMinor }).toEqual({ status: 'planned', cost: restricted, extra: restricted - free });
          // The path's lanes add up to the cost.
          expect(got.lanes.length).toBe(got.path.length - 1);
        } else if (free !== Infinity) {
          expect(got.status).toBe('blocked');
          expect(got.blockedBy.length).toBeGreaterThan(0);
        } else {
          expect(got.status).toBe('no-route');
        }
      });
    });
  }

  it('the random cases cover every status but unbounded, and limits that cost money', () => {
    expect(seen.planned).toBeGreaterThan(50);
    expect(seen.blocked).toBeGreaterThan(10);
    expect(seen['no-route']).toBeGreaterThan(10);
    expect(seen.costlier).toBeGreaterThan(10);
    expect(seen.unbounded).toBe(0);
  });
});

describe('planLoads: named reasons', () => {
  const depots = 'id,name,lat,lon\nA,A,50,4\nB,B,50.1,4.1\nC,C,50.2,4.2\nD,D,50.3,4.3';
  const vehicles = 'vehicle,vehicle_class,height_m,width_m,length_m,weight_t,axle_load_t,tunnel_code,carriage\nDD,,4.20,2.55,16.5,40,11.5,,\nTK,,3.9,2.55,16.5,40,11.5,D/E,tank';

  function run(lanes: string, loads: string) {
    const imported = importNetwork(depots, lanes, { plan: { date: '2026-03-01' } });
    const v = importVehicles(vehicles, { classes: imported.vehicleClasses });
    const l = importLoads(loads, { depots: imported.network!.depotIndex, vehicles: v.byId, classes: imported.vehicleClasses, planDate: '2026-03-01' });
    expect(l.report.errors).toEqual([]);
    return planLoads(imported, l.loads, { date: '2026-03-01', vehicles: v.byId });
  }

  it('a blocked load names the limit, the sizes and the lane row', () => {
    const plan = run(
      'from,to,toll,fuel,max_height_m,tunnel_category\nA,B,1.00,0,4.00,\nB,C,1.00,0,,D\nA,C,5.00,0,,',
      'load,from,to,vehicle\nL1,A,B,DD\nL2,A,C,TK\nL3,A,C,DD\nL4,C,A,DD',
    );
    expect(plan.loads.map((l) => l.status)).toEqual(['blocked', 'planned', 'planned', 'no-route']);
    expect(plan.loads[0].blockedBy).toEqual(['max_height_m 4.00 < 4.20 on lane row 2']);
    expect(plan.loads[1].costMinor).toBe(500);
    expect(plan.loads[1].limitsExtraMinor).toBe(300);
    expect(plan.loads[1].avoided).toEqual(['tunnel_category D forbidden to tunnel code D/E (ADR 8.6.4) on lane row 3']);
    expect(plan.loads[2].avoided).toEqual(['max_height_m 4.00 < 4.20 on lane row 2']);
  });

  it('an unbounded load names the rebate loop that reaches it', () => {
    const plan = run('from,to,toll,fuel,rebate\nA,B,1.00,0,0\nB,C,1.00,0,0\nC,B,1.00,0,3.00\nC,D,1.00,0,0', 'load,from,to,vehicle\nL1,A,D,DD\nL2,B,A,DD');
    expect(plan.loads[0].status).toBe('unbounded');
    expect(plan.loads[0].loop).toEqual({ depots: ['B', 'C'], lanes: [3, 4], netPerLapMinor: -100 });
    expect(plan.loads[1].status).toBe('no-route');
  });

  it('alternatives come in cost order with their difference and departing lanes', () => {
    const imported = importNetwork(depots, 'from,to,toll,fuel\nA,B,1.00,0\nB,D,1.00,0\nA,C,1.50,0\nC,D,1.00,0\nA,D,4.00,0', { plan: { date: '2026-03-01' } });
    const l = importLoads('load,from,to\nL1,A,D', { depots: imported.network!.depotIndex, vehicles: new Map(), classes: [], planDate: '2026-03-01' });
    const plan = planLoads(imported, l.loads, { date: '2026-03-01', vehicles: new Map(), alternatives: 5 });
    const p = plan.loads[0];
    expect(p.costMinor).toBe(200);
    expect(p.alternatives.map((a) => [a.costMinor, a.differenceMinor, a.path.join('>'), a.departs])).toEqual([
      [250, 50, 'A>C>D', [4, 5]],
      [400, 200, 'A>D', [6]],
    ]);
    expect(p.alternativesStoppedBy).toBe('exhausted');
  });
});
