// Great-circle distances of lane rows without a distance, computed at most once per lane table: a
// calendar review or a day's dispatch plans the same table for many dates and classes, and each
// plan would otherwise repeat the same trigonometry for every such row.

import { greatCircleKm } from '../geo/turf';
import type { DepotRecord, LaneTable } from '../import/types';

const cache = new WeakMap<LaneTable, Float64Array>();

/** The table's cache column (NaN = not computed yet); a planner fetches it once, not once per row. */
export function greatCircleColumn(table: LaneTable): Float64Array {
  let known = cache.get(table);
  if (known === undefined) {
    known = new Float64Array(table.count).fill(NaN);
    cache.set(table, known);
  }
  return known;
}

/** Great-circle km between the depots of lane row `i`, through `known` = greatCircleColumn(table). */
export function greatCircleAt(known: Float64Array, table: LaneTable, depots: readonly DepotRecord[], i: number): number {
  let km = known[i];
  if (Number.isNaN(km)) {
    const a = depots[table.from[i]];
    const b = depots[table.to[i]];
    km = greatCircleKm(a.lat, a.lon, b.lat, b.lon);
    known[i] = km;
  }
  return km;
}

/** Great-circle km between the depots of lane row `i` (computed at most once per table). */
export function greatCircleOfRow(table: LaneTable, depots: readonly DepotRecord[], i: number): number {
  return greatCircleAt(greatCircleColumn(table), table, depots, i);
}
