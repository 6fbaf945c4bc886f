// The routes report every front end shows: per depot status, exact cost, legs, the previous depot
// and lane (so the whole tree is in the output), path and lanes with the route's breakdown and
// driving-limit flag, plus the rebate loops. The CLI's --json output is this object as is; the CSV
// is its flat form. Rows are built one at a time (`routesReportStream`), so an export of any size
// is written without holding every path at once; the breakdowns are running totals (route-totals.ts).

import { isPlainCsvText } from '../io/csv-papaparse';
import { formatMinor, type Minor } from '../money/minor';
import { roundedKm, roundedMinutes, routeBreakdown } from '../planning/route-breakdown';
import type { Network } from '../network/types';
import { DRIVING_LIMIT_CAUTION } from '../planning/settings';
import { ROUTE_CAUTION } from '../text/cautions';
import { statusName, STATUS_REACHABLE, type DepotStatus, type RouteTree } from '../routes/cheapest-routes';
import type { LegLimitedRoutes } from '../routes/leg-limited';
import { routePath, type RoutePath } from '../routes/route-path';
import { routeTotals, type RouteTotals } from './route-totals';

/** A depot's row without its path: the size of every field is bounded. */
export interface RouteRowSummary {
  id: string;
  name: string;
  status: DepotStatus;
  cost_minor: number | null;
  cost: string | null;
  legs: number | null;
  /** The depot before this one on its cheapest route (null at the origin and unless reachable). */
  via: string | null;
  /** Source row of the lane from `via` to this depot. */
  via_lane: number | null;
  /** Summed along the route; null unless reachable. */
  breakdown: RouteBreakdownRow | null;
}

/** The fields whose length is the route's: left out with `paths: false`. */
export interface RoutePathFields {
  path: string[];
  /** Source rows of the lanes used, in travel order. */
  lanes: number[];
  /** Contract references of the lanes used, in travel order ("" where a lane has none). */
  refs: string[];
}

export type DepotRouteRow = RouteRowSummary & RoutePathFields;

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
  /** Give each row its path, lanes and refs (default true). */
  paths?: boolean;
  /** Only these depots (indices), in this order; default every depot in network order. */
  depots?: readonly number[];
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

/** The report's fields before its rows, in output order. */
export type RoutesReportHead = Pick<RoutesReport, 'origin' | 'currency' | 'max_legs'>;
/** The report's fields after its rows, in output order. */
export type RoutesReportTail = Pick<RoutesReport, 'loops' | 'drive_limit_minutes' | 'over_drive_limit' | 'drive_limit_caution' | 'caution'>;

/** The report with its rows made on demand; memory O(depots) whatever the paths add up to. */
export interface RoutesReportStream {
  readonly head: RoutesReportHead;
  readonly tail: RoutesReportTail;
  /** Whether rows carry path, lanes and refs. */
  readonly paths: boolean;
  /** Depot indices of the rows, in output order. */
  readonly depots: ArrayLike<number>;
  /** Rows in output order, each built when asked for. */
  rows(): Generator<RouteRowSummary | DepotRouteRow>;
  /** One depot's row with its path. */
  fullRow(d: number): DepotRouteRow;
  /** One depot's row of the flat table (columns of `routesReportHeader(paths)`), the same as routesReportCells of its row. */
  cells(d: number): (string | number)[];
  /**
   * Per column of the flat table: true when every cell `cells` can give in it is plain CSV text
   * (formatCsvRows' `plainColumns`): numbers, amounts, statuses, and the id, name and reference
   * columns when every depot id, name or lane reference is `isPlainCsvText`. Worked out on first use.
   */
  plainColumns(): readonly boolean[];
}

// Totals and the lane into each depot, from either kind of solve.
interface Solved {
  totals: RouteTotals;
  viaLane: Int32Array;
  pathOf(d: number): RoutePath | null;
}

function fromTree(network: Network, tree: RouteTree): Solved {
  return { totals: routeTotals(network, tree), viaLane: tree.viaLane, pathOf: (d) => routePath(network, tree, d) };
}

// A leg-limited walk may pass a depot more than once, so its walks form no tree over depots: each
// walk (at most max-legs lanes) is summed once, which bounds the work by depots x max-legs.
function fromLegLimited(network: Network, solved: LegLimitedRoutes): Solved {
  const n = network.depotCount;
  const column = () => new Float64Array(n).fill(NaN);
  const totals: RouteTotals = { toll: column(), fuel: column(), fees: column(), rebate: column(), distanceKm: column(), driveMinutes: column() };
  const viaLane = new Int32Array(n).fill(-1);
  const pathOf = (d: number) => (solved.status[d] === STATUS_REACHABLE ? solved.path(d) : null);
  for (let d = 0; d < n; d++) {
    const path = pathOf(d);
    if (path === null) continue;
    const b = routeBreakdown(network, path.lanes, null);
    totals.toll[d] = b.toll ?? NaN;
    totals.fuel[d] = b.fuel ?? NaN;
    totals.fees[d] = b.fees ?? NaN;
    totals.rebate[d] = b.rebate ?? NaN;
    totals.distanceKm[d] = b.distanceKm ?? NaN;
    totals.driveMinutes[d] = b.driveMinutes ?? NaN;
    viaLane[d] = path.lanes.length === 0 ? -1 : path.lanes[path.lanes.length - 1];
  }
  return { totals, viaLane, pathOf };
}

/** Builds the report's parts from an unlimited or a leg-limited solve; rows are made when read. */
export function routesReportStream(network: Network, solved: RouteTree | LegLimitedRoutes, options: RoutesReportOptions = {}): RoutesReportStream {
  const limit = options.driveLimitMinutes ?? null;
  const paths = options.paths !== false;
  const money = (v: number) => formatMinor(v as Minor, network.exponent);
  // A component total out of the exact range (NaN in the totals) is shown as null / an empty cell.
  const part = (v: number) => (Number.isNaN(v) ? null : money(v));
  const minor = (v: number) => (Number.isNaN(v) ? null : v);
  const limited = 'maxLegs' in solved;
  const { totals, viaLane, pathOf } = limited ? fromLegLimited(network, solved) : fromTree(network, solved);
  const depots: ArrayLike<number> = options.depots ?? Int32Array.from({ length: network.depotCount }, (_, d) => d);

  const overLimit = (d: number) => {
    const drive = roundedMinutes(totals.driveMinutes[d]);
    return limit !== null && drive !== null && drive > limit;
  };
  let over = 0;
  for (let i = 0; i < depots.length; i++) if (solved.status[depots[i]] === STATUS_REACHABLE && overLimit(depots[i])) over++;

  const summary = (d: number): RouteRowSummary => {
    const reachable = solved.status[d] === STATUS_REACHABLE;
    const lane = reachable ? viaLane[d] : -1;
    return {
      id: network.depotIds[d],
      name: network.depotNames[d],
      status: statusName(solved.status[d]),
      cost_minor: reachable ? solved.cost[d] : null,
      cost: reachable ? money(solved.cost[d]) : null,
      legs: reachable ? solved.legs[d] : null,
      via: lane === -1 ? null : network.depotIds[network.laneFrom[lane]],
      via_lane: lane === -1 ? null : network.laneRow[lane],
      breakdown: reachable
        ? {
            toll: part(totals.toll[d]),
            fuel: part(totals.fuel[d]),
            fees: part(totals.fees[d]),
            rebate: part(totals.rebate[d]),
            toll_minor: minor(totals.toll[d]),
            fuel_minor: minor(totals.fuel[d]),
            fees_minor: minor(totals.fees[d]),
            rebate_minor: minor(totals.rebate[d]),
            distance_km: roundedKm(totals.distanceKm[d]),
            drive_minutes: roundedMinutes(totals.driveMinutes[d]),
            over_drive_limit: overLimit(d),
          }
        : null,
    };
  };
  // Unbounded depots never get a path: following predecessors there would circle a rebate loop.
  const fullRow = (d: number): DepotRouteRow => {
    const s = summary(d);
    const path = solved.status[d] === STATUS_REACHABLE ? pathOf(d) : null;
    // Built in one literal, in the order the JSON shows (no spread: this runs once per depot).
    return {
      id: s.id,
      name: s.name,
      status: s.status,
      cost_minor: s.cost_minor,
      cost: s.cost,
      legs: s.legs,
      via: s.via,
      via_lane: s.via_lane,
      path: path ? path.depots.map((x) => network.depotIds[x]) : [],
      lanes: path ? path.lanes.map((e) => network.laneRow[e]) : [],
      refs: path ? path.lanes.map((e) => network.laneRef[e] ?? '') : [],
      breakdown: s.breakdown,
    };
  };

  // The flat row straight from the arrays: no row object and no array per path, because a CSV of
  // every path of a large network writes hundreds of millions of legs.
  const { depotIds, laneRow, laneRef } = network;
  const cells = (d: number): (string | number)[] => {
    const reachable = solved.status[d] === STATUS_REACHABLE;
    const lane = reachable ? viaLane[d] : -1;
    const row: (string | number)[] = [
      depotIds[d],
      network.depotNames[d],
      statusName(solved.status[d]),
      reachable ? money(solved.cost[d]) : '',
      reachable ? solved.legs[d] : '',
      lane === -1 ? '' : depotIds[network.laneFrom[lane]],
      lane === -1 ? '' : laneRow[lane],
    ];
    const path = paths && reachable ? pathOf(d) : null;
    // Paths are joined natively (join), not added up one leg at a time: a file of every path writes
    // hundreds of millions of legs.
    if (paths) {
      if (path) {
        const ids = new Array<string>(path.depots.length);
        for (let i = 0; i < ids.length; i++) ids[i] = depotIds[path.depots[i]];
        row.push(ids.join('>'));
      } else row.push('');
    }
    if (reachable) {
      row.push(part(totals.toll[d]) ?? '', part(totals.fuel[d]) ?? '', part(totals.fees[d]) ?? '', part(totals.rebate[d]) ?? '');
      row.push(roundedKm(totals.distanceKm[d]) ?? '', roundedMinutes(totals.driveMinutes[d]) ?? '', overLimit(d) ? 'yes' : 'no');
    } else {
      row.push('', '', '', '', '', '', '');
    }
    if (paths) {
      if (path) {
        const rows = new Array<number>(path.lanes.length);
        let anyRef = false;
        for (let i = 0; i < rows.length; i++) {
          const e = path.lanes[i];
          rows[i] = laneRow[e];
          const ref = laneRef[e];
          if (ref !== undefined && ref !== '') anyRef = true;
        }
        let refs = '';
        if (anyRef) {
          const texts = new Array<string>(rows.length);
          for (let i = 0; i < texts.length; i++) texts[i] = laneRef[path.lanes[i]] ?? '';
          refs = texts.join('>');
        }
        row.push(rows.join('>'), refs);
      } else row.push('', '');
    }
    return row;
  };

  let plain: boolean[] | null = null;
  const plainColumns = (): readonly boolean[] => {
    if (plain !== null) return plain;
    const every = (texts: ArrayLike<string | undefined>) => {
      for (let i = 0; i < texts.length; i++) {
        const t = texts[i];
        if (t !== undefined && t !== '' && !isPlainCsvText(t)) return false;
      }
      return true;
    };
    const ids = every(depotIds);
    const names = every(network.depotNames);
    // id, name, status, cost, legs, via, via_lane [, path], toll ... over_drive_limit [, lane_rows, lane_refs]
    const head = [ids, names, true, true, true, ids, true];
    const breakdown = [true, true, true, true, true, true, true];
    plain = paths ? [...head, ids, ...breakdown, true, every(laneRef)] : [...head, ...breakdown];
    return plain;
  };

  return {
    head: { origin: network.depotIds[solved.origin], currency: network.currency, max_legs: limited ? solved.maxLegs : null },
    tail: {
      loops: solved.loops.map((loop) => ({
        depots: loop.depots.map((x) => network.depotIds[x]),
        lanes: loop.lanes.map((e) => network.laneRow[e]),
        net_per_lap_minor: loop.netPerLap,
      })),
      drive_limit_minutes: limit,
      over_drive_limit: over,
      drive_limit_caution: over > 0 ? DRIVING_LIMIT_CAUTION : null,
      caution: ROUTE_CAUTION,
    },
    paths,
    depots,
    *rows() {
      for (let i = 0; i < depots.length; i++) yield paths ? fullRow(depots[i]) : summary(depots[i]);
    },
    fullRow,
    cells,
    plainColumns,
  };
}

/** Builds the whole report as one object (every row with its path): for small networks and the app. */
export function routesReport(network: Network, solved: RouteTree | LegLimitedRoutes, options: RoutesReportOptions = {}): RoutesReport {
  const stream = routesReportStream(network, solved, { ...options, paths: true });
  const depots: DepotRouteRow[] = [];
  for (let i = 0; i < stream.depots.length; i++) depots.push(stream.fullRow(stream.depots[i]));
  return { ...stream.head, depots, ...stream.tail };
}

/** Header of the flat table; without paths the path, lane_rows and lane_refs columns are left out. */
export function routesReportHeader(paths: boolean): string[] {
  const head = ['id', 'name', 'status', 'cost', 'legs', 'via', 'via_lane'];
  const breakdown = ['toll', 'fuel', 'fees', 'rebate', 'distance_km', 'drive_minutes', 'over_drive_limit'];
  return paths ? [...head, 'path', ...breakdown, 'lane_rows', 'lane_refs'] : [...head, ...breakdown];
}

/** One row of the flat table, in the columns of `routesReportHeader(paths)`. */
export function routesReportCells(row: RouteRowSummary | DepotRouteRow, paths: boolean): (string | number)[] {
  const b = row.breakdown;
  const cells: (string | number)[] = [row.id, row.name, row.status, row.cost ?? '', row.legs ?? '', row.via ?? '', row.via_lane ?? ''];
  const full = paths ? (row as DepotRouteRow) : null;
  if (full) cells.push(full.path.join('>'));
  if (b) cells.push(b.toll ?? '', b.fuel ?? '', b.fees ?? '', b.rebate ?? '', b.distance_km ?? '', b.drive_minutes ?? '', b.over_drive_limit ? 'yes' : 'no');
  else cells.push('', '', '', '', '', '', '');
  if (full) cells.push(full.lanes.join('>'), full.refs.some((r) => r !== '') ? full.refs.join('>') : '');
  return cells;
}

/** Flat table of the report: a header and one row per depot, the breakdown after the path. */
export function routesReportRows(report: RoutesReport): (string | number | null)[][] {
  return [routesReportHeader(true), ...report.depots.map((d) => routesReportCells(d, true))];
}
