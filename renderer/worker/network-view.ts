// Copies what the UI needs out of the compiled network. The copies travel to the UI thread as
// transferables, so the worker keeps its own arrays intact.

import type { Network } from '../../engine/index';
import type { NetworkView, PlanChoice } from './protocol';

/** The UI's view of a planned network; `vehicleClasses` lists the classes the lanes file prices. */
export function networkView(network: Network, vehicleClasses: string[], plan: PlanChoice, driveLimitMinutes: number): NetworkView {
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
    laneRef: network.laneRef.slice(),
    laneDistanceKm: network.laneDistanceKm.slice(),
    laneDriveMinutes: network.laneDriveMinutes.slice(),
    vehicleClasses,
    plan,
    driveLimitMinutes,
  };
}

/** The typed arrays of a view, for postMessage's transfer list. */
export function transferablesOf(view: NetworkView): ArrayBuffer[] {
  return [view.lat, view.lon, view.laneFrom, view.laneTo, view.laneToll, view.laneFuel, view.laneFees, view.laneRebate, view.laneRow, view.laneDistanceKm, view.laneDriveMinutes].map(
    (a) => a.buffer as ArrayBuffer,
  );
}
