// A network made of chosen lanes with chosen nets, sharing the depots of an existing one: the
// common core and the union of a class's maximal period networks, which bound every period's floors.
// Only what the solvers read is filled in; amounts other than the net are zero.

import { compressRows } from '../../network/compressed-rows';
import type { Network } from '../../network/types';

/** `rows[i]` goes from `from[i]` to `to[i]` at `net[i]`; laneRow holds the given rows. */
export function laneSetNetwork(template: Network, from: Int32Array, to: Int32Array, net: Float64Array, rows: Int32Array): Network {
  const m = from.length;
  const zeros = new Float64Array(m);
  return {
    depotCount: template.depotCount,
    laneCount: m,
    currency: template.currency,
    exponent: template.exponent,
    depotIds: template.depotIds,
    depotNames: template.depotNames,
    lat: template.lat,
    lon: template.lon,
    depotIndex: template.depotIndex,
    laneFrom: from,
    laneTo: to,
    laneToll: zeros,
    laneFuel: zeros,
    laneFees: zeros,
    laneRebate: zeros,
    laneNet: net,
    laneRow: rows,
    laneDistanceKm: new Float64Array(m).fill(NaN),
    laneDriveMinutes: new Float64Array(m).fill(NaN),
    laneRef: new Array<string | undefined>(m),
    ...compressRows(template.depotCount, from, to, net),
  };
}
