// The lane-table edit model: one edit = one scenario change (a second edit of the same field
// replaces it, an edit back to the contract's value removes it), amounts found by lane key.

import { describe, expect, it } from 'vitest';
import { laneKeysOf } from '../../../engine/import/lane-key';
import { applyScenarioAmounts, emptyScenario, fixPlanScenario, setLaneAmount, setLaneClosed } from '../../../renderer/model/scenario-edits';

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

  it('applies amounts and closures to the right one of two parallel lanes', () => {
    let s = setLaneAmount(emptyScenario(), keys[2], 'toll', 1, 100);
    s = setLaneClosed(s, keys[0], true);
    const out = applyScenarioAmounts(base, keys, s);
    expect(Array.from(out.toll)).toEqual([100, 0, 1]);
    expect(Array.from(out.closed)).toEqual([1, 0, 0]);
    expect(Array.from(out.changed)).toEqual([1, 0, 1]);
    expect(Array.from(base.toll)).toEqual([100, 0, 100]); // the base is never modified
    expect(setLaneClosed(s, keys[0], false).changes).toHaveLength(1);
  });

  it('keeps a change whose lane is gone and reports it as unresolved', () => {
    const s = setLaneAmount(emptyScenario(), { from: 'A', to: 'Z', ref: null, occurrence: 1 }, 'fees', 1, 0);
    const out = applyScenarioAmounts(base, keys, s);
    expect(out.unresolved).toEqual([0]);
    expect(s.changes).toHaveLength(1);
  });

  it('turns fix-plan rows (lanes file rows) into rebate changes', () => {
    const network = { laneRow: Int32Array.from([2, 3, 4]), laneRebate: base.rebate };
    const s = fixPlanScenario(emptyScenario(), network, keys, [{ row: 3, new_rebate_minor: 12 }]);
    expect(s.changes).toEqual([{ kind: 'set-amount', lane: keys[1], field: 'rebate', amountMinor: 12, note: null }]);
  });
});
