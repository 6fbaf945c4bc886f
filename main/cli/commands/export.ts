// `lanewright export`: writes the lanes CSV (every row, class and validity window of the file), the
// routes CSV from an origin, the loops CSV and a GeoJSON of depots, routes and loops; options choose
// which. With --scenario every file describes the contract as the scenario changes it, through the
// engine's overlay (engine/scenario/overlay.ts) as in the app. Every file is written atomically.

import { findDistinctLoops } from '../../../engine/index';
import { geoJsonText } from '../../../engine/index';
import { lanesCsv, type LanesExportInput } from '../../../engine/index';
import { loopsCsv } from '../../../engine/index';
import { routesCsv } from '../../../engine/index';
import { networkGeoJson } from '../../../engine/index';
import { depotIndexOf } from '../../../engine/index';
import { routesReport, type RoutesReport } from '../../../engine/index';
import { cheapestRoutes } from '../../../engine/index';
import { parseScenarioDocument, scenarioImport } from '../../../engine/index';
import type { Network } from '../../../engine/index';
import { UsageError, type ParsedArgs } from '../args';
import { readTextFile } from '../files';
import { loadImport } from '../load-network';
import { CSV_DIALECT_OPTION, NETWORK_FILES, PLANNING_OPTIONS, type CommandSpec } from '../options';
import { inCsvDialect } from '../csv-dialect-option';
import type { CommandOutput } from '../run';
import { counted } from '../../../engine/index';

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
    { name: 'scenario', value: 'FILE', help: 'lay this scenario file over the lanes before exporting' },
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
  const scenarioPath = args.values.get('scenario');
  const scenario = scenarioPath === undefined ? null : parseScenarioDocument(readTextFile(scenarioPath), scenarioPath);

  const imported = loadImport(args);
  let network: Network = imported.network;
  let lanes: LanesExportInput = imported;
  if (scenario) {
    const what = scenarioImport(imported, scenario);
    for (const p of what.overlay.problems) out.warn(`scenario ${scenarioPath}: ${p.message}; the change is kept in the scenario but not applied (code ${p.code})`);
    network = what.network;
    lanes = what;
  }
  let report: RoutesReport | undefined;
  if (originId) {
    const solved = cheapestRoutes(network, depotIndexOf(network, originId, '--from'));
    report = routesReport(network, solved, { driveLimitMinutes: imported.plan.settings.drivingLimit.dailyDrivingMinutes });
  }
  const loops = findDistinctLoops(network).loops;
  if (lanesOut) {
    const rows = lanes.lanes.count - (lanes.leaveOut ? lanes.leaveOut.reduce((n, x) => n + x, 0) : 0);
    out.writeFile(lanesOut, inCsvDialect(args, lanesCsv(lanes, loops)), `lanes: ${lanesOut} (${counted(rows, 'lane row')}, ${network.laneCount} planned for ${imported.plan.date ?? 'any date'})`);
  }
  if (routesOut && report) out.writeFile(routesOut, inCsvDialect(args, routesCsv(report)), `routes from ${originId}: ${routesOut} (${counted(report.depots.length, 'depot')})`);
  if ((routesOut || lanesOut || geojsonOut) && report) out.afterOutput(`CAUTION: ${report.caution}`);
  if (loopsOut) out.writeFile(loopsOut, inCsvDialect(args, loopsCsv(network, loops)), `loops: ${loopsOut} (${counted(loops.length, 'loop')})`);
  if (geojsonOut) out.writeFile(geojsonOut, geoJsonText(networkGeoJson(network, { report, loops })), `GeoJSON: ${geojsonOut}`);
  if (loops.length > 0) out.warn(`WARNING: ${counted(loops.length, 'rebate loop')} in the network; the contract terms need fixing (see the loops export)`);
  return 0;
}
