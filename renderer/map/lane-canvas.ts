// Lanes drawn straight onto one canvas per kind (all lanes; the route tree), with level of detail:
// only lanes that meet the view are drawn, and above `LANE_DETAIL_THRESHOLD` lanes the ones in view
// are thinned to `MAX_LANES_PER_FRAME` (the map says so). A Leaflet layer per lane, or one polyline
// of 500,000 rings, took seconds per pan or zoom; this paints in tens of milliseconds. The canvas is
// Leaflet's own canvas renderer (padding, zoom animation, retina), with its drawing replaced.

import L from 'leaflet';
import { addedLaneOf, type AddedLane } from '../model/added-lanes';
import type { NetworkView } from '../worker/protocol';
import { lanesInView, type ViewBox } from './lane-grid';
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

interface CanvasInternals {
  _ctx: CanvasRenderingContext2D;
  _bounds: L.Bounds;
  _map: L.Map | null;
  _redraw(): void;
  _draw(): void;
}

export interface LineStyle {
  color: string;
  weight: number;
  opacity: number;
  lineCap?: string;
}

/** Web Mercator metres of each depot, made once per network. */
const mercator = new WeakMap<NetworkView, { x: Float64Array; y: Float64Array }>();
export function mercatorOf(network: NetworkView): { x: Float64Array; y: Float64Array } {
  let m = mercator.get(network);
  if (!m) {
    const n = network.lat.length;
    m = { x: new Float64Array(n), y: new Float64Array(n) };
    // Leaflet's spherical Mercator (L.Projection.SphericalMercator), written out: one L.LatLng per
    // depot cost more than the arithmetic.
    // Its radius and latitude limit are not in Leaflet's type declarations.
    const mercatorConstants = L.Projection.SphericalMercator as unknown as { R: number; MAX_LATITUDE: number };
    const R = mercatorConstants.R;
    const limit = mercatorConstants.MAX_LATITUDE;
    const rad = Math.PI / 180;
    for (let d = 0; d < n; d++) {
      const lat = Math.max(Math.min(limit, network.lat[d]), -limit);
      const sin = Math.sin(lat * rad);
      m.x[d] = R * network.lon[d] * rad;
      m.y[d] = (R * Math.log((1 + sin) / (1 - sin))) / 2;
    }
    mercator.set(network, m);
  }
  return m;
}

/** The map's metres-to-layer-pixels affine map at its current zoom (two reference points fix it). */
export function layerTransform(map: L.Map): { sx: number; ox: number; sy: number; oy: number } {
  const a = L.latLng(0, 0);
  const b = L.latLng(40, 40);
  const pa = L.Projection.SphericalMercator.project(a);
  const pb = L.Projection.SphericalMercator.project(b);
  const qa = map.latLngToLayerPoint(a);
  const qb = map.latLngToLayerPoint(b);
  const sx = (qb.x - qa.x) / (pb.x - pa.x);
  const sy = (qb.y - qa.y) / (pb.y - pa.y);
  return { sx, ox: qa.x - sx * pa.x, sy, oy: qa.y - sy * pa.y };
}

/** The renderer's pixel box as latitude / longitude bounds. */
export function viewBoxOf(map: L.Map, bounds: L.Bounds): ViewBox {
  const sw = map.layerPointToLatLng(L.point(bounds.min!.x, bounds.max!.y));
  const ne = map.layerPointToLatLng(L.point(bounds.max!.x, bounds.min!.y));
  return { south: sw.lat, west: sw.lng, north: ne.lat, east: ne.lng };
}

const canvasDraw = (L.Canvas.prototype as unknown as CanvasInternals)._draw;

// Paints wait for the next animation frame and share it: at most PAINT_BUDGET_MS of painting per
// frame, the rest in the frames after, so an import or a solve that changes several canvases never
// holds the UI thread for all of them in one task.
const PAINT_BUDGET_MS = 30;
const paintQueue = new Set<() => void>();
let paintFrame = 0;
function runPaints(): void {
  paintFrame = 0;
  const started = performance.now();
  for (const job of paintQueue) {
    paintQueue.delete(job);
    job();
    if (paintQueue.size > 0 && performance.now() - started > PAINT_BUDGET_MS) {
      paintFrame = requestAnimationFrame(runPaints);
      return;
    }
  }
}
function schedulePaint(job: () => void): void {
  paintQueue.add(job);
  if (!paintFrame) paintFrame = requestAnimationFrame(runPaints);
}

type Paint = (ctx: CanvasRenderingContext2D, bounds: L.Bounds, map: L.Map) => void;
type Painted = L.Canvas & CanvasInternals & { _clear(): void; lwPaint?: Paint; lwJob?: () => void };

/** A Leaflet canvas renderer whose drawing is `lwPaint`, run in the paint queue after Leaflet has placed and cleared the canvas. */
const PaintedCanvas = L.Canvas.extend({
  _draw(this: Painted) {
    canvasDraw.call(this);
    if (this.lwJob) schedulePaint(this.lwJob);
  },
}) as unknown as new (options: L.RendererOptions) => Painted;

/** A canvas that paints with `paint` whenever the view moves; `repaint()` after the content changes. */
export class PaintLayer {
  readonly renderer: Painted;
  private readonly job: () => void;

  constructor(pane: string, paint: Paint) {
    // A small margin: in software rendering the cost of a paint grows with the canvas area.
    const renderer = new PaintedCanvas({ pane, padding: 0.15 });
    this.job = () => {
      // The view may have moved or the layer gone since the paint was queued: paint what is current.
      if (!renderer._map || !renderer._bounds || !renderer._ctx) return;
      renderer._clear();
      paint(renderer._ctx, renderer._bounds, renderer._map);
    };
    renderer.lwJob = this.job;
    this.renderer = renderer;
  }

  addTo(map: L.Map): this {
    this.renderer.addTo(map);
    return this;
  }

  remove(): void {
    paintQueue.delete(this.job);
    this.renderer.remove();
  }

  /** Paints again in the paint queue (several changes before it runs paint once). */
  repaint(): void {
    schedulePaint(this.job);
  }
}

/** Strokes lanes as one path, each shifted right of its direction when its reverse is drawn too. */
function strokeLanes(ctx: CanvasRenderingContext2D, map: L.Map, network: NetworkView, lanes: ArrayLike<number>, style: LineStyle, view: ViewBox | null, added: readonly AddedLane[] = []): number {
  const m = mercatorOf(network);
  const t = layerTransform(map);
  const shift = offsetFor(style.weight);
  ctx.beginPath();
  let drawn = 0;
  for (let i = 0; i < lanes.length; i++) {
    const e = lanes[i];
    let a: number, b: number, twoWay: boolean;
    if (e >= 0) {
      if (e >= network.laneFrom.length) continue;
      a = network.laneFrom[e];
      b = network.laneTo[e];
      twoWay = network.laneReverse[e] === 1;
    } else {
      // A lane the scenario adds is not in the network: its ends come from its change.
      const extra = addedLaneOf(added, e);
      if (!extra || extra.from < 0 || extra.to < 0) continue;
      a = extra.from;
      b = extra.to;
      twoWay = false;
    }
    if (view) {
      const la = network.lat[a], lb = network.lat[b], oa = network.lon[a], ob = network.lon[b];
      if (Math.max(la, lb) < view.south || Math.min(la, lb) > view.north || Math.max(oa, ob) < view.west || Math.min(oa, ob) > view.east) continue;
    }
    let x1 = t.sx * m.x[a] + t.ox;
    let y1 = t.sy * m.y[a] + t.oy;
    let x2 = t.sx * m.x[b] + t.ox;
    let y2 = t.sy * m.y[b] + t.oy;
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

/** Every lane of the network, grey, culled to the view and thinned above the threshold. */
export function allLanesLayer(pane: string, network: NetworkView, style: LineStyle, onCounts: (counts: LaneCounts) => void): PaintLayer {
  const grid = network.laneGrid;
  const total = network.laneFrom.length;
  return new PaintLayer(pane, (ctx, bounds, map) => {
    const view = viewBoxOf(map, bounds);
    const picked = lanesInView(grid, network, view, total > LANE_DETAIL_THRESHOLD ? MAX_LANES_PER_FRAME : total);
    const drawn = strokeLanes(ctx, map, network, picked.lanes, style, null);
    onCounts({ drawn, inView: picked.inView, total });
  });
}

/** A set of lanes (the route tree), culled to the view; lanes the scenario adds are drawn from `added`. */
export function laneSetLayer(pane: string, network: NetworkView, lanes: Int32Array, added: readonly AddedLane[], style: LineStyle): PaintLayer {
  return new PaintLayer(pane, (ctx, bounds, map) => {
    strokeLanes(ctx, map, network, lanes, style, viewBoxOf(map, bounds), added);
  });
}
