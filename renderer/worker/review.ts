// Contract review for the review tab: the calendar review of the whole contract (every period and
// class) and the one-day audit of the planned date (every rebate loop of that day's network, not only
// those reachable from the origin; the fix plan; rebate headroom per lane), both under the active
// scenario through the engine's overlay.

import { auditNetwork, calendarFixChanges, calendarReport, calendarReportScenario, calendarReviewHtml, reviewCalendarUnder, type CalendarReport, type ImportResult, type ReviewedFile, type ScenarioChange } from '../../engine/index';
import type { HeadroomRunner, Network } from '../../engine/index';
import { auditReport, type AuditReport } from '../../engine/index';
import { overlayKeys, scenarioImport } from '../../engine/index';
import { hasChanges, type Scenario } from '../model/scenario-edits';
import type { HeadroomThreadsView } from './headroom-protocol';

export type ContractReviewView = AuditReport & {
  scenarioProblems: string[];
  /** The review across the whole calendar, under the active scenario (`calendar.scenario` names it). */
  calendar: CalendarReport | null;
  /** The printable report of `calendar` (self-contained HTML). */
  calendarHtml: string | null;
  /** The calendar's verified fix plan as scenario changes (one rebate per lane, notes naming plan, row and classes); empty without one. */
  calendarFix: ScenarioChange[];
  /** The threads the review's headroom searches ran on (headroom-pool.ts), and why one when so. */
  headroomThreads: HeadroomThreadsView;
};

export interface CalendarContext {
  imported: ImportResult;
  files: readonly ReviewedFile[];
  fixBy: 'lane' | 'clause';
}

type CalendarPart = Pick<ContractReviewView, 'calendar' | 'calendarHtml' | 'calendarFix'>;

/**
 * The last calendar review of each lane table. The review does not depend on the date or class
 * planned (it covers them all), so choosing a range of the strip, which re-plans that day, need not
 * review the calendar again. It depends on the lane rows (the table, kept across re-plans), the
 * planning settings, the scenario's changes, the plan's kind and the files named.
 */
const calendarCache = new WeakMap<object, { key: string; part: CalendarPart }>();

const calendarKey = (context: CalendarContext, scenario: Scenario | null) => JSON.stringify([context.imported.plan.settings, scenario?.changes ?? [], context.fixBy, context.files]);

/**
 * Audits the planned network, with the scenario laid over the import's lane rows first when it has
 * changes; headroom searches go through `runner` (the engine worker's thread pool).
 */
export function reviewContract(
  imported: ImportResult,
  network: Network,
  scenario: Scenario | null,
  onProgress?: (phase: string, fraction: number) => void,
  context?: CalendarContext,
  runner?: HeadroomRunner,
): Omit<ContractReviewView, 'headroomThreads'> {
  let target = network;
  let scenarioProblems: string[] = [];
  // Lane keys as scenarios name them (counted over the file's rows), for the fix plan's changes.
  const rowKeys = overlayKeys(imported);
  let laneKeys = Array.from(imported.plan.laneRecord, (r) => rowKeys[r]);
  if (scenario && hasChanges(scenario)) {
    const what = scenarioImport(imported, scenario);
    target = what.network;
    laneKeys = what.keys;
    scenarioProblems = what.overlay.problems.map((p) => p.message);
  }
  const phases = { loops: 'Finding rebate loops', 'fix-plan': 'Working out a fix plan', headroom: 'Rebate headroom per lane' } as const;
  const order = { loops: 0, 'fix-plan': 1, headroom: 2 } as const;
  const audit = auditNetwork(target, {
    laneKeys,
    headroomRunner: runner,
    onProgress: (p) => onProgress?.(phases[p.phase], (order[p.phase] + (p.total > 0 ? p.done / p.total : 0)) / (context ? 6 : 3)),
  });
  let calendar: CalendarReport | null = null;
  let calendarHtml: string | null = null;
  let calendarFix: ScenarioChange[] = [];
  const active = scenario && hasChanges(scenario) ? scenario : null;
  const last = context ? calendarCache.get(context.imported.lanes) : undefined;
  if (context && last && last.key === calendarKey(context, active)) ({ calendar, calendarHtml, calendarFix } = last.part);
  else if (context) {
    const calendarPhases = { periods: 'Planning every period', loops: 'Rebate loops over the calendar', 'fix-plan': 'A fix plan for the whole calendar', verify: 'Checking the plan in every period', headroom: 'Headroom over the calendar' } as const;
    const reviewed = reviewCalendarUnder(context.imported, active, {
      fixBy: context.fixBy,
      headroomRunner: runner,
      onProgress: (p) => onProgress?.(calendarPhases[p.phase], 0.5 + (p.total > 0 ? p.done / p.total : 0) / 2),
    });
    calendar = calendarReport({ ...context.imported, lanes: reviewed.overlay.table }, reviewed.review, context.fixBy, calendarReportScenario(active, reviewed));
    calendarHtml = calendarReviewHtml(calendar, { files: context.files, exponent: context.imported.exponent });
    if (calendar.fix_plan_verified) calendarFix = calendarFixChanges(reviewed);
    calendarCache.set(context.imported.lanes, { key: calendarKey(context, active), part: { calendar, calendarHtml, calendarFix } });
  }
  return { ...auditReport(target, audit), scenarioProblems, calendar, calendarHtml, calendarFix };
}
