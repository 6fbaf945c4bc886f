// The calendar review as `lanewright audit --json` prints it without --date (review: "calendar"),
// and its flat tables for spreadsheets: one row per lane row and class, one row per loop range.
// Rows are source rows of the lanes file (header = 1); dates are ISO 8601, ranges inclusive.

import type { CalendarReview } from '../audit/calendar/calendar-review';
import { loopClauses } from '../audit/calendar/clause-table';
import { loopRanges, loopsByPeriod, periodRuns } from '../audit/calendar/loops-over-time';
import { isoDateText } from '../import/cells';
import { clauseOf } from '../import/lane-clause';
import type { DepotRecord, LaneTable } from '../import/types';
import { formatMinor, type Minor } from '../money/minor';
import { CAUTIONS } from '../text/cautions';
import { loopSearchNote } from './audit-report';
import type { LoopSearchStop } from '../audit/distinct-loops';
import type { CalendarReportScenario } from '../scenario/calendar-under-scenario';

export interface DateRange {
  from: string | null;
  to: string | null;
}

export interface CalendarLoopRow {
  id: number;
  depots: string[];
  lanes: number[];
  /** The most negative net per lap over its ranges and classes. */
  net_per_lap_minor: number;
  classes: (string | null)[];
  clauses: string[];
  ranges: (DateRange & { net_per_lap_minor: number; by_class: { vehicle_class: string | null; net_per_lap_minor: number }[] })[];
  lane_details: { row: number; from: string; to: string; ref: string | null; clause: string; rebate_minor: number }[];
}

export interface CalendarFixRow {
  row: number;
  from: string;
  to: string;
  ref: string | null;
  clause: string;
  /** Set when the plan cut by clause: the clause's percentage. */
  clause_percent: number | null;
  rebate_minor: number;
  new_rebate_minor: number;
  cut_minor: number;
  /** Net in the first class reviewed that plans the row, before and after the cut. */
  net_minor: number;
  new_net_minor: number;
  by_class: { vehicle_class: string | null; net_minor: number; new_net_minor: number }[];
  negotiable: boolean;
}

export interface CalendarHeadroomRow {
  row: number;
  from: string;
  to: string;
  ref: string | null;
  clause: string;
  vehicle_class: string | null;
  net_minor: number;
  floor_minor: number | null;
  headroom_minor: number | null;
  set_by: DateRange | null;
  negotiable: boolean;
}

export interface CalendarReport {
  review: 'calendar';
  /** Null for the files as loaded; else every figure is the contract as the scenario changes it. */
  scenario: CalendarReportScenario | null;
  currency: string;
  window: DateRange;
  classes: (string | null)[];
  periods: (DateRange & { loops: number[] })[];
  loops: CalendarLoopRow[];
  loop_cap_reached: boolean;
  /** What ended the loop search and its figures, as in the one-day audit report. */
  loop_search: { stopped_by: LoopSearchStop; cap: number; searches: number; work: number; work_budget: number; memory_bound: number };
  /** One sentence saying truthfully what stopped the loop search; null when it was complete. */
  loop_search_note: string | null;
  clauses: { clause: string; source: 'clause' | 'ref' | 'row'; lanes: number[]; rebate_minor: number; loops: number[]; ranges: DateRange[] }[];
  fix_by: 'lane' | 'clause';
  fix_plan: CalendarFixRow[];
  fix_plan_method: string | null;
  fix_plan_verified: boolean;
  fix_plan_incomplete: boolean;
  /** Rebate removed, each row's cut weighted by its days of validity in the window / 365 (rounded). */
  rebate_removed_per_year_minor: number;
  unfixable_loops: { lanes: number[]; vehicle_class: string | null; period: DateRange; net_per_lap_minor: number }[];
  headroom: CalendarHeadroomRow[];
  headroom_after_fix_plan: boolean;
  negotiable_unmatched: string[];
  work: { periods: number; networks: number; maximal_networks: number };
  caution: string;
}

export interface CalendarReportInput {
  lanes: LaneTable;
  depots: readonly DepotRecord[];
  currency: string;
}

/**
 * Builds the report object. `input.lanes` is the table the review ran on (under a scenario: the
 * overlay's table, whose added lanes read row 0), and `scenario` names the what-if.
 */
export function calendarReport(input: CalendarReportInput, review: CalendarReview, fixBy: 'lane' | 'clause' = 'lane', scenario: CalendarReportScenario | null = null): CalendarReport {
  const t = input.lanes;
  const id = (d: number) => input.depots[d].id;
  const row = (r: number) => t.sourceRow[r];
  const ref = (r: number) => t.ref[r] ?? null;
  const end = (r: number) => ({ row: row(r), from: id(t.from[r]), to: id(t.to[r]) });
  const span = (first: number, last: number): DateRange => ({ from: isoDateText(review.periods[first].from), to: isoDateText(review.periods[last].to) });
  const byPeriod = loopsByPeriod(review.loops, review.periods);
  const netsOf = rowNets(review);
  const plan = review.fixPlan;

  let removedDays = 0;
  if (plan) for (const c of plan.changes) removedDays += c.cut * review.rowDays[c.row];

  return {
    review: 'calendar',
    scenario,
    currency: input.currency,
    window: review.window ? { from: isoDateText(review.window.from), to: isoDateText(review.window.to) } : { from: null, to: null },
    classes: review.classes,
    periods: review.periods.map((p, k) => ({ from: isoDateText(p.from), to: isoDateText(p.to), loops: byPeriod[k] })),
    loops: review.loops.map((loop) => {
      const ranges = loopRanges(loop, review.classes).map((g) => ({
        ...span(g.first, g.last),
        net_per_lap_minor: Math.min(...g.nets.map((n) => n.netPerLap)),
        by_class: g.nets.map((n) => ({ vehicle_class: n.vehicleClass, net_per_lap_minor: n.netPerLap })),
      }));
      return {
        id: loop.id,
        depots: loop.depots.map(id),
        lanes: loop.rows.map(row),
        net_per_lap_minor: Math.min(...ranges.map((g) => g.net_per_lap_minor)),
        classes: review.classes.filter((c) => loop.presence.some((p) => p.vehicleClass === c)),
        clauses: loopClauses(t, loop).map((c) => c.name),
        ranges,
        lane_details: loop.rows.map((r) => ({ ...end(r), ref: ref(r), clause: clauseOf(t, r).name, rebate_minor: t.rebate[r] })),
      };
    }),
    loop_cap_reached: review.loopCapReached,
    loop_search: {
      stopped_by: review.loopSearch.stoppedBy,
      cap: review.loopSearch.cap,
      searches: review.loopSearch.searches,
      work: review.loopSearch.work,
      work_budget: review.loopSearch.workBudget,
      memory_bound: review.loopSearch.memoryBound,
    },
    loop_search_note: loopSearchNote(review.loops.length, review.loopSearch),
    clauses: review.clauses.map((c) => ({
      clause: c.name,
      source: c.source,
      lanes: c.rows.map(row),
      rebate_minor: c.rebate,
      loops: c.loops,
      ranges: periodRuns(c.periods).map(([a, b]) => span(a, b)),
    })),
    fix_by: plan?.by ?? fixBy,
    fix_plan: (plan?.changes ?? []).map((c) => {
      const nets = netsOf.get(c.row) ?? [];
      return {
        ...end(c.row),
        ref: ref(c.row),
        clause: clauseOf(t, c.row).name,
        clause_percent: c.clause?.percent ?? null,
        rebate_minor: t.rebate[c.row],
        new_rebate_minor: t.rebate[c.row] - c.cut,
        cut_minor: c.cut,
        net_minor: nets[0]?.net ?? NaN,
        new_net_minor: (nets[0]?.net ?? NaN) + c.cut,
        by_class: nets.map((n) => ({ vehicle_class: n.vehicleClass, net_minor: n.net, new_net_minor: n.net + c.cut })),
        negotiable: review.negotiable[c.row] === 1,
      };
    }),
    fix_plan_method: plan?.method ?? null,
    fix_plan_verified: plan ? plan.verified : true,
    fix_plan_incomplete: plan ? plan.stepLimitReached : false,
    rebate_removed_per_year_minor: Math.round(removedDays / 365),
    unfixable_loops: (plan?.unfixable ?? []).map((u) => ({ lanes: u.rows.map(row), vehicle_class: u.vehicleClass, period: span(u.period, u.period), net_per_lap_minor: u.netPerLap })),
    headroom: review.headroom.map((h) => {
      const floor = Number.isNaN(h.floor) ? null : h.floor;
      return {
        ...end(h.row),
        ref: ref(h.row),
        clause: clauseOf(t, h.row).name,
        vehicle_class: h.vehicleClass,
        net_minor: h.net,
        floor_minor: floor,
        headroom_minor: floor === null ? null : h.net - floor,
        set_by: h.setBy < 0 ? null : span(h.setBy, h.setBy),
        negotiable: review.negotiable[h.row] === 1,
      };
    }),
    headroom_after_fix_plan: review.headroomAfterFixPlan,
    negotiable_unmatched: review.negotiableUnmatched,
    work: { periods: review.periods.length, networks: review.networks.length, maximal_networks: review.networks.filter((n) => n.maximal).length },
    caution: CAUTIONS.join(' '),
  };
}

// Net of each row per class (before any cut), from the first network of the class that plans it.
function rowNets(review: CalendarReview): Map<number, { vehicleClass: string | null; net: number }[]> {
  const out = new Map<number, { vehicleClass: string | null; net: number }[]>();
  const wanted = new Set(review.fixPlan?.changes.map((c) => c.row) ?? []);
  for (const vehicleClass of review.classes) {
    for (const r of wanted) {
      const net = review.networks.find((n) => n.vehicleClass === vehicleClass && n.laneOf[r] >= 0);
      if (!net) continue;
      const list = out.get(r) ?? [];
      list.push({ vehicleClass, net: net.network.laneNet[net.laneOf[r]] });
      out.set(r, list);
    }
  }
  return out;
}

type Cell = string | number | null;

/** One row per lane row and class with a headroom entry: the lane, its loops, the plan's cut and the headroom. */
export function calendarLaneRows(report: CalendarReport, exponent: number): Cell[][] {
  const money = (v: number | null) => (v === null ? '' : formatMinor(v as Minor, exponent));
  const onLoops = new Map<number, number[]>();
  for (const loop of report.loops) for (const r of loop.lanes) onLoops.set(r, [...(onLoops.get(r) ?? []), loop.id]);
  const fix = new Map(report.fix_plan.map((f) => [f.row, f]));
  const rows: Cell[][] = [['row', 'from', 'to', 'ref', 'clause', 'vehicle_class', 'net', 'on_loops', 'cut', 'new_rebate', 'floor', 'headroom', 'set_by_from', 'set_by_to']];
  for (const h of report.headroom) {
    const f = fix.get(h.row);
    rows.push([
      h.row, h.from, h.to, h.ref ?? '', h.clause, h.vehicle_class ?? '', money(h.net_minor), [...new Set(onLoops.get(h.row) ?? [])].join(' '),
      f ? money(f.cut_minor) : '', f ? money(f.new_rebate_minor) : '',
      h.floor_minor === null ? 'no limit' : money(h.floor_minor), h.headroom_minor === null ? 'no limit' : money(h.headroom_minor),
      h.set_by?.from ?? '', h.set_by?.to ?? '',
    ]);
  }
  return rows;
}

/** One row per loop and date range: where and when each loop pays, by class. */
export function calendarLoopRows(report: CalendarReport, exponent: number): Cell[][] {
  const money = (v: number) => formatMinor(v as Minor, exponent);
  const rows: Cell[][] = [['loop', 'from_date', 'to_date', 'vehicle_class', 'net_per_lap', 'depots', 'rows', 'clauses']];
  for (const loop of report.loops) {
    for (const range of loop.ranges) {
      for (const c of range.by_class) rows.push([loop.id, range.from ?? '', range.to ?? '', c.vehicle_class ?? '', money(c.net_per_lap_minor), loop.depots.join(' > '), loop.lanes.join(' '), loop.clauses.join('; ')]);
    }
  }
  return rows;
}
