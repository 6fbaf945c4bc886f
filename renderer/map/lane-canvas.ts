// Canvases painted on the UI thread: `PaintLayer` is Leaflet's own canvas renderer (padding, zoom
// animation, retina) with its drawing replaced, queued per animation frame under a budget. The
// basemap and the depot canvas paint here, and the lanes when the paint worker is not available
// (lane-layers.ts); also the map's metres-to-pixels transform and view box that every paint uses.

import L from 'leaflet';
import type { NetworkView } from '../worker/protocol';
import type { ViewBox } from './lane-grid';
import { projectPoints, type ViewTransform } from './mercator';

interface CanvasInternals {
  _ctx: CanvasRenderingContext2D;
  _bounds: L.Bounds;
  _map: L.Map | null;
  _redraw(): void;
  _draw(): void;
}

/** Web Mercator metres of each depot, made once per network. */
const mercator = new WeakMap<NetworkView, { x: Float64Array; y: Float64Array }>();
export function mercatorOf(network: NetworkView): { x: Float64Array; y: Float64Array } {
  let m = mercator.get(network);
  if (!m) mercator.set(network, (m = projectPoints(network.lat, network.lon)));
  return m;
}

/** The map's metres-to-layer-pixels affine map at its current zoom (two reference points fix it). */
export function layerTransform(map: L.Map): ViewTransform {
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

// `_drawFirst` heads Leaflet's list of the canvas's paths in drawing order (null once empty).
type CanvasWithPaths = L.Canvas & { _map: L.Map | null; _drawFirst: unknown; _removePath(layer: L.Path): void };
const canvasRemovePath = (L.Canvas.prototype as unknown as CanvasWithPaths)._removePath;

/**
 * Leaflet's canvas renderer that leaves the map when its last path is removed (Leaflet adds it back
 * with the next path). An empty canvas stayed on the map and was still resized and handed to the
 * compositor at full size on every move: in software rendering, tens of milliseconds of UI thread
 * for nothing (the sample network's depot canvas, after a large network replaced it).
 */
const LeavingCanvas = L.Canvas.extend({
  _removePath(this: CanvasWithPaths, layer: L.Path) {
    canvasRemovePath.call(this, layer);
    if (this._map && !this._drawFirst) this._map.removeLayer(this);
  },
}) as unknown as new (options: L.RendererOptions & { tolerance?: number }) => L.Canvas;

export function leavingCanvas(options: L.RendererOptions & { tolerance?: number }): L.Canvas {
  return new LeavingCanvas(options);
}
