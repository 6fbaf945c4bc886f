// The worker on the engine's overlay: each bug the app had with scenarios has a case here that
// failed before. Keys counted in the date-filtered network, a toll edit under one class changing
// every class, a change whose lane is missing listed as if applied, an export of the day's rows only.

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCsvText } from '../../../engine/io/csv-papaparse';
import { readEnteredAmount } from '../../../engine/import/amount-text';
import { MoneyFormatError } from '../../../engine/errors';
import { emptyScenario, setLaneAmount } from '../../../renderer/model/scenario-edits';
import type { FromWorker, NetworkView, PlanChoice, SolveView, ToWorker } from '../../../renderer/worker/protocol';
import { WorkerSession } from '../../../renderer/worker/session';
import type { Scenario } from '../../../engine/scenario/types';
import { laneKey } from '../../../renderer/model/lane-names';

const sample = (name: string) => readFileSync(`sample-data/${name}`, 'utf8');

function drive(messages: ToWorker[]): FromWorker[] {
  const out: FromWorker[] = [];
  const session = new WorkerSession((m) => out.push(m));
  messages.forEach((m) => session.handle(m));
  return out.filter((m) => m.kind !== 'progress');
}

const load = (depots: string, lanes: string, plan: PlanChoice): ToWorker => ({ kind: 'load', id: 1, depots: { name: 'depots.csv', text: depots }, lanes: { name: 'lanes.csv', text: lanes }, acceptPartial: true, plan });
const solve = (origin: string, plan: PlanChoice, scenario: Scenario | null, id = 2): ToWorker => ({ kind: 'solve', id, settings: { origin, maxLegs: null, vehicleClass: plan.vehicleClass, dispatchDate: plan.date }, scenario });
const loadedView = (m: FromWorker) => (m as { network: NetworkView }).network;
const laneKeys = (view: NetworkView) => Array.from(view.laneRecord, (_, e) => laneKey(view, e));
const solvedView = (m: FromWorker) => (m as { result: SolveView }).result;

describe('worker session on the overlay', () => {
  it('names a lane by its row of the file, not by its place among the rows valid on the date', () => {
    const depots = 'id,name,lat,lon\nA,Alpha,50.0,4.0\nB,Bravo,50.5,4.5\n';
    const lanes = 'from,to,ref,toll,fuel,fees,rebate,valid_from,valid_to\nA,B,R1,10.00,0,0,0,2026-01-01,2026-06-30\nA,B,R1,20.00,0,0,0,2026-07-01,2026-12-31\n';
    const plan = { date: '2026-08-15', vehicleClass: '' };
    const [loaded] = drive([load(depots, lanes, plan)]);
    const view = loadedView(loaded);
    expect(laneKeys(view)).toEqual([{ from: 'A', to: 'B', ref: 'R1', occurrence: 2 }]);
    const first = setLaneAmount(emptyScenario(), { from: 'A', to: 'B', ref: 'R1', occurrence: 1 }, 'toll', 100, 1000);
    const [, a] = drive([load(depots, lanes, plan), solve('A', plan, first)]);
    expect(solvedView(a).cost[1]).toBe(2000);
    expect(solvedView(a).overlay.changes[0].applied).toBe(true);
    const second = setLaneAmount(emptyScenario(), laneKeys(view)[0], 'toll', 2500, 2000);
    const [, b] = drive([load(depots, lanes, plan), solve('A', plan, second)]);
    expect(solvedView(b).cost[1]).toBe(2500);
  });

  it('a toll edit made while viewing 2axle changes the 2axle toll only, and says so', () => {
    const light = { date: '2026-08-15', vehicleClass: '2axle' };
    const heavy = { date: '2026-08-15', vehicleClass: '5axle' };
    const [loaded] = drive([load(sample('depots.csv'), sample('lanes.csv'), light)]);
    const view = loadedView(loaded);
    const e = laneKeys(view).findIndex((k) => k.from === 'LUX' && k.to === 'SXB');
    expect(view.laneToll[e]).toBe(819);
    const scenario = setLaneAmount(emptyScenario(), laneKeys(view)[e], 'toll', 900, 819, view.plannedClass);
    const [, onLight] = drive([load(sample('depots.csv'), sample('lanes.csv'), light), solve('LUX', light, scenario)]);
    expect(solvedView(onLight).overlay.toll[e]).toBe(900);
    expect(solvedView(onLight).overlay.changes[0].text).toBe('LUX → SXB, ref BFH-L-014: toll 2axle 8.19 → 9.00');
    const [heavyLoaded, onHeavy] = drive([load(sample('depots.csv'), sample('lanes.csv'), heavy), solve('LUX', heavy, scenario)]);
    const h = laneKeys(loadedView(heavyLoaded)).findIndex((k) => k.from === 'LUX' && k.to === 'SXB');
    expect(solvedView(onHeavy).overlay.toll[h]).toBe(1820);
  });

  it('a loaded change whose lane is missing is listed as not applied, with the reason, and kept', () => {
    const plan = { date: '2026-08-15', vehicleClass: '' };
    const scenario: Scenario = { ...emptyScenario(), changes: [{ kind: 'close-lane', lane: { from: 'RTM', to: 'ANR', ref: 'NO-SUCH-REF', occurrence: 1 }, note: null }] };
    const [, solved] = drive([load(sample('depots.csv'), sample('lanes.csv'), plan), solve('RTM', plan, scenario)]);
    const change = solvedView(solved).overlay.changes[0];
    expect(change.applied).toBe(false);
    expect(change.problem).toMatch(/RTM → ANR, ref NO-SUCH-REF/);
    expect(change.problem).not.toMatch(/RTM>ANR\|/);
    expect(scenario.changes).toHaveLength(1);
  });

  it('lists every row of the file with the rows the date leaves out, and exports them all (147 rows)', () => {
    const plan = { date: '2026-08-15', vehicleClass: '2axle' };
    const [loaded, , exported] = drive([load(sample('depots.csv'), sample('lanes.csv'), plan), solve('RTM', plan, null), { kind: 'export', id: 3, what: 'lanes-csv' }]);
    const rows = loadedView(loaded).rows;
    expect(rows.lane.length).toBe(147);
    expect(Array.from(rows.lane).filter((e) => e === -1).length).toBeGreaterThan(0);
    const csv = parseCsvText((exported as { text: string }).text).rows;
    expect(csv.length - 1).toBe(147);
    expect(csv[0]).toEqual(expect.arrayContaining(['toll_2axle', 'toll_5axle', 'valid_from', 'valid_to']));
  });
});

describe('amounts typed into the lane table are read by the importer\'s rules', () => {
  it('accepts a decimal comma and grouped thousands, refuses what a file would refuse', () => {
    expect(readEnteredAmount('12,50', 2, 'EUR')).toBe(1250);
    expect(readEnteredAmount('1.234,56', 2, 'EUR')).toBe(123456);
    expect(readEnteredAmount('12.50', 2, 'EUR')).toBe(1250);
    expect(readEnteredAmount('12,50 €', 2, 'EUR')).toBe(1250);
    expect(() => readEnteredAmount('1,234', 2, 'EUR')).toThrow(MoneyFormatError);
    expect(() => readEnteredAmount('12.50 USD', 2, 'EUR')).toThrow(MoneyFormatError);
    expect(() => readEnteredAmount('twelve', 2, 'EUR')).toThrow(MoneyFormatError);
  });
});
