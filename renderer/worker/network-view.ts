// Copies what the UI needs out of the compiled network. The copies travel to the UI thread as
// transferables, so the worker keeps its own arrays intact.

import type { Network } from '../../engine/network/types';
import type { NetworkView } from './protocol';

/** The UI's view of a network; `vehicleClasses` lists the priced classes (none yet in plain files). */
export function networkView(network: Network, vehicleClasses: string[] = []): NetworkView {
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
  };
}

/** The typed arrays of a view, for postMessage's transfer list. */
export function transferablesOf(view: NetworkView): ArrayBuffer[] {
  return [view.lat, view.lon, view.laneFrom, view.laneTo, view.laneToll, view.laneFuel, view.laneFees, view.laneRebate, view.laneRow, view.laneDistanceKm, view.laneDriveMinutes].map(
    (a) => a.buffer as ArrayBuffer,
  );
}
