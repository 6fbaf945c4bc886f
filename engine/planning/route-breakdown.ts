// A route's cost breakdown: tolls, fuel, fees and rebates summed exactly along the lanes used, with
// distance and drive time, and whether the drive time passes the daily driving limit (an estimate).

import { sumMinorOrNull, type Minor } from '../money/minor';
import type { Network } from '../network/types';

/**
 * The components are shown beside the route's cost, which the solver sums from the lanes' nets. A
 * component's own sum can leave the exact range while the cost does not (a huge toll cancelled by an
 * equal rebate); that figure alone is null ("out of range"), the route and its cost stand.
 */
export interface RouteBreakdown {
  toll: Minor | null;
  fuel: Minor | null;
  fees: Minor | null;
  rebate: Minor | null;
  /** Null when a lane on the route has no distance. */
  distanceKm: number | null;
  driveMinutes: number | null;
  /** True when driveMinutes exceeds the daily driving limit given. */
  overDriveLimit: boolean;
}

/** Sums the components of `lanes` (lane indices in travel order). */
export function routeBreakdown(network: Network, lanes: readonly number[], driveLimitMinutes: number | null): RouteBreakdown {
  let distance = 0;
  let drive = 0;
  for (const e of lanes) {
    distance += network.laneDistanceKm[e];
    drive += network.laneDriveMinutes[e];
  }
  // Distances are read or estimated to 0.1 km; rounding the sum drops float noise from adding them.
  const distanceKm = Number.isNaN(distance) ? null : Math.round(distance * 1000) / 1000;
  const driveMinutes = Number.isNaN(drive) ? null : Math.round(drive * 100) / 100;
  return {
    toll: sumMinorOrNull(lanes.map((e) => network.laneToll[e])),
    fuel: sumMinorOrNull(lanes.map((e) => network.laneFuel[e])),
    fees: sumMinorOrNull(lanes.map((e) => network.laneFees[e])),
    rebate: sumMinorOrNull(lanes.map((e) => network.laneRebate[e])),
    distanceKm,
    driveMinutes,
    overDriveLimit: driveLimitMinutes !== null && driveMinutes !== null && driveMinutes > driveLimitMinutes,
  };
}
