// Export files the UI offers, made in the worker with the engine's exporters (the same files the
// command line writes). With an active scenario they describe the changed contract: the engine's
// overlay lays the scenario over every lane row (as `lanewright export --scenario` does) and the
// routes are solved again on the result.

import { findDistinctLoops } from '../../engine/index';
import { geoJsonText } from '../../engine/index';
import { networkGeoJson } from '../../engine/index';
import { lanesCsv, type LanesExportInput } from '../../engine/index';
import { loopsCsv } from '../../engine/index';
import { routesCsv } from '../../engine/index';
import type { ImportResult } from '../../engine/index';
import type { Network } from '../../engine/index';
import { routesReport } from '../../engine/index';
import { scenarioImport } from '../../engine/index';
import { calendarReviewCsv, compareCsv, compareImport, compareReport, reviewCsv } from '../../engine/index';
import { applyCsvDialect, exportFileName, RFC4180_DIALECT, type CsvDialect, type ExportSettings } from '../../engine/index';
import { hasChanges, type Scenario } from '../model/scenario-edits';
import type { ContractReviewView, ExportKind, PlanSettings } from './protocol';
import { solveFor } from './solve-plan';

export interface ExportFile {
  fileName: string;
  mime: string;
  text: string;
}

export interface ExportContext {
  imported: ImportResult;
  network: Network;
  settings: PlanSettings | null;
  scenario: Scenario | null;
  date: string | null;
  /** Vehicle class planned for; null = the file's default. */
  vehicleClass?: string | null;
  /** Input file names (depots, lanes). */
  files?: string[];
  /** The contract review last made and the scenario it was made under (the review exports). */
  review?: { scenario: Scenario | null; report: ContractReviewView } | null;
}

/** The network and lane rows the exports describe: the import's, or the scenario's when it changes anything. */
function target(ctx: ExportContext): { network: Network; lanes: LanesExportInput } {
  const { imported, network, scenario } = ctx;
  if (!scenario || !hasChanges(scenario)) return { network, lanes: imported };
  const what = scenarioImport(imported, scenario);
  return { network: what.network, lanes: what };
}

const scenarioName = (ctx: ExportContext) => (ctx.scenario && hasChanges(ctx.scenario) ? ctx.scenario.name : null);

/** What the file was made from; JSON and GeoJSON exports carry it. */
export function exportSettings(ctx: ExportContext): ExportSettings {
  return { date: ctx.date, vehicle_class: ctx.vehicleClass ?? null, files: ctx.files ?? [], scenario: scenarioName(ctx) };
}

/**
 * Builds one export file. Routes need a chosen origin; the others describe the whole contract.
 * Names carry what is inside (kind, origin, date, class, scenario); CSV is written in `dialect`.
 */
export function exportText(ctx: ExportContext, what: ExportKind, dialect: CsvDialect = RFC4180_DIALECT): ExportFile {
  const { network, lanes } = target(ctx);
  const plan = ctx.imported.plan;
  const name = (kind: string, extension: string, origin: string | null = null) =>
    exportFileName({ kind, origin, date: ctx.date, vehicleClass: ctx.vehicleClass ?? null, scenario: scenarioName(ctx) }, extension);
  const csv = (text: string) => applyCsvDialect(text, dialect);
  const loops = () => findDistinctLoops(network).loops;
  const report = () => {
    if (!ctx.settings) return undefined;
    const solved = solveFor(network, ctx.settings);
    return routesReport(network, solved, { driveLimitMinutes: plan.settings.drivingLimit.dailyDrivingMinutes });
  };
  switch (what) {
    case 'routes-csv': {
      const routes = report();
      if (!routes) throw new RangeError('export: choose an origin before exporting routes');
      return { fileName: name('routes', 'csv', routes.origin), mime: 'text/csv', text: csv(routesCsv(routes)) };
    }
    case 'lanes-csv':
      return { fileName: name('lanes', 'csv'), mime: 'text/csv', text: csv(lanesCsv(lanes, loops())) };
    case 'loops-csv':
      return { fileName: name('rebate-loops', 'csv'), mime: 'text/csv', text: csv(loopsCsv(network, loops())) };
    case 'review-csv': {
      // The network the review audited: the scenario it was made under, laid over the import.
      const reviewed = ctx.review;
      if (!reviewed) throw new RangeError('export: open the Contract review tab first; the review is exported as it was made');
      const audited = target({ ...ctx, scenario: reviewed.scenario }).network;
      const scenario = reviewed.scenario && hasChanges(reviewed.scenario) ? reviewed.scenario.name : null;
      const fileName = exportFileName({ kind: 'contract-review', date: ctx.date, vehicleClass: ctx.vehicleClass ?? null, scenario }, 'csv');
      return { fileName, mime: 'text/csv', text: csv(reviewCsv(audited, reviewed.report)) };
    }
    case 'calendar-review-csv': {
      const calendar = ctx.review?.report.calendar;
      if (!calendar) throw new RangeError('export: open the Contract review tab first; the calendar review is exported as it was made');
      const w = calendar.window;
      const fileName = exportFileName({ kind: `calendar-review-${w.from ?? 'undated'}${w.to && w.to !== w.from ? `-${w.to}` : ''}` }, 'csv');
      return { fileName, mime: 'text/csv', text: csv(calendarReviewCsv(calendar, ctx.imported.exponent)) };
    }
    case 'compare-csv': {
      const settings = ctx.settings;
      if (!settings) throw new RangeError('export: choose an origin before exporting the comparison');
      if (!ctx.scenario || !hasChanges(ctx.scenario)) throw new RangeError('export: the scenario has no changes to compare');
      // The comparison is the command line's (no leg limit): with a limit on screen it would differ from what the app shows.
      if (settings.maxLegs !== null) throw new RangeError(`export: the comparison is planned without a leg limit; clear Maximum legs (${settings.maxLegs}) to export it`);
      const report = compareReport(compareImport(ctx.imported, ctx.scenario, settings.origin));
      return { fileName: name('comparison', 'csv', settings.origin), mime: 'text/csv', text: csv(compareCsv(report, ctx.imported.exponent)) };
    }
    case 'geojson': {
      const routes = report();
      return { fileName: name('network', 'geojson', routes?.origin ?? null), mime: 'application/geo+json', text: geoJsonText(networkGeoJson(network, { report: routes, loops: loops(), settings: exportSettings(ctx) })) };
    }
  }
}
