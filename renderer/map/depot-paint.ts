// Depots of a large network as circles on a 2D context, styled by the solve: which depots are in
// view, the even thinning above the cap, and one path per style. Apart from Leaflet, so the paint
// worker and the UI thread's fallback (depot-canvas.ts) draw the same, and tests run it under Node.

import type { ViewBox } from './lane-grid';
import type { ViewTransform } from './mercator';
import { STYLE } from './map-style';

/** Depots drawn per frame at most (the origin and the selection always); the map says when it thins them. */
export const MAX_DEPOTS_PER_FRAME = 6_000;
/**
 * More depots than this in a frame and solid styles are drawn as dots in their outline colour,
 * without the outline (stroking thousands of circles took most of a frame without a GPU); dashed
 * and unbounded rings keep their outline, so states still differ in more than colour.
 */
export const DENSE_DEPOTS = 2_000;

export type DepotStyle = { radius: number; color: string; weight: number; fillColor: string; fillOpacity: number; dashArray?: string };

/** How the depots look now: the solve's status per depot (null before a solve), its origin, the selection (-1 for none). */
export interface DepotLook {
  status: ArrayLike<number> | null;
  origin: number;
  selected: number;
}

/** Depots in degrees and Mercator metres. */
export interface DepotPoints {
  lat: ArrayLike<number>;
  lon: ArrayLike<number>;
  x: ArrayLike<number>;
  y: ArrayLike<number>;
}

/** The part of a 2D context a depot paint uses. */
export interface CircleContext {
  beginPath(): void;
  moveTo(x: number, y: number): void;
  arc(x: number, y: number, radius: number, start: number, end: number): void;
  fill(rule?: CanvasFillRule): void;
  stroke(): void;
  setLineDash(segments: number[]): void;
  fillStyle: unknown;
  strokeStyle: unknown;
  globalAlpha: number;
  lineWidth: number;
}

const UNBOUNDED: DepotStyle = { ...STYLE.unreachable, color: STYLE.loop.color, weight: 3, fillOpacity: 1 };

export function depotStyleOf(look: DepotLook, d: number): DepotStyle {
  if (look.status && d === look.origin) return STYLE.origin;
  if (d === look.selected) return STYLE.selected;
  const status = look.status ? look.status[d] : -1;
  if (status === 1) return STYLE.reachable;
  if (status === 0) return STYLE.unreachable;
  if (status === 2) return UNBOUNDED;
  return STYLE.depot;
}

/**
 * Paints the depots in `view` (at most MAX_DEPOTS_PER_FRAME, an even stride in file order, plus the
 * origin and the selection); returns the depots drawn (for hit tests) and how many were in view.
 * `scale` shrinks the circles of a network of thousands, so the lanes between them stay visible.
 */
export function paintDepots(ctx: CircleContext, t: ViewTransform, points: DepotPoints, view: ViewBox, look: DepotLook, scale: number): { shown: Int32Array; inView: number } {
  const n = points.lat.length;
  let inView: number[] = [];
  for (let d = 0; d < n; d++) {
    const lat = points.lat[d];
    const lon = points.lon[d];
    if (lat >= view.south && lat <= view.north && lon >= view.west && lon <= view.east) inView.push(d);
  }
  const inViewCount = inView.length;
  if (inView.length > MAX_DEPOTS_PER_FRAME) {
    const step = inView.length / MAX_DEPOTS_PER_FRAME;
    const kept = Array.from({ length: MAX_DEPOTS_PER_FRAME }, (_, j) => inView[Math.floor(j * step)]);
    const origin = look.status ? look.origin : -1;
    for (const d of [origin, look.selected]) if (d >= 0 && inView.includes(d) && !kept.includes(d)) kept.push(d);
    inView = kept;
  }
  const shown = Int32Array.from(inView);
  const px = new Float64Array(shown.length);
  const py = new Float64Array(shown.length);
  // One path per style: the origin and the selection last, so they sit on top.
  const groups = new Map<DepotStyle, number[]>();
  const special: number[] = [];
  shown.forEach((d, i) => {
    px[i] = t.sx * points.x[d] + t.ox;
    py[i] = t.sy * points.y[d] + t.oy;
    if ((look.status && d === look.origin) || d === look.selected) return void special.push(i);
    const style = depotStyleOf(look, d);
    let list = groups.get(style);
    if (!list) groups.set(style, (list = []));
    list.push(i);
  });
  const dense = shown.length > DENSE_DEPOTS;
  const paint = (given: DepotStyle, items: number[], radius: number) => {
    const style = dense && !given.dashArray && given.weight < 3 ? { ...given, fillColor: given.color, weight: 0 } : given;
    ctx.beginPath();
    for (const i of items) {
      ctx.moveTo(px[i] + radius, py[i]);
      ctx.arc(px[i], py[i], radius, 0, 2 * Math.PI);
    }
    ctx.globalAlpha = style.fillOpacity;
    ctx.fillStyle = style.fillColor;
    ctx.fill();
    ctx.globalAlpha = 1;
    if (style.weight > 0) {
      ctx.setLineDash(style.dashArray ? style.dashArray.split(' ').map(Number) : []);
      ctx.lineWidth = style.weight;
      ctx.strokeStyle = style.color;
      ctx.stroke();
      ctx.setLineDash([]);
    }
  };
  for (const [style, items] of groups) paint(style, items, Math.max(2, style.radius * scale));
  for (const i of special) {
    const style = depotStyleOf(look, shown[i]);
    paint(style, [i], style.radius);
  }
  return { shown, inView: inViewCount };
}
