// `lanewright export`: writes the lanes CSV (every row, class and validity window of the file), the
// routes CSV from an origin, the loops CSV and a GeoJSON of depots, routes and loops; options choose
// which. With --scenario every file describes the contract as the scenario changes it, through the
// engine's overlay (engine/scenario/overlay.ts) as in the app. Every file is written atomically.
// This file holds the option table and help; the work is in export-run.ts, imported only when it runs, so
// `--help` never loads the engine.

import { NETWORK_FILES, PLANNING_OPTIONS, CSV_DIALECT_OPTION, type CommandSpec } from '../options';

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
  load: async () => (await import('./export-run')).runExport,
};
