// The calendar review under a what-if against the same contract edited by hand (the check outside
// the overlay): a scenario that changes a rebate, a validity window and one class's toll, closes a
// lane and adds one must give the loops, ranges, clauses, fix plan and headroom that the review of
// the hand-edited lanes file gives. The calendar fix plan, applied as scenario changes, leaves no
// loop in any period, and each change names its plan, row and classes.

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { reviewCalendar } from '../../../engine/audit/calendar/calendar-review';
import { importNetwork } from '../../../engine/planning/import-network';
import { calendarReport, type CalendarReport } from '../../../engine/report/calendar-report';
import { calendarFixChanges, calendarReportScenario, reviewCalendarUnder } from '../../../engine/scenario/calendar-under-scenario';
import { parseScenarioDocument } from '../../../engine/scenario/document';
import { withChange } from '../../../engine/scenario/edit';
import type { Scenario } from '../../../engine/scenario/types';

const depots = readFileSync('sample-data/depots.csv', 'utf8');
const lanes = readFileSync('sample-data/lanes-rebate-loop.csv', 'utf8');

const key = (from: string, to: string, ref: string) => ({ from, to, ref, occurrence: 1 });
export const WHAT_IF: Scenario = {
  name: 'Spring only, one class tolled',
  description: null,
  changes: [
    { kind: 'set-amount', lane: key('FRA', 'SXB', 'BFH-L-019'), field: 'rebate', amountMinor: 16_900, note: null },
    { kind: 'set-validity', lane: key('FRA', 'SXB', 'BFH-L-019'), validFrom: '2026-03-01', validTo: '2026-05-31', note: null },
    { kind: 'set-amount', lane: key('SXB', 'FRA', 'BFH-L-023'), field: 'toll', vehicleClass: '2axle', amountMinor: 50, note: null },
    { kind: 'close-lane', lane: key('KRL', 'MHG', 'BFH-L-188'), note: null },
    {
      kind: 'add-lane',
      lane: { from: 'LUX', to: 'ANR', ref: 'WHATIF-1', tollMinor: 0, fuelMinor: 14_530, feesMinor: 1_200, rebateMinor: 40_000, validFrom: '2026-10-01', validTo: '2026-12-31', distanceKm: 291.1, driveMinutes: 257 },
      note: null,
    },
  ],
};

function handEdited(): string {
  const edit = (text: string, from: string, to: string) => {
    expect(text.includes(from), from).toBe(true);
    return text.replace(from, to);
  };
  let t = edit(lanes, 'FRA,SXB,BFH-L-019,0.00,0.00,0.00,120.80,11.00,170.00,EUR,232.2,,2026-03-01,2026-09-30', 'FRA,SXB,BFH-L-019,0.00,0.00,0.00,120.80,11.00,169.00,EUR,232.2,,2026-03-01,2026-05-31');
  t = edit(t, 'SXB,FRA,BFH-L-023,0.00,0.00,0.00,', 'SXB,FRA,BFH-L-023,0.00,0.50,0.00,');
  t = edit(t, 'KRL,MHG,BFH-L-188,24.05,10.82,24.05,36.27,8.00,62.00,EUR,68.7,62,2026-06-01,2026-08-31,"Seasonal backhaul refund, clause 8.1",8.1\n', '');
  return t + 'LUX,ANR,WHATIF-1,0.00,,,145.30,12.00,400.00,EUR,291.1,257,2026-10-01,2026-12-31,,\n';
}

/** The report with rows named by ref (row numbers differ: the hand edit drops a row and appends one). */
function byRef(report: CalendarReport) {
  return {
    window: report.window,
    periods: report.periods,
    loops: report.loops.map((l) => ({ depots: l.depots, refs: l.lane_details.map((d) => d.ref), clauses: l.clauses, ranges: l.ranges, classes: l.classes })),
    clauses: report.clauses.map((c) => ({ clause: c.clause, rebate: c.rebate_minor, loops: c.loops, ranges: c.ranges, lanes: c.lanes.length })),
    fix: report.fix_plan.map((f) => [f.ref, f.clause, f.cut_minor, f.new_rebate_minor, f.by_class]),
    verified: report.fix_plan_verified,
    headroom: report.headroom.map((h) => [h.ref, h.from, h.to, h.vehicle_class, h.net_minor, h.floor_minor, h.set_by]).sort((a, b) => JSON.stringify(a).localeCompare(JSON.stringify(b))),
  };
}

describe('calendar review under a what-if', () => {
  const imported = importNetwork(depots, lanes);
  const edited = importNetwork(depots, handEdited());

  it('is the sample scenario file what-if-spring-rebate.json (notes aside)', () => {
    const file = parseScenarioDocument(readFileSync('sample-data/what-if-spring-rebate.json', 'utf8'), 'what-if-spring-rebate.json');
    expect(file.changes.map((c) => ({ ...c, note: null }))).toEqual(WHAT_IF.changes);
  });

  for (const fixBy of ['lane', 'clause'] as const) {
    it(`equals the review of the hand-edited file (fix plan by ${fixBy})`, () => {
      expect(edited.report.errors).toEqual([]);
      const under = reviewCalendarUnder(imported, WHAT_IF, { fixBy });
      expect(under.changes.every((c) => c.applied)).toBe(true);
      expect(under.planProblems).toEqual([]);
      const got = calendarReport({ ...imported, lanes: under.overlay.table }, under.review, fixBy, calendarReportScenario(WHAT_IF, under));
      const want = calendarReport(edited, reviewCalendar(edited, { fixBy }), fixBy);
      expect(byRef(got)).toEqual(byRef(want));
      // The scenario's loops: FRA/SXB only for the 5-axle class, March to May (the 2-axle toll
      // closes its lap), MHG/KRL gone with its lane, and the added lane's loops from October (the
      // 2-axle class's cheaper tolls also pay round ANR > BRU > LGG > LUX).
      expect(got.loops.map((l) => [l.depots.join('>'), l.classes, l.ranges.map((r) => `${r.from}..${r.to}`)])).toEqual([
        ['FRA>SXB', ['5axle'], ['2026-03-01..2026-05-31']],
        ['ANR>LUX', ['2axle', '5axle'], ['2026-10-01..2026-12-31']],
        ['ANR>BRU>LGG>LUX', ['2axle'], ['2026-10-01..2026-12-31']],
      ]);
      expect(got.scenario?.name).toBe(WHAT_IF.name);
    });
  }

  it('without changes it is the review of the files as loaded', () => {
    const plain = calendarReport(imported, reviewCalendar(imported));
    const under = reviewCalendarUnder(imported, { name: 'empty', description: null, changes: [] });
    expect(calendarReport(imported, under.review)).toEqual(plain);
    expect(calendarReportScenario({ name: 'empty', description: null, changes: [] }, under)).toBeNull();
  });

  for (const fixBy of ['lane', 'clause'] as const) {
    it(`the fix plan by ${fixBy}, applied as scenario changes, leaves no loop in any period and names plan, row and classes`, () => {
      for (const start of [null, WHAT_IF]) {
        const under = reviewCalendarUnder(imported, start, { fixBy });
        expect(under.review.fixPlan?.verified).toBe(true);
        const changes = calendarFixChanges(under);
        expect(changes.length).toBeGreaterThan(0);
        for (const c of changes) {
          expect(c.kind).toBe('set-amount');
          expect(c.note).toMatch(fixBy === 'clause' ? /^calendar fix plan by clause \S+ \(\d+ % of its rebates\): / : /^calendar fix plan by lane \(clause \S+\): /);
          expect(c.note).toMatch(/(lanes-file row \d+|the lane added by change \d+); the rebate holds for every vehicle class \(reviewed: (2axle|5axle)/);
        }
        const fixed = changes.reduce(withChange, start ?? { name: 'fix', description: null, changes: [] });
        const after = reviewCalendarUnder(imported, fixed, { fixBy });
        expect(after.changes.every((c) => c.applied)).toBe(true);
        expect(after.review.loops).toEqual([]);
      }
    });
  }
});

describe('overlay class copies keep the clause', () => {
  it('a toll change for one class on an every-class row (long layout) copies the row with its clause and notes', () => {
    const imported = importNetwork('id,lat,lon\nA,51.9,4.1\nB,51.2,4.3\n', 'from,to,ref,vehicle_class,toll,fuel,fees,rebate,notes,clause\nA,B,R1,,0,50,0,80,refund,7.2\nB,A,R2,2axle,0,50,0,0,,\nB,A,R2,5axle,0,50,0,0,,\n');
    expect(imported.report.errors).toEqual([]);
    const scenario: Scenario = { name: 'one class', description: null, changes: [{ kind: 'set-amount', lane: key('A', 'B', 'R1'), field: 'toll', vehicleClass: '2axle', amountMinor: 10, note: null }] };
    const under = reviewCalendarUnder(imported, scenario);
    const t = under.overlay.table;
    expect(t.count).toBe(4);
    expect([t.clause?.[3], t.notes[3]]).toEqual(['7.2', 'refund']);
    // Without the copy's clause the clause table split 7.2 into "7.2" and "R1".
    expect(under.review.clauses.map((c) => [c.name, c.rows])).toEqual([['7.2', [0, 3]]]);
  });
});
