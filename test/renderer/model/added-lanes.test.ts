// Lanes a scenario adds, as the lane table and the map read them: located on the network's depots,
// edited in place (the change keeps its position), and the edited scenario is what the engine plans with.

import { describe, expect, it } from 'vitest';
import { applyScenario } from '../../../engine/scenario/apply';
import type { Minor } from '../../../engine/money/minor';
import type { Scenario } from '../../../engine/scenario/types';
import { addedAmount, addedLaneName, addedLaneOf, addedLaneRef, addedLanes, sameAddedLanes, setAddedLaneAmount } from '../../../renderer/model/added-lanes';

const depots = [
  { id: 'A', name: 'Depot A', lat: 50, lon: 4 },
  { id: 'B', name: 'Depot B', lat: 51, lon: 5 },
  { id: 'C', name: 'Depot C', lat: 52, lon: 6 },
];
const lanes = [{ from: 'A', to: 'B', toll: 100 as Minor, fuel: 200 as Minor, fees: 0 as Minor, rebate: 0 as Minor, sourceRow: 2 }];
const newLane = (from: string, to: string) => ({ from, to, ref: 'X-1', tollMinor: 500, feesMinor: 25, fuelMinor: 1000, rebateMinor: 125, validFrom: null, validTo: null, distanceKm: null, driveMinutes: null });

const scenario: Scenario = {
  name: 'what-if',
  description: null,
  changes: [
    { kind: 'set-amount', lane: { from: 'A', to: 'B', ref: null, occurrence: 1 }, field: 'toll', amountMinor: 150, note: null },
    { kind: 'add-lane', lane: newLane('B', 'C'), note: null },
    { kind: 'add-lane', lane: newLane('C', 'ZZ'), note: 'unknown depot' },
  ],
};

describe('added lanes', () => {
  it('lists add-lane changes in order with their change index, depots and net cost', () => {
    const added = addedLanes(['A', 'B', 'C'], scenario);
    expect(added.map((a) => [a.changeIndex, a.from, a.to, a.netMinor])).toEqual([
      [1, 1, 2, 1400],
      [2, 2, -1, 1400],
    ]);
    expect(addedLaneName(added[0].lane)).toBe('B → C (X-1)');
    expect(addedLanes(['A'], null)).toEqual([]);
  });

  it('edits one amount in place, and the engine plans the added lane with it', () => {
    const edited = setAddedLaneAmount(scenario, 1, 'rebate', 0);
    expect(edited.changes).toHaveLength(3);
    expect(edited.changes[0]).toBe(scenario.changes[0]);
    expect(addedAmount(addedLanes(['A', 'B', 'C'], edited)[0].lane, 'rebate')).toBe(0);
    expect(addedAmount(addedLanes(['A', 'B', 'C'], scenario)[0].lane, 'rebate')).toBe(125); // the original is untouched

    const applied = applyScenario({ depots, lanes }, edited);
    const e = Array.from(applied.baseLaneOf).indexOf(-1);
    expect(e).toBeGreaterThanOrEqual(0);
    const net = applied.network.laneToll[e] + applied.network.laneFuel[e] + applied.network.laneFees[e] - applied.network.laneRebate[e];
    expect(net).toBe(addedLanes(['A', 'B', 'C'], edited)[0].netMinor);
    expect(applied.network.laneRebate[e]).toBe(0);
  });

  it('refuses to edit a change that adds no lane', () => {
    expect(() => setAddedLaneAmount(scenario, 0, 'toll', 1)).toThrow(RangeError);
  });

  it('names added lanes in results by their change, apart from network lanes and untraced ones', () => {
    const added = addedLanes(['A', 'B', 'C'], scenario);
    expect(addedLaneRef(1)).toBe(-3);
    expect(addedLaneOf(added, addedLaneRef(1))?.lane.to).toBe('C');
    expect(addedLaneOf(added, addedLaneRef(0))).toBeUndefined(); // change 0 sets an amount
    expect(addedLaneOf(added, -1)).toBeUndefined();
    expect(addedLaneOf(added, 0)).toBeUndefined();
  });

  it('sees the same added lanes after an edit elsewhere, and a new list after an edit of one', () => {
    const before = addedLanes(['A', 'B', 'C'], scenario);
    const elsewhere = { ...scenario, changes: [{ ...scenario.changes[0] }, ...scenario.changes.slice(1)] };
    expect(sameAddedLanes(before, addedLanes(['A', 'B', 'C'], elsewhere))).toBe(true);
    expect(sameAddedLanes(before, addedLanes(['A', 'B', 'C'], setAddedLaneAmount(scenario, 1, 'toll', 7)))).toBe(false);
    expect(sameAddedLanes(before, addedLanes(['A', 'B', 'C'], { ...scenario, changes: scenario.changes.slice(1) }))).toBe(false);
  });
});
