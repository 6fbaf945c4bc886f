// Strokes lanes onto a 2D context: the drawing itself, apart from Leaflet and from where it runs,
// so the paint worker (OffscreenCanvas) and the UI thread's fallback (map/lane-canvas.ts) draw the
// same pixels and tests can run it under Node against a recording context. Culling and thinning
// are lane-grid.ts; this file only maps projected depots to pixels and strokes one path.

import { lanesInView, type LaneGrid, type ViewBox } from './lane-grid';
import type { ViewTransform } from './mercator';
import { offsetFor } from './two-way';

/** More lanes than this and the grey lanes are thinned to the cap below. */
export const LANE_DETAIL_THRESHOLD = 20_000;
/** Grey lanes drawn per frame at most, once thinned. */
export const MAX_LANES_PER_FRAME = 12_000;
/**
 * More lines than this in one frame and a wide style (the route tree) is stroked one pixel wide:
 * without a GPU, 50,000 three-pixel lines took about 300 ms to rasterise, one-pixel lines 30 ms.
 */
export const WIDE_LINES_LIMIT = 15_000;

export interface LaneCounts {
  /** Lanes drawn in this frame. */
  drawn: number;
  /** Lanes that meet the view. */
  inView: number;
  /** Lanes of the network. */
  total: number;
}

export interface LineStyle {
  color: string;
  weight: number;
  opacity: number;
  lineCap?: string;
}

/** What painting lanes needs of a network: depots (degrees and Mercator metres), lane ends, two-way flags, the grid. */
export interface LanePaintData {
  lat: ArrayLike<number>;
  lon: ArrayLike<number>;
  /** Mercator metres of each depot (mercator.ts). */
  x: ArrayLike<number>;
  y: ArrayLike<number>;
  laneFrom: ArrayLike<number>;
  laneTo: ArrayLike<number>;
  laneReverse: ArrayLike<number>;
  laneGrid: LaneGrid;
}

/** Ends of the lanes a scenario adds, by their negative ref (`addedLaneRef`): not in the network's arrays. */
export type AddedEnds = ReadonlyMap<number, { from: number; to: number }>;
export const NO_ADDED: AddedEnds = new Map();

/** The part of CanvasRenderingContext2D / OffscreenCanvasRenderingContext2D a lane paint uses. */
export interface PathContext {
  beginPath(): void;
  moveTo(x: number, y: number): void;
  lineTo(x: number, y: number): void;
  stroke(): void;
  strokeStyle: unknown;
  globalAlpha: number;
  lineWidth: number;
  lineCap: CanvasLineCap;
  lineJoin: CanvasLineJoin;
}

/**
 * Strokes `lanes` as one path, each shifted right of its direction when its reverse is drawn too;
 * with `view`, lanes whose extent misses it are skipped. Returns the number of lanes drawn.
 */
export function strokeLanes(ctx: PathContext, t: ViewTransform, data: LanePaintData, lanes: ArrayLike<number>, style: LineStyle, view: ViewBox | null, added: AddedEnds = NO_ADDED): number {
  const shift = offsetFor(style.weight);
  const count = data.laneFrom.length;
  ctx.beginPath();
  let drawn = 0;
  for (let i = 0; i < lanes.length; i++) {
    const e = lanes[i];
    let a: number, b: number, twoWay: boolean;
    if (e >= 0) {
      if (e >= count) continue;
      a = data.laneFrom[e];
      b = data.laneTo[e];
      twoWay = data.laneReverse[e] === 1;
    } else {
      // A lane the scenario adds is not in the network: its ends come from its change.
      const extra = added.get(e);
      if (!extra || extra.from < 0 || extra.to < 0) continue;
      a = extra.from;
      b = extra.to;
      twoWay = false;
    }
    if (view) {
      const la = data.lat[a], lb = data.lat[b], oa = data.lon[a], ob = data.lon[b];
      if (Math.max(la, lb) < view.south || Math.min(la, lb) > view.north || Math.max(oa, ob) < view.west || Math.min(oa, ob) > view.east) continue;
    }
    let x1 = t.sx * data.x[a] + t.ox;
    let y1 = t.sy * data.y[a] + t.oy;
    let x2 = t.sx * data.x[b] + t.ox;
    let y2 = t.sy * data.y[b] + t.oy;
    if (twoWay) {
      const dx = x2 - x1;
      const dy = y2 - y1;
      const length = Math.hypot(dx, dy);
      if (length > 0) {
        // Screen y grows downwards, so the right-hand normal of (dx, dy) is (-dy, dx).
        const sx = (-dy / length) * shift;
        const sy = (dx / length) * shift;
        x1 += sx;
        y1 += sy;
        x2 += sx;
        y2 += sy;
      }
    }
    ctx.moveTo(x1, y1);
    ctx.lineTo(x2, y2);
    drawn++;
  }
  const dense = drawn > WIDE_LINES_LIMIT && style.weight > 1;
  ctx.strokeStyle = style.color;
  ctx.globalAlpha = dense ? 1 : style.opacity;
  ctx.lineWidth = dense ? 1 : style.weight;
  ctx.lineCap = (style.lineCap as CanvasLineCap | undefined) ?? 'round';
  ctx.lineJoin = 'round';
  ctx.stroke();
  ctx.globalAlpha = 1;
  return drawn;
}

/** Every lane of the network, culled to `view` and thinned above the threshold; says what it drew. */
export function paintAllLanes(ctx: PathContext, t: ViewTransform, data: LanePaintData, view: ViewBox, style: LineStyle): LaneCounts {
  const total = data.laneFrom.length;
  const picked = lanesInView(data.laneGrid, data, view, total > LANE_DETAIL_THRESHOLD ? MAX_LANES_PER_FRAME : total);
  const drawn = strokeLanes(ctx, t, data, picked.lanes, style, null);
  return { drawn, inView: picked.inView, total };
}
