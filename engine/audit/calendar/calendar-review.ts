// The contract review across the whole calendar: the window, its periods, the network of every
// period and class, the loops over time, one fix plan for every period (by lane or by clause,
// verified by solving every period network), headroom per row and the clause table.
// Work is shared: periods with the same rows share one network, and only the maximal networks
// (those no other network of the class contains) are searched, fixed and solved for headroom.

import { clauseOf } from '../../import/lane-clause';
import { laneKeyText } from '../../import/lane-key';
import type { LaneTable } from '../../import/types';
import type { ImportResult } from '../../planning/import-types';
import { importCalendarSource, type CalendarSource } from './calendar-source';
import { clauseFixPlan } from './clause-fix-plan';
import { clauseTable, type ClauseRow } from './clause-table';
import { daysInRange } from './days';
import type { HeadroomRunner } from '../headroom';
import { headroomOverTime, type HeadroomWork, type RowHeadroom } from './headroom-over-time';
import { laneFixPlan, verifyCuts, type CalendarFixPlan } from './lane-fix-plan';
import { loopsOverTime, type CalendarLoop, type LoopsOverTime } from './loops-over-time';
import { periodNetworks, type PeriodNetwork } from './period-networks';
import { reviewPeriods, type ReviewPeriod } from './periods';
import { reviewWindow, type ReviewWindow } from './review-window';

export type CalendarPhase = 'periods' | 'loops' | 'fix-plan' | 'verify' | 'headroom';

export interface CalendarReviewOptions {
  /** ISO 8601 dates, inclusive; default every date the lanes file names. */
  fromDate?: string;
  toDate?: string;
  /** Classes to review; default every class in the file. */
  vehicleClasses?: (string | null)[];
  /** Most distinct loops (default 100). */
  loopCap?: number;
  /** Refs, clause names or lane key texts ("FROM>TO|ref|n") the user marks as negotiable. */
  negotiable?: Iterable<string>;
  fixBy?: 'lane' | 'clause';
  skipInvalid?: boolean;
  /** Most periods in the window (default 1,000). */
  maxPeriods?: number;
  /** Most feasibility checks of the clause plan (default 4,000). */
  clauseBudget?: number;
  /** Runs the headroom searches (e.g. over worker threads); default: the calling thread. */
  headroomRunner?: HeadroomRunner;
  onProgress?: (progress: { phase: CalendarPhase; done: number; total: number }) => void;
}

export interface CalendarReview {
  window: ReviewWindow | null;
  periods: ReviewPeriod[];
  classes: (string | null)[];
  networks: PeriodNetwork[];
  loops: CalendarLoop[];
  loopCapReached: boolean;
  /** What stopped the loop search (see loopSearchNote). */
  loopSearch: LoopsOverTime['loopSearch'];
  /** Null when no period has a loop. */
  fixPlan: CalendarFixPlan | null;
  /** Empty when a fix plan was needed and could not be verified. */
  headroom: RowHeadroom[];
  /** How the floors were found (whole-network solves, rows left to targeted searches); null without headroom. */
  headroomWork: HeadroomWork | null;
  headroomAfterFixPlan: boolean;
  clauses: ClauseRow[];
  /** Per LaneTable row: 1 when marked negotiable. */
  negotiable: Uint8Array;
  negotiableUnmatched: string[];
  /** Per LaneTable row: days it is valid in the window (365 for an undated review). */
  rowDays: Float64Array;
}

/** Runs the calendar review on an import as loaded (its lane table and planning settings). */
export function reviewCalendar(result: ImportResult, options: CalendarReviewOptions = {}): CalendarReview {
  return reviewCalendarOf(importCalendarSource(result, options.skipInvalid), options);
}

/**
 * Runs the calendar review on a lane table and its planner: the import's own, or a what-if's
 * overlay (engine/scenario/calendar-under-scenario.ts), whose rows, amounts, closures and windows
 * then decide every period network. `skipInvalid` is the source's business here.
 */
export function reviewCalendarOf(source: CalendarSource, options: CalendarReviewOptions = {}): CalendarReview {
  const table = source.lanes;
  const progress = options.onProgress;
  const leaveOut = source.leaveOut;
  const window = reviewWindow(table, { fromDate: options.fromDate, toDate: options.toDate }, leaveOut);
  const periods = reviewPeriods(table, window, options.maxPeriods, leaveOut);
  const networks = periodNetworks(source, periods, {
    vehicleClasses: options.vehicleClasses,
    onProgress: (done, total) => progress?.({ phase: 'periods', done, total }),
  });
  const classes = [...new Set(networks.map((n) => n.vehicleClass))];
  const { marks: negotiable, unmatched } = markNegotiable(source, options.negotiable);
  const rowDays = validDays(table, window, leaveOut);

  const found = loopsOverTime(networks, { cap: options.loopCap, onProgress: (done, total) => progress?.({ phase: 'loops', done, total }) });
  let fixPlan: CalendarFixPlan | null = null;
  if (found.loops.length > 0) {
    progress?.({ phase: 'fix-plan', done: 0, total: 1 });
    fixPlan =
      options.fixBy === 'clause'
        ? clauseFixPlan(table, networks, found.loops.map((l) => l.rows), rowDays, { negotiable, budget: options.clauseBudget })
        : laneFixPlan(table, networks, { negotiable });
    progress?.({ phase: 'verify', done: 0, total: 1 });
    if (leaveOut) withoutLeftOut(fixPlan, leaveOut);
    fixPlan.verified = fixPlan.unfixable.length === 0 && fixPlan.changes.length > 0 && verifyCuts(table, networks, fixPlan.cut);
  }
  const floors =
    fixPlan && !fixPlan.verified ? null : headroomOverTime(networks, table.count, fixPlan?.cut ?? null, (done, total) => progress?.({ phase: 'headroom', done, total }), options.headroomRunner);
  return {
    window,
    periods,
    classes,
    networks,
    loops: found.loops,
    loopCapReached: found.capReached,
    loopSearch: found.loopSearch,
    fixPlan,
    headroom: floors?.rows ?? [],
    headroomWork: floors?.work ?? null,
    headroomAfterFixPlan: fixPlan !== null,
    clauses: clauseTable(table, found.loops, leaveOut),
    negotiable,
    negotiableUnmatched: unmatched,
    rowDays,
  };
}

// A clause cut reaches every row of the clause; rows in no network (closed by a what-if) are left out of the plan.
function withoutLeftOut(plan: CalendarFixPlan, leaveOut: Uint8Array): void {
  plan.changes = plan.changes.filter((c) => !leaveOut[c.row]);
  for (let r = 0; r < plan.cut.length; r++) if (leaveOut[r]) plan.cut[r] = 0;
}

function validDays(table: LaneTable, window: ReviewWindow | null, leaveOut: Uint8Array | undefined): Float64Array {
  const days = new Float64Array(table.count);
  for (let r = 0; r < table.count; r++) {
    if (leaveOut?.[r]) continue;
    if (window === null) {
      days[r] = 365;
      continue;
    }
    const from = Math.max(table.validFrom[r], window.from);
    const to = table.validTo[r] === 0 ? window.to : Math.min(table.validTo[r], window.to);
    days[r] = from <= to ? daysInRange(from, to) : 0;
  }
  return days;
}

// The same names as the one-day audit takes (refs, lane key texts), plus clause names.
function markNegotiable(source: CalendarSource, names: Iterable<string> | undefined): { marks: Uint8Array; unmatched: string[] } {
  const table = source.lanes;
  const marks = new Uint8Array(table.count);
  const wanted = new Set([...(names ?? [])].map((s) => s.trim()).filter((s) => s !== ''));
  if (wanted.size === 0) return { marks, unmatched: [] };
  const keys = source.keys();
  const matched = new Set<string>();
  for (let r = 0; r < table.count; r++) {
    const clause = clauseOf(table, r);
    for (const name of [table.ref[r], laneKeyText(keys[r]), clause.source === 'clause' ? clause.name : undefined]) {
      if (name === undefined || !wanted.has(name)) continue;
      marks[r] = 1;
      matched.add(name);
    }
  }
  return { marks, unmatched: [...wanted].filter((n) => !matched.has(n)) };
}
