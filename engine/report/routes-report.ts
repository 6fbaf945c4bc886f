// The routes report every front end shows: per depot status, exact cost, legs, path and lanes, plus
// the rebate loops. The CLI's --json output is this object as is; the CSV is its flat form.

import { formatMinor, type Minor } from '../money/minor';
import type { Network } from '../network/types';
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
}

/** Builds the report from an unlimited or a leg-limited solve. */
export function routesReport(network: Network, solved: RouteTree | LegLimitedRoutes): RoutesReport {
  const limited = 'maxLegs' in solved;
  const pathOf = (d: number): RoutePath | null => (limited ? solved.path(d) : routePath(network, solved, d));
  const depots: DepotRouteRow[] = [];
  for (let d = 0; d < network.depotCount; d++) {
    const reachable = solved.status[d] === STATUS_REACHABLE;
    const path = reachable ? pathOf(d) : null;
    depots.push({
      id: network.depotIds[d],
      name: network.depotNames[d],
      status: statusName(solved.status[d]),
      cost_minor: reachable ? solved.cost[d] : null,
      cost: reachable ? formatMinor(solved.cost[d] as Minor, network.exponent) : null,
      legs: reachable ? solved.legs[d] : null,
      path: path ? path.depots.map((x) => network.depotIds[x]) : [],
      lanes: path ? path.lanes.map((e) => network.laneRow[e]) : [],
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
  };
}

/** Flat table of the report: a header and one row per depot. */
export function routesReportRows(report: RoutesReport): (string | number | null)[][] {
  return [
    ['id', 'name', 'status', 'cost', 'legs', 'path'],
    ...report.depots.map((d) => [d.id, d.name, d.status, d.cost ?? '', d.legs ?? '', d.path.join('>')]),
  ];
}
