// The routes command as it was before the linear report, for the bench baseline: read and solve as
// the CLI does, then one path walk per depot for the breakdown (routePath + routeBreakdown), every row
// kept in memory, the whole output built as one string and written at once.
//   node --import tsx test/bench/routes-path-walk-command.ts DEPOTS LANES ORIGIN paths|no-paths csv|json OUT
// Prints one JSON line of timings on stderr.

import { writeFileSync } from 'node:fs';
import { formatCsvRows } from '../../engine/io/csv-papaparse';
import { formatMinor, type Minor } from '../../engine/money/minor';
import { routeBreakdown } from '../../engine/planning/route-breakdown';
import { cheapestRoutes, STATUS_REACHABLE, statusName } from '../../engine/routes/cheapest-routes';
import { routePath } from '../../engine/routes/route-path';
import { loadImport } from '../../main/cli/load-network';

const [depotsFile, lanesFile, originId, pathMode, format, outFile] = process.argv.slice(2);
const paths = pathMode === 'paths';
const readStart = performance.now();
const imported = loadImport({ command: 'routes', values: new Map([['depots', depotsFile], ['lanes', lanesFile], ['date', '2026-06-01']]), flags: new Set(), now: new Date() });
const network = imported.network;
const readMs = performance.now() - readStart;
const solveStart = performance.now();
const tree = cheapestRoutes(network, network.depotIndex.get(originId)!);
const solveMs = performance.now() - solveStart;

const reportStart = performance.now();
const money = (v: number) => formatMinor(v as Minor, network.exponent);
const limit = imported.plan.settings.drivingLimit.dailyDrivingMinutes;
const rows = [];
for (let d = 0; d < network.depotCount; d++) {
  const reachable = tree.status[d] === STATUS_REACHABLE;
  const path = reachable ? routePath(network, tree, d) : null;
  const b = path ? routeBreakdown(network, path.lanes, limit) : null;
  rows.push({
    id: network.depotIds[d],
    name: network.depotNames[d],
    status: statusName(tree.status[d]),
    cost_minor: reachable ? tree.cost[d] : null,
    cost: reachable ? money(tree.cost[d]) : null,
    legs: reachable ? tree.legs[d] : null,
    ...(paths
      ? {
          path: path ? path.depots.map((x) => network.depotIds[x]) : [],
          lanes: path ? path.lanes.map((e) => network.laneRow[e]) : [],
          refs: path ? path.lanes.map((e) => network.laneRef[e] ?? '') : [],
        }
      : {}),
    breakdown: b && { toll: money(b.toll ?? 0), fuel: money(b.fuel ?? 0), fees: money(b.fees ?? 0), rebate: money(b.rebate ?? 0), distance_km: b.distanceKm, drive_minutes: b.driveMinutes, over_drive_limit: b.overDriveLimit },
  });
}
const reportMs = performance.now() - reportStart;

const writeStart = performance.now();
const text =
  format === 'json'
    ? JSON.stringify({ origin: originId, currency: network.currency, depots: rows }) + '\n'
    : formatCsvRows(
        rows.map((r) => {
          const b = r.breakdown;
          const walked = r as { path?: string[]; lanes?: number[] };
          return [r.id, r.name, r.status, r.cost ?? '', r.legs ?? '', ...(paths ? [walked.path!.join('>')] : []), b?.toll ?? '', b?.fuel ?? '', b?.fees ?? '', b?.rebate ?? '', b?.distance_km ?? '', b?.drive_minutes ?? '', ...(paths ? [walked.lanes!.join('>')] : [])];
        }),
      );
writeFileSync(outFile, text);
const writeMs = performance.now() - writeStart;
process.stderr.write(JSON.stringify({ read_ms: readMs, solve_ms: solveMs, report_ms: reportMs, write_ms: writeMs }) + '\n');
