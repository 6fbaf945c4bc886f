// The lanes export: every row of the lane table (every vehicle class and validity window, not only
// the rows planned for one day), with the toll column of every class, the validity columns, the
// limits and the file's own extra columns, so exporting and re-importing gives the same lane table
// and the same routes for every date and class. The planned figures (net, sources, loop) follow as
// columns the importer knows to ignore; they are blank for a row the plan of the day leaves out.

import { TUNNEL_CATEGORIES } from '../import/adr-tunnels';
import { isoDateText } from '../import/cells';
import type { LaneTable } from '../import/types';
import { formatCsvRows } from '../io/csv-papaparse';
import { formatMinor, type Minor } from '../money/minor';
import { netCost } from '../money/net-cost';
import type { PlannedNetwork } from '../planning/types';
import type { RebateLoop } from '../routes/rebate-loop';

export interface LanesExportInput {
  depots: readonly { id: string }[];
  /** Every accepted lane row (with a scenario: the overlay's table). */
  lanes: LaneTable;
  currency: string;
  exponent: number;
  /** The plan of the day and class whose net, sources and loops the derived columns show. */
  plan?: PlannedNetwork;
  /** Rows left out of the file (a scenario's closed rows). */
  leaveOut?: Uint8Array;
}

/** Header and rows of the lanes export; `loops` (lanes of `plan.network`) marks the rows on a rebate loop. */
export function lanesCsvRows(input: LanesExportInput, loops: readonly RebateLoop[] = []): (string | number)[][] {
  const { lanes: t, exponent, currency, plan } = input;
  const money = (v: number) => (Number.isNaN(v) ? '' : formatMinor(v as Minor, exponent));
  const measure = (v: number) => (Number.isNaN(v) ? '' : String(v));
  const network = plan?.network ?? null;
  // Network lane of each row under the plan, or -1.
  const laneOfRow = new Int32Array(t.count).fill(-1);
  if (plan && network) plan.laneRecord.forEach((row, e) => (laneOfRow[row] = e));
  const onLoop = new Set<number>();
  for (const loop of loops) for (const e of loop.lanes) onLoop.add(e);
  const limits = t.limits ?? null;
  // The clause column only when the file had one, so a file without it exports as before.
  const clauses = t.clause ?? null;

  const header = [
    'from', 'to', 'ref', ...(clauses ? ['clause'] : []),
    ...(t.vehicleClass ? ['vehicle_class'] : []),
    'toll', ...t.classTolls.map((c) => `toll_${c.name}`),
    'fuel', 'fees', 'rebate', 'currency', 'distance_km', 'drive_minutes', 'valid_from', 'valid_to', 'notes',
    ...(limits ? limits.measures.map((m) => m.column.name) : []),
    ...(limits?.tunnelCategory ? ['tunnel_category'] : []),
    ...(limits?.noDangerousGoods ? ['no_dangerous_goods'] : []),
    ...t.extra.map((x) => x.column),
    'net', 'distance_source', 'fuel_source', 'net_negative', 'on_rebate_loop',
  ];
  const rows: (string | number)[][] = [header];
  for (let r = 0; r < t.count; r++) {
    if (input.leaveOut?.[r]) continue;
    const e = laneOfRow[r];
    const net = e >= 0 && network ? netCost(network.laneToll[e], network.laneFuel[e], network.laneFees[e], network.laneRebate[e]) : null;
    const cls = t.vehicleClass ? t.vehicleClass[r] : -1;
    rows.push([
      input.depots[t.from[r]].id,
      input.depots[t.to[r]].id,
      t.ref[r] ?? '',
      ...(clauses ? [clauses[r] ?? ''] : []),
      ...(t.vehicleClass ? [cls >= 0 ? t.classNames[cls] : ''] : []),
      money(t.toll[r]),
      ...t.classTolls.map((c) => money(c.toll[r])),
      money(t.fuel[r]),
      money(t.fees[r]),
      money(t.rebate[r]),
      currency,
      measure(t.distanceKm[r]),
      measure(t.driveMinutes[r]),
      isoDateText(t.validFrom[r]) ?? '',
      isoDateText(t.validTo[r]) ?? '',
      t.notes[r] ?? '',
      ...(limits ? limits.measures.map((m) => measure(m.values[r])) : []),
      ...(limits?.tunnelCategory ? [limits.tunnelCategory[r] === 0 ? '' : TUNNEL_CATEGORIES[limits.tunnelCategory[r] - 1]] : []),
      ...(limits?.noDangerousGoods ? [limits.noDangerousGoods[r] ? 'yes' : 'no'] : []),
      ...t.extra.map((x) => x.values[r] ?? ''),
      net === null ? '' : money(net),
      Number.isNaN(t.distanceKm[r]) ? 'great-circle' : 'file',
      Number.isNaN(t.fuel[r]) ? 'estimated' : 'file',
      net === null ? '' : net < 0 ? 'yes' : 'no',
      e >= 0 && onLoop.has(e) ? 'yes' : 'no',
    ]);
  }
  return rows;
}

/** The lanes export as RFC 4180 CSV text. */
export function lanesCsv(input: LanesExportInput, loops: readonly RebateLoop[] = []): string {
  return formatCsvRows(lanesCsvRows(input, loops));
}
