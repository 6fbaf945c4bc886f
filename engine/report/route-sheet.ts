// One route on its own: each lane with its distance, drive time, amounts, contract ref, clause and
// validity, estimated values marked with the rule that made them, the total and the caution. The
// app's route export (CSV) and its printed route sheet are both this table.

import { addMinor, formatMinor, subMinor, type Minor } from '../money/minor';
import type { EstimateRules } from '../planning/estimate-rules';
import { ROUTE_CAUTION } from '../text/cautions';

export interface RouteSheetLeg {
  from: string;
  to: string;
  ref: string | null;
  /** Row of the lanes file (header = 1); null for a lane a scenario adds. */
  row: number | null;
  distanceKm: number | null;
  driveMinutes: number | null;
  tollMinor: number;
  fuelMinor: number;
  feesMinor: number;
  rebateMinor: number;
  validFrom: string | null;
  validTo: string | null;
  clause: string | null;
  distanceEstimated: boolean;
  fuelEstimated: boolean;
  driveEstimated: boolean;
}

export interface RouteSheet {
  origin: string;
  destination: string;
  /** The date planned for (ISO 8601); always stated. */
  date: string;
  /** Vehicle class whose tolls apply; null = the file's default. */
  vehicleClass: string | null;
  currency: string;
  exponent: number;
  /** Name of the what-if scenario the amounts include, or null for the contract as loaded. */
  scenario: string | null;
  legs: RouteSheetLeg[];
  rules: EstimateRules;
}

export const ROUTE_SHEET_COLUMNS = [
  'leg', 'from', 'to', 'ref', 'lanes_file_row', 'distance_km', 'distance_estimate', 'drive_minutes', 'drive_estimate',
  'toll', 'fuel', 'fuel_estimate', 'fees', 'rebate', 'net', 'valid_from', 'valid_to', 'clause', 'currency', 'date', 'vehicle_class', 'scenario', 'caution',
] as const;

/** The net of one leg: toll + fuel + fees - rebate (exact). */
export function legNetMinor(leg: RouteSheetLeg): Minor {
  return subMinor(addMinor(addMinor(leg.tollMinor as Minor, leg.fuelMinor as Minor, 'route leg'), leg.feesMinor as Minor, 'route leg'), leg.rebateMinor as Minor, 'route leg');
}

function sum(values: number[]): Minor {
  return values.reduce<Minor>((a, v) => addMinor(a, v as Minor, 'route sheet total'), 0 as Minor);
}

/** Header, one row per leg, then the total; every row carries the date, class, scenario and caution. */
export function routeSheetRows(sheet: RouteSheet): (string | number | null)[][] {
  const money = (v: number) => formatMinor(v as Minor, sheet.exponent);
  const context = [sheet.currency, sheet.date, sheet.vehicleClass ?? '', sheet.scenario ?? '', ROUTE_CAUTION];
  const rows: (string | number | null)[][] = [[...ROUTE_SHEET_COLUMNS]];
  sheet.legs.forEach((leg, i) => {
    rows.push([
      i + 1, leg.from, leg.to, leg.ref ?? '', leg.row ?? '',
      leg.distanceKm ?? '', leg.distanceEstimated ? sheet.rules.distance : '',
      leg.driveMinutes ?? '', leg.driveEstimated ? sheet.rules.driveTime : '',
      money(leg.tollMinor), money(leg.fuelMinor), leg.fuelEstimated ? sheet.rules.fuel : '', money(leg.feesMinor), money(leg.rebateMinor), money(legNetMinor(leg)),
      leg.validFrom ?? '', leg.validTo ?? '', leg.clause ?? '', ...context,
    ]);
  });
  const distances = sheet.legs.map((l) => l.distanceKm);
  const drives = sheet.legs.map((l) => l.driveMinutes);
  rows.push([
    'total', sheet.origin, sheet.destination, '', '',
    distances.every((d) => d !== null) ? Math.round(distances.reduce((a, d) => a + d!, 0) * 1000) / 1000 : '', sheet.legs.some((l) => l.distanceEstimated) ? 'includes estimates' : '',
    drives.every((d) => d !== null) ? Math.round(drives.reduce((a, d) => a + d!, 0) * 100) / 100 : '', sheet.legs.some((l) => l.driveEstimated) ? 'includes estimates' : '',
    money(sum(sheet.legs.map((l) => l.tollMinor))), money(sum(sheet.legs.map((l) => l.fuelMinor))), sheet.legs.some((l) => l.fuelEstimated) ? 'includes estimates' : '',
    money(sum(sheet.legs.map((l) => l.feesMinor))), money(sum(sheet.legs.map((l) => l.rebateMinor))), money(sum(sheet.legs.map((l) => legNetMinor(l)))),
    '', '', '', ...context,
  ]);
  return rows;
}
