// The network model: depots and directed lanes as the importer hands them over, and the compact
// compiled form that every solver reads. Lanes stay in input order; parallel lanes are all kept.

import type { Minor } from '../money/minor';

/** A depot as read from the depots file. */
export interface DepotInput {
  id: string;
  name: string;
  lat: number;
  lon: number;
}

/** One contract line: a directed lane with its cost components in minor units. */
export interface LaneInput {
  from: string;
  to: string;
  toll: Minor;
  fuel: Minor;
  fees: Minor;
  rebate: Minor;
  /** Row of the lanes file this lane came from, as a spreadsheet numbers it (header = 1). */
  sourceRow: number;
  /** Lane or contract reference, when the file gives one. */
  ref?: string;
  distanceKm?: number;
  driveMinutes?: number;
}

/**
 * The compiled network. Lanes are indexed 0..laneCount-1 in input order; `out*` arrays hold the
 * same lanes grouped by origin depot (compressed sparse rows), so a solver scans a depot's lanes
 * as one contiguous run of typed-array memory.
 */
export interface Network {
  readonly depotCount: number;
  readonly laneCount: number;
  /** ISO 4217 code, and the number of minor digits used by every amount. */
  readonly currency: string;
  readonly exponent: number;

  readonly depotIds: readonly string[];
  readonly depotNames: readonly string[];
  readonly lat: Float64Array;
  readonly lon: Float64Array;
  readonly depotIndex: ReadonlyMap<string, number>;

  // Per lane, in input order. Amounts are exact integers of minor units stored in float64.
  readonly laneFrom: Int32Array;
  readonly laneTo: Int32Array;
  readonly laneToll: Float64Array;
  readonly laneFuel: Float64Array;
  readonly laneFees: Float64Array;
  readonly laneRebate: Float64Array;
  /** toll + fuel + fees - rebate. */
  readonly laneNet: Float64Array;
  readonly laneRow: Int32Array;
  /** NaN where unknown. */
  readonly laneDistanceKm: Float64Array;
  readonly laneDriveMinutes: Float64Array;
  readonly laneRef: readonly (string | undefined)[];

  // Compressed sparse rows: lanes leaving depot d are positions outStart[d] .. outStart[d+1]-1.
  readonly outStart: Int32Array;
  /** Lane index at each position. */
  readonly outLane: Int32Array;
  /** Destination depot at each position (copy of laneTo[outLane[p]] for locality). */
  readonly outTo: Int32Array;
  /** Net cost at each position (copy of laneNet[outLane[p]] for locality). */
  readonly outNet: Float64Array;
}
