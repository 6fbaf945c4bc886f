// `lanewright compare`: a what-if scenario against the base from one origin: each depot's cost
// before and after, the routes that changed and the rebate loops that appear or disappear.
// Changes that no longer fit the lanes file are printed as warnings; the scenario file is never rewritten.
// The scenario goes through the engine's overlay (engine/scenario/overlay.ts), as in the app.
// This file holds the option table and help; the work is in compare-run.ts, imported only when it runs, so
// `--help` never loads the engine.

import { NETWORK_FILES, PLANNING_OPTIONS, JSON_OPTION, OUT_OPTION, LOOP_CAP_OPTION, CSV_DIALECT_OPTION, type CommandSpec } from '../options';

export const compareCommand: CommandSpec = {
  name: 'compare',
  summary: 'a what-if scenario file against the lanes as they are, from one origin',
  details:
    'Applies the scenario\'s changes (amounts, closed or added lanes, validity) and prints each depot\'s cost\n' +
    'before and after and whether its route changed, as CSV or one JSON object with --json; rebate loops the\n' +
    'scenario creates or removes are named on stderr. The scenario file is never rewritten.',
  example: 'lanewright compare --depots sample-data/depots.csv --lanes sample-data/lanes-rebate-loop.csv --scenario sample-data/what-if-clause-7-2.json --from RTM --date 2026-06-01',
  options: [
    ...NETWORK_FILES,
    { name: 'scenario', value: 'FILE', help: 'scenario JSON file (lanewright-scenario)', required: true },
    { name: 'from', value: 'DEPOT_ID', help: 'origin depot', required: true },
    LOOP_CAP_OPTION,
    JSON_OPTION,
    CSV_DIALECT_OPTION,
    OUT_OPTION,
    ...PLANNING_OPTIONS,
  ],
  load: async () => (await import('./compare-run')).runCompare,
};
