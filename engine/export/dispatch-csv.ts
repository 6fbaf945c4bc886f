// The dispatch sheet as RFC 4180 CSV: one row per load (formula-like text neutralised by the writer).

import { formatCsvRows } from '../io/csv-papaparse';
import { dispatchReportRows, type DispatchReport } from '../report/dispatch-report';

export function dispatchCsv(report: DispatchReport): string {
  return formatCsvRows(dispatchReportRows(report));
}
