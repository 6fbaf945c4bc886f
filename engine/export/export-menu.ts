// The exports the app offers, in menu order, with the one label each has: the page's Export menu
// and the desktop application menu both list this table, so neither can offer less than the other.
// `file` is the kind of file the host's save dialog is asked for (main/ipc/contract.ts ExportKind).

export const EXPORT_MENU = [
  { what: 'routes-csv', label: 'Routes (CSV)', file: 'csv' },
  { what: 'lanes-csv', label: 'Lane costs (CSV)', file: 'csv' },
  { what: 'loops-csv', label: 'Rebate loops (CSV)', file: 'csv' },
  { what: 'geojson', label: 'Network and routes (GeoJSON)', file: 'geojson' },
  { what: 'review-html', label: 'Contract review report (HTML)', file: 'html' },
  { what: 'scenario-json', label: 'Scenario file (JSON)', file: 'scenario' },
  { what: 'compare-csv', label: 'Scenario comparison (CSV)', file: 'csv' },
  { what: 'review-csv', label: 'Contract review, one day (CSV)', file: 'csv' },
  { what: 'calendar-review-csv', label: 'Contract review, calendar (CSV)', file: 'csv' },
] as const;

/** One entry of the Export menu. */
export type ExportChoice = (typeof EXPORT_MENU)[number]['what'];

