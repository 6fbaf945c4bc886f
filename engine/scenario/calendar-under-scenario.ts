// The calendar review of a contract as a what-if changes it: every period network is planned from
// the overlay's table (its amounts per class, closed rows left out, added lanes in, validity as
// changed), by the overlay's own planner, so the review reads a lane's amount where the routes,
// exports and dispatch read it. The calendar fix plan goes back the other way as scenario changes
// (one rebate per lane) that the user sees, can undo and save.

import { reviewCalendarOf, type CalendarReview, type CalendarReviewOptions } from '../audit/calendar/calendar-review';
import { importCalendarSource, type CalendarSource } from '../audit/calendar/calendar-source';
import { clauseOf } from '../import/lane-clause';
import { laneKeyId } from '../import/lane-key';
import type { ImportResult } from '../planning/import-types';
import { buildOverlay, type LaneOverlay } from './overlay';
import { overlayPlan } from './overlay-network';
import { describeChanges, type ChangeView } from './overlay-rows';
import type { Scenario, ScenarioChange } from './types';

/** The what-if a calendar review was made under, as the report names it: its name and changes as words. */
export interface CalendarReportScenario {
  name: string;
  changes: { text: string; note: string | null; applied: boolean; problem: string | null }[];
  /** Problems of planning the overlaid table (rows left out of some period). */
  plan_problems: string[];
}

export interface ScenarioCalendarReview {
  review: CalendarReview;
  /** The overlay reviewed; `overlay.table` is the table the review's rows index (the import's own without changes). */
  overlay: LaneOverlay;
  /** The scenario's changes as words, with whether each applied (empty without a scenario). */
  changes: ChangeView[];
  /** Problems of planning the overlaid table (rows left out of some period), each once. */
  planProblems: string[];
}

/** The overlay's table planned by the overlay's rules: the review's source under a what-if. */
export function overlayCalendarSource(imported: ImportResult, overlay: LaneOverlay, planProblems: Set<string>): CalendarSource {
  const lanesFile = imported.importReport.files.find((f) => f.kind === 'lanes')?.file;
  return {
    lanes: overlay.table,
    depots: imported.depots,
    vehicleClasses: imported.vehicleClasses,
    leaveOut: overlay.closed,
    keys: () => overlay.keys,
    plan(date, vehicleClass) {
      const planned = overlayPlan(overlay, { ...imported, lanesFile }, { date, vehicleClass: vehicleClass ?? undefined, settings: imported.plan.settings });
      for (const p of planned.planProblems) planProblems.add(`${p.file} row ${p.row ?? '?'}: ${p.message}`);
      return { network: planned.network, laneRecord: planned.plan.laneRecord };
    },
  };
}

/** Reviews the calendar of `imported` under `scenario` (null or no changes: the files as loaded). */
export function reviewCalendarUnder(imported: ImportResult, scenario: Scenario | null, options: CalendarReviewOptions = {}): ScenarioCalendarReview {
  const overlay = buildOverlay(imported, scenario);
  if (!scenario || scenario.changes.length === 0) {
    return { review: reviewCalendarOf(importCalendarSource(imported, options.skipInvalid), options), overlay, changes: [], planProblems: [] };
  }
  const problems = new Set<string>();
  const review = reviewCalendarOf(overlayCalendarSource(imported, overlay, problems), options);
  return { review, overlay, changes: describeChanges(imported, overlay, scenario, imported.exponent), planProblems: [...problems] };
}

/**
 * The calendar fix plan as scenario changes: one rebate change per lane the plan cuts, to the
 * rebate under the scenario less the cut (rows sharing a lane key, such as a row's class copies,
 * take the largest cut). Each change's note names the plan (by lane, or the clause and its
 * percentage), the lanes-file row and that the rebate holds for every vehicle class reviewed.
 */
export function calendarFixChanges(reviewed: ScenarioCalendarReview): ScenarioChange[] {
  const { review, overlay } = reviewed;
  const plan = review.fixPlan;
  if (!plan) return [];
  const t = overlay.table;
  const byKey = new Map<string, { row: number; rebate: number; rows: number[] }>();
  for (const c of plan.changes) {
    const id = laneKeyId(overlay.keys[c.row]);
    const rebate = t.rebate[c.row] - c.cut;
    const seen = byKey.get(id);
    if (!seen) byKey.set(id, { row: c.row, rebate, rows: [c.row] });
    else {
      seen.rows.push(c.row);
      if (rebate < seen.rebate) seen.rebate = rebate;
    }
  }
  const clauseCut = new Map(plan.changes.map((c) => [c.row, c.clause]));
  return [...byKey.values()].map(({ row, rebate, rows }) => {
    const classes = review.classes.filter((cls) => review.networks.some((n) => n.vehicleClass === cls && rows.some((r) => n.laneOf[r] >= 0)));
    const clause = clauseCut.get(row);
    const how = clause ? `by clause ${clause.name} (${clause.percent} % of its rebates)` : `by lane (clause ${clauseOf(t, row).name})`;
    const where = overlay.changeOf[row] >= 0 ? `the lane added by change ${overlay.changeOf[row] + 1}` : `lanes-file row ${t.sourceRow[row]}`;
    const cls = classes.length === 0 ? 'the default toll' : classes.join(', ');
    return {
      kind: 'set-amount',
      lane: overlay.keys[row],
      field: 'rebate',
      amountMinor: rebate,
      note: `calendar fix plan ${how}: ${where}; the rebate holds for every vehicle class (reviewed: ${cls})`,
    };
  });
}

/** What the report says of the scenario a review ran under; null for the files as loaded. */
export function calendarReportScenario(scenario: Scenario | null, reviewed: ScenarioCalendarReview): CalendarReportScenario | null {
  if (!scenario || scenario.changes.length === 0) return null;
  return {
    name: scenario.name,
    changes: reviewed.changes.map((c) => ({ text: c.text, note: scenario.changes[c.index]?.note ?? null, applied: c.applied, problem: c.problem })),
    plan_problems: reviewed.planProblems,
  };
}
