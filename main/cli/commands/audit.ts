// `lanewright audit --date D`: the contract review of one day's network, independent of any origin:
// every distinct rebate loop, a verified fix plan and the rebate headroom of every lane, as CSV (one
// row per lane) or JSON; --loops-csv also writes one row per lane of each loop. Without --date the
// command reviews the whole calendar (audit-calendar.ts).

import { auditNetwork, overlayKeys } from '../../../engine/index';
import { auditLaneRows, auditLoopRows, auditReport } from '../../../engine/index';
import { formatCsvRows } from '../../../engine/index';
import { UsageError, wholeNumberOption, type ParsedArgs } from '../args';
import { auditProgress, CALENDAR_AUDIT_OPTIONS, runCalendarAudit } from './audit-calendar';
import { loadImport, planDateOf } from '../load-network';
import { JSON_OPTION, LOOP_CAP_OPTION, NETWORK_FILES, OUT_OPTION, PLANNING_OPTIONS, TIMINGS_OPTION, type CommandSpec } from '../options';
import type { CommandOutput } from '../run';

export const auditCommand: CommandSpec = {
  name: 'audit',
  summary: 'contract review across the whole calendar (one day with --date): rebate loops, a verified fix plan, headroom',
  details:
    'Without --date: the whole calendar of the contract (--from-date to --to-date, default every date the lanes\n' +
    'file names), every period and vehicle class; loops by date range and clause, one fix plan for every date\n' +
    '(--fix-by lane or clause), headroom per lane row and the period that sets it, --report FILE.html.\n' +
    'With --date: that day\'s network. Finds the distinct rebate loops (up to --loop-cap), a set of rebate cuts\n' +
    'that removes them all (checked by solving again) and how far each lane\'s rebate can grow before a loop\n' +
    'appears. Prints one CSV row per lane, or one JSON object with --json (its "review" says which); --loops-csv\n' +
    'also writes one row per lane (one day) or per loop range (calendar) of each loop.',
  example: 'lanewright audit --depots sample-data/depots.csv --lanes sample-data/lanes.csv --date 2026-06-01 --negotiable K-2',
  options: [
    ...NETWORK_FILES,
    LOOP_CAP_OPTION,
    { name: 'negotiable', value: 'REF,...', help: 'contract references, clauses or lane keys (FROM>TO|ref|n) whose rebates may change' },
    ...CALENDAR_AUDIT_OPTIONS,
    { name: 'loops-csv', value: 'FILE', help: 'also write one row per lane of each loop to FILE' },
    { name: 'progress', help: 'print progress by phase on stderr' },
    JSON_OPTION,
    OUT_OPTION,
    TIMINGS_OPTION,
    ...PLANNING_OPTIONS,
  ],
  run: runAudit,
};

function runAudit(args: ParsedArgs, out: CommandOutput): number {
  if (!args.values.has('date')) return runCalendarAudit(args, out);
  for (const { name } of CALENDAR_AUDIT_OPTIONS) {
    if (args.values.has(name)) throw new UsageError(`--${name} belongs to the calendar review; leave out --date to review the whole calendar`);
  }
  const loopCap = wholeNumberOption(args, 'loop-cap', 1);
  const negotiable = (args.values.get('negotiable') ?? '').split(',').map((s) => s.trim()).filter((s) => s !== '');
  const loopsCsv = args.values.get('loops-csv');

  const readStart = performance.now();
  const imported = loadImport(args);
  const network = imported.network;
  // Lane keys as scenarios name them: counted over the file's rows, not the day's network.
  const rowKeys = overlayKeys(imported);
  const laneKeys = Array.from(imported.plan.laneRecord, (r) => rowKeys[r]);
  const readMs = performance.now() - readStart;

  const solveStart = performance.now();
  const audit = auditNetwork(network, {
    loopCap,
    negotiable,
    laneKeys,
    onProgress: auditProgress(args, out),
  });
  const solveMs = performance.now() - solveStart;

  for (const name of audit.negotiableUnmatched ?? []) out.warn(`--negotiable: no lane has the contract reference or lane key "${name}"; it marks nothing`);
  const report = auditReport(network, audit);
  out.write(args.flags.has('json') ? JSON.stringify({ review: 'day', date: planDateOf(args).date, ...report }) + '\n' : formatCsvRows(auditLaneRows(network, report)));
  if (loopsCsv) out.writeFile(loopsCsv, formatCsvRows(auditLoopRows(network, report)));
  if (args.flags.has('timings')) out.timing({ read_ms: readMs, audit_ms: solveMs, depots: network.depotCount, lanes: network.laneCount });

  if (report.loops.length > 0) {
    out.warn(
      `WARNING: ${report.loops.length}${report.loop_cap_reached ? '+' : ''} rebate loop(s) in the network: costs through them are unbounded and the contract terms need fixing`,
    );
    if (report.loop_cap_reached) out.warn(`WARNING: more loops exist than the ${report.loops.length} reported (raise --loop-cap to see them)`);
    if (report.fix_plan_verified) {
      out.warn(`fix plan: ${report.fix_plan.length} rebate cut(s) remove every loop (checked by solving the changed network); headroom is computed after the fix plan`);
    } else if (report.fix_plan_incomplete) {
      out.warn(`WARNING: the fix plan stopped after ${report.fix_plan.length} lane change(s) with loops left; headroom is not available`);
    } else {
      out.warn(`WARNING: no rebate cut can fix ${report.unfixable_loops.length} loop(s) (no lane on them carries a rebate); headroom is not available`);
    }
  }
  return 0;
}
