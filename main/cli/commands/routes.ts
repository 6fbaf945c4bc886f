// `lanewright routes`: cheapest routes from one depot with each route's breakdown, as CSV (default)
// or JSON; --out writes it to a file. Rows are written as they are made (routesCsvChunks,
// routesJsonChunks), so memory follows the depot count, never the output's size. --no-paths leaves
// out each route's path; --to lists only the named depots. Input problems stop it unless --skip-invalid.
// This file holds the option table and help; the work is in routes-run.ts, imported only when it runs, so
// `--help` never loads the engine.

import { NETWORK_FILES, PLANNING_OPTIONS, JSON_OPTION, OUT_OPTION, TIMINGS_OPTION, CSV_DIALECT_OPTION, type CommandSpec } from '../options';

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
    { name: 'to', value: 'ID,...', help: 'only these destination depots (comma-separated ids)' },
    { name: 'no-paths', help: 'leave out each route\'s path, lane rows and refs (via and via_lane still give the whole tree)' },
    JSON_OPTION,
    CSV_DIALECT_OPTION,
    OUT_OPTION,
    TIMINGS_OPTION,
    ...PLANNING_OPTIONS,
  ],
  load: async () => (await import('./routes-run')).runRoutes,
};
