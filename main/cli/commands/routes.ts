// `lanewright routes`: cheapest routes from one depot with each route's breakdown, as CSV (default)
// or JSON; --out writes the routes CSV to a file. Input problems stop it unless --skip-invalid.

import { depotIndexOf } from '../../../engine/index';
import { cheapestRoutes } from '../../../engine/index';
import { legLimitedRoutes } from '../../../engine/index';
import { routesReport } from '../../../engine/index';
import { routesCsv } from '../../../engine/index';
import { required, wholeNumberOption, type ParsedArgs } from '../args';
import { loadImport, planDateOf } from '../load-network';
import { CSV_DIALECT_OPTION, JSON_OPTION, NETWORK_FILES, OUT_OPTION, PLANNING_OPTIONS, TIMINGS_OPTION, type CommandSpec } from '../options';
import { csvDialectOption, inCsvDialect } from '../csv-dialect-option';
import type { CommandOutput } from '../run';

export const routesCommand: CommandSpec = {
  name: 'routes',
  summary: 'cheapest routes from one depot to every other, with each route\'s cost breakdown',
  details:
    'Prints one CSV row per depot (status reachable, unreachable or unbounded; cost, legs, path, tolls, fuel,\n' +
    'fees, rebates, distance, drive time), or one JSON object with --json. Rebate loops that make costs\n' +
    'unbounded are named on stderr. Exit status 0, 1 for bad input, 2 for a mistake on the command line.',
  example: 'lanewright routes --depots sample-data/depots.csv --lanes sample-data/lanes.csv --from RTM --date 2026-06-01',
  options: [
    ...NETWORK_FILES,
    { name: 'from', value: 'DEPOT_ID', help: 'origin depot', required: true },
    { name: 'max-legs', value: 'K', help: 'routes of at most K lanes' },
    JSON_OPTION,
    CSV_DIALECT_OPTION,
    OUT_OPTION,
    TIMINGS_OPTION,
    ...PLANNING_OPTIONS,
  ],
  run: runRoutes,
};

function runRoutes(args: ParsedArgs, out: CommandOutput): number {
  const originId = required(args, 'from');
  const maxLegs = wholeNumberOption(args, 'max-legs', 0);
  csvDialectOption(args); // a wrong name is refused before any file is read

  const readStart = performance.now();
  const imported = loadImport(args);
  const network = imported.network;
  const origin = depotIndexOf(network, originId, `--from`);
  const readMs = performance.now() - readStart;

  const solveStart = performance.now();
  const solved = maxLegs === undefined ? cheapestRoutes(network, origin) : legLimitedRoutes(network, origin, maxLegs);
  const solveMs = performance.now() - solveStart;

  const report = routesReport(network, solved, { driveLimitMinutes: imported.plan.settings.drivingLimit.dailyDrivingMinutes });
  out.write(args.flags.has('json') ? JSON.stringify({ date: planDateOf(args).date, ...report }) + '\n' : inCsvDialect(args, routesCsv(report)));
  if (args.flags.has('timings')) {
    out.timing({ read_ms: readMs, solve_ms: solveMs, depots: network.depotCount, lanes: network.laneCount });
  }
  if (report.over_drive_limit > 0) {
    const limit = imported.plan.settings.drivingLimit;
    out.warn(`CAUTION: ${report.over_drive_limit} route(s) exceed the ${limit.rule.toUpperCase()} daily driving limit of ${limit.dailyDrivingMinutes / 60} h (over_drive_limit column). ${report.drive_limit_caution}`);
  }
  // The CSV's companion text: the caution goes with every output, on stderr beside the CSV.
  out.afterOutput(`CAUTION: ${report.caution}`);
  if (report.loops.length > 0) {
    out.warn(`WARNING: ${report.loops.length} rebate loop(s) make costs from ${originId} unbounded; the contract terms need fixing (see loops in --json output)`);
  }
  return 0;
}
