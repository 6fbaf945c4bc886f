// The lanes export: one row per planned lane with its components, net cost, distance, drive time,
// validity, contract reference and flags. Its columns are ones the importer reads (or knows to
// ignore, like net and the flags), so the file re-imports to the same network.

import { formatCsvRows } from '../io/csv-papaparse';
import type { RebateLoop } from '../routes/rebate-loop';
import { formatMinor, type Minor } from '../money/minor';
import type { LaneTable } from '../import/types';
import type { PlannedNetwork } from '../planning/types';

export interface LanesExportInput {
  plan: PlannedNetwork;
  /** The import's lane table, for notes; optional. */
  lanes?: LaneTable;
  currency: string;
  exponent: number;
}

/** Header and rows of the lanes export; `loops` marks the lanes on a rebate loop. */
export function lanesCsvRows(input: LanesExportInput, loops: readonly RebateLoop[] = []): (string | number)[][] {
  const { plan, exponent, currency } = input;
  const onLoop = new Set<number>();
  for (const loop of loops) for (const e of loop.lanes) onLoop.add(e);
  const withClass = plan.lanes.some((l) => l.vehicleClass !== null);
  const money = (v: number) => formatMinor(v as Minor, exponent);
  // The clause column only when the file had one, so a file without it exports as before.
  const clauses = input.lanes?.clause;
  const header = ['from', 'to', 'ref', ...(clauses ? ['clause'] : []), ...(withClass ? ['vehicle_class'] : []), 'toll', 'fuel', 'fees', 'rebate', 'net', 'currency', 'distance_km', 'drive_minutes',
    'valid_from', 'valid_to', 'distance_source', 'fuel_source', 'net_negative', 'on_rebate_loop', 'notes'];
  const rows: (string | number)[][] = [header];
  plan.lanes.forEach((lane, i) => {
    const net = lane.toll + lane.fuel + lane.fees - lane.rebate;
    const record = plan.laneRecord[i];
    rows.push([
      lane.from,
      lane.to,
      lane.ref ?? '',
      ...(clauses ? [clauses[record] ?? ''] : []),
      ...(withClass ? [lane.vehicleClass ?? ''] : []),
      money(lane.toll),
      money(lane.fuel),
      money(lane.fees),
      money(lane.rebate),
      money(net),
      currency,
      lane.distanceKm === undefined ? '' : String(lane.distanceKm),
      lane.driveMinutes === undefined ? '' : String(lane.driveMinutes),
      lane.validFrom ?? '',
      lane.validTo ?? '',
      lane.distanceEstimated ? 'great-circle' : 'file',
      lane.fuelEstimated ? 'estimated' : 'file',
      net < 0 ? 'yes' : 'no',
      onLoop.has(i) ? 'yes' : 'no',
      input.lanes?.notes[record] ?? '',
    ]);
  });
  return rows;
}

/** The lanes export as RFC 4180 CSV text. */
export function lanesCsv(input: LanesExportInput, loops: readonly RebateLoop[] = []): string {
  return formatCsvRows(lanesCsvRows(input, loops));
}
