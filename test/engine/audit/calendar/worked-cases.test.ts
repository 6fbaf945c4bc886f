// Worked cases of the calendar review: the situations the contract review got wrong when it mixed
// every validity window (rebates that never overlap, a loop on another date than the one planned),
// clauses and their names, the window and its periods, and the sample's two seasonal loops.

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { reviewCalendar } from '../../../../engine/audit/calendar/calendar-review';
import { loopRanges, loopsByPeriod } from '../../../../engine/audit/calendar/loops-over-time';
import { loopClauses } from '../../../../engine/audit/calendar/clause-table';
import { findDistinctLoops } from '../../../../engine/audit/distinct-loops';
import { ReviewBudgetError } from '../../../../engine/errors';
import { PlanRequestError } from '../../../../engine/import/import-errors';
import { importNetwork } from '../../../../engine/planning/import-network';

const DEPOTS = 'id,lat,lon\nA,51.9,4.1\nB,51.2,4.3\nC,50.6,3.0\n';
const HEADER = 'from,to,ref,toll,fuel,fees,rebate,valid_from,valid_to,clause\n';
const sample = (name: string) => readFileSync(new URL(`../../../../sample-data/${name}`, import.meta.url), 'utf8');
const range = (review: ReturnType<typeof reviewCalendar>, first: number, last: number) => [review.periods[first].from, review.periods[last].to];

describe('calendar review: worked cases', () => {
  it('two rebates valid Jan-Feb and Jul-Dec never overlap: no loop, no fix plan (mixing the windows made one)', () => {
    const lanes = HEADER + 'A,B,R1,0,50,0,80,2026-01-01,2026-02-28,3.1\nB,A,R2,0,50,0,40,2026-07-01,2026-12-31,3.2\nA,B,R1-BASE,0,50,0,0,,,\nB,A,R2-BASE,0,50,0,0,,,\n';
    const imported = importNetwork(DEPOTS, lanes);
    expect(findDistinctLoops(imported.network!).loops).toHaveLength(1); // the undated one-day plan mixes the windows
    const review = reviewCalendar(imported);
    expect(review.window).toEqual({ from: 20260101, to: 20261231 });
    expect(review.periods.map((p) => [p.from, p.to])).toEqual([[20260101, 20260228], [20260301, 20260630], [20260701, 20261231]]);
    expect(review.loops).toEqual([]);
    expect(review.fixPlan).toBeNull();
  });

  it('a loop from March to September is reported for the whole contract, and a day outside it has none', () => {
    const lanes = HEADER + 'A,B,R1,0,50,0,80,2026-03-01,2026-09-30,7.2\nB,A,R2,0,50,0,30,,,7.3\nA,B,R1-BASE,0,50,0,0,,,\nA,C,R3,0,10,0,0,2026-01-01,2026-12-31,\n';
    const imported = importNetwork(DEPOTS, lanes);
    const review = reviewCalendar(imported);
    expect(review.loops).toHaveLength(1);
    const [loop] = review.loops;
    expect(loopRanges(loop, review.classes).map((r) => [...range(review, r.first, r.last), r.nets])).toEqual([[20260301, 20260930, [{ vehicleClass: null, netPerLap: -1000 }]]]);
    const byPeriod = loopsByPeriod(review.loops, review.periods);
    const november = review.periods.findIndex((p) => p.from <= 20261101 && p.to >= 20261101);
    expect(byPeriod[november]).toEqual([]);
    expect(loopClauses(imported.lanes, loop).map((c) => c.name)).toEqual(['7.2', '7.3']);
    // One fix plan for every period: the March-September clause covers the lap (-10.00) alone.
    expect(review.fixPlan!.verified).toBe(true);
    expect(review.fixPlan!.changes.map((c) => [c.row, c.cut])).toEqual([[0, 1000]]);
  });

  it('rows without a clause are their own clause, named by ref, else by row; a clause spans its lanes', () => {
    // Nets: A>B -10 (clause 9.9), B>C 50, C>A 5 (no ref, no clause), B>A 20, C>B -10 (clause 9.9), A>C 20 (ref R6).
    // Loops: A>B>C>A 45 no; B>C>B 40 no; A>B>A 10 no; A>C>B>A 30 no: none, so the table lists the rebate clauses only.
    const lanes = HEADER + 'A,B,R1,0,50,0,60,,,9.9\nB,C,R2,0,50,0,0,,,\nC,A,,0,50,0,45,,,\nB,A,R4,0,20,0,0,,,\nC,B,R5,0,20,0,30,,,9.9\nA,C,R6,0,30,0,10,,,\n';
    const imported = importNetwork(DEPOTS, lanes);
    const review = reviewCalendar(imported);
    expect(review.clauses.map((c) => [c.name, c.source, c.rows.map((r) => imported.lanes.sourceRow[r]), c.rebate, c.loops])).toEqual([
      ['9.9', 'clause', [2, 6], 9000, []],
      ['R6', 'ref', [7], 1000, []],
      ['row 4', 'row', [4], 4500, []],
    ]);
  });

  it('the window can be narrowed; a window ending before it starts is refused by option', () => {
    const lanes = HEADER + 'A,B,R1,0,50,0,80,2026-03-01,2026-09-30,\nB,A,R2,0,50,0,40,,,\n';
    const imported = importNetwork(DEPOTS, lanes);
    const review = reviewCalendar(imported, { fromDate: '2026-08-01', toDate: '2026-12-31' });
    expect(review.periods.map((p) => [p.from, p.to])).toEqual([[20260801, 20260930], [20261001, 20261231]]);
    expect(loopRanges(review.loops[0], review.classes).map((r) => range(review, r.first, r.last))).toEqual([[20260801, 20260930]]);
    expect(() => reviewCalendar(imported, { fromDate: '2026-10-01', toDate: '2026-09-01' })).toThrow(PlanRequestError);
    expect(() => reviewCalendar(imported, { fromDate: '2026-02-30' })).toThrow(PlanRequestError);
    // A file with no date at all: one undated period.
    const undated = reviewCalendar(importNetwork(DEPOTS, HEADER + 'A,B,R1,0,50,0,80,,,\nB,A,R2,0,50,0,40,,,\n'));
    expect(undated.window).toBeNull();
    expect(undated.periods).toEqual([{ from: 0, to: 0 }]);
    expect(undated.loops).toHaveLength(1);
  });

  it('too many periods stop the review with a budget error', () => {
    let lanes = HEADER;
    for (let d = 1; d <= 20; d++) lanes += `A,B,R${d},0,50,0,1,2026-01-${String(d).padStart(2, '0')},2026-01-${String(d).padStart(2, '0')},\n`;
    expect(() => reviewCalendar(importNetwork(DEPOTS, lanes), { maxPeriods: 10 })).toThrow(ReviewBudgetError);
  });

  it('the sample loop variant: FRA/SXB from March to September for both classes, clause 8.1 from June to August for the 2-axle class', () => {
    const imported = importNetwork(sample('depots.csv'), sample('lanes-rebate-loop.csv'));
    const review = reviewCalendar(imported);
    const ids = imported.depots.map((d) => d.id);
    const rows = (rs: number[]) => rs.map((r) => imported.lanes.sourceRow[r]);
    expect(review.classes).toEqual(['2axle', '5axle']);
    expect(
      review.loops.map((l) => ({
        depots: l.depots.map((d) => ids[d]),
        rows: rows(l.rows),
        clauses: loopClauses(imported.lanes, l).map((c) => c.name),
        ranges: loopRanges(l, review.classes).map((r) => [...range(review, r.first, r.last), r.nets.map((n) => `${n.vehicleClass} ${n.netPerLap}`)]),
      })),
    ).toEqual([
      { depots: ['FRA', 'SXB'], rows: [20, 24], clauses: ['7.2', '7.3'], ranges: [[20260301, 20260930, ['2axle -140', '5axle -140']]] },
      { depots: ['MHG', 'KRL'], rows: [111, 112], clauses: ['8.1'], ranges: [[20260601, 20260831, ['2axle -582']]] },
    ]);
    expect(review.clauses.filter((c) => c.loops.length > 0).map((c) => [c.name, c.loops, c.rebate, range(review, c.periods[0], c.periods[c.periods.length - 1])])).toEqual([
      ['7.2', [1], 17000, [20260301, 20260930]],
      ['7.3', [1], 9500, [20260301, 20260930]],
      ['8.1', [2], 12200, [20260601, 20260831]],
    ]);
    expect(review.fixPlan!.verified).toBe(true);
    expect(review.fixPlan!.changes.map((c) => [imported.lanes.sourceRow[c.row], c.cut])).toEqual([[20, 140], [112, 582]]);
    const byClause = reviewCalendar(imported, { fixBy: 'clause' }).fixPlan!;
    expect(byClause.verified).toBe(true);
    expect(byClause.changes.map((c) => [imported.lanes.sourceRow[c.row], c.clause!.name, c.clause!.percent, c.cut])).toEqual([[20, '7.2', 1, 170], [111, '8.1', 5, 300], [112, '8.1', 5, 310]]);
    // Work shared: 12 periods x 2 classes plan to 24 networks, of which only 4 are maximal.
    expect([review.periods.length, review.networks.length, review.networks.filter((n) => n.maximal).length]).toEqual([12, 24, 4]);
  });
});
