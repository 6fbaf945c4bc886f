// The depot painter that the paint worker and the UI thread's fallback share: which depots it draws
// (in view; above the cap an even stride that still holds the origin and the selection), which it
// reports for hit tests, and how each state is styled (map-style.ts), against a recording context.

import { describe, expect, it } from 'vitest';
import { depotStyleOf, MAX_DEPOTS_PER_FRAME, paintDepots } from '../../../renderer/map/depot-paint';
import { STYLE } from '../../../renderer/map/map-style';

class CircleRecorder {
  fillStyle: unknown = '';
  strokeStyle: unknown = '';
  globalAlpha = 1;
  lineWidth = 1;
  readonly fills: { color: unknown; centres: [number, number][] }[] = [];
  readonly strokes: { color: unknown; width: number; dash: number[] }[] = [];
  private centres: [number, number][] = [];
  private dash: number[] = [];
  beginPath() {
    this.centres = [];
  }
  moveTo() {}
  arc(x: number, y: number) {
    this.centres.push([x, y]);
  }
  fill() {
    this.fills.push({ color: this.fillStyle, centres: this.centres });
  }
  stroke() {
    this.strokes.push({ color: this.strokeStyle, width: this.lineWidth, dash: this.dash });
  }
  setLineDash(d: number[]) {
    this.dash = d;
  }
}

/** `n` depots along the equator of the plane (x = lon, y = lat). */
function line(n: number) {
  const lon = Array.from({ length: n }, (_, d) => d);
  const lat = lon.map(() => 0);
  return { lat, lon, x: lon, y: lat };
}
const IDENTITY = { sx: 1, ox: 0, sy: 1, oy: 0 };

describe('paintDepots', () => {
  it('draws the depots in view where the transform puts them, and reports them', () => {
    const ctx = new CircleRecorder();
    const { shown, inView } = paintDepots(ctx, { sx: 10, ox: 5, sy: 1, oy: 0 }, line(10), { south: -1, west: 2.5, north: 1, east: 5 }, { status: null, origin: -1, selected: -1 }, 1);
    expect(Array.from(shown)).toEqual([3, 4, 5]);
    expect(inView).toBe(3);
    expect(ctx.fills.flatMap((f) => f.centres)).toEqual([
      [35, 0],
      [45, 0],
      [55, 0],
    ]);
  });

  it('thins above the cap to an even stride and keeps the origin and the selection', () => {
    const n = MAX_DEPOTS_PER_FRAME * 3 + 7;
    const status = new Uint8Array(n).fill(1);
    const look = { status, origin: 1, selected: 2 };
    const { shown, inView } = paintDepots(new CircleRecorder(), IDENTITY, line(n), { south: -1, west: -1, north: 1, east: n }, look, 0.5);
    expect(inView).toBe(n);
    expect(shown.length).toBe(MAX_DEPOTS_PER_FRAME + 2);
    expect(new Set(shown).size).toBe(shown.length);
    expect(shown).toContain(1);
    expect(shown).toContain(2);
  });

  it('styles each state apart: origin and selection on top, unreachable dashed, unbounded in the loop colour', () => {
    const status = Uint8Array.from([1, 1, 0, 2, 1]);
    const look = { status, origin: 0, selected: 4 };
    expect(depotStyleOf(look, 0)).toBe(STYLE.origin);
    expect(depotStyleOf(look, 4)).toBe(STYLE.selected);
    expect(depotStyleOf(look, 1)).toBe(STYLE.reachable);
    expect(depotStyleOf(look, 2)).toBe(STYLE.unreachable);
    expect(depotStyleOf(look, 3)).toMatchObject({ color: STYLE.loop.color, weight: 3 });
    expect(depotStyleOf({ status: null, origin: 0, selected: -1 }, 0)).toBe(STYLE.depot);
    const ctx = new CircleRecorder();
    paintDepots(ctx, IDENTITY, line(5), { south: -1, west: -1, north: 1, east: 5 }, look, 1);
    // The last two paths are the origin's and the selection's, so they sit on top.
    expect(ctx.fills.slice(-2).map((f) => f.color)).toEqual([STYLE.origin.fillColor, STYLE.selected.fillColor]);
    expect(ctx.strokes.find((s) => s.color === STYLE.unreachable.color)?.dash).toEqual([2, 2]);
  });
});
