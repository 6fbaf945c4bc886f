// `lanewright routes`: cheapest routes from one depot with each route's breakdown, as CSV (default)
// or JSON; --out writes it to a file. Rows are written as they are made (routesCsvChunks,
// routesJsonChunks), so memory follows the depot count, never the output's size. --no-paths leaves
// out each route's path; --to lists only the named depots. Input problems stop it unless --skip-invalid.
// The command's work; its option table is in routes.ts (engine-free), so this module loads only when it runs.

import { depotIndexOf } from '../../../engine/index';
import { cheapestRoutes } from '../../../engine/index';
import { legLimitedRoutes } from '../../../engine/index';
import { routesReportStream } from '../../../engine/index';
import { routesCsvChunks, routesJsonChunks } from '../../../engine/index';
import type { Network, PlanningSettings } from '../../../engine/index';
import { required, wholeNumberOption, type ParsedArgs } from '../args';
import { exportSettingsOf, loadImport, planDateOf } from '../load-network';
import { csvDialectOption, inCsvDialect } from '../csv-dialect-option';
import type { CommandOutput } from '../run';
import { counted, plural } from '../../../engine/index';

/** Depot indices named by --to (comma-separated ids, in the order given, repeats dropped); undefined = all. */
function targetDepots(network: Network, args: ParsedArgs): number[] | undefined {
  const text = args.values.get('to');
  if (text === undefined) return undefined;
  const seen = new Set<number>();
  for (const id of text.split(',')) seen.add(depotIndexOf(network, id.trim(), '--to'));
  return [...seen];
}

/**
 * The network and the planning settings, and nothing else of the import: the lane table, the depot
 * records and the plan's columns are garbage once this returns, so the solve, the report and the
 * writing reuse their memory (about as much as the network again on a million lanes).
 */
function networkOnly(args: ParsedArgs): { network: Network; settings: PlanningSettings; plan: { date: string | null; vehicleClass: string | null } } {
  const imported = loadImport(args);
  return { network: imported.network, settings: imported.plan.settings, plan: { date: imported.plan.date, vehicleClass: imported.plan.vehicleClass } };
}

export function runRoutes(args: ParsedArgs, out: CommandOutput): number {
  const originId = required(args, 'from');
  const maxLegs = wholeNumberOption(args, 'max-legs', 0);
  csvDialectOption(args); // a wrong name is refused before any file is read

  const readStart = performance.now();
  const { network, settings, plan } = networkOnly(args);
  const origin = depotIndexOf(network, originId, `--from`);
  const depots = targetDepots(network, args);
  const readMs = performance.now() - readStart;

  const solveStart = performance.now();
  const solved = maxLegs === undefined ? cheapestRoutes(network, origin) : legLimitedRoutes(network, origin, maxLegs);
  const solveMs = performance.now() - solveStart;

  const reportStart = performance.now();
  const report = routesReportStream(network, solved, {
    driveLimitMinutes: settings.drivingLimit.dailyDrivingMinutes,
    paths: !args.flags.has('no-paths'),
    depots,
  });
  const reportMs = performance.now() - reportStart;

  const writeStart = performance.now();
  if (args.flags.has('json')) for (const chunk of routesJsonChunks(report, undefined, { date: planDateOf(args).date, settings: exportSettingsOf(args, plan, null) })) out.write(chunk);
  else if (!args.values.has('csv-dialect')) for (const chunk of routesCsvChunks(report)) out.write(chunk);
  // Another dialect re-writes the whole table (its numeric columns are judged over every row), so
  // only then is the CSV held in memory at once.
  else out.write(inCsvDialect(args, [...routesCsvChunks(report)].join('')));
  const writeMs = performance.now() - writeStart;
  if (args.flags.has('timings')) {
    out.timing({ read_ms: readMs, solve_ms: solveMs, report_ms: reportMs, write_ms: writeMs, depots: network.depotCount, lanes: network.laneCount, rows: report.depots.length });
  }
  const { over_drive_limit: over, caution, loops } = report.tail;
  if (over > 0) {
    const limit = settings.drivingLimit;
    out.warn(`CAUTION: ${counted(over, 'route')} ${plural(over, 'exceeds', 'exceed')} the ${limit.rule.toUpperCase()} daily driving limit of ${limit.dailyDrivingMinutes / 60} h (over_drive_limit column). ${report.tail.drive_limit_caution}`);
  }
  // The CSV's companion text: the caution goes with every output, on stderr beside the CSV.
  out.afterOutput(`CAUTION: ${caution}`);
  if (loops.length > 0) {
    out.warn(`WARNING: ${counted(loops.length, 'rebate loop')} ${plural(loops.length, 'makes', 'make')} costs from ${originId} unbounded; the contract terms need fixing (see loops in --json output)`);
  }
  return 0;
}
