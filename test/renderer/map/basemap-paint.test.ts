// The basemap painter the paint worker and the UI thread's fallback share: Natural Earth land and
// borders, culled to the view. Checked on views whose content is known from any atlas: the land
// around Paris is drawn and filled even-odd, the open South Atlantic between 45°S and 42°S, 25°W and
// 20°W holds no land (common knowledge, no source), and every ring drawn meets the view.

import { describe, expect, it } from 'vitest';
import { basemapRings, paintBasemap } from '../../../renderer/map/basemap-paint';
import { mercatorX, mercatorY } from '../../../renderer/map/mercator';

class ShapeRecorder {
  fillStyle: unknown = '';
  strokeStyle: unknown = '';
  lineWidth = 1;
  lineJoin: CanvasLineJoin = 'miter';
  readonly paths: { starts: number; points: number }[] = [];
  readonly fills: (CanvasFillRule | undefined)[] = [];
  strokes = 0;
  beginPath() {
    this.paths.push({ starts: 0, points: 0 });
  }
  moveTo() {
    this.paths.at(-1)!.starts++;
  }
  lineTo() {
    this.paths.at(-1)!.points++;
  }
  closePath() {}
  fill(rule?: CanvasFillRule) {
    this.fills.push(rule);
  }
  stroke() {
    this.strokes++;
  }
}

const IDENTITY = { sx: 1, ox: 0, sy: 1, oy: 0 };

describe('paintBasemap', () => {
  it('fills the land around Paris even-odd and strokes the borders there', () => {
    const ctx = new ShapeRecorder();
    paintBasemap(ctx, { sx: 1e-3, ox: 0, sy: -1e-3, oy: 0 }, { south: 47, west: 0, north: 50, east: 5 });
    const [land, borders] = ctx.paths;
    expect(land.starts).toBeGreaterThan(0);
    expect(borders.starts).toBeGreaterThan(0);
    expect(ctx.fills).toEqual(['evenodd']);
    expect(ctx.strokes).toBe(1);
  });

  it('draws nothing in the open South Atlantic', () => {
    const ctx = new ShapeRecorder();
    paintBasemap(ctx, IDENTITY, { south: -45, west: -25, north: -42, east: -20 });
    expect(ctx.paths.map((p) => p.starts)).toEqual([0, 0]);
  });

  it('projects rings once, in Mercator metres, each with its box', () => {
    const { land } = basemapRings();
    expect(land.length).toBeGreaterThan(100);
    for (const ring of land.slice(0, 50)) {
      for (let i = 0; i < ring.xy.length; i += 2) {
        expect(ring.xy[i]).toBeGreaterThanOrEqual(mercatorX(ring.west) - 1e-6);
        expect(ring.xy[i]).toBeLessThanOrEqual(mercatorX(ring.east) + 1e-6);
        expect(ring.xy[i + 1]).toBeGreaterThanOrEqual(mercatorY(ring.south) - 1e-6);
        expect(ring.xy[i + 1]).toBeLessThanOrEqual(mercatorY(ring.north) + 1e-6);
      }
    }
  });
});
