// The paint worker's state: the networks it was sent, the canvases it paints and the last frame of
// each. A frame or a content change marks its canvas; one scheduled pass paints every marked canvas
// with its latest frame, so frames that queue up while a paint runs are painted once. No DOM and no
// Leaflet: tests drive it under Node with recording canvases.

import { paintBasemap, type ShapeContext } from '../basemap-paint';
import { paintDepots, type CircleContext } from '../depot-paint';
import { paintAllLanes, strokeLanes, type AddedEnds, type LaneCounts, type LanePaintData, type PathContext } from '../lane-paint';
import { projectPoints } from '../mercator';
import type { CanvasContent, FromPaint, NetworkPaintArrays, PaintFrame, ToPaint } from './protocol';

/** The 2D context calls a paint makes (OffscreenCanvasRenderingContext2D has them all). */
export interface PaintContext extends PathContext, ShapeContext, CircleContext {
  setTransform(a: number, b: number, c: number, d: number, e: number, f: number): void;
  clearRect(x: number, y: number, w: number, h: number): void;
}

/** A canvas the scene paints: an OffscreenCanvas in the worker, a fake in tests. */
export interface PaintTarget {
  width: number;
  height: number;
  getContext(kind: '2d'): unknown;
}

interface Slot {
  target: PaintTarget;
  network: number | null;
  content: CanvasContent;
  added: AddedEnds;
  frame: PaintFrame | null;
}

function addedEnds(content: CanvasContent): AddedEnds {
  return content.kind === 'lane-set' ? new Map(content.added.map((a) => [a.ref, { from: a.from, to: a.to }])) : new Map();
}

export class PaintScene {
  private readonly networks = new Map<number, LanePaintData>();
  private readonly slots = new Map<number, Slot>();
  private readonly marked = new Set<number>();
  private scheduled = false;

  /** `schedule` runs the paint pass later (a zero-delay timer in the worker). */
  constructor(
    private readonly post: (message: FromPaint) => void,
    private readonly schedule: (run: () => void) => void,
  ) {}

  handle(message: ToPaint): void {
    switch (message.kind) {
      case 'network':
        this.networks.set(message.network, paintDataOf(message.arrays));
        return;
      case 'drop-network':
        this.networks.delete(message.network);
        return;
      case 'open':
        this.slots.set(message.canvas, { target: message.target as unknown as PaintTarget, network: message.network, content: message.content, added: addedEnds(message.content), frame: null });
        return;
      case 'content': {
        const slot = this.slots.get(message.canvas);
        if (!slot) return;
        slot.content = message.content;
        slot.added = addedEnds(message.content);
        return this.mark(message.canvas);
      }
      case 'frame': {
        const slot = this.slots.get(message.canvas);
        if (!slot) return;
        slot.frame = message.frame;
        return this.mark(message.canvas);
      }
      case 'close':
        this.slots.delete(message.canvas);
        this.marked.delete(message.canvas);
        return;
    }
  }

  /** Test seam: the canvas ids open now. */
  openCanvases(): number[] {
    return [...this.slots.keys()];
  }

  private mark(canvas: number): void {
    this.marked.add(canvas);
    if (this.scheduled) return;
    this.scheduled = true;
    this.schedule(() => {
      this.scheduled = false;
      const ids = [...this.marked];
      this.marked.clear();
      for (const id of ids) this.paint(id);
    });
  }

  private paint(id: number): void {
    const slot = this.slots.get(id);
    if (!slot || !slot.frame) return;
    const data = slot.network === null ? null : this.networks.get(slot.network);
    if (data === undefined || (data === null && slot.content.kind !== 'basemap')) return this.post({ kind: 'failed', canvas: id, message: `paint: network ${slot.network} was not sent` });
    const frame = slot.frame;
    const target = slot.target;
    const width = Math.max(1, Math.round(frame.width * frame.pixelRatio));
    const height = Math.max(1, Math.round(frame.height * frame.pixelRatio));
    // Setting a size clears the canvas and its state, so only when it changes.
    if (target.width !== width) target.width = width;
    if (target.height !== height) target.height = height;
    const ctx = target.getContext('2d') as PaintContext | null;
    if (!ctx) return this.post({ kind: 'failed', canvas: id, message: 'paint: no 2D context' });
    ctx.setTransform(1, 0, 0, 1, 0, 0);
    ctx.clearRect(0, 0, width, height);
    ctx.setTransform(frame.pixelRatio, 0, 0, frame.pixelRatio, 0, 0);
    const content = slot.content;
    let counts: LaneCounts = { drawn: 0, inView: 0, total: 0 };
    let shown: Int32Array | undefined;
    if (content.kind === 'basemap') paintBasemap(ctx, frame.transform, frame.view);
    else if (data && content.kind === 'all-lanes') counts = paintAllLanes(ctx, frame.transform, data, frame.view, content.style);
    else if (data && content.kind === 'lane-set') {
      // A lane set is drawn whole, culled to the view: every lane of it in view is drawn.
      const drawn = strokeLanes(ctx, frame.transform, data, content.lanes, content.style, frame.view, slot.added);
      counts = { drawn, inView: drawn, total: data.laneFrom.length };
    } else if (data && content.kind === 'depots') {
      const painted = paintDepots(ctx, frame.transform, data, frame.view, content.look, content.scale);
      shown = painted.shown;
      counts = { drawn: shown.length, inView: painted.inView, total: data.lat.length };
    }
    this.post({ kind: 'painted', canvas: id, seq: frame.seq, counts, ...(shown ? { shown } : {}) });
  }
}

/** The arrays as received, with each depot projected once. */
export function paintDataOf(arrays: NetworkPaintArrays): LanePaintData {
  const { x, y } = projectPoints(arrays.lat, arrays.lon);
  return { ...arrays, x, y };
}
