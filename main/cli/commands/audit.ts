// `lanewright audit`: the contract review of the whole network, independent of any origin: every
// distinct rebate loop, a verified fix plan and the rebate headroom of every lane, as CSV (one row per
// lane) or JSON; --loops-csv also writes one row per lane of each loop.

import { auditNetwork, overlayKeys } from '../../../engine/index';
import { auditLaneRows, auditLoopRows, auditReport } from '../../../engine/index';
import { formatCsvRows } from '../../../engine/index';
import { wholeNumberOption, type ParsedArgs } from '../args';
import { loadImport, planDateOf } from '../load-network';
import { CSV_DIALECT_OPTION, JSON_OPTION, LOOP_CAP_OPTION, NETWORK_FILES, OUT_OPTION, PLANNING_OPTIONS, TIMINGS_OPTION, type CommandSpec } from '../options';
import { csvDialectOption, inCsvDialect } from '../csv-dialect-option';
import type { CommandOutput } from '../run';

export const auditCommand: CommandSpec = {
  name: 'audit',
  summary: 'contract review of the whole network: rebate loops, a verified fix plan, rebate headroom per lane',
  details:
    'Finds the distinct rebate loops (up to --loop-cap), a set of rebate cuts that removes them all (checked by\n' +
    'solving again) and how far each lane\'s rebate can grow before a loop appears. Prints one CSV row per lane,\n' +
    'or one JSON object with --json; --loops-csv also writes one row per lane of each loop.',
  example: 'lanewright audit --depots sample-data/depots.csv --lanes sample-data/lanes.csv --date 2026-06-01 --negotiable K-2',
  options: [
    ...NETWORK_FILES,
    LOOP_CAP_OPTION,
    { name: 'negotiable', value: 'REF,...', help: 'contract references or lane keys (FROM>TO|ref|n) whose rebates may change' },
    { name: 'loops-csv', value: 'FILE', help: 'also write one row per lane of each loop to FILE' },
    { name: 'progress', help: 'print progress by phase on stderr' },
    JSON_OPTION,
    CSV_DIALECT_OPTION,
    OUT_OPTION,
    TIMINGS_OPTION,
    ...PLANNING_OPTIONS,
  ],
  run: runAudit,
};

function runAudit(args: ParsedArgs, out: CommandOutput): number {
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
  out.write(args.flags.has('json') ? JSON.stringify({ date: planDateOf(args).date, ...report }) + '\n' : inCsvDialect(args, formatCsvRows(auditLaneRows(network, report))));
  if (loopsCsv) out.writeFile(loopsCsv, inCsvDialect(args, formatCsvRows(auditLoopRows(network, report))));
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
