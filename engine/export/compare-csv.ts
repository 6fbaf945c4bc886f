// The scenario comparison as CSV, the table `lanewright compare` writes: one row per depot with
// both statuses and costs, the change and whether its cheapest route changed. Written through the
// one CSV writer (cell guard included).

import { formatCsvRows } from '../io/csv-papaparse';
import { compareReportRows, type CompareReport } from '../report/compare-report';

export function compareCsv(report: CompareReport, exponent: number): string {
  return formatCsvRows(compareReportRows(report, exponent));
}
