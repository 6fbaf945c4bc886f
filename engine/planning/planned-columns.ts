// Compiles a plan's lane columns straight into the typed-array Network (the same layout as
// network/build.ts makes from LaneInput objects), and turns them into PlannedLane objects only
// when a caller asks, so planning a million lanes allocates no object per lane.

import { isoDateText } from '../import/cells';
import type { DepotRecord, LaneTable } from '../import/types';
import type { Minor } from '../money/minor';
import { netCost } from '../money/net-cost';
import { depotColumns } from '../network/build';
import { compressRows } from '../network/compressed-rows';
import type { Network } from '../network/types';
import type { PlannedLane } from './types';

/** One entry per planned lane; `record` is its LaneTable row. */
export interface PlannedColumns {
  record: Int32Array;
  toll: Float64Array;
  fuel: Float64Array;
  distanceKm: Float64Array;
  driveMinutes: Float64Array;
  /** Bits: 1 distance, 2 fuel, 4 drive time estimated. */
  estimated: Uint8Array;
}

/** The Network of a plan; lane e is planned lane e. Depot indices are the depots' positions. */
export function buildPlannedNetwork(depots: readonly DepotRecord[], table: LaneTable, c: PlannedColumns, currency: string, exponent: number): Network {
  const depotCount = depots.length;
  const laneCount = c.record.length;
  const laneFrom = new Int32Array(laneCount);
  const laneTo = new Int32Array(laneCount);
  const laneFees = new Float64Array(laneCount);
  const laneRebate = new Float64Array(laneCount);
  const laneNet = new Float64Array(laneCount);
  const laneRow = new Int32Array(laneCount);
  const laneRef: (string | undefined)[] = new Array(laneCount);
  // One message function for every lane (it reads the row being built), not a closure per lane.
  let r = 0;
  const context = () => `net cost of the lane from row ${table.sourceRow[r]}`;
  for (let e = 0; e < laneCount; e++) {
    r = c.record[e];
    laneFrom[e] = table.from[r];
    laneTo[e] = table.to[r];
    laneFees[e] = table.fees[r];
    laneRebate[e] = table.rebate[r];
    laneNet[e] = netCost(c.toll[e], c.fuel[e], table.fees[r], table.rebate[r], context);
    laneRow[e] = table.sourceRow[r];
    laneRef[e] = table.ref[r];
  }
  return {
    depotCount,
    laneCount,
    currency,
    exponent,
    ...depotColumns(depots),
    laneFrom,
    laneTo,
    laneToll: c.toll,
    laneFuel: c.fuel,
    laneFees,
    laneRebate,
    laneNet,
    laneRow,
    laneDistanceKm: c.distanceKm,
    laneDriveMinutes: c.driveMinutes,
    laneRef,
    ...compressRows(depotCount, laneFrom, laneTo, laneNet),
  };
}

/** The planned lanes as objects (LaneInput plus validity, class and estimate flags). */
export function plannedLanes(depots: readonly DepotRecord[], table: LaneTable, c: PlannedColumns, plannedClass: string | null): PlannedLane[] {
  // Every class row planned is for the planned class: its own, or a lane's stand-in row of another
  // class at the default toll.
  const classOf = (r: number): string | null => (table.vehicleClass && table.vehicleClass[r] === -1 ? null : plannedClass);
  const lanes: PlannedLane[] = new Array(c.record.length);
  for (let e = 0; e < c.record.length; e++) {
    const r = c.record[e];
    lanes[e] = {
      from: depots[table.from[r]].id,
      to: depots[table.to[r]].id,
      toll: c.toll[e] as Minor,
      fuel: c.fuel[e] as Minor,
      fees: table.fees[r] as Minor,
      rebate: table.rebate[r] as Minor,
      sourceRow: table.sourceRow[r],
      ref: table.ref[r],
      distanceKm: c.distanceKm[e],
      driveMinutes: c.driveMinutes[e],
      validFrom: isoDateText(table.validFrom[r]),
      validTo: isoDateText(table.validTo[r]),
      vehicleClass: classOf(r),
      distanceEstimated: (c.estimated[e] & 1) !== 0,
      fuelEstimated: (c.estimated[e] & 2) !== 0,
      driveEstimated: (c.estimated[e] & 4) !== 0,
    };
  }
  return lanes;
}
