// What the paint worker holds of a network, copied from the network's own arrays: one owner of the
// list, for the engine worker (which makes the copies with each network view) and the map (which
// copies again when those copies were already handed on).

import type { LaneGrid } from '../lane-grid';
import type { NetworkPaintArrays } from './protocol';

/** The arrays painting needs, as read from a NetworkView or the engine's network. */
export interface PaintSource {
  lat: Float64Array;
  lon: Float64Array;
  laneFrom: Int32Array;
  laneTo: Int32Array;
  laneReverse: Uint8Array;
  laneGrid: LaneGrid;
}

/** Fresh copies (safe to transfer: they share no buffer with `source`). */
export function copyPaintArrays(source: PaintSource): NetworkPaintArrays {
  const g = source.laneGrid;
  return {
    lat: source.lat.slice(),
    lon: source.lon.slice(),
    laneFrom: source.laneFrom.slice(),
    laneTo: source.laneTo.slice(),
    laneReverse: source.laneReverse.slice(),
    laneGrid: { ...g, start: g.start.slice(), lanes: g.lanes.slice(), long: g.long.slice() },
  };
}

/** The buffers of `arrays`, for postMessage's transfer list. */
export function paintBuffers(arrays: NetworkPaintArrays): ArrayBuffer[] {
  const { lat, lon, laneFrom, laneTo, laneReverse, laneGrid } = arrays;
  return [lat, lon, laneFrom, laneTo, laneReverse, laneGrid.start, laneGrid.lanes, laneGrid.long].map((a) => a.buffer as ArrayBuffer);
}
