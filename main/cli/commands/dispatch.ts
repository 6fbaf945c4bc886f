// `lanewright dispatch`: the day's loads, each on its own vehicle, over the network's lanes with the
// vehicles' limits: status, cost, what the limits cost, what blocks a load, alternatives and totals,
// as CSV (one row per load, default) or JSON. Input problems stop it unless --skip-invalid.
// --scenario plans the loads under a what-if through the engine's overlay, as the app does.
// This file holds the option table and help; the work is in dispatch-run.ts, imported only when it runs, so
// `--help` never loads the engine.

import { NETWORK_FILES, PLANNING_OPTIONS, JSON_OPTION, OUT_OPTION, TIMINGS_OPTION, CSV_DIALECT_OPTION, type CommandSpec } from '../options';

export const dispatchCommand: CommandSpec = {
  name: 'dispatch',
  summary: 'the day\'s loads, each on its vehicle, over lanes within the vehicle\'s limits',
  details:
    'Plans every load (status, cost, what the vehicle\'s limits cost, what blocks it, alternatives) and the\n' +
    'totals, as one CSV row per load or one JSON object with --json. Loads without a date are planned for\n' +
    '--date (default today). Input problems stop it unless --skip-invalid.',
  example: 'lanewright dispatch --depots sample-data/depots.csv --lanes sample-data/lanes.csv --loads sample-data/loads.csv --vehicles sample-data/vehicles.csv --date 2026-06-01',
  options: [
    ...NETWORK_FILES,
    { name: 'loads', value: 'FILE', help: 'loads CSV (load, from, to, date, vehicle, ...)', required: true },
    { name: 'vehicles', value: 'FILE', help: 'vehicles CSV (vehicle, vehicle_class, height_m, weight_t, ...)' },
    { name: 'scenario', value: 'FILE', help: 'plan the loads under this what-if scenario file (lanewright-scenario)' },
    { name: 'alternatives', value: 'K', help: 'up to K alternative routes per load (at most 20)' },
    JSON_OPTION,
    CSV_DIALECT_OPTION,
    OUT_OPTION,
    TIMINGS_OPTION,
    ...PLANNING_OPTIONS,
  ],
  load: async () => (await import('./dispatch-run')).runDispatch,
};
