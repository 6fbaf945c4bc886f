// Export files the UI offers, made in the worker from the current network, scenario and solve. The
// one place the renderer reaches the engine's writers, so new exporters change this file only.

import { LanewrightError } from '../../engine/errors';
import { formatCsvRows } from '../../engine/io/csv-papaparse';
import { formatMinor, type Minor } from '../../engine/money/minor';
import type { Network } from '../../engine/network/types';
import { routesReport, routesReportRows } from '../../engine/report/routes-report';
import type { ExportKind } from './protocol';
import type { Solved } from './solve-plan';

export interface ExportFile {
  fileName: string;
  mime: string;
  text: string;
}

function laneRows(network: Network, weights: Float64Array | undefined): (string | number | null)[][] {
  // Scenario weights are per CSR position; the file lists lanes in input order.
  const net = new Float64Array(network.laneCount);
  for (let p = 0; p < network.laneCount; p++) net[network.outLane[p]] = weights ? weights[p] : network.outNet[p];
  const money = (v: number) => (Number.isFinite(v) ? formatMinor(v as Minor, network.exponent) : '');
  const rows: (string | number | null)[][] = [['row', 'from', 'to', 'toll', 'fuel', 'fees', 'rebate', 'net', 'open']];
  for (let e = 0; e < network.laneCount; e++) {
    rows.push([
      network.laneRow[e],
      network.depotIds[network.laneFrom[e]],
      network.depotIds[network.laneTo[e]],
      money(network.laneToll[e]),
      money(network.laneFuel[e]),
      money(network.laneFees[e]),
      money(network.laneRebate[e]),
      money(net[e]),
      Number.isFinite(net[e]) ? 'yes' : 'no',
    ]);
  }
  return rows;
}

/** Builds one export file. Routes need a solve; the others need only the network. */
export function exportText(network: Network, solved: Solved | null, weights: Float64Array | undefined, what: ExportKind): ExportFile {
  switch (what) {
    case 'routes-csv': {
      if (!solved) throw new LanewrightError('export: no routes have been solved yet');
      const report = routesReport(network, solved);
      return { fileName: `routes-from-${report.origin}.csv`, mime: 'text/csv', text: formatCsvRows(routesReportRows(report)) };
    }
    case 'lanes-csv':
      return { fileName: 'lane-costs.csv', mime: 'text/csv', text: formatCsvRows(laneRows(network, weights)) };
    default:
      throw new LanewrightError(`export: ${what} is not available in this build`);
  }
}
