// `lanewright check`: reads the depots and lanes files and prints the validation report, as lines or
// JSON. Exit status 0 when there are no errors, 1 when there are; warnings alone do not fail.
// This file holds the option table and help; the work is in check-run.ts, imported only when it runs, so
// `--help` never loads the engine.

import { NETWORK_FILES, PLANNING_OPTIONS, JSON_OPTION, OUT_OPTION, type CommandSpec } from '../options';

export const checkCommand: CommandSpec = {
  name: 'check',
  summary: 'check the depots and lanes files and print every problem by file, row and column',
  details:
    'Reads both files and prints each error and warning (file, row, column, value, reason) and the row counts\n' +
    '(accepted + rejected = total), as lines or one JSON object with --json. Exit status 0 without errors,\n' +
    '1 with errors (warnings alone do not fail), 2 for a mistake on the command line.',
  example: 'lanewright check --depots sample-data/depots.csv --lanes sample-data/lanes.csv --date 2026-06-01',
  options: [...NETWORK_FILES, JSON_OPTION, OUT_OPTION, ...PLANNING_OPTIONS],
  load: async () => (await import('./check-run')).runCheck,
};
