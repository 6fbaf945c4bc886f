// `lanewright dispatch`: the day's loads, each on its own vehicle, over the network's lanes with the
// vehicles' limits: status, cost, what the limits cost, what blocks a load, alternatives and totals,
// as CSV (one row per load, default) or JSON. Input problems stop it unless --skip-invalid.
// --scenario plans the loads under a what-if through the engine's overlay, as the app does.
// The command's work; its option table is in dispatch.ts (engine-free), so this module loads only when it runs.

import { parseScenarioDocument, planLoads, dispatchCsv, InvalidInputError, importLoads, importVehicles, formatItem, dispatchReport, type VehiclesImport, type ValidationReport } from '../../../engine/index';
import { required, UsageError, wholeNumberOption, type ParsedArgs } from '../args';
import { readTextFile } from '../files';
import { exportSettingsOf, importOptionsFromArgs, loadImport, planDateOf } from '../load-network';
import { inCsvDialect } from '../csv-dialect-option';
import { readTextChunks } from '../read-chunks';
import type { CommandOutput } from '../run';
import { counted, plural } from '../../../engine/index';

/** Most alternatives per load the command computes (each costs up to a few hundred Dijkstra runs). */
const MAX_ALTERNATIVES = 20;

function chunksOf(path: string): Iterable<string> {
  return { [Symbol.iterator]: function* () { for (const c of readTextChunks(path)) yield c.text; } };
}

/** Prints a file's problems; throws InvalidInputError when it has errors and --skip-invalid is off. */
function reportFile(report: ValidationReport, args: ParsedArgs, out: CommandOutput): void {
  if (report.errors.length > 0 && !args.flags.has('skip-invalid')) throw new InvalidInputError(report);
  for (const e of report.errors) out.warn(formatItem(e, 'error'));
  for (const w of report.warnings) out.warn(formatItem(w, 'warning'));
  if (report.omitted > 0) out.warn(`... ${counted(report.omitted, 'more problem')} not listed`);
  if (report.errors.length > 0) for (const f of report.files) out.warn(`${f.file}: ${counted(f.total, 'row')}, ${f.accepted} accepted, ${f.rejected} rejected`);
}

export function runDispatch(args: ParsedArgs, out: CommandOutput): number {
  const loadsPath = required(args, 'loads');
  const vehiclesPath = args.values.get('vehicles');
  const scenarioPath = args.values.get('scenario');
  const k = wholeNumberOption(args, 'alternatives', 0) ?? 0;
  if (k > MAX_ALTERNATIVES) throw new UsageError(`--alternatives must be at most ${MAX_ALTERNATIVES}, got ${k}`);

  const start = performance.now();
  // Read before the network so a bad scenario file stops the command before any work.
  const scenario = scenarioPath === undefined ? null : parseScenarioDocument(readTextFile(scenarioPath), scenarioPath);
  const imported = loadImport(args);
  // loadImport has printed the note when the date is today's; loads without a date go on this day.
  const { date } = planDateOf(args);

  let vehicles: VehiclesImport | null = null;
  if (vehiclesPath !== undefined) {
    vehicles = importVehicles(chunksOf(vehiclesPath), { file: vehiclesPath, classes: imported.vehicleClasses });
    reportFile(vehicles.report, args, out);
  }
  const loads = importLoads(chunksOf(loadsPath), {
    file: loadsPath,
    depots: imported.network.depotIndex,
    vehicles: vehicles?.byId ?? new Map(),
    vehiclesFile: vehiclesPath ?? null,
    depotsFile: args.values.get('depots'),
    classes: imported.vehicleClasses,
    planDate: date,
  });
  reportFile(loads.report, args, out);
  const readMs = performance.now() - start;

  const solveStart = performance.now();
  const plan = planLoads(imported, loads.loads, {
    date,
    vehicles: vehicles?.byId ?? new Map(),
    settings: importOptionsFromArgs(args).plan?.settings,
    skipInvalid: args.flags.has('skip-invalid'),
    alternatives: k,
    scenario,
  });
  const solveMs = performance.now() - solveStart;
  const report = dispatchReport(plan);
  out.write(args.flags.has('json') ? JSON.stringify({ ...report, settings: exportSettingsOf(args, { date, vehicleClass: imported.plan.vehicleClass }, scenario ? scenario.name : null, [loadsPath, vehiclesPath, scenarioPath]) }) + '\n' : inCsvDialect(args, dispatchCsv(report)));
  if (scenario) out.warn(`note: loads planned under the what-if scenario "${scenario.name}" (${scenarioPath}), not the lanes as the file has them`);
  for (const w of report.warnings) out.warn(`warning: ${w}`);
  for (const n of report.notes) out.warn(`note: ${n}`);
  const t = report.totals.all;
  out.warn(`${counted(t.loads, 'load')}: ${t.planned} planned, ${t.blocked} blocked, ${t.unbounded} unbounded, ${t.no_route} without a route; planned cost ${t.cost} ${report.currency}`);
  if (t.unbounded > 0) out.warn(`WARNING: ${counted(t.unbounded, 'load')} ${plural(t.unbounded, 'is', 'are')} reached by a rebate loop; their cost is unbounded and the contract terms need fixing (see the loop column)`);
  if (t.over_drive_limit > 0) out.warn(`CAUTION: ${counted(t.over_drive_limit, 'route')} ${plural(t.over_drive_limit, 'exceeds', 'exceed')} the daily driving limit. ${report.drive_limit_caution}`);
  out.warn(`CAUTION: ${report.caution}`);
  if (args.flags.has('timings')) {
    out.timing({ read_ms: readMs, plan_ms: solveMs, loads: loads.loads.length, groups: plan.stats.groups, restricted_solves: plan.stats.restrictedSolves, plain_solves: plan.stats.plainSolves });
  }
  return 0;
}
