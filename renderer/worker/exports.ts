// Export files the UI offers, made in the worker with the engine's exporters (the same files the
// command line writes). With an active scenario they describe the changed contract: the engine's
// overlay lays the scenario over every lane row (as `lanewright export --scenario` does) and the
// routes are solved again on the result.

import { findDistinctLoops } from '../../engine/index';
import { exportFileName } from '../../engine/index';
import { geoJsonText } from '../../engine/index';
import { networkGeoJson } from '../../engine/index';
import { lanesCsv, type LanesExportInput } from '../../engine/index';
import { loopsCsv } from '../../engine/index';
import { routesCsv } from '../../engine/index';
import type { ImportResult } from '../../engine/index';
import type { Network } from '../../engine/index';
import { routesReport } from '../../engine/index';
import { scenarioImport } from '../../engine/index';
import { hasChanges, type Scenario } from '../model/scenario-edits';
import type { ExportKind, PlanSettings } from './protocol';
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
}

/** The network and lane rows the exports describe: the import's, or the scenario's when it changes anything. */
function target(ctx: ExportContext): { network: Network; lanes: LanesExportInput } {
  const { imported, network, scenario } = ctx;
  if (!scenario || !hasChanges(scenario)) return { network, lanes: imported };
  const what = scenarioImport(imported, scenario);
  return { network: what.network, lanes: what };
}

const suffix = (ctx: ExportContext) => (ctx.scenario && hasChanges(ctx.scenario) ? `-${ctx.scenario.name.replace(/[^\w-]+/g, '-').toLowerCase()}` : '');

/** Builds one export file. Routes need a chosen origin; the others describe the whole contract. */
export function exportText(ctx: ExportContext, what: ExportKind): ExportFile {
  const { network, lanes } = target(ctx);
  const plan = ctx.imported.plan;
  const tag = suffix(ctx);
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
      return { fileName: exportFileName({ kind: `routes-from-${routes.origin}${tag}` }, 'csv'), mime: 'text/csv', text: routesCsv(routes) };
    }
    case 'lanes-csv':
      return { fileName: exportFileName({ kind: `lanes${tag}` }, 'csv'), mime: 'text/csv', text: lanesCsv(lanes, loops()) };
    case 'loops-csv':
      return { fileName: exportFileName({ kind: `rebate-loops${tag}` }, 'csv'), mime: 'text/csv', text: loopsCsv(network, loops()) };
    case 'geojson':
      return { fileName: exportFileName({ kind: `network${tag}` }, 'geojson'), mime: 'application/geo+json', text: geoJsonText(networkGeoJson(network, { report: report(), loops: loops() })) };
  }
}
