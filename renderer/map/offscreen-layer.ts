// A Leaflet layer whose canvas is painted by the paint worker (map/paint/): the UI thread only
// places the canvas and sends each frame's transform; rasterising happens on the worker's thread.
// Chosen over painting in chunks on the UI thread: a single stroke of 12,000 lanes or a 50,000-lane
// route tree cannot be split without drawing some lanes twice, and its rasterising alone took
// 100-400 ms in software (no GPU). The canvas stays where its painted frame belongs until the
// worker says the next frame is on it, so a pan never shows the old picture shifted.

import L from 'leaflet';
import type { NetworkView } from '../worker/protocol';
import { layerTransform, viewBoxOf } from './lane-canvas';
import { paintClient, type CanvasContent, type PaintedAnswer } from './paint/paint-client';

// Leaflet internals this layer uses (not in its type declarations).
interface MapInternals {
  _animatingZoom?: boolean;
  _getNewPixelOrigin(center: L.LatLng, zoom: number): L.Point;
}

/** The part of a frame the UI thread keeps to place the canvas once it is painted. */
interface Placed {
  /** World pixel (at `zoom`) of the canvas's top-left corner. */
  worldMin: L.Point;
  zoom: number;
  width: number;
  height: number;
}

const PADDING = 0.15;

export class OffscreenPaintLayer extends L.Layer {
  private canvas: HTMLCanvasElement | null = null;
  private id = 0;
  private seq = 0;
  private readonly sent = new Map<number, Placed>();
  private shown: Placed | null = null;
  private animation: { center: L.LatLng; zoom: number } | null = null;

  constructor(
    pane: string,
    private readonly network: NetworkView | null,
    private content: CanvasContent,
    private readonly onPainted: ((answer: PaintedAnswer) => void) | null = null,
  ) {
    super();
    L.Util.setOptions(this, { pane });
  }

  /** New content for the same canvas (the route tree after a solve): the old picture stays until the new one is painted. */
  setCanvasContent(content: CanvasContent): void {
    this.content = content;
    if (this.id) paintClient().content(this.id, content);
  }

  override onAdd(map: L.Map): this {
    const canvas = L.DomUtil.create('canvas', 'leaflet-zoom-animated lw-offscreen-canvas');
    this.getPane()!.appendChild(canvas);
    this.canvas = canvas;
    this.id = paintClient().open(canvas, this.network, this.content, (answer) => this.painted(answer));
    this.update(map);
    return this;
  }

  override onRemove(): this {
    paintClient().close(this.id);
    this.id = 0;
    this.canvas?.remove();
    this.canvas = null;
    this.sent.clear();
    this.shown = null;
    return this;
  }

  override getEvents(): { [name: string]: L.LeafletEventHandlerFn } {
    return {
      viewreset: () => this.update(this._map),
      moveend: () => this.update(this._map),
      zoom: () => this.place(),
      zoomanim: (event) => {
        const e = event as L.ZoomAnimEvent;
        this.animation = { center: e.center, zoom: e.zoom };
        this.place();
      },
    };
  }

  /** Sends the frame for the map's view now (Leaflet's canvas renderer box: the view plus a margin). */
  private update(map: L.Map): void {
    if (!this.canvas || !map) return;
    const internals = map as unknown as MapInternals;
    // Mid-animation the view is not where it will end; the moveend after it sends the frame.
    if (internals._animatingZoom && this.shown) return;
    this.animation = null;
    const size = map.getSize();
    const min = map.containerPointToLayerPoint(size.multiplyBy(-PADDING)).round();
    const max = min.add(size.multiplyBy(1 + 2 * PADDING)).round();
    const t = layerTransform(map);
    const seq = ++this.seq;
    const width = max.x - min.x;
    const height = max.y - min.y;
    this.sent.set(seq, { worldMin: min.add(map.getPixelOrigin()), zoom: map.getZoom(), width, height });
    paintClient().frame(this.id, {
      seq,
      width,
      height,
      pixelRatio: L.Browser.retina ? 2 : 1,
      transform: { sx: t.sx, ox: t.ox - min.x, sy: t.sy, oy: t.oy - min.y },
      view: viewBoxOf(map, L.bounds(min, max)),
    });
  }

  private painted(answer: PaintedAnswer): void {
    const placed = this.sent.get(answer.seq);
    if (!placed) return;
    for (const s of this.sent.keys()) if (s <= answer.seq) this.sent.delete(s);
    this.shown = placed;
    this.place();
    this.onPainted?.(answer);
  }

  /** Puts the painted frame where it belongs in the map's view now (or at the end of a zoom animation). */
  private place(): void {
    const map = this._map;
    const canvas = this.canvas;
    const shown = this.shown;
    if (!map || !canvas || !shown) return;
    const internals = map as unknown as MapInternals;
    const target = internals._animatingZoom && this.animation ? this.animation : { center: map.getCenter(), zoom: map.getZoom() };
    const scale = map.getZoomScale(target.zoom, shown.zoom);
    const offset = shown.worldMin.multiplyBy(scale).subtract(internals._getNewPixelOrigin(target.center, target.zoom));
    L.DomUtil.setTransform(canvas, offset, scale);
    canvas.style.width = `${shown.width}px`;
    canvas.style.height = `${shown.height}px`;
  }
}
