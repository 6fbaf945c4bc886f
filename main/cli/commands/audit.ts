// `lanewright audit --date D`: the contract review of one day's network, independent of any origin:
// every distinct rebate loop, a verified fix plan and the rebate headroom of every lane, as CSV (one
// row per lane) or JSON; --loops-csv also writes one row per lane of each loop. Without --date the
// command reviews the whole calendar (audit-calendar.ts).

import { auditNetwork } from '../../../engine/index';
import { auditLaneRows, auditLoopRows, auditReport } from '../../../engine/index';
import { formatCsvRows } from '../../../engine/index';
import { UsageError, wholeNumberOption, type ParsedArgs } from '../args';
import { CALENDAR_AUDIT_OPTIONS, runCalendarAudit } from './audit-calendar';
import { loadNetwork, LOAD_NETWORK_FLAGS } from '../load-network';
import type { CommandOutput } from '../run';

export const auditFlags = ['json', 'progress', 'timings', ...LOAD_NETWORK_FLAGS];

export function runAudit(args: ParsedArgs, out: CommandOutput): number {
  if (!args.values.has('date')) return runCalendarAudit(args, out);
  for (const name of CALENDAR_AUDIT_OPTIONS) {
    if (args.values.has(name)) throw new UsageError(`--${name} belongs to the calendar review; leave out --date to review the whole calendar`);
  }
  const loopCap = wholeNumberOption(args, 'loop-cap', 1);
  const negotiable = (args.values.get('negotiable') ?? '').split(',').map((s) => s.trim()).filter((s) => s !== '');
  const loopsCsv = args.values.get('loops-csv');

  const readStart = performance.now();
  const network = loadNetwork(args);
  const readMs = performance.now() - readStart;

  let lastLine = '';
  const solveStart = performance.now();
  const audit = auditNetwork(network, {
    loopCap,
    negotiable,
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
  const dayReport = { review: 'day' as const, date: args.values.get('date'), ...report };
  out.write(args.flags.has('json') ? JSON.stringify(dayReport) + '\n' : formatCsvRows(auditLaneRows(network, report)));
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
