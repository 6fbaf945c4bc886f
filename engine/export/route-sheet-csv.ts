// One route as CSV (the app's "Export route" button): the route sheet's table, RFC 4180.

import { formatCsvRows } from '../io/csv-papaparse';
import { routeSheetRows, type RouteSheet } from '../report/route-sheet';

export function routeSheetCsv(sheet: RouteSheet): string {
  return formatCsvRows(routeSheetRows(sheet));
}
