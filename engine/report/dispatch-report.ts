// The dispatch report every front end shows: one entry per load (status, exact cost and breakdown,
// path and lane rows, what the vehicle's limits cost, what blocks it, its loop, alternatives), totals
// by date and by vehicle, and the caution. `lanewright dispatch --json` prints this object as is;
// `dispatchReportRows` is its flat CSV form (one row per load).

import type { LoadPlan, LoadStatus, DispatchPlan } from '../dispatch/plan-loads';
import { formatMinor, sumMinor, type Minor } from '../money/minor';
import { DRIVING_LIMIT_CAUTION } from '../planning/settings';
import { DISPATCH_CAUTION } from '../text/cautions';

export interface DispatchLoadRow {
  load: string;
  from: string;
  to: string;
  date: string;
  vehicle: string | null;
  vehicle_class: string | null;
  status: LoadStatus;
  cost_minor: number | null;
  cost: string | null;
  legs: number | null;
  path: string[];
  lanes: number[];
  /** A component is null when its own sum is outside the exact range (the load's cost is not). */
  breakdown: { toll_minor: number | null; fuel_minor: number | null; fees_minor: number | null; rebate_minor: number | null; toll: string | null; fuel: string | null; fees: string | null; rebate: string | null; distance_km: number | null; drive_minutes: number | null } | null;
  over_drive_limit: boolean;
  limits_extra_minor: number | null;
  limits_extra: string | null;
  avoided: string[];
  blocked_by: string[];
  loop: { depots: string[]; lanes: number[]; net_per_lap_minor: number } | null;
  alternatives: { cost_minor: number; cost: string; difference_minor: number; path: string[]; lanes: number[]; departs: number[] }[];
  alternatives_stopped_by: 'k' | 'exhausted' | 'budget' | null;
  notes: string[];
  source_row: number;
}

export interface DispatchTotalRow {
  /** The date, or the vehicle id ("class X" for loads without a vehicle). */
  key: string;
  loads: number;
  planned: number;
  blocked: number;
  unbounded: number;
  no_route: number;
  cost_minor: number;
  cost: string;
  distance_km: number | null;
  drive_minutes: number | null;
  over_drive_limit: number;
}

export interface DispatchReport {
  date: string;
  currency: string;
  drive_limit_minutes: number | null;
  loads: DispatchLoadRow[];
  totals: { all: DispatchTotalRow; by_date: DispatchTotalRow[]; by_vehicle: DispatchTotalRow[] };
  warnings: string[];
  notes: string[];
  caution: string;
  /** Set when a route is over the driving limit. */
  drive_limit_caution: string | null;
}

/** The report object of a dispatch plan. */
export function dispatchReport(plan: DispatchPlan): DispatchReport {
  const money = (v: number) => formatMinor(v as Minor, plan.exponent);
  const loads = plan.loads.map((p) => loadRow(p, money));
  const vehicleKey = (r: DispatchLoadRow) => r.vehicle ?? `class ${r.vehicle_class ?? '(default)'}`;
  const over = loads.filter((r) => r.over_drive_limit).length;
  return {
    date: plan.date,
    currency: plan.currency,
    drive_limit_minutes: plan.driveLimitMinutes,
    loads,
    totals: {
      all: total('all', loads, money),
      by_date: groupTotals(loads, (r) => r.date, money),
      by_vehicle: groupTotals(loads, vehicleKey, money),
    },
    warnings: plan.warnings,
    notes: plan.notes,
    caution: DISPATCH_CAUTION,
    drive_limit_caution: over > 0 ? DRIVING_LIMIT_CAUTION : null,
  };
}

function loadRow(p: LoadPlan, money: (v: number) => string): DispatchLoadRow {
  const b = p.breakdown;
  return {
    load: p.load.id,
    from: p.load.from,
    to: p.load.to,
    date: p.load.date,
    vehicle: p.load.vehicle,
    vehicle_class: p.vehicleClass,
    status: p.status,
    cost_minor: p.costMinor,
    cost: p.costMinor === null ? null : money(p.costMinor),
    legs: p.status === 'planned' ? p.lanes.length : null,
    path: p.path,
    lanes: p.lanes,
    breakdown: b && {
      toll_minor: b.toll,
      fuel_minor: b.fuel,
      fees_minor: b.fees,
      rebate_minor: b.rebate,
      toll: b.toll === null ? null : money(b.toll),
      fuel: b.fuel === null ? null : money(b.fuel),
      fees: b.fees === null ? null : money(b.fees),
      rebate: b.rebate === null ? null : money(b.rebate),
      distance_km: b.distanceKm,
      drive_minutes: b.driveMinutes,
    },
    over_drive_limit: b?.overDriveLimit ?? false,
    limits_extra_minor: p.limitsExtraMinor,
    limits_extra: p.limitsExtraMinor === null ? null : money(p.limitsExtraMinor),
    avoided: p.avoided,
    blocked_by: p.blockedBy,
    loop: p.loop && { depots: p.loop.depots, lanes: p.loop.lanes, net_per_lap_minor: p.loop.netPerLapMinor },
    alternatives: p.alternatives.map((a) => ({ cost_minor: a.costMinor, cost: money(a.costMinor), difference_minor: a.differenceMinor, path: a.path, lanes: a.lanes, departs: a.departs })),
    alternatives_stopped_by: p.alternativesStoppedBy,
    notes: p.notes,
    source_row: p.load.sourceRow,
  };
}

function groupTotals(rows: DispatchLoadRow[], keyOf: (r: DispatchLoadRow) => string, money: (v: number) => string): DispatchTotalRow[] {
  const groups = new Map<string, DispatchLoadRow[]>();
  for (const r of rows) {
    const k = keyOf(r);
    const list = groups.get(k);
    if (list) list.push(r);
    else groups.set(k, [r]);
  }
  return [...groups.keys()].sort().map((k) => total(k, groups.get(k)!, money));
}

function total(key: string, rows: DispatchLoadRow[], money: (v: number) => string): DispatchTotalRow {
  const planned = rows.filter((r) => r.status === 'planned');
  const cost = sumMinor(planned.map((r) => r.cost_minor!), `dispatch total cost (${key})`);
  const sum = (f: (r: DispatchLoadRow) => number | null | undefined, digits: number) => {
    let s = 0;
    for (const r of planned) {
      const v = f(r);
      if (v === null || v === undefined) return null;
      s += v;
    }
    return Math.round(s * 10 ** digits) / 10 ** digits;
  };
  return {
    key,
    loads: rows.length,
    planned: planned.length,
    blocked: rows.filter((r) => r.status === 'blocked').length,
    unbounded: rows.filter((r) => r.status === 'unbounded').length,
    no_route: rows.filter((r) => r.status === 'no-route').length,
    cost_minor: cost,
    cost: money(cost),
    distance_km: sum((r) => r.breakdown?.distance_km, 3),
    drive_minutes: sum((r) => r.breakdown?.drive_minutes, 2),
    over_drive_limit: planned.filter((r) => r.over_drive_limit).length,
  };
}

/** One row per load, as the CSV export and the dispatch sheet write it. The caution is the last column. */
export function dispatchReportRows(report: DispatchReport): (string | number | null)[][] {
  const header = [
    'load', 'from', 'to', 'date', 'vehicle', 'vehicle_class', 'status', 'cost', 'toll', 'fuel', 'fees', 'rebate', 'distance_km', 'drive_minutes',
    'over_drive_limit', 'legs', 'path', 'lane_rows', 'limits_extra', 'avoided', 'blocked_by', 'loop', 'alternatives', 'notes', 'caution',
  ];
  return [
    header,
    ...report.loads.map((r) => {
      const b = r.breakdown;
      return [
        r.load, r.from, r.to, r.date, r.vehicle ?? '', r.vehicle_class ?? '', r.status, r.cost ?? '',
        b?.toll ?? '', b?.fuel ?? '', b?.fees ?? '', b?.rebate ?? '', b?.distance_km ?? '', b?.drive_minutes ?? '',
        b ? (r.over_drive_limit ? 'yes' : 'no') : '', r.legs ?? '', r.path.join('>'), r.lanes.join('>'), r.limits_extra ?? '',
        r.avoided.join('; '), r.blocked_by.join('; '), r.loop ? `${r.loop.depots.join('>')} (net per lap ${r.loop.net_per_lap_minor} minor units)` : '',
        r.alternatives.map((a) => `${a.cost} via ${a.path.join('>')}`).join('; '), r.notes.join('; '), report.caution,
      ];
    }),
  ];
}
