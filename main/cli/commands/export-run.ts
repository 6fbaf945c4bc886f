// `lanewright export`: writes the lanes CSV (every row, class and validity window of the file), the
// routes CSV from an origin, the loops CSV and a GeoJSON of depots, routes and loops; options choose
// which. With --scenario every file describes the contract as the scenario changes it, through the
// engine's overlay (engine/scenario/overlay.ts) as in the app. Every file is written atomically.
// The command's work; its option table is in export.ts (engine-free), so this module loads only when it runs.

import { findDistinctLoops } from '../../../engine/index';
import { geoJsonText } from '../../../engine/index';
import { lanesCsv, type LanesExportInput } from '../../../engine/index';
import { loopsCsv } from '../../../engine/index';
import { routesCsvChunks, routesReportStream, type RoutesReportStream } from '../../../engine/index';
import { networkGeoJson } from '../../../engine/index';
import { depotIndexOf } from '../../../engine/index';
import { routesReport, type RoutesReport } from '../../../engine/index';
import { cheapestRoutes } from '../../../engine/index';
import { parseScenarioDocument, scenarioImport } from '../../../engine/index';
import type { Network } from '../../../engine/index';
import { UsageError, type ParsedArgs } from '../args';
import { readTextFile } from '../files';
import { exportSettingsOf, loadImport } from '../load-network';
import { inCsvDialect } from '../csv-dialect-option';
import type { CommandOutput } from '../run';
import { counted } from '../../../engine/index';

export function runExport(args: ParsedArgs, out: CommandOutput): number {
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
  let routes: RoutesReportStream | undefined;
  if (originId) {
    const solved = cheapestRoutes(network, depotIndexOf(network, originId, '--from'));
    const driveLimitMinutes = imported.plan.settings.drivingLimit.dailyDrivingMinutes;
    // The routes CSV is written as a stream of rows, as `routes --out` writes it, so its size never
    // has to fit in memory; only the GeoJSON, which places every route, takes the whole report.
    routes = routesReportStream(network, solved, { driveLimitMinutes });
    if (geojsonOut) report = routesReport(network, solved, { driveLimitMinutes });
  }
  const loops = findDistinctLoops(network).loops;
  if (lanesOut) {
    const rows = lanes.lanes.count - (lanes.leaveOut ? lanes.leaveOut.reduce((n, x) => n + x, 0) : 0);
    out.writeFile(lanesOut, inCsvDialect(args, lanesCsv(lanes, loops)), `lanes: ${lanesOut} (${counted(rows, 'lane row')}, ${network.laneCount} planned for ${imported.plan.date ?? 'any date'})`);
  }
  if (routesOut && routes) {
    const file = out.openFile(routesOut, `routes from ${originId}: ${routesOut} (${counted(routes.depots.length, 'depot')})`);
    // Another dialect re-writes the whole table (its numeric columns are judged over every row).
    if (!args.values.has('csv-dialect')) for (const chunk of routesCsvChunks(routes)) file.write(chunk);
    else file.write(inCsvDialect(args, [...routesCsvChunks(routes)].join('')));
  }
  if ((routesOut || lanesOut || geojsonOut) && routes) out.afterOutput(`CAUTION: ${routes.tail.caution}`);
  if (loopsOut) out.writeFile(loopsOut, inCsvDialect(args, loopsCsv(network, loops)), `loops: ${loopsOut} (${counted(loops.length, 'loop')})`);
  // The GeoJSON says what it was made from, as the app's export does (engine/export/export-settings.ts).
  const settings = exportSettingsOf(args, imported.plan, scenario ? scenario.name : null);
  if (geojsonOut) out.writeFile(geojsonOut, geoJsonText(networkGeoJson(network, { report, loops, settings })), `GeoJSON: ${geojsonOut}`);
  if (loops.length > 0) out.warn(`WARNING: ${counted(loops.length, 'rebate loop')} in the network; the contract terms need fixing (see the loops export)`);
  return 0;
}
