// `lanewright export`: writes the lanes CSV, the routes CSV from an origin, the loops CSV and a
// GeoJSON of depots, routes and loops; options choose which. Every file is written atomically.

import { findDistinctLoops } from '../../../engine/index';
import { geoJsonText } from '../../../engine/index';
import { lanesCsv } from '../../../engine/index';
import { loopsCsv } from '../../../engine/index';
import { routesCsv } from '../../../engine/index';
import { networkGeoJson } from '../../../engine/index';
import { depotIndexOf } from '../../../engine/index';
import { routesReport, type RoutesReport } from '../../../engine/index';
import { cheapestRoutes } from '../../../engine/index';
import { UsageError, type ParsedArgs } from '../args';
import { loadImport } from '../load-network';
import { CSV_DIALECT_OPTION, NETWORK_FILES, PLANNING_OPTIONS, type CommandSpec } from '../options';
import { inCsvDialect } from '../csv-dialect-option';
import type { CommandOutput } from '../run';

export const exportCommand: CommandSpec = {
  name: 'export',
  summary: 'write the lanes, routes and loops as CSV and the network as GeoJSON',
  details:
    'Writes each file asked for, atomically (a failed run leaves the old file as it was): the planned lanes CSV,\n' +
    'the routes from --from as CSV, the rebate loops CSV and a GeoJSON of depots, routes and loops (RFC 7946).\n' +
    'CSV files are RFC 4180 UTF-8 and read back as the same network.',
  example: 'lanewright export --depots sample-data/depots.csv --lanes sample-data/lanes.csv --from RTM --date 2026-06-01 --routes-out routes.csv --geojson-out network.geojson',
  options: [
    ...NETWORK_FILES,
    { name: 'from', value: 'DEPOT_ID', help: 'origin of the routes (needed by --routes-out)' },
    { name: 'lanes-out', value: 'FILE', help: 'write the planned lanes CSV' },
    { name: 'routes-out', value: 'FILE', help: 'write the routes from --from as CSV' },
    { name: 'loops-out', value: 'FILE', help: 'write the rebate loops CSV' },
    { name: 'geojson-out', value: 'FILE', help: 'write depots, routes and loops as GeoJSON' },
    CSV_DIALECT_OPTION,
    ...PLANNING_OPTIONS,
  ],
  run: runExport,
};

function runExport(args: ParsedArgs, out: CommandOutput): number {
  const lanesOut = args.values.get('lanes-out');
  const routesOut = args.values.get('routes-out');
  const loopsOut = args.values.get('loops-out');
  const geojsonOut = args.values.get('geojson-out');
  if (!lanesOut && !routesOut && !loopsOut && !geojsonOut) {
    throw new UsageError('export needs at least one of --lanes-out, --routes-out, --loops-out, --geojson-out');
  }
  const originId = args.values.get('from');
  if (routesOut && !originId) throw new UsageError('--routes-out needs --from DEPOT_ID');

  const imported = loadImport(args);
  const network = imported.network;
  let report: RoutesReport | undefined;
  if (originId) {
    const solved = cheapestRoutes(network, depotIndexOf(network, originId, '--from'));
    report = routesReport(network, solved, { driveLimitMinutes: imported.plan.settings.drivingLimit.dailyDrivingMinutes });
  }
  const loops = findDistinctLoops(network).loops;
  if (lanesOut) out.writeFile(lanesOut, inCsvDialect(args, lanesCsv(imported, loops)), `lanes: ${lanesOut} (${network.laneCount} lane(s))`);
  if (routesOut && report) out.writeFile(routesOut, inCsvDialect(args, routesCsv(report)), `routes from ${originId}: ${routesOut} (${report.depots.length} depot(s))`);
  if ((routesOut || lanesOut || geojsonOut) && report) out.afterOutput(`CAUTION: ${report.caution}`);
  if (loopsOut) out.writeFile(loopsOut, inCsvDialect(args, loopsCsv(network, loops)), `loops: ${loopsOut} (${loops.length} loop(s))`);
  if (geojsonOut) out.writeFile(geojsonOut, geoJsonText(networkGeoJson(network, { report, loops })), `GeoJSON: ${geojsonOut}`);
  if (loops.length > 0) out.warn(`WARNING: ${loops.length} rebate loop(s) in the network; the contract terms need fixing (see the loops export)`);
  return 0;
}
