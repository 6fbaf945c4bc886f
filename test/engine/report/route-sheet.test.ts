// One route as a table: amounts exact, net per leg = toll + fuel + fees - rebate, the total row the
// sum (checked by brute-force summing the legs here), estimates named by their rule, the caution
// and date on every row; the CSV reads back with papaparse to the same cells.

import { describe, expect, it } from 'vitest';
import { routeSheetCsv } from '../../../engine/export/route-sheet-csv';
import { parseCsvText } from '../../../engine/io/csv-papaparse';
import { DEFAULT_PLANNING_SETTINGS } from '../../../engine/planning/settings';
import { estimateRules } from '../../../engine/planning/estimate-rules';
import { ROUTE_SHEET_COLUMNS, routeSheetRows, type RouteSheet } from '../../../engine/report/route-sheet';
import { ROUTE_CAUTION } from '../../../engine/text/cautions';

const leg = { ref: null, row: 2, distanceKm: 100, driveMinutes: 90, validFrom: null, validTo: null, clause: null, distanceEstimated: false, fuelEstimated: false, driveEstimated: false };
const sheet: RouteSheet = {
  origin: 'RTM',
  destination: 'LYS',
  date: '2026-08-15',
  vehicleClass: '2axle',
  currency: 'EUR',
  exponent: 2,
  scenario: null,
  rules: estimateRules(DEFAULT_PLANNING_SETTINGS, 'EUR'),
  legs: [
    { ...leg, from: 'RTM', to: 'PAR', ref: 'R-1', tollMinor: 4280, fuelMinor: 11950, feesMinor: 1500, rebateMinor: 0, validFrom: '2026-01-01', validTo: '2026-12-31', clause: '=HYPERLINK("x")' },
    { ...leg, from: 'PAR', to: 'LYS', row: 7, distanceKm: 465.2, tollMinor: 1, fuelMinor: 2, feesMinor: 3, rebateMinor: 17000, distanceEstimated: true, fuelEstimated: true },
  ],
};

describe('routeSheetRows', () => {
  const rows = routeSheetRows(sheet);
  const at = (name: (typeof ROUTE_SHEET_COLUMNS)[number]) => ROUTE_SHEET_COLUMNS.indexOf(name);

  it('has a header, one row per leg and a total that is the sum of the legs', () => {
    expect(rows).toHaveLength(4);
    expect(rows[1][at('net')]).toBe('177.30'); // 42.80 + 119.50 + 15.00 - 0
    expect(rows[2][at('net')]).toBe('-169.94'); // 0.01 + 0.02 + 0.03 - 170.00
    expect(rows[3][at('leg')]).toBe('total');
    expect(rows[3][at('net')]).toBe('7.36');
    expect(rows[3][at('distance_km')]).toBe(565.2);
    expect(rows[3][at('drive_minutes')]).toBe(180);
  });

  it('names the rule beside each estimated value and leaves known values unmarked', () => {
    expect(rows[1][at('distance_estimate')]).toBe('');
    expect(rows[2][at('distance_estimate')]).toBe('great-circle distance x detour factor 1.3');
    expect(rows[2][at('fuel_estimate')]).toBe('distance x 32 l/100 km x EUR 1.65/l');
    expect(rows[2][at('drive_estimate')]).toBe('');
    expect(rows[3][at('distance_estimate')]).toBe('includes estimates');
  });

  it('carries the date, class and caution on every row, and reads back through papaparse', () => {
    for (const row of rows.slice(1)) {
      expect(row[at('caution')]).toBe(ROUTE_CAUTION);
      expect(row[at('date')]).toBe('2026-08-15');
      expect(row[at('vehicle_class')]).toBe('2axle');
    }
    const back = parseCsvText(routeSheetCsv(sheet)).rows;
    expect(back[1][at('valid_from')]).toBe('2026-01-01');
    expect(back[1][at('clause')]).toBe('\'=HYPERLINK("x")'); // a formula in a clause is neutralised
    expect(back[3][at('net')]).toBe('7.36');
  });
});
