// `lanewright compare`: a what-if scenario against the base from one origin: each depot's cost
// before and after, the routes that changed and the rebate loops that appear or disappear.
// Changes that no longer fit the lanes file are printed as warnings; the scenario file is never rewritten.
// The scenario goes through the engine's overlay (engine/scenario/overlay.ts), as in the app.

import { compareImport } from '../../../engine/index';
import { parseScenarioDocument } from '../../../engine/index';
import { compareCsv, compareReport } from '../../../engine/index';
import { required, wholeNumberOption, type ParsedArgs } from '../args';
import { readDocumentFile } from '../files';
import { loadImport, planDateOf } from '../load-network';
import { CSV_DIALECT_OPTION, JSON_OPTION, LOOP_CAP_OPTION, NETWORK_FILES, OUT_OPTION, PLANNING_OPTIONS, type CommandSpec } from '../options';
import { inCsvDialect } from '../csv-dialect-option';
import type { CommandOutput } from '../run';

export const compareCommand: CommandSpec = {
  name: 'compare',
  summary: 'a what-if scenario file against the lanes as they are, from one origin',
  details:
    'Applies the scenario\'s changes (amounts, closed or added lanes, validity) and prints each depot\'s cost\n' +
    'before and after and whether its route changed, as CSV or one JSON object with --json; rebate loops the\n' +
    'scenario creates or removes are named on stderr. The scenario file is never rewritten.',
  example: 'lanewright compare --depots sample-data/depots.csv --lanes sample-data/lanes.csv --scenario what-if.json --from RTM --date 2026-06-01',
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
  run: runCompare,
};

function runCompare(args: ParsedArgs, out: CommandOutput): number {
  const originId = required(args, 'from');
  const scenarioPath = required(args, 'scenario');
  const loopCap = wholeNumberOption(args, 'loop-cap', 1);
  const scenario = parseScenarioDocument(readDocumentFile(scenarioPath, 'scenario'), scenarioPath);
  // The scenario is laid over every lane row of the file, then planned for --date and
  // --vehicle-class like the base, so a change names the same row whatever the date or class.
  const imported = loadImport(args);
  const network = imported.network;
  const comparison = compareImport(imported, scenario, originId, { loopCap });
  const report = compareReport(comparison);
  out.write(args.flags.has('json') ? JSON.stringify({ date: planDateOf(args).date, ...report }) + '\n' : inCsvDialect(args, compareCsv(report, network.exponent)));

  for (const p of report.problems) out.warn(`scenario ${scenarioPath}: ${p.message}; the change is kept in the scenario but not applied (code ${p.code})`);
  for (const loop of report.loops_appeared) {
    out.warn(`WARNING: the scenario creates a rebate loop ${loop.depots.join(' > ')} netting ${loop.net_per_lap_minor} minor units per lap${loop.reached_from_origin ? `; costs from ${originId} through it are unbounded` : ''}`);
  }
  for (const loop of report.loops_disappeared) out.warn(`the scenario removes the rebate loop ${loop.depots.join(' > ')}`);
  if (report.loop_cap_reached) out.warn('WARNING: more loops exist than were compared (raise --loop-cap)');
  return 0;
}
