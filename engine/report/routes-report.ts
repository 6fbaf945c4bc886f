// The routes report every front end shows: per depot status, exact cost, legs, path and lanes with
// the route's breakdown and driving-limit flag, plus the rebate loops. The CLI's --json output is this
// object as is; the CSV is its flat form.

import { formatMinor, type Minor } from '../money/minor';
import type { Network } from '../network/types';
import { routeBreakdown } from '../planning/route-breakdown';
import { DRIVING_LIMIT_CAUTION } from '../planning/settings';
import { ROUTE_CAUTION } from '../text/cautions';
import { statusName, STATUS_REACHABLE, type DepotStatus, type RouteTree } from '../routes/cheapest-routes';
import type { LegLimitedRoutes } from '../routes/leg-limited';
import { routePath, type RoutePath } from '../routes/route-path';

export interface DepotRouteRow {
  id: string;
  name: string;
  status: DepotStatus;
  cost_minor: number | null;
  cost: string | null;
  legs: number | null;
  path: string[];
  /** Source rows of the lanes used, in travel order. */
  lanes: number[];
  /** Contract references of the lanes used, in travel order ("" where a lane has none). */
  refs: string[];
  /** Summed along the route; null unless reachable. */
  breakdown: RouteBreakdownRow | null;
}

/** A component is null when its own sum is outside the exact range (the route's cost is not). */
export interface RouteBreakdownRow {
  toll: string | null;
  fuel: string | null;
  fees: string | null;
  rebate: string | null;
  toll_minor: number | null;
  fuel_minor: number | null;
  fees_minor: number | null;
  rebate_minor: number | null;
  distance_km: number | null;
  drive_minutes: number | null;
  /** Drive time passes the daily driving limit: an estimate, see `caution`. */
  over_drive_limit: boolean;
}

export interface RoutesReportOptions {
  /** Daily driving limit routes are checked against; null or omitted = no check. */
  driveLimitMinutes?: number | null;
}

export interface LoopRow {
  depots: string[];
  lanes: number[];
  net_per_lap_minor: number;
}

export interface RoutesReport {
  origin: string;
  currency: string;
  max_legs: number | null;
  depots: DepotRouteRow[];
  loops: LoopRow[];
  drive_limit_minutes: number | null;
  /** Routes over the driving limit, and the caution that goes with the flag (null when none is over). */
  over_drive_limit: number;
  drive_limit_caution: string | null;
  /** Always the route caution (estimates; restrictions, hours and regulations apply), never null. */
  caution: string;
}

/** Builds the report from an unlimited or a leg-limited solve. */
export function routesReport(network: Network, solved: RouteTree | LegLimitedRoutes, options: RoutesReportOptions = {}): RoutesReport {
  const limit = options.driveLimitMinutes ?? null;
  const money = (v: number) => formatMinor(v as Minor, network.exponent);
  const part = (v: Minor | null) => (v === null ? null : money(v));
  let over = 0;
  const limited = 'maxLegs' in solved;
  const pathOf = (d: number): RoutePath | null => (limited ? solved.path(d) : routePath(network, solved, d));
  const depots: DepotRouteRow[] = [];
  for (let d = 0; d < network.depotCount; d++) {
    const reachable = solved.status[d] === STATUS_REACHABLE;
    const path = reachable ? pathOf(d) : null;
    const b = path ? routeBreakdown(network, path.lanes, limit) : null;
    if (b?.overDriveLimit) over++;
    depots.push({
      id: network.depotIds[d],
      name: network.depotNames[d],
      status: statusName(solved.status[d]),
      cost_minor: reachable ? solved.cost[d] : null,
      cost: reachable ? money(solved.cost[d]) : null,
      legs: reachable ? solved.legs[d] : null,
      path: path ? path.depots.map((x) => network.depotIds[x]) : [],
      lanes: path ? path.lanes.map((e) => network.laneRow[e]) : [],
      refs: path ? path.lanes.map((e) => network.laneRef[e] ?? '') : [],
      breakdown: b && {
        toll: part(b.toll),
        fuel: part(b.fuel),
        fees: part(b.fees),
        rebate: part(b.rebate),
        toll_minor: b.toll,
        fuel_minor: b.fuel,
        fees_minor: b.fees,
        rebate_minor: b.rebate,
        distance_km: b.distanceKm,
        drive_minutes: b.driveMinutes,
        over_drive_limit: b.overDriveLimit,
      },
    });
  }
  return {
    origin: network.depotIds[solved.origin],
    currency: network.currency,
    max_legs: limited ? solved.maxLegs : null,
    depots,
    loops: solved.loops.map((loop) => ({
      depots: loop.depots.map((x) => network.depotIds[x]),
      lanes: loop.lanes.map((e) => network.laneRow[e]),
      net_per_lap_minor: loop.netPerLap,
    })),
    drive_limit_minutes: limit,
    over_drive_limit: over,
    drive_limit_caution: over > 0 ? DRIVING_LIMIT_CAUTION : null,
    caution: ROUTE_CAUTION,
  };
}

/** Flat table of the report: a header and one row per depot, the breakdown after the path. */
export function routesReportRows(report: RoutesReport): (string | number | null)[][] {
  return [
    ['id', 'name', 'status', 'cost', 'legs', 'path', 'toll', 'fuel', 'fees', 'rebate', 'distance_km', 'drive_minutes', 'over_drive_limit', 'lane_rows', 'lane_refs'],
    ...report.depots.map((d) => {
      const b = d.breakdown;
      return [
        d.id,
        d.name,
        d.status,
        d.cost ?? '',
        d.legs ?? '',
        d.path.join('>'),
        b?.toll ?? '',
        b?.fuel ?? '',
        b?.fees ?? '',
        b?.rebate ?? '',
        b?.distance_km ?? '',
        b?.drive_minutes ?? '',
        b ? (b.over_drive_limit ? 'yes' : 'no') : '',
        d.lanes.join('>'),
        d.refs.some((r) => r !== '') ? d.refs.join('>') : '',
      ];
    }),
  ];
}
