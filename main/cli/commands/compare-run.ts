// `lanewright compare`: a what-if scenario against the base from one origin: each depot's cost
// before and after, the routes that changed and the rebate loops that appear or disappear.
// Changes that no longer fit the lanes file are printed as warnings; the scenario file is never rewritten.
// The scenario goes through the engine's overlay (engine/scenario/overlay.ts), as in the app.
// The command's work; its option table is in compare.ts (engine-free), so this module loads only when it runs.

import { compareImport } from '../../../engine/index';
import { parseScenarioDocument } from '../../../engine/index';
import { compareCsv, compareReport } from '../../../engine/index';
import { required, wholeNumberOption, type ParsedArgs } from '../args';
import { readDocumentFile } from '../files';
import { exportSettingsOf, loadImport, planDateOf } from '../load-network';
import { inCsvDialect } from '../csv-dialect-option';
import type { CommandOutput } from '../run';

export function runCompare(args: ParsedArgs, out: CommandOutput): number {
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
  out.write(args.flags.has('json') ? JSON.stringify({ date: planDateOf(args).date, settings: exportSettingsOf(args, imported.plan, scenario.name, [scenarioPath]), ...report }) + '\n' : inCsvDialect(args, compareCsv(report, network.exponent)));

  for (const p of report.problems) out.warn(`scenario ${scenarioPath}: ${p.message}; the change is kept in the scenario but not applied (code ${p.code})`);
  for (const loop of report.loops_appeared) {
    out.warn(`WARNING: the scenario creates a rebate loop ${loop.depots.join(' > ')} netting ${loop.net_per_lap_minor} minor units per lap${loop.reached_from_origin ? `; costs from ${originId} through it are unbounded` : ''}`);
  }
  for (const loop of report.loops_disappeared) out.warn(`the scenario removes the rebate loop ${loop.depots.join(' > ')}`);
  if (report.loop_cap_reached) out.warn('WARNING: more loops exist than were compared (raise --loop-cap)');
  return 0;
}
