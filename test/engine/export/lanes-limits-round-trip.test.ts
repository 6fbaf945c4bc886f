// The lanes export keeps every lane limit column (the five measures, the ADR tunnel category and the
// dangerous-goods ban), also for a what-if: rows the overlay copies for a class keep their row's
// limits, added lanes have none. Re-importing the export gives the same limits row by row, and a
// day's loads on limited vehicles are planned the same (status, cost, route) from the export as
// from the original under the scenario.

import { describe, expect, it } from 'vitest';
import { planLoads } from '../../../engine/dispatch/plan-loads';
import { lanesCsv } from '../../../engine/export/lanes-csv';
import { importLoads, importVehicles } from '../../../engine/import/import-loads';
import type { LaneTable } from '../../../engine/import/types';
import { importNetwork } from '../../../engine/planning/import-network';
import { scenarioImport } from '../../../engine/scenario/overlay-network';
import type { Scenario } from '../../../engine/scenario/types';

const DEPOTS = 'id,name,lat,lon\nA,a,51.0,4.0\nB,b,51.5,4.5\nC,c,52.0,5.0\nD,d,52.5,5.5\n';
// Long layout: a blank vehicle_class row serves every class, so a toll change for one class copies it.
const LANES = [
  'from,to,ref,vehicle_class,toll,fuel,fees,rebate,distance_km,drive_minutes,max_height_m,max_width_m,max_length_m,max_weight_t,max_axle_load_t,tunnel_category,no_dangerous_goods',
  'A,B,R1,,10.00,20.00,1.00,0,100,80,4.00,,,,,,',
  'B,D,R2,,10.00,20.00,1.00,0,100,80,,2.50,18.75,40,11.5,D,no',
  'A,C,R3,,15.00,25.00,1.00,0,120,90,,,,,,B,yes',
  'C,D,R4,,15.00,25.00,1.00,0,120,90,4.50,,,44,,,',
  'A,D,R5,2axle,90.00,60.00,1.00,0,250,200,,,,7.5,,E,',
  'A,D,R5,5axle,120.00,60.00,1.00,0,250,200,,,,7.5,,E,',
].join('\n') + '\n';
const VEHICLES = 'vehicle,vehicle_class,height_m,width_m,length_m,weight_t,axle_load_t,tunnel_code,carriage\nTALL,5axle,4.20,2.55,16.5,40,11.5,,\nTANK,5axle,3.90,2.55,16.5,40,11.5,D/E,tank\nSMALL,2axle,3.50,2.40,10,7,6,,\n';
const LOADS = 'load,from,to,vehicle\nL1,A,D,TALL\nL2,A,D,TANK\nL3,A,D,SMALL\nL4,A,B,TALL\nL5,A,C,TANK\n';
const DATE = '2026-05-04';

const scenario: Scenario = {
  name: 'limits what-if',
  description: null,
  changes: [
    // A class copy of a limited row (B>D serves every class; the 5axle toll changes).
    { kind: 'set-amount', lane: { from: 'B', to: 'D', ref: 'R2', occurrence: 1 }, field: 'toll', amountMinor: 500, vehicleClass: '5axle', note: null },
    { kind: 'close-lane', lane: { from: 'C', to: 'D', ref: 'R4', occurrence: 1 }, note: null },
    { kind: 'add-lane', lane: { from: 'C', to: 'B', ref: 'NEW', tollMinor: 100, feesMinor: 0, fuelMinor: 500, rebateMinor: 0, validFrom: null, validTo: null, distanceKm: 30, driveMinutes: 25 }, note: null },
  ],
};

/** Each limit column by its header: one text per row, as the export writes it. */
function limitsOf(t: LaneTable, keep: (r: number) => boolean = () => true) {
  const rows = Array.from({ length: t.count }, (_, r) => r).filter(keep);
  const l = t.limits!;
  return {
    measures: l.measures.map((m) => [m.column.name, rows.map((r) => (Number.isNaN(m.values[r]) ? null : m.values[r]))]),
    tunnel: rows.map((r) => l.tunnelCategory?.[r] ?? 0),
    noDangerousGoods: rows.map((r) => l.noDangerousGoods?.[r] ?? 0),
  };
}

function planLoadsOf(lanes: string, what: Scenario | null) {
  const imported = importNetwork(DEPOTS, lanes, { plan: { date: DATE } });
  expect(imported.report.errors).toEqual([]);
  const vehicles = importVehicles(VEHICLES, { classes: imported.vehicleClasses });
  const loads = importLoads(LOADS, { depots: imported.network!.depotIndex, vehicles: vehicles.byId, classes: imported.vehicleClasses, planDate: DATE });
  expect(loads.report.errors).toEqual([]);
  return planLoads(imported, loads.loads, { date: DATE, vehicles: vehicles.byId, scenario: what }).loads;
}

function dispatchOf(lanes: string, what: Scenario | null) {
  return planLoadsOf(lanes, what).map((p) => ({ load: p.load.id, status: p.status, cost: p.costMinor, path: p.path, blocked: p.blockedBy.length > 0 }));
}

describe('lanes export with lane limits', () => {
  const imported = importNetwork(DEPOTS, LANES, { plan: { date: DATE } });

  it('writes every limit column and reads back the same limits', () => {
    const text = lanesCsv(imported);
    const header = text.split('\r\n')[0].split(',');
    for (const name of ['max_height_m', 'max_width_m', 'max_length_m', 'max_weight_t', 'max_axle_load_t', 'tunnel_category', 'no_dangerous_goods']) expect(header).toContain(name);
    const back = importNetwork(DEPOTS, text, { plan: { date: DATE } });
    expect(back.report.errors).toEqual([]);
    expect(limitsOf(back.lanes)).toEqual(limitsOf(imported.lanes));
    expect(limitsOf(imported.lanes).tunnel).toEqual([0, 4, 2, 0, 5, 5]); // D = 4, B = 2, E = 5 (ADR 1.9.5 categories A-E)
  });

  it('keeps a class copy\'s limits under a what-if and plans the loads the same from the export', () => {
    const what = scenarioImport(imported, scenario);
    expect(what.overlay.problems).toEqual([]);
    const t = what.lanes;
    // The copy of B>D (for 5axle) carries B>D's limits; the added lane has none.
    const copy = Array.from({ length: t.count }, (_, r) => r).find((r) => what.overlay.sourceOf[r] === 1 && r !== 1)!;
    expect(copy).toBeGreaterThanOrEqual(what.overlay.baseCount);
    const limits = limitsOf(t);
    expect(limits.measures.map(([, v]) => (v as (number | null)[])[copy])).toEqual(limits.measures.map(([, v]) => (v as (number | null)[])[1]));
    expect(limits.tunnel[copy]).toBe(4);

    const text = lanesCsv(what);
    const back = importNetwork(DEPOTS, text, { plan: { date: DATE } });
    expect(back.report.errors).toEqual([]);
    // Every row but the closed one, in the overlay's order.
    expect(limitsOf(back.lanes)).toEqual(limitsOf(t, (r) => what.leaveOut[r] === 0));
    const fromExport = dispatchOf(text, null);
    expect(fromExport).toEqual(dispatchOf(LANES, scenario));
    // The limits decide something here: the 4.20 m trailer goes round the 4.00 m bridge A>B over the
    // added lane, and the tank may not use A>C (dangerous goods banned), its only way to C.
    expect(fromExport.find((l) => l.load === 'L4')).toMatchObject({ status: 'planned', path: ['A', 'C', 'B'] });
    expect(fromExport.find((l) => l.load === 'L5')).toMatchObject({ status: 'blocked', blocked: true });
    // Under the scenario itself, the added lane has no file row: the load names it.
    const underScenario = planLoadsOf(LANES, scenario).find((p) => p.load.id === 'L4')!;
    expect(underScenario.lanes).toEqual([4, 0]); // A>C is row 4 of the file (header = 1)
    expect(underScenario.notes).toContain('the route uses a lane the what-if scenario adds, not in the lanes file (lane row 0): C → B (NEW)');
  });
});
