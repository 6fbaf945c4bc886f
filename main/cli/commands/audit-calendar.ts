// `lanewright audit` without --date: the contract review across the whole calendar (every period
// of the window, every vehicle class), with one fix plan by lane or by clause, as CSV (one row per
// lane row and class) or JSON; --loops-csv writes one row per loop range, --report a printable HTML.

import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { calendarFixChanges, calendarLoopRows, calendarReport, calendarReportScenario, calendarReviewCsv, calendarReviewHtml, formatCsvRows, reviewCalendarUnder, serializeScenarioDocument, withChange, type Scenario } from '../../../engine/index';
import { UsageError, wholeNumberOption, type ParsedArgs } from '../args';
import { inCsvDialect } from '../csv-dialect-option';
import { exportSettingsOf, loadImport } from '../load-network';
import { createHeadroomThreadPool } from '../../headroom-threads/pool';
import type { CommandOutput } from '../run';
import { auditProgress, negotiableOption } from './audit-shared';
import { counted, plural } from '../../../engine/index';

/** Value options only the calendar review reads (kept together so the option table can take them as they are). */
export const CALENDAR_AUDIT_OPTIONS = ['from-date', 'to-date', 'fix-by', 'report', 'fix-scenario-out'] as const;

function fixByOption(args: ParsedArgs): 'lane' | 'clause' {
  const value = args.values.get('fix-by') ?? 'lane';
  if (value !== 'lane' && value !== 'clause') throw new UsageError(`--fix-by must be lane or clause, got "${value}"`);
  return value;
}

const sha256 = (path: string) => createHash('sha256').update(readFileSync(path)).digest('hex');

export function runCalendarAudit(args: ParsedArgs, out: CommandOutput, what: { path: string; scenario: Scenario } | null): number {
  const loopCap = wholeNumberOption(args, 'loop-cap', 1);
  const threads = wholeNumberOption(args, 'threads', 1);
  const fixBy = fixByOption(args);
  const negotiable = negotiableOption(args);
  const loopsCsv = args.values.get('loops-csv');
  const reportPath = args.values.get('report');

  const readStart = performance.now();
  // The calendar review splits the contract into periods itself: the rows are read undated.
  const imported = loadImport(args, {}, false);
  const readMs = performance.now() - readStart;

  const solveStart = performance.now();
  // Headroom searches over worker threads (main/headroom-threads); the results do not depend on how many.
  const pool = createHeadroomThreadPool({ threads });
  let reviewed: ReturnType<typeof reviewCalendarUnder>;
  try {
    reviewed = reviewCalendarUnder(imported, what?.scenario ?? null, {
      headroomRunner: pool,
      fromDate: args.values.get('from-date'),
      toDate: args.values.get('to-date'),
      vehicleClasses: args.values.has('vehicle-class') ? [imported.plan.vehicleClass] : undefined,
      loopCap,
      negotiable,
      fixBy,
      skipInvalid: args.flags.has('skip-invalid'),
      onProgress: auditProgress(args, out),
    });
  } finally {
    pool.close();
  }
  const solveMs = performance.now() - solveStart;
  const review = reviewed.review;
  for (const p of reviewed.overlay.problems) out.warn(`scenario ${what!.path}: ${p.message}; the change is kept in the scenario but not applied (code ${p.code})`);
  for (const p of reviewed.planProblems) out.warn(`scenario ${what!.path}: ${p}`);

  // Under a scenario the rows are the overlay's (added lanes read row 0); the report names the scenario.
  const report = calendarReport({ ...imported, lanes: reviewed.overlay.table }, review, fixBy, what ? calendarReportScenario(what.scenario, reviewed) : null);
  const exponent = imported.exponent;
  const window = report.window.from === null ? 'every date (the lanes file names none)' : `${report.window.from} to ${report.window.to}`;
  out.warn(`calendar review${what ? ` under scenario "${what.scenario.name}" (${what.path})` : ''}: ${window}, ${counted(report.periods.length, 'period')}, ${plural(report.classes.length, 'vehicle class', 'vehicle classes')} ${report.classes.map((c) => c ?? 'default toll').join(', ')} (--date D reviews one day)`);
  for (const name of review.negotiableUnmatched) out.warn(`--negotiable: no lane has the contract reference, clause or lane key "${name}"; it marks nothing`);
  // The whole calendar: no one date, and every class unless --vehicle-class named one.
  const settings = exportSettingsOf(args, { date: null, vehicleClass: args.values.has('vehicle-class') ? imported.plan.vehicleClass : null }, what ? what.scenario.name : null, [what?.path]);
  out.write(args.flags.has('json') ? JSON.stringify({ ...report, settings }) + '\n' : inCsvDialect(args, calendarReviewCsv(report, exponent)));
  if (loopsCsv) out.writeFile(loopsCsv, inCsvDialect(args, formatCsvRows(calendarLoopRows(report, exponent))));
  if (reportPath) {
    const files = ['depots', 'lanes'].map((k) => args.values.get(k)!).map((path) => ({ name: path, sha256: sha256(path) }));
    out.writeFile(reportPath, calendarReviewHtml(report, { files, exponent, madeAt: new Date().toISOString().slice(0, 16) + 'Z' }));
  }
  const fixOut = args.values.get('fix-scenario-out');
  if (fixOut && report.loops.length > 0 && !report.fix_plan_verified) out.warn(`--fix-scenario-out: the fix plan is not verified; ${fixOut} is not written`);
  else if (fixOut) {
    // The verified plan as a scenario file (the scenario given, plus one rebate change per lane cut), for `compare` or the app.
    const base: Scenario = what?.scenario ?? { name: `Calendar fix plan by ${fixBy}`, description: null, changes: [] };
    const fixed = calendarFixChanges(reviewed).reduce(withChange, base);
    out.writeFile(fixOut, serializeScenarioDocument(fixed));
  }
  if (args.flags.has('timings')) {
    out.timing({ read_ms: readMs, audit_ms: solveMs, periods: report.work.periods, networks: report.work.networks, maximal_networks: report.work.maximal_networks, lanes: imported.lanes.count, threads: pool.threads, headroom_worker_jobs: pool.workerJobs() });
  }

  if (report.loops.length > 0) {
    out.warn(`WARNING: ${report.loops.length}${report.loop_search.stopped_by === 'cap' ? '+' : ''} rebate ${plural(report.loops.length, 'loop')} in the contract over the window: costs through them are unbounded and the contract terms need fixing`);
    for (const loop of report.loops) {
      const when = loop.ranges.map((r) => (r.from === null ? 'every date' : `${r.from} to ${r.to}`)).join(', ');
      out.warn(`  loop ${loop.id}: ${[...loop.depots, loop.depots[0]].join(' > ')}, clauses ${loop.clauses.join(', ') || 'none'}, ${when}`);
    }
    // What stopped the search, truthfully: "more loops exist" only when one more was found.
    if (report.loop_search_note !== null) out.warn(`WARNING: ${report.loop_search_note}`);
    if (report.fix_plan_verified) {
      out.warn(`fix plan by ${report.fix_by}: ${counted(report.fix_plan.length, 'rebate cut')} ${plural(report.fix_plan.length, 'removes', 'remove')} every loop in every period (checked by solving every period network); headroom is computed after the fix plan`);
    } else if (report.unfixable_loops.length > 0) {
      out.warn(`WARNING: no rebate cut can fix ${counted(report.unfixable_loops.length, 'loop')} (no lane on them carries a rebate); headroom is not available`);
    } else {
      out.warn(`WARNING: the fix plan stopped with loops left${report.fix_plan_method ? ` (${report.fix_plan_method})` : ''}; headroom is not available`);
    }
  }
  return 0;
}
