// Lanes only the scenario plans, as the lane table and the map read them: the worker lists them with
// each solve from the engine's overlay (they were read from the scenario itself), both lanes the
// scenario adds and a file row its validity change brings into the date (that row was solved but
// left out of the drawn tree). Added lanes are edited in place (the change keeps its position).

import { describe, expect, it } from 'vitest';
import type { Scenario } from '../../../engine/scenario/types';
import { addedAmount, addedLaneLabel, addedLaneName, addedLaneOf, addedLaneRef, sameAddedLanes, setAddedLaneAmount } from '../../../renderer/model/added-lanes';
import type { FromWorker, RouteView, SolveView, ToWorker } from '../../../renderer/worker/protocol';
import { WorkerSession } from '../../../renderer/worker/session';

const DATE = '2026-06-01';
const depots = 'id,name,lat,lon\nA,Depot A,50,4\nB,Depot B,51,5\nC,Depot C,52,6\n';
// Row 3 (B>C) is valid only from July: not in the plan of 1 June.
const lanes = 'from,to,ref,toll,fuel,fees,rebate,valid_from,valid_to\nA,B,,1.00,2.00,0,0,,\nB,C,R9,3.00,0,0,0,2026-07-01,\n';
const newLane = (from: string, to: string) => ({ from, to, ref: 'X-1', tollMinor: 500, feesMinor: 25, fuelMinor: 1000, rebateMinor: 125, validFrom: null, validTo: null, distanceKm: null, driveMinutes: null });

const scenario: Scenario = {
  name: 'what-if',
  description: null,
  changes: [
    { kind: 'set-amount', lane: { from: 'A', to: 'B', ref: null, occurrence: 1 }, field: 'toll', vehicleClass: null, amountMinor: 150, note: null },
    { kind: 'add-lane', lane: newLane('C', 'A'), note: null },
    { kind: 'add-lane', lane: newLane('C', 'ZZ'), note: 'unknown depot' },
    { kind: 'set-validity', lane: { from: 'B', to: 'C', ref: 'R9', occurrence: 1 }, validFrom: null, validTo: null, note: null },
  ],
};

function solveWith(s: Scenario): { view: SolveView; route: (target: number) => RouteView | null } {
  const out: FromWorker[] = [];
  const session = new WorkerSession((m) => out.push(m));
  const messages: ToWorker[] = [
    { kind: 'load', id: 1, depots: { name: 'depots.csv', text: depots }, lanes: { name: 'lanes.csv', text: lanes }, acceptPartial: false, plan: { date: DATE, vehicleClass: '' } },
    { kind: 'solve', id: 2, settings: { origin: 'A', maxLegs: null, vehicleClass: '', dispatchDate: DATE }, scenario: s },
  ];
  messages.forEach((m) => session.handle(m));
  const view = (out.find((m) => m.kind === 'solved') as { result: SolveView }).result;
  const route = (target: number) => {
    session.handle({ kind: 'route', id: 3 + target, target, solveId: 2 });
    return (out.find((m) => m.kind === 'route' && m.id === 3 + target) as { route: RouteView | null }).route;
  };
  return { view, route };
}

describe('lanes only the scenario plans', () => {
  it('come from the worker: the added lane and the row brought into the date, with their amounts; a change that misses is not listed', () => {
    const { view } = solveWith(scenario);
    const extra = view.extraLanes;
    expect(extra.map((a) => [a.kind, a.changeIndex, a.sourceRow, a.from, a.to, a.netMinor])).toEqual([
      ['row', 3, 3, 1, 2, 300],
      ['added', 1, null, 2, 0, 1400],
    ]);
    expect(extra.map((a) => a.ref)).toEqual([addedLaneRef(0), addedLaneRef(1)]);
    expect(addedLaneName(extra[1].lane)).toBe('C → A (X-1)');
    expect(addedLaneLabel(extra[0])).toBe('Valid by scenario: B → C (R9)');
    expect(addedLaneLabel(extra[1])).toBe('Added: C → A (X-1)');
    expect(view.overlay.changes[2].applied).toBe(false);
  });

  it('the row brought into the date is in the drawn tree and in the route over it', () => {
    const { view, route } = solveWith(scenario);
    expect(view.cost[2]).toBe(650); // A>B 1.50 + 2.00, then B>C 3.00
    const rowRef = view.extraLanes[0].ref;
    expect(Array.from(view.treeLanes)).toContain(rowRef);
    expect(addedLaneOf(view.extraLanes, rowRef)?.kind).toBe('row');
    expect(route(2)?.lanes).toEqual([0, rowRef]);
  });

  it('without changes that plan other rows, none are listed', () => {
    expect(solveWith({ ...scenario, changes: scenario.changes.slice(0, 1) }).view.extraLanes).toEqual([]);
  });

  it('edits an added lane in place; the worker plans it with the new amount', () => {
    const edited = setAddedLaneAmount(scenario, 1, 'rebate', 0);
    expect(edited.changes).toHaveLength(4);
    expect(edited.changes[0]).toBe(scenario.changes[0]);
    const { view } = solveWith(edited);
    expect(addedAmount(view.extraLanes[1].lane, 'rebate')).toBe(0);
    expect(view.extraLanes[1].netMinor).toBe(1525);
    expect(() => setAddedLaneAmount(scenario, 0, 'toll', 1)).toThrow(RangeError);
  });

  it('sees the same lanes after an edit elsewhere, and a new list after an edit of one', () => {
    const before = solveWith(scenario).view.extraLanes;
    const elsewhere = { ...scenario, changes: [{ ...scenario.changes[0], amountMinor: 175 } as Scenario['changes'][number], ...scenario.changes.slice(1)] };
    expect(sameAddedLanes(before, solveWith(elsewhere).view.extraLanes)).toBe(true);
    expect(sameAddedLanes(before, solveWith(setAddedLaneAmount(scenario, 1, 'toll', 7)).view.extraLanes)).toBe(false);
    expect(addedLaneOf(before, -1)).toBeUndefined();
    expect(addedLaneOf(before, 0)).toBeUndefined();
  });
});
