// `lanewright audit --date D`: the contract review of one day's network, independent of any origin:
// every distinct rebate loop, a verified fix plan and the rebate headroom of every lane, as CSV (one
// row per lane) or JSON; --loops-csv also writes one row per lane of each loop. Without --date the
// command reviews the whole calendar (audit-calendar.ts).

import { auditNetwork, overlayKeys } from '../../../engine/index';
import { auditLoopRows, auditReport, reviewCsv } from '../../../engine/index';
import { formatCsvRows } from '../../../engine/index';
import { UsageError, wholeNumberOption, type ParsedArgs } from '../args';
import { CALENDAR_AUDIT_OPTIONS, runCalendarAudit } from './audit-calendar';
import { loadImport, planDateOf } from '../load-network';
import { CSV_DIALECT_OPTION, JSON_OPTION, LOOP_CAP_OPTION, NETWORK_FILES, OUT_OPTION, PLANNING_OPTIONS, TIMINGS_OPTION, type CommandSpec } from '../options';
import { csvDialectOption, inCsvDialect } from '../csv-dialect-option';
import type { CommandOutput } from '../run';
import { counted, plural } from '../../../engine/index';

export const auditCommand: CommandSpec = {
  name: 'audit',
  summary: 'contract review: rebate loops, a verified fix plan and rebate headroom, over the whole calendar or one day',
  details:
    'Without --date, reviews the whole calendar: the periods in which the set of valid lanes is the same, each\n' +
    'loop with the date ranges it exists in and the clauses it combines, one fix plan verified on every period\n' +
    '(--fix-by lane or clause) and headroom per lane; --report writes a printable HTML report. With --date,\n' +
    'reviews that day\'s network. Finds the distinct rebate loops (up to --loop-cap), a set of rebate cuts that\n' +
    'removes them all (checked by solving again) and how far each lane\'s rebate can grow before a loop appears.\n' +
    'Prints one CSV row per lane, or one JSON object with --json; --loops-csv also writes one row per lane of each loop.',
  example: 'lanewright audit --depots sample-data/depots.csv --lanes sample-data/lanes.csv --date 2026-06-01 --negotiable K-2',
  options: [
    ...NETWORK_FILES,
    LOOP_CAP_OPTION,
    { name: 'negotiable', value: 'REF,...', help: 'contract references or lane keys (FROM>TO|ref|n) whose rebates may change' },
    { name: 'loops-csv', value: 'FILE', help: 'also write one row per lane of each loop to FILE' },
    { name: 'progress', help: 'print progress by phase on stderr' },
    { name: 'from-date', value: 'YYYY-MM-DD', help: 'calendar review: first day reviewed (default: the earliest date the file names)' },
    { name: 'to-date', value: 'YYYY-MM-DD', help: 'calendar review: last day reviewed (default: the latest date the file names)' },
    { name: 'fix-by', value: 'lane|clause', help: 'calendar review: one cut per lane (default) or one percentage cut per clause' },
    { name: 'report', value: 'FILE', help: 'calendar review: also write a printable HTML report to FILE' },
    JSON_OPTION,
    CSV_DIALECT_OPTION,
    OUT_OPTION,
    TIMINGS_OPTION,
    // audit's --date has its own meaning: without it the whole calendar is reviewed, not today.
    ...PLANNING_OPTIONS.map((o) => (o.name === 'date' ? { ...o, help: 'review this one day; without it, audit reviews the whole calendar of the contract' } : o)),
  ],
  run: runAudit,
};

function runAudit(args: ParsedArgs, out: CommandOutput): number {
  if (!args.values.has('date')) return runCalendarAudit(args, out);
  for (const name of CALENDAR_AUDIT_OPTIONS) {
    if (args.values.has(name)) throw new UsageError(`--${name} belongs to the calendar review; leave out --date to review the whole calendar`);
  }
  const loopCap = wholeNumberOption(args, 'loop-cap', 1);
  const negotiable = (args.values.get('negotiable') ?? '').split(',').map((s) => s.trim()).filter((s) => s !== '');
  const loopsCsv = args.values.get('loops-csv');
  csvDialectOption(args);

  const readStart = performance.now();
  const imported = loadImport(args);
  const network = imported.network;
  // Lane keys as scenarios name them: counted over the file's rows, not the day's network.
  const rowKeys = overlayKeys(imported);
  const laneKeys = Array.from(imported.plan.laneRecord, (r) => rowKeys[r]);
  const readMs = performance.now() - readStart;

  let lastLine = '';
  const solveStart = performance.now();
  const audit = auditNetwork(network, {
    loopCap,
    negotiable,
    laneKeys,
    onProgress: args.flags.has('progress')
      ? ({ phase, done, total }) => {
          const line = `audit: ${phase} ${total === 0 ? 100 : Math.floor((100 * done) / total)}%`;
          if (line !== lastLine) out.warn((lastLine = line));
        }
      : undefined,
  });
  const solveMs = performance.now() - solveStart;

  for (const name of audit.negotiableUnmatched ?? []) out.warn(`--negotiable: no lane has the contract reference or lane key "${name}"; it marks nothing`);
  const report = auditReport(network, audit);
  // Which review this is: one day, named.
  const dayReport = { review: 'day' as const, date: planDateOf(args).date, ...report };
  out.write(args.flags.has('json') ? JSON.stringify(dayReport) + '\n' : inCsvDialect(args, reviewCsv(network, report)));
  if (loopsCsv) out.writeFile(loopsCsv, inCsvDialect(args, formatCsvRows(auditLoopRows(network, report))));
  if (args.flags.has('timings')) out.timing({ read_ms: readMs, audit_ms: solveMs, depots: network.depotCount, lanes: network.laneCount });

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
