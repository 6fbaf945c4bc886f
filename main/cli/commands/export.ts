// `lanewright export`: writes the lanes CSV, the routes CSV from an origin, the loops CSV and a
// GeoJSON of depots, routes and loops; options choose which. Every file is written atomically.

import { findDistinctLoops } from '../../../engine/index';
import { geoJsonText } from '../../../engine/index';
import { lanesCsv } from '../../../engine/index';
import { loopsCsv } from '../../../engine/index';
import { routesCsvChunks, routesReportStream } from '../../../engine/index';
import { networkGeoJson } from '../../../engine/index';
import { depotIndexOf } from '../../../engine/index';
import { routesReport, type RoutesReport } from '../../../engine/index';
import { cheapestRoutes } from '../../../engine/index';
import { UsageError, type ParsedArgs } from '../args';
import { LOAD_NETWORK_FLAGS, loadImport } from '../load-network';
import type { CommandOutput } from '../run';

export const exportFlags = [...LOAD_NETWORK_FLAGS];

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

  const imported = loadImport(args);
  const network = imported.network;
  const solved = originId ? cheapestRoutes(network, depotIndexOf(network, originId, '--from')) : undefined;
  const driveLimitMinutes = imported.plan.settings.drivingLimit.dailyDrivingMinutes;
  // The GeoJSON draws every route, so it needs the whole report; the routes CSV is streamed.
  const report: RoutesReport | undefined = solved && geojsonOut ? routesReport(network, solved, { driveLimitMinutes }) : undefined;
  const loops = findDistinctLoops(network).loops;
  if (lanesOut) out.writeFile(lanesOut, lanesCsv(imported, loops), `lanes: ${lanesOut} (${network.laneCount} lane(s))`);
  if (routesOut && solved) out.writeFile(routesOut, routesCsvChunks(routesReportStream(network, solved, { driveLimitMinutes })), `routes from ${originId}: ${routesOut} (${network.depotCount} depot(s))`);
  if (loopsOut) out.writeFile(loopsOut, loopsCsv(network, loops), `loops: ${loopsOut} (${loops.length} loop(s))`);
  if (geojsonOut) out.writeFile(geojsonOut, geoJsonText(networkGeoJson(network, { report, loops })), `GeoJSON: ${geojsonOut}`);
  if (loops.length > 0) out.warn(`WARNING: ${loops.length} rebate loop(s) in the network; the contract terms need fixing (see the loops export)`);
  return 0;
}
