// The routes export: the routes report's flat table (one row per depot with status, cost, legs,
// path and breakdown) as RFC 4180 CSV.

import { formatCsvRows } from '../io/csv-papaparse';
import { routesReportRows, type RoutesReport } from '../report/routes-report';

/** The routes report as CSV text. */
export function routesCsv(report: RoutesReport): string {
  return formatCsvRows(routesReportRows(report));
}
