// `lanewright routes`: cheapest routes from one depot with each route's breakdown, as CSV (default)
// or JSON; --out writes the routes CSV to a file. Input problems stop it unless --skip-invalid.

import { depotIndexOf } from '../../../engine/index';
import { cheapestRoutes } from '../../../engine/index';
import { legLimitedRoutes } from '../../../engine/index';
import { routesReport } from '../../../engine/index';
import { routesCsv } from '../../../engine/index';
import { required, wholeNumberOption, type ParsedArgs } from '../args';
import { LOAD_NETWORK_FLAGS, loadImport } from '../load-network';
import type { CommandOutput } from '../run';

export const routesFlags = ['json', 'timings', ...LOAD_NETWORK_FLAGS];

export function runRoutes(args: ParsedArgs, out: CommandOutput): number {
  const originId = required(args, 'from');
  const maxLegs = wholeNumberOption(args, 'max-legs', 0);

  const readStart = performance.now();
  const imported = loadImport(args);
  const network = imported.network;
  const origin = depotIndexOf(network, originId, `--from`);
  const readMs = performance.now() - readStart;

  const solveStart = performance.now();
  const solved = maxLegs === undefined ? cheapestRoutes(network, origin) : legLimitedRoutes(network, origin, maxLegs);
  const solveMs = performance.now() - solveStart;

  const report = routesReport(network, solved, { driveLimitMinutes: imported.plan.settings.drivingLimit.dailyDrivingMinutes });
  out.write(args.flags.has('json') ? JSON.stringify(report) + '\n' : routesCsv(report));
  if (args.flags.has('timings')) {
    out.timing({ read_ms: readMs, solve_ms: solveMs, depots: network.depotCount, lanes: network.laneCount });
  }
  if (report.over_drive_limit > 0) {
    const limit = imported.plan.settings.drivingLimit;
    out.warn(`CAUTION: ${report.over_drive_limit} route(s) exceed the ${limit.rule.toUpperCase()} daily driving limit of ${limit.dailyDrivingMinutes / 60} h (over_drive_limit column). ${report.caution}`);
  }
  if (report.loops.length > 0) {
    out.warn(`WARNING: ${report.loops.length} rebate loop(s) make costs from ${originId} unbounded; the contract terms need fixing (see loops in --json output)`);
  }
  return 0;
}
