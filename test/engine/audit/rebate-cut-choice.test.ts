// The one ranking of rebate cuts, case by case (each preference decides when the ones before it tie),
// and the two fix plans that use it agreeing on a network where the preferences matter.

import { describe, expect, it } from 'vitest';
import { reviewCalendar } from '../../../engine/audit/calendar/calendar-review';
import { buildFixPlan } from '../../../engine/audit/fix-plan';
import { pickRebateCut, type RebateCutFacts } from '../../../engine/audit/rebate-cut-choice';
import { importNetwork } from '../../../engine/planning/import-network';

const facts = (table: Record<number, Partial<RebateCutFacts>>) => (c: number): RebateCutFacts => ({ negotiable: false, rebateLeft: 100, alreadyCut: false, sourceRow: 10 + c, ...table[c] });

describe('pickRebateCut', () => {
  it('prefers negotiable, then covering, then already cut, then the smallest share, the largest rebate, the lowest row', () => {
    expect(pickRebateCut([0, 1], 50, facts({ 1: { negotiable: true, rebateLeft: 10 } }))).toBe(1);
    expect(pickRebateCut([0, 1], 50, facts({ 0: { rebateLeft: 40 }, 1: { rebateLeft: 60 } }))).toBe(1);
    expect(pickRebateCut([0, 1], 50, facts({ 1: { alreadyCut: true, rebateLeft: 60 } }))).toBe(1);
    expect(pickRebateCut([0, 1], 50, facts({ 0: { rebateLeft: 60 }, 1: { rebateLeft: 500 } }))).toBe(1);
    // Neither covers 50: both cuts are 100% of the rebate, so the larger rebate goes first.
    expect(pickRebateCut([0, 1], 50, facts({ 0: { rebateLeft: 20 }, 1: { rebateLeft: 30 } }))).toBe(1);
    expect(pickRebateCut([0, 1], 50, facts({ 0: { sourceRow: 9 }, 1: { sourceRow: 3 } }))).toBe(1);
    expect(pickRebateCut([3, 1], 50, facts({ 1: { sourceRow: 5 }, 3: { sourceRow: 5 } }))).toBe(1);
    expect(() => pickRebateCut([], 1, facts({}))).toThrow(RangeError);
  });

  it('the one-day plan and the calendar plan cut the same rows of an undated contract', () => {
    // Nets A>B 10, B>A -12, A>C 3, C>B 4: A>B>A pays 2.00, A>C>B>A 5.00. On the latter B>A (30.00)
    // and C>B (5.00) both cover 5.00; B>A's cut is the smaller share, and it also fixes A>B>A.
    const depots = 'id,lat,lon\nA,51.9,4.1\nB,51.2,4.3\nC,50.6,3.0\n';
    const lanes = 'from,to,ref,toll,fuel,fees,rebate\nA,B,R1,0,10,0,0\nB,A,R2,0,18,0,30\nA,C,R3,0,5,0,2\nC,B,R4,0,9,0,5\n';
    const imported = importNetwork(depots, lanes);
    const day = buildFixPlan(imported.network!);
    const calendar = reviewCalendar(imported).fixPlan!;
    expect(day.verified && calendar.verified).toBe(true);
    const dayRows = day.changes.map((c) => [imported.network!.laneRow[c.lane], c.oldRebate - c.newRebate]);
    expect(calendar.changes.map((c) => [imported.lanes.sourceRow[c.row], c.cut])).toEqual(dayRows);
    expect(dayRows).toEqual([[3, 500]]);
  });
});
