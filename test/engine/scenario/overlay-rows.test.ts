// What the lane table and the change list read from an overlay: the change texts (worked by hand
// from the rows below) are the same whether the rows are keyed afresh or through the import's
// shared index (the app passes the index, so a recompute does not key 500,000 rows again), and a
// class's toll falls back to the toll column where the class column is blank.

import { describe, expect, it } from 'vitest';
import { importNetwork } from '../../../engine/planning/import-network';
import { buildOverlay, overlayIndex } from '../../../engine/scenario/overlay';
import { describeChanges, overlayRowAmounts } from '../../../engine/scenario/overlay-rows';
import type { Scenario } from '../../../engine/scenario/types';

const depots = 'id,name,lat,lon\nA,Alpha,50.0,4.0\nB,Bravo,50.5,4.5\nC,Charlie,51.0,5.0\n';
const lanes = 'from,to,ref,toll,toll_2axle,toll_5axle,fuel,fees,rebate\n' +
  'A,B,R1,1.00,2.00,,0,0,0\n' +
  'A,B,R1,3.00,,7.50,0,0,0\n' +
  'B,C,,5.00,6.00,8.00,0,0,0\n';
const imported = importNetwork(depots, lanes, { plan: { date: '2026-08-15' } });
const scenario: Scenario = {
  name: 't',
  description: null,
  changes: [
    { kind: 'set-amount', lane: { from: 'A', to: 'B', ref: 'R1', occurrence: 2 }, field: 'toll', amountMinor: 900, vehicleClass: '5axle', note: null },
    { kind: 'close-lane', lane: { from: 'B', to: 'C', ref: null, occurrence: 1 }, note: null },
    { kind: 'set-amount', lane: { from: 'C', to: 'A', ref: null, occurrence: 1 }, field: 'fees', amountMinor: 100, note: null },
  ],
};

describe('describeChanges', () => {
  it('gives the same texts with the shared index as without it', () => {
    const index = overlayIndex(imported);
    const overlay = buildOverlay(imported, scenario, index);
    const fresh = describeChanges(imported, overlay, scenario, 2);
    expect(describeChanges(imported, overlay, scenario, 2, index)).toEqual(fresh);
    expect(fresh.map((c) => [c.text, c.applied])).toEqual([
      ['A → B, ref R1, 2nd row: toll 5axle 7.50 → 9.00', true],
      ['B → C, no ref: closed', true],
      ['C → A, no ref: fees ? → 1.00', false],
    ]);
  });
});

describe('overlayRowAmounts', () => {
  it("reads the class's toll column, and the toll column where the class column is blank", () => {
    const overlay = buildOverlay(imported, null);
    expect(Array.from(overlayRowAmounts(overlay, '2axle').toll.subarray(0, 3))).toEqual([200, 300, 600]);
    expect(Array.from(overlayRowAmounts(overlay, '5axle').toll.subarray(0, 3))).toEqual([100, 750, 800]);
    expect(Array.from(overlayRowAmounts(overlay, null).toll.subarray(0, 3))).toEqual([100, 300, 500]);
  });
});
