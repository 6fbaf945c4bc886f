// The overlay: a scenario laid over every lane row of the file. Each bug it fixes has a case here
// that failed before: keys counted in the date- or class-filtered network, a toll edit under one
// class changing every class, a change whose lane is missing. Figures are worked by hand.

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { importNetwork } from '../../../engine/planning/import-network';
import { buildOverlay } from '../../../engine/scenario/overlay';
import { overlayNetwork, overlayWeights } from '../../../engine/scenario/overlay-network';
import { compareImport } from '../../../engine/scenario/compare';
import { planRequestOf } from '../../../engine/scenario/overlay-network';
import { compareReport } from '../../../engine/report/compare-report';
import { parseScenarioDocument, serializeScenarioDocument } from '../../../engine/scenario/document';
import type { Scenario, ScenarioChange } from '../../../engine/scenario/types';
import type { PlanRequest } from '../../../engine/planning/types';

const depots = 'id,name,lat,lon\nA,Alpha,50.0,4.0\nB,Bravo,50.5,4.5\nC,Charlie,51.0,5.0\n';
const scenario = (...changes: ScenarioChange[]): Scenario => ({ name: 't', description: null, changes });
const key = (from: string, to: string, ref: string | null, occurrence = 1) => ({ from, to, ref, occurrence });

describe('lane keys are counted over the file, not over the day or class planned', () => {
  // Two rows A>B with ref R1: the first valid in the first half of 2026, the second in the second.
  const lanes = 'from,to,ref,toll,fuel,fees,rebate,valid_from,valid_to\n' +
    'A,B,R1,10.00,0,0,0,2026-01-01,2026-06-30\n' +
    'A,B,R1,20.00,0,0,0,2026-07-01,2026-12-31\n' +
    'B,C,,5.00,0,0,0,,\n';
  const summer = importNetwork(depots, lanes, { plan: { date: '2026-08-15' } });

  it('a change naming occurrence 1 (the first-half row) does not touch the second-half row', () => {
    const compared = compareImport(summer, scenario({ kind: 'set-amount', lane: key('A', 'B', 'R1', 1), field: 'toll', amountMinor: 100, vehicleClass: null, note: null }), 'A');
    const b = compared.depots.find((d) => d.depot === 'B')!;
    expect([b.baseCost, b.scenarioCost]).toEqual([2000, 2000]);
    expect(compared.problems).toEqual([]);
  });

  it('a change naming occurrence 2 applies to the second-half row instead of being reported missing', () => {
    const compared = compareImport(summer, scenario({ kind: 'set-amount', lane: key('A', 'B', 'R1', 2), field: 'toll', amountMinor: 2500, vehicleClass: null, note: null }), 'A');
    expect(compared.problems).toEqual([]);
    expect(compared.depots.find((d) => d.depot === 'B')!.scenarioCost).toBe(2500);
    expect(compareReport(compared).depots.find((d) => d.id === 'B')!.scenario_lanes).toEqual(['A>B|R1|2']);
  });

  it('the same with one row per vehicle class and a chosen class', () => {
    const long = 'from,to,ref,vehicle_class,toll,fuel,fees,rebate\nA,B,R1,2axle,8.19,0,0,0\nA,B,R1,5axle,18.20,0,0,0\n';
    const heavy = importNetwork(depots, long, { plan: { vehicleClass: '5axle' } });
    const compared = compareImport(heavy, scenario({ kind: 'set-amount', lane: key('A', 'B', 'R1', 2), field: 'toll', amountMinor: 1900, vehicleClass: '5axle', note: null }), 'A');
    expect(compared.problems).toEqual([]);
    expect(compared.depots.find((d) => d.depot === 'B')!.scenarioCost).toBe(1900);
    const light = importNetwork(depots, long, { plan: { vehicleClass: '2axle' } });
    const unchanged = compareImport(light, scenario({ kind: 'set-amount', lane: key('A', 'B', 'R1', 2), field: 'toll', amountMinor: 1900, vehicleClass: '5axle', note: null }), 'A');
    expect(unchanged.depots.find((d) => d.depot === 'B')!.scenarioCost).toBe(819);
  });
});

describe('a toll edit names its vehicle class', () => {
  const sample = (name: string) => readFileSync(new URL(`../../../sample-data/${name}`, import.meta.url), 'utf8');
  const imported = importNetwork(sample('depots.csv'), sample('lanes.csv'), { plan: { vehicleClass: '2axle' } });
  const row = 13; // LUX>SXB BFH-L-014: toll 18.20, 2axle 8.19, 5axle 18.20 (sample-data/lanes.csv line 15)
  const lux = key('LUX', 'SXB', 'BFH-L-014');

  it('a 2axle toll change leaves the 5axle and default tolls as they are', () => {
    const overlay = buildOverlay(imported, scenario({ kind: 'set-amount', lane: lux, field: 'toll', amountMinor: 900, vehicleClass: '2axle', note: null }));
    const t = overlay.table;
    expect(t.sourceRow[row]).toBe(15);
    expect(t.classTolls.map((c) => [c.name, c.toll[row]])).toEqual([['2axle', 900], ['5axle', 1820]]);
    expect(t.toll[row]).toBe(1820);
    expect(overlay.problems).toEqual([]);
    const heavy = overlayNetwork(overlay, imported, { vehicleClass: '5axle' });
    const e = heavy.keys.findIndex((k) => k.from === 'LUX' && k.to === 'SXB');
    expect(heavy.network.laneToll[e]).toBe(1820);
    const light = overlayNetwork(overlay, imported, { vehicleClass: '2axle' });
    expect(light.network.laneToll[light.keys.findIndex((k) => k.from === 'LUX' && k.to === 'SXB')]).toBe(900);
  });

  it('"every class" is explicit and changes every class column', () => {
    const overlay = buildOverlay(imported, scenario({ kind: 'set-amount', lane: lux, field: 'toll', amountMinor: 900, vehicleClass: null, note: null }));
    expect([overlay.table.toll[row], ...overlay.table.classTolls.map((c) => c.toll[row])]).toEqual([900, 900, 900]);
  });

  it('a class the file does not have is a problem, kept and not applied', () => {
    const overlay = buildOverlay(imported, scenario({ kind: 'set-amount', lane: lux, field: 'toll', amountMinor: 900, vehicleClass: '7axle', note: null }));
    expect(overlay.problems.map((p) => [p.changeIndex, p.code])).toEqual([[0, 'unknown-class']]);
    expect(overlay.table.classTolls[0].toll[row]).toBe(819);
  });

  it('in the long layout a row for every class gets a copy for the class edited', () => {
    const long = 'from,to,ref,vehicle_class,toll,fuel,fees,rebate\nA,B,R1,,10.00,0,0,0\nA,B,R2,2axle,4.00,0,0,0\nA,B,R2,5axle,9.00,0,0,0\n';
    const table = importNetwork(depots, long, { plan: { vehicleClass: '2axle' } });
    const overlay = buildOverlay(table, scenario({ kind: 'set-amount', lane: key('A', 'B', 'R1'), field: 'toll', amountMinor: 700, vehicleClass: '5axle', note: null }));
    expect(overlay.reshaped).toBe(true);
    const tollOfR1 = (cls: string) => {
      const net = overlayNetwork(overlay, table, { vehicleClass: cls });
      return net.network.laneToll[net.keys.findIndex((k) => k.ref === 'R1')];
    };
    expect([tollOfR1('2axle'), tollOfR1('5axle')]).toEqual([1000, 700]);
  });

  it('a version 1 toll change reads as every class, and version 2 writes the class', () => {
    const v1 = JSON.stringify({ format: 'lanewright-scenario', version: 1, name: 'old', description: null, changes: [{ kind: 'set-amount', lane: lux, field: 'toll', amountMinor: 900, note: null }] });
    const read = parseScenarioDocument(v1);
    expect(read.changes[0]).toMatchObject({ field: 'toll', vehicleClass: null });
    const written = JSON.parse(serializeScenarioDocument(scenario({ kind: 'set-amount', lane: lux, field: 'toll', amountMinor: 900, vehicleClass: '2axle', note: null })));
    expect(written).toMatchObject({ version: 2, changes: [{ vehicleClass: '2axle' }] });
  });
});

describe('what the overlay gives every consumer', () => {
  const lanes = 'from,to,ref,toll,fuel,fees,rebate,valid_from,valid_to\n' +
    'A,B,,10.00,1.00,0,0,,\n' +
    'B,C,,5.00,1.00,0,2.00,,\n' +
    'A,C,,30.00,0,0,0,,\n';
  const imported = importNetwork(depots, lanes, {});
  const request: PlanRequest = planRequestOf(imported);

  it('a change whose lane is missing is a problem naming it, kept, and the other changes still apply', () => {
    const s = scenario(
      { kind: 'close-lane', lane: key('A', 'B', 'GONE'), note: null },
      { kind: 'set-amount', lane: key('A', 'C', null), field: 'fees', amountMinor: 100, note: null },
    );
    const overlay = buildOverlay(imported, s);
    expect(overlay.problems.map((p) => [p.changeIndex, p.code, p.lane.ref])).toEqual([[0, 'lane-missing', 'GONE']]);
    expect(overlay.table.fees[2]).toBe(100);
    expect(s.changes).toHaveLength(2);
  });

  it('an amount change or a closure is a weights update on the base network; an added lane needs a rebuild', () => {
    const priced = buildOverlay(imported, scenario({ kind: 'set-amount', lane: key('B', 'C', null), field: 'rebate', amountMinor: 0, note: null }, { kind: 'close-lane', lane: key('A', 'C', null), note: null }));
    const network = imported.network!;
    const weights = overlayWeights(priced, imported, request, network, imported.plan.laneRecord)!;
    const byLane = new Map<number, number>();
    for (let p = 0; p < network.laneCount; p++) byLane.set(network.outLane[p], weights[p]);
    expect([byLane.get(0), byLane.get(1), byLane.get(2)]).toEqual([1100, 600, Infinity]);
    const added = buildOverlay(imported, scenario({ kind: 'add-lane', lane: { from: 'C', to: 'A', ref: null, tollMinor: 1, fuelMinor: 0, feesMinor: 0, rebateMinor: 0, validFrom: null, validTo: null, distanceKm: 10, driveMinutes: 10 }, note: null }));
    expect(overlayWeights(added, imported, request, network, imported.plan.laneRecord)).toBeNull();
    const rebuilt = overlayNetwork(added, imported, request);
    expect(rebuilt.network.laneCount).toBe(4);
    expect(Array.from(rebuilt.addedBy)).toEqual([-1, -1, -1, 0]);
    expect(rebuilt.keys[3]).toEqual(key('C', 'A', null, 1));
  });

  it('a scenario without changes copies nothing', () => {
    const overlay = buildOverlay(imported, scenario());
    expect(overlay.table).toBe(imported.lanes);
  });

  it('an amount that makes a net leave the exact range is a problem, not applied', () => {
    const overlay = buildOverlay(imported, scenario({ kind: 'set-amount', lane: key('A', 'B', null), field: 'fees', amountMinor: Number.MAX_SAFE_INTEGER, note: null }));
    expect(overlay.problems.map((p) => p.code)).toEqual(['amount-overflow']);
    expect(overlay.table.fees[0]).toBe(0);
  });
});
