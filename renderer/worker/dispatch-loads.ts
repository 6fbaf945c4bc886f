// The worker's side of the Loads panel: reads the loads (and vehicles) texts against the imported
// network, plans every load (under the active what-if scenario, through the engine's overlay) and
// returns the dispatch report, the files' report and the sheet as CSV.

import { planLoads, dispatchCsv, importLoads, importVehicles, dispatchReport, type ImportResult, type OverlayIndex, type Scenario, type ValidationItem, type ValidationReport, type DispatchReport } from '../../engine/index';
import type { ImportIssue, ImportReport, NamedText } from './protocol';

export interface DispatchRequest {
  loads: NamedText;
  vehicles: NamedText | null;
  /** ISO 8601 date for loads without one. */
  date: string;
  alternatives: number;
  /** Plan with the accepted rows when some are rejected. */
  acceptPartial: boolean;
  /** The active what-if scenario (null = the lanes as the file has them). */
  scenario: Scenario | null;
}

export interface DispatchView {
  /** Null when the files have errors and acceptPartial is off (nothing was planned). */
  report: DispatchReport | null;
  files: ImportReport;
  csv: string | null;
}

const issue = (item: ValidationItem): ImportIssue => ({ file: item.file, row: item.row, column: item.column, value: item.value, reason: item.message, code: item.code });

function merged(reports: ValidationReport[]): ImportReport {
  return {
    files: reports.flatMap((r) => r.files.map((f) => ({ ...f }))),
    issues: reports.flatMap((r) => r.errors.map(issue)),
    warnings: reports.flatMap((r) => r.warnings.map(issue)),
    omitted: reports.reduce((s, r) => s + r.omitted, 0),
    excluded: 0,
    notes: [],
    fatal: false,
  };
}

export function dispatchLoads(imported: ImportResult, request: DispatchRequest, index?: OverlayIndex): DispatchView {
  const network = imported.network!;
  const vehicles = request.vehicles ? importVehicles(request.vehicles.text, { file: request.vehicles.name, classes: imported.vehicleClasses }) : null;
  const loads = importLoads(request.loads.text, {
    file: request.loads.name,
    depots: network.depotIndex,
    vehicles: vehicles?.byId ?? new Map(),
    vehiclesFile: request.vehicles?.name ?? null,
    depotsFile: imported.importReport.files.find((f) => f.kind === 'depots')?.file,
    classes: imported.vehicleClasses,
    planDate: request.date,
  });
  const files = merged(vehicles ? [vehicles.report, loads.report] : [loads.report]);
  if (files.issues.length > 0 && !request.acceptPartial) return { report: null, files: { ...files, fatal: true }, csv: null };
  const plan = planLoads(imported, loads.loads, { date: request.date, vehicles: vehicles?.byId ?? new Map(), alternatives: request.alternatives, skipInvalid: true, scenario: request.scenario, overlayIndex: index });
  const report = dispatchReport(plan);
  return { report, files, csv: dispatchCsv(report) };
}
