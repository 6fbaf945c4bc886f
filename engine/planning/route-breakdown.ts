// A route's cost breakdown: tolls, fuel, fees and rebates summed exactly along the lanes used, with
// distance and drive time, and whether the drive time passes the daily driving limit (an estimate).

import { sumMinor, type Minor } from '../money/minor';
import type { Network } from '../network/types';

export interface RouteBreakdown {
  toll: Minor;
  fuel: Minor;
  fees: Minor;
  rebate: Minor;
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
  const distanceKm = roundedKm(distance);
  const driveMinutes = roundedMinutes(drive);
  return {
    toll: sumMinor(lanes.map((e) => network.laneToll[e]), 'route tolls'),
    fuel: sumMinor(lanes.map((e) => network.laneFuel[e]), 'route fuel'),
    fees: sumMinor(lanes.map((e) => network.laneFees[e]), 'route fees'),
    rebate: sumMinor(lanes.map((e) => network.laneRebate[e]), 'route rebates'),
    distanceKm,
    driveMinutes,
    overDriveLimit: driveLimitMinutes !== null && driveMinutes !== null && driveMinutes > driveLimitMinutes,
  };
}

// Distances are read or estimated to 0.1 km; rounding the sum drops float noise from adding them.
// Rounding twice gives the same figure, so a sum may be rounded again where it is shown.

/** A summed distance as reported: rounded to metres, null when a lane had none (NaN). */
export function roundedKm(sum: number): number | null {
  return Number.isNaN(sum) ? null : Math.round(sum * 1000) / 1000;
}

/** A summed drive time as reported: rounded to 0.01 minute, null when a lane had none (NaN). */
export function roundedMinutes(sum: number): number | null {
  return Number.isNaN(sum) ? null : Math.round(sum * 100) / 100;
}
