// Messages between the map (UI thread) and the paint worker, which rasterises the lane canvases
// off the UI thread (OffscreenCanvas). The network's typed arrays go over once per network; after
// that a frame is a few numbers (size, pixel ratio, the metres-to-pixels transform, the view box).
// Everything is structured-clone data; the canvases themselves are transferred.

import type { DepotLook } from '../depot-paint';
import type { LaneGrid, ViewBox } from '../lane-grid';
import type { LaneCounts, LineStyle } from '../lane-paint';
import type { ViewTransform } from '../mercator';

/** What painting needs of a network: copies of the NetworkView's arrays, never per-lane objects. */
export interface NetworkPaintArrays {
  lat: Float64Array;
  lon: Float64Array;
  laneFrom: Int32Array;
  laneTo: Int32Array;
  /** 1 where the lane's reverse is in the network (drawn side by side). */
  laneReverse: Uint8Array;
  laneGrid: LaneGrid;
}

/** A lane only the scenario plans: its negative ref (`addedLaneRef`) and its depots. */
export interface AddedLaneEnds {
  ref: number;
  from: number;
  to: number;
}

/** What one canvas shows. */
export type CanvasContent =
  /** Every lane, culled to the view and thinned above the threshold (lane-paint.ts `paintAllLanes`). */
  | { kind: 'all-lanes'; style: LineStyle }
  /** A set of lanes (the route tree), culled to the view; negative refs are lanes in `added`. */
  | { kind: 'lane-set'; lanes: Int32Array; added: AddedLaneEnds[]; style: LineStyle }
  /** Land and borders (basemap-paint.ts); needs no network. */
  | { kind: 'basemap' }
  /** The network's depots styled by `look` (depot-paint.ts), circles shrunk by `scale`. */
  | { kind: 'depots'; look: DepotLook & { status: Uint8Array | null }; scale: number };

/** One frame of a canvas: its CSS size, device pixels per CSS pixel, and where the map looks. */
export interface PaintFrame {
  /** Increases per canvas; the answer names it, so the map places the canvas for the frame painted. */
  seq: number;
  width: number;
  height: number;
  pixelRatio: number;
  /** Mercator metres to the canvas's CSS pixels. */
  transform: ViewTransform;
  /** The canvas's extent in degrees, for culling. */
  view: ViewBox;
}

export type ToPaint =
  | { kind: 'network'; network: number; arrays: NetworkPaintArrays }
  | { kind: 'drop-network'; network: number }
  /** `network` null: content that needs none (the basemap). */
  | { kind: 'open'; canvas: number; target: OffscreenCanvas; network: number | null; content: CanvasContent }
  | { kind: 'content'; canvas: number; content: CanvasContent }
  | { kind: 'frame'; canvas: number; frame: PaintFrame }
  | { kind: 'close'; canvas: number };

/**
 * Frame `seq` is on the canvas. `counts` says what it drew: lanes (or depots) drawn, in view, of the
 * network; zeros for the basemap. `shown`: the depots drawn, for the map's hit tests.
 */
export interface PaintedAnswer {
  kind: 'painted';
  canvas: number;
  seq: number;
  counts: LaneCounts;
  shown?: Int32Array;
}

export type FromPaint =
  | PaintedAnswer
  /** The canvas could not be painted (no 2D context, a message for an unknown network). */
  | { kind: 'failed'; canvas: number; message: string };
