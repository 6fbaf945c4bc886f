// The lane-table edit model: one edit = one scenario change (a second edit of the same field
// replaces it, an edit back to the contract's value removes it); a toll edit names its class.

import { describe, expect, it } from 'vitest';
import { laneKeysOf } from '../../../engine/import/lane-key';
import { emptyScenario, fixPlanScenario, setLaneAmount, setLaneClosed } from '../../../renderer/model/scenario-edits';

const lanes = [
  { from: 'A', to: 'B', ref: 'C-1' },
  { from: 'B', to: 'A', ref: undefined },
  { from: 'A', to: 'B', ref: 'C-1' },
];
const keys = laneKeysOf(lanes);
const base = {
  toll: Float64Array.from([100, 0, 100]),
  fuel: Float64Array.from([50, 50, 60]),
  fees: Float64Array.from([10, 10, 10]),
  rebate: Float64Array.from([0, 30, 0]),
};

describe('scenario edits', () => {
  it('replaces an earlier edit of the same lane field and drops an edit back to the original', () => {
    let s = setLaneAmount(emptyScenario(), keys[1], 'rebate', 0, 30);
    s = setLaneAmount(s, keys[1], 'rebate', 10, 30);
    expect(s.changes).toHaveLength(1);
    expect(s.changes[0]).toMatchObject({ kind: 'set-amount', field: 'rebate', amountMinor: 10 });
    s = setLaneAmount(s, keys[1], 'toll', 5, 0);
    expect(s.changes).toHaveLength(2);
    s = setLaneAmount(s, keys[1], 'rebate', 30, 30);
    expect(s.changes.map((c) => c.kind === 'set-amount' && c.field)).toEqual(['toll']);
  });

  it('a toll edit names the class viewed; an every-class edit is a separate change', () => {
    let s = setLaneAmount(emptyScenario(), keys[0], 'toll', 900, 100, '2axle');
    expect(s.changes[0]).toMatchObject({ field: 'toll', vehicleClass: '2axle', amountMinor: 900 });
    s = setLaneAmount(s, keys[0], 'toll', 950, 100, null);
    expect(s.changes.map((c) => c.kind === 'set-amount' && [c.vehicleClass, c.amountMinor])).toEqual([['2axle', 900], [null, 950]]);
    s = setLaneAmount(s, keys[0], 'toll', 990, 100, '2axle');
    expect(s.changes.map((c) => c.kind === 'set-amount' && [c.vehicleClass, c.amountMinor])).toEqual([['2axle', 990], [null, 950]]);
    expect(setLaneAmount(emptyScenario(), keys[0], 'fees', 5, 10, '2axle').changes[0]).not.toHaveProperty('vehicleClass');
  });

  it('closes and reopens one of two parallel lanes by its key', () => {
    const s = setLaneClosed(emptyScenario(), keys[0], true);
    expect(s.changes).toEqual([{ kind: 'close-lane', lane: keys[0], note: null }]);
    expect(setLaneClosed(s, keys[0], false).changes).toHaveLength(0);
  });

  it('turns fix-plan rows (lanes file rows) into rebate changes', () => {
    const network = { laneRow: Int32Array.from([2, 3, 4]), laneRebate: base.rebate };
    const s = fixPlanScenario(emptyScenario(), network, (e) => keys[e], [{ row: 3, new_rebate_minor: 12 }]);
    expect(s.changes).toEqual([{ kind: 'set-amount', lane: keys[1], field: 'rebate', amountMinor: 12, note: null }]);
    const noted = fixPlanScenario(emptyScenario(), network, (e) => keys[e], [{ row: 3, new_rebate_minor: 12 }], (row) => `one-day fix plan: lanes-file row ${row}`);
    expect(noted.changes.map((c) => c.note)).toEqual(['one-day fix plan: lanes-file row 3']);
  });
});
