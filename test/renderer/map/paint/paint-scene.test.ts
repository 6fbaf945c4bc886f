// The paint worker's state machine under Node, with recording canvases: a frame is painted at its
// size times the pixel ratio and answered with its seq and what it drew; frames that queue up before
// the paint pass are painted once (the latest); content changes repaint with the last frame; closed
// canvases and unknown networks are never painted silently.

import { describe, expect, it } from 'vitest';
import { laneGrid } from '../../../../renderer/map/lane-grid';
import { PaintScene } from '../../../../renderer/map/paint/paint-scene';
import type { FromPaint, NetworkPaintArrays, PaintFrame, ToPaint } from '../../../../renderer/map/paint/protocol';
import { mercatorX, mercatorY } from '../../../../renderer/map/mercator';
import { RecordingContext } from '../recording-context';

function arrays(): NetworkPaintArrays {
  const ends = { lat: Float64Array.from([0, 0, 1]), lon: Float64Array.from([0, 1, 1]), laneFrom: Int32Array.from([0, 1]), laneTo: Int32Array.from([1, 2]) };
  return { ...ends, laneReverse: new Uint8Array(2), laneGrid: laneGrid(ends, 2) };
}

class FakeCanvas {
  width = 300;
  height = 150;
  readonly ctx = new RecordingContext();
  getContext(): RecordingContext {
    return this.ctx;
  }
}

function frame(seq: number, view = { south: -1, west: -1, north: 2, east: 2 }): PaintFrame {
  return { seq, width: 200, height: 100, pixelRatio: 2, transform: { sx: 1e-4, ox: 10, sy: -1e-4, oy: 90 }, view };
}

function scene() {
  const posted: FromPaint[] = [];
  const queue: (() => void)[] = [];
  const s = new PaintScene((m) => posted.push(m), (run) => queue.push(run));
  const flush = () => queue.splice(0).forEach((run) => run());
  const open = (canvas: number, target: FakeCanvas, content: Extract<ToPaint, { kind: 'open' }>['content'], network = 1) =>
    s.handle({ kind: 'open', canvas, target: target as unknown as OffscreenCanvas, network, content });
  return { s, posted, flush, open };
}

const LANE_STYLE = { color: '#888', weight: 1, opacity: 0.5 };

describe('PaintScene', () => {
  it('paints a frame at its size times the pixel ratio and answers with its seq and counts', () => {
    const { s, posted, flush, open } = scene();
    s.handle({ kind: 'network', network: 1, arrays: arrays() });
    const canvas = new FakeCanvas();
    open(7, canvas, { kind: 'all-lanes', style: LANE_STYLE });
    s.handle({ kind: 'frame', canvas: 7, frame: frame(1) });
    expect(posted).toEqual([]);
    flush();
    expect([canvas.width, canvas.height]).toEqual([400, 200]);
    expect(canvas.ctx.clears).toEqual([[0, 0, 400, 200]]);
    expect(canvas.ctx.transforms.at(-1)).toEqual([2, 0, 0, 2, 0, 0]);
    expect(posted).toEqual([{ kind: 'painted', canvas: 7, seq: 1, counts: { drawn: 2, inView: 2, total: 2 } }]);
    // The first lane, depot 0 to depot 1, through the frame's transform (metres to CSS pixels).
    expect(canvas.ctx.strokes[0].segments[0]).toEqual([10, 90, 1e-4 * mercatorX(1) + 10, 90 - 1e-4 * mercatorY(0)]);
  });

  it('paints frames that queued up before the pass once, with the latest', () => {
    const { s, posted, flush, open } = scene();
    s.handle({ kind: 'network', network: 1, arrays: arrays() });
    const canvas = new FakeCanvas();
    open(1, canvas, { kind: 'all-lanes', style: LANE_STYLE });
    for (let seq = 1; seq <= 3; seq++) s.handle({ kind: 'frame', canvas: 1, frame: frame(seq) });
    flush();
    expect(posted.map((m) => (m.kind === 'painted' ? m.seq : -1))).toEqual([3]);
    expect(canvas.ctx.strokes).toHaveLength(1);
  });

  it('repaints a lane set with the last frame when its content changes, drawing added lanes from their ends', () => {
    const { s, posted, flush, open } = scene();
    s.handle({ kind: 'network', network: 1, arrays: arrays() });
    const canvas = new FakeCanvas();
    open(2, canvas, { kind: 'lane-set', lanes: new Int32Array(0), added: [], style: LANE_STYLE });
    s.handle({ kind: 'frame', canvas: 2, frame: frame(5) });
    flush();
    s.handle({ kind: 'content', canvas: 2, content: { kind: 'lane-set', lanes: Int32Array.from([1, -2]), added: [{ ref: -2, from: 2, to: 0 }], style: LANE_STYLE } });
    flush();
    expect(posted.map((m) => (m.kind === 'painted' ? [m.seq, m.counts.drawn] : m.kind))).toEqual([
      [5, 0],
      [5, 2],
    ]);
    expect(canvas.ctx.strokes[1].segments).toHaveLength(2);
  });

  it('stops painting a closed canvas and says when a network was never sent', () => {
    const { s, posted, flush, open } = scene();
    const closed = new FakeCanvas();
    s.handle({ kind: 'network', network: 1, arrays: arrays() });
    open(1, closed, { kind: 'all-lanes', style: LANE_STYLE });
    s.handle({ kind: 'frame', canvas: 1, frame: frame(1) });
    s.handle({ kind: 'close', canvas: 1 });
    const orphan = new FakeCanvas();
    open(2, orphan, { kind: 'all-lanes', style: LANE_STYLE }, 99);
    s.handle({ kind: 'frame', canvas: 2, frame: frame(1) });
    flush();
    expect(closed.ctx.strokes).toEqual([]);
    expect(s.openCanvases()).toEqual([2]);
    expect(posted).toEqual([{ kind: 'failed', canvas: 2, message: 'paint: network 99 was not sent' }]);
  });
});
