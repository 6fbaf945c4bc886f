// Every depot's route breakdown as a running total down the cheapest-route tree: a depot's totals
// are its parent's plus its own lane, taken in topological order of the tree (depots sorted by
// legs), so the whole report costs O(depots) instead of one walk per path (O(sum of path lengths)).

import { sumMinorOrNull } from '../money/minor';
import type { Network } from '../network/types';
import { STATUS_REACHABLE, type RouteTree } from '../routes/cheapest-routes';

/**
 * Totals per depot along its cheapest route; NaN where the depot is not reachable. For a reachable
 * depot a money total is NaN when that sum itself is outside the exact range (the route's cost, a
 * sum of nets, is not affected): reports show it as null.
 */
export interface RouteTotals {
  /** Exact integers of minor units. */
  readonly toll: Float64Array;
  readonly fuel: Float64Array;
  readonly fees: Float64Array;
  readonly rebate: Float64Array;
  /** Unrounded sums, added in travel order; NaN when a lane on the route has none. */
  readonly distanceKm: Float64Array;
  readonly driveMinutes: Float64Array;
}

/**
 * Depots of the tree in topological order: the origin first, then by number of legs, so every
 * depot comes after the one before it on its route. Counting sort, O(depots).
 */
export function treeOrder(tree: RouteTree): Int32Array {
  const n = tree.status.length;
  let maxLegs = 0;
  let count = 0;
  for (let d = 0; d < n; d++) {
    if (tree.status[d] !== STATUS_REACHABLE) continue;
    count++;
    if (tree.legs[d] > maxLegs) maxLegs = tree.legs[d];
  }
  const start = new Int32Array(maxLegs + 2);
  for (let d = 0; d < n; d++) if (tree.status[d] === STATUS_REACHABLE) start[tree.legs[d] + 1]++;
  for (let k = 0; k <= maxLegs; k++) start[k + 1] += start[k];
  const order = new Int32Array(count);
  for (let d = 0; d < n; d++) if (tree.status[d] === STATUS_REACHABLE) order[start[tree.legs[d]]++] = d;
  return order;
}

/**
 * Running totals of every reachable depot's route. The additions are the same, in the same order,
 * as summing the route's lanes from the origin, so the results equal a walk of each path exactly
 * (distances included, bit for bit). A money sum that leaves the exact range is redone exactly over
 * the route (sumMinorOrNull), so it is NaN only when the total itself is out of range; that walk
 * happens only past the range, never on ordinary networks.
 */
export function routeTotals(network: Network, tree: RouteTree): RouteTotals {
  const n = network.depotCount;
  const toll = new Float64Array(n).fill(NaN);
  const fuel = new Float64Array(n).fill(NaN);
  const fees = new Float64Array(n).fill(NaN);
  const rebate = new Float64Array(n).fill(NaN);
  const distanceKm = new Float64Array(n).fill(NaN);
  const driveMinutes = new Float64Array(n).fill(NaN);
  const { laneFrom, laneToll, laneFuel, laneFees, laneRebate, laneDistanceKm, laneDriveMinutes } = network;
  const order = treeOrder(tree);
  const MAX = Number.MAX_SAFE_INTEGER;
  // The exact sum of one amount over the route to d, walking back up the tree; NaN when out of range.
  const exact = (d: number, amounts: Float64Array): number => {
    const values: number[] = [];
    for (let x = d, lane = tree.viaLane[x]; lane !== -1; x = laneFrom[lane], lane = tree.viaLane[x]) values.push(amounts[lane]);
    return sumMinorOrNull(values.reverse()) ?? NaN;
  };
  const add = (totals: Float64Array, amounts: Float64Array, d: number, p: number, lane: number) => {
    const sum = totals[p] + amounts[lane];
    totals[d] = Math.abs(sum) <= MAX ? sum : exact(d, amounts);
  };
  for (let i = 0; i < order.length; i++) {
    const d = order[i];
    const lane = tree.viaLane[d];
    if (lane === -1) {
      // The origin: every sum starts at 0.
      toll[d] = fuel[d] = fees[d] = rebate[d] = distanceKm[d] = driveMinutes[d] = 0;
      continue;
    }
    const p = laneFrom[lane];
    add(toll, laneToll, d, p, lane);
    add(fuel, laneFuel, d, p, lane);
    add(fees, laneFees, d, p, lane);
    add(rebate, laneRebate, d, p, lane);
    distanceKm[d] = distanceKm[p] + laneDistanceKm[lane];
    driveMinutes[d] = driveMinutes[p] + laneDriveMinutes[lane];
  }
  return { toll, fuel, fees, rebate, distanceKm, driveMinutes };
}
