// Copies what the UI needs out of the compiled network and the import's lane table. The copies
// travel to the UI thread as transferables, so the worker keeps its own arrays intact. Lane keys
// come from the engine (counted over the file's rows), so the UI never counts them itself; they
// travel as occurrences beside ref indices, never as 500,000 objects.

import { overlayKeys } from '../../engine/index';
import type { ImportResult, LaneKey, Network } from '../../engine/index';
import { laneGrid } from '../map/lane-grid';
import { copyPaintArrays, paintBuffers } from '../map/paint/paint-arrays';
import type { LaneRowsView, NetworkView, PlanChoice } from './protocol';

/** Base network lane of each lanes-file row, -1 for a row the plan leaves out. */
export function laneOfRows(result: ImportResult): Int32Array {
  const lane = new Int32Array(result.lanes.count).fill(-1);
  result.plan.laneRecord.forEach((row, e) => (lane[row] = e));
  return lane;
}

function rowsView(result: ImportResult, lane: Int32Array, keys: readonly LaneKey[], refNames: string[]): LaneRowsView {
  const t = result.lanes;
  const n = t.count;
  const cls = t.vehicleClass;
  // Refs as indices into one list of distinct refs: a file repeats a contract's ref on many rows.
  const refIndex = new Int32Array(n);
  const seen = new Map<string, number>();
  for (let r = 0; r < n; r++) {
    const ref = t.ref[r];
    if (!ref) {
      refIndex[r] = -1;
      continue;
    }
    let i = seen.get(ref);
    if (i === undefined) {
      i = refNames.length;
      refNames.push(ref);
      seen.set(ref, i);
    }
    refIndex[r] = i;
  }
  const occurrence = new Int32Array(n);
  for (let r = 0; r < n; r++) occurrence[r] = keys[r].occurrence;
  const classIndex = new Int32Array(n).fill(-1);
  if (cls) for (let r = 0; r < n; r++) classIndex[r] = cls[r];
  return {
    from: t.from.slice(0, n),
    to: t.to.slice(0, n),
    sourceRow: t.sourceRow.slice(0, n),
    refIndex,
    occurrence,
    validFrom: t.validFrom.slice(0, n),
    validTo: t.validTo.slice(0, n),
    classIndex,
    lane: lane.slice(),
  };
}

/**
 * 1 for a lane whose reverse (same depots, other way) is in the network, so the map draws both
 * directions side by side; found here over the network's rows of out-lanes, never on the UI thread.
 */
export function reverseFlags(network: Network): Uint8Array {
  const flags = new Uint8Array(network.laneCount);
  for (let e = 0; e < network.laneCount; e++) {
    const a = network.laneFrom[e];
    const b = network.laneTo[e];
    if (a === b) continue;
    for (let p = network.outStart[b]; p < network.outStart[b + 1]; p++) {
      if (network.outTo[p] === a) {
        flags[e] = 1;
        break;
      }
    }
  }
  return flags;
}

/** The UI's view of a planned import: the network, its lane keys and every row of the lanes file. */
export function networkView(result: ImportResult, plan: PlanChoice, keys: readonly LaneKey[] = overlayKeys(result)): NetworkView {
  const network: Network = result.network!;
  const lane = laneOfRows(result);
  const refNames: string[] = [];
  const rows = rowsView(result, lane, keys, refNames);
  const laneReverse = reverseFlags(network);
  // Binned here, off the UI thread (the map culls its lanes with it).
  const grid = laneGrid(network);
  return {
    currency: network.currency,
    exponent: network.exponent,
    depotIds: network.depotIds.slice(),
    depotNames: network.depotNames.slice(),
    lat: network.lat.slice(),
    lon: network.lon.slice(),
    laneFrom: network.laneFrom.slice(),
    laneTo: network.laneTo.slice(),
    laneToll: network.laneToll.slice(),
    laneFuel: network.laneFuel.slice(),
    laneFees: network.laneFees.slice(),
    laneRebate: network.laneRebate.slice(),
    laneRow: network.laneRow.slice(),
    laneRecord: result.plan.laneRecord.slice(),
    laneDistanceKm: network.laneDistanceKm.slice(),
    laneDriveMinutes: network.laneDriveMinutes.slice(),
    laneReverse,
    laneGrid: grid,
    refNames,
    rowClassNames: result.lanes.classNames.slice(),
    rows,
    vehicleClasses: result.vehicleClasses,
    plannedClass: result.plan.vehicleClass,
    plan,
    driveLimitMinutes: result.plan.settings.drivingLimit.dailyDrivingMinutes,
    // The paint worker's own copies, handed on by the UI thread without copying (map/paint/).
    paint: copyPaintArrays({ lat: network.lat, lon: network.lon, laneFrom: network.laneFrom, laneTo: network.laneTo, laneReverse, laneGrid: grid }),
  };
}

/** The typed arrays of a view, for postMessage's transfer list. */
export function transferablesOf(view: NetworkView): ArrayBuffer[] {
  const r = view.rows;
  const own = [view.lat, view.lon, view.laneFrom, view.laneTo, view.laneToll, view.laneFuel, view.laneFees, view.laneRebate, view.laneRow, view.laneDistanceKm, view.laneDriveMinutes, view.laneReverse, view.laneRecord, view.laneGrid.start, view.laneGrid.lanes, view.laneGrid.long, r.from, r.to, r.sourceRow, r.refIndex, r.occurrence, r.validFrom, r.validTo, r.classIndex, r.lane].map(
    (a) => a.buffer as ArrayBuffer,
  );
  return view.paint ? [...own, ...paintBuffers(view.paint)] : own;
}
