// `lanewright audit --date D`: the contract review of one day's network, independent of any origin:
// every distinct rebate loop, a verified fix plan and the rebate headroom of every lane, as CSV (one
// row per lane) or JSON; --loops-csv also writes one row per lane of each loop. Without --date the
// command reviews the whole calendar (audit-calendar.ts).
// The command's work; its option table is in audit.ts (engine-free), so this module loads only when it runs.

import { auditNetwork, overlayKeys, parseScenarioDocument, scenarioImport, type Scenario } from '../../../engine/index';
import { readDocumentFile } from '../files';
import { auditLoopRows, auditReport, reviewCsv } from '../../../engine/index';
import { formatCsvRows } from '../../../engine/index';
import { UsageError, wholeNumberOption, type ParsedArgs } from '../args';
import { CALENDAR_AUDIT_OPTIONS, runCalendarAudit } from './audit-calendar';
import { exportSettingsOf, loadImport, planDateOf } from '../load-network';
import { csvDialectOption, inCsvDialect } from '../csv-dialect-option';
import { createHeadroomThreadPool } from '../../headroom-threads/pool';
import type { CommandOutput } from '../run';
import { auditProgress, negotiableOption } from './audit-shared';
import { counted, plural } from '../../../engine/index';

/** The --scenario file, read before any work; null without one. */
export function auditScenario(args: ParsedArgs): { path: string; scenario: Scenario } | null {
  const path = args.values.get('scenario');
  return path === undefined ? null : { path, scenario: parseScenarioDocument(readDocumentFile(path, 'scenario'), path) };
}

export function runAudit(args: ParsedArgs, out: CommandOutput): number {
  const what = auditScenario(args);
  if (!args.values.has('date')) return runCalendarAudit(args, out, what);
  for (const name of CALENDAR_AUDIT_OPTIONS) {
    if (args.values.has(name)) throw new UsageError(`--${name} belongs to the calendar review; leave out --date to review the whole calendar`);
  }
  const loopCap = wholeNumberOption(args, 'loop-cap', 1);
  const threads = wholeNumberOption(args, 'threads', 1);
  const negotiable = negotiableOption(args);
  const loopsCsv = args.values.get('loops-csv');
  csvDialectOption(args);

  const readStart = performance.now();
  const imported = loadImport(args);
  let network = imported.network;
  // Lane keys as scenarios name them: counted over the file's rows, not the day's network.
  const rowKeys = overlayKeys(imported);
  let laneKeys = Array.from(imported.plan.laneRecord, (r) => rowKeys[r]);
  if (what) {
    // The day's network as the scenario makes it, through the one overlay (as export and compare do).
    const overlaid = scenarioImport(imported, what.scenario);
    for (const p of overlaid.overlay.problems) out.warn(`scenario ${what.path}: ${p.message}; the change is kept in the scenario but not applied (code ${p.code})`);
    network = overlaid.network;
    laneKeys = overlaid.keys;
  }
  const readMs = performance.now() - readStart;

  const solveStart = performance.now();
  // Headroom searches over worker threads (main/headroom-threads); the results do not depend on how many.
  const pool = createHeadroomThreadPool({ threads });
  let audit: ReturnType<typeof auditNetwork>;
  try {
    audit = auditNetwork(network, {
      headroomRunner: pool,
      loopCap,
      negotiable,
      laneKeys,
      onProgress: auditProgress(args, out),
    });
  } finally {
    pool.close();
  }
  const solveMs = performance.now() - solveStart;

  for (const name of audit.negotiableUnmatched ?? []) out.warn(`--negotiable: no lane has the contract reference or lane key "${name}"; it marks nothing`);
  const report = auditReport(network, audit);
  // Which review this is: one day, named.
  const dayReport = { review: 'day' as const, date: planDateOf(args).date, scenario: what ? what.scenario.name : null, settings: exportSettingsOf(args, imported.plan, what ? what.scenario.name : null, [what?.path]), ...report };
  out.write(args.flags.has('json') ? JSON.stringify(dayReport) + '\n' : inCsvDialect(args, reviewCsv(network, report)));
  if (loopsCsv) out.writeFile(loopsCsv, inCsvDialect(args, formatCsvRows(auditLoopRows(network, report))));
  if (args.flags.has('timings')) out.timing({ read_ms: readMs, audit_ms: solveMs, depots: network.depotCount, lanes: network.laneCount, threads: pool.threads, headroom_worker_jobs: pool.workerJobs() });

  if (report.loops.length > 0) {
    out.warn(
      `WARNING: ${report.loops.length}${report.loop_search.stopped_by === 'cap' ? '+' : ''} rebate ${plural(report.loops.length, 'loop')} in the network: costs through them are unbounded and the contract terms need fixing`,
    );
    // What stopped the search, truthfully: "more loops exist" only when one more was found.
    if (report.loop_search_note !== null) out.warn(`WARNING: ${report.loop_search_note}`);
    if (report.fix_plan_verified) {
      out.warn(`fix plan: ${counted(report.fix_plan.length, 'rebate cut')} ${plural(report.fix_plan.length, 'removes', 'remove')} every loop (checked by solving the changed network); headroom is computed after the fix plan`);
    } else if (report.fix_plan_incomplete) {
      out.warn(`WARNING: the fix plan stopped after ${counted(report.fix_plan.length, 'lane change')} with loops left; headroom is not available`);
    } else {
      out.warn(`WARNING: no rebate cut can fix ${counted(report.unfixable_loops.length, 'loop')} (no lane on them carries a rebate); headroom is not available`);
    }
  }
  return 0;
}
