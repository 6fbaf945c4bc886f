// The lane painter that the paint worker and the UI thread's fallback share: which lanes it strokes
// (culled to the view, thinned as lane-grid.ts picks them, scenario-added lanes from their ends),
// where (the transform, two-way lanes shifted right of their direction) and how (wide lines thinned
// to one pixel above the limit). Checked against a recording context and hand-worked pixels.

import { describe, expect, it } from 'vitest';
import { laneGrid, lanesInView } from '../../../renderer/map/lane-grid';
import { LANE_DETAIL_THRESHOLD, MAX_LANES_PER_FRAME, paintAllLanes, strokeLanes, WIDE_LINES_LIMIT, type LanePaintData } from '../../../renderer/map/lane-paint';
import { seededRandom } from '../../support/seeded-random';
import { RecordingContext } from './recording-context';

/** Depots on a plane: x = lon, y = lat (identity projection), so pixels are easy to work out by hand. */
function plane(lat: number[], lon: number[], from: number[], to: number[], reverse = from.map(() => 0)): LanePaintData {
  const ends = { lat, lon, laneFrom: Int32Array.from(from), laneTo: Int32Array.from(to) };
  return { ...ends, x: lon, y: lat, laneReverse: Uint8Array.from(reverse), laneGrid: laneGrid(ends, 4) };
}

const IDENTITY = { sx: 1, ox: 0, sy: 1, oy: 0 };
const STYLE = { color: '#123456', weight: 1, opacity: 0.5 };

describe('strokeLanes', () => {
  it('maps lane ends through the transform and strokes them as one path', () => {
    const data = plane([0, 10, 20], [0, 5, 0], [0, 1], [1, 2]);
    const ctx = new RecordingContext();
    const drawn = strokeLanes(ctx, { sx: 2, ox: 100, sy: -1, oy: 50 }, data, [0, 1], STYLE, null);
    expect(drawn).toBe(2);
    expect(ctx.strokes).toHaveLength(1);
    expect(ctx.strokes[0].segments).toEqual([
      [100, 50, 110, 40],
      [110, 40, 100, 30],
    ]);
    expect(ctx.strokes[0]).toMatchObject({ color: '#123456', width: 1, alpha: 0.5 });
  });

  it('shifts a two-way lane to the right of its direction by half its width plus a pixel', () => {
    // A lane going +x on screen: its right-hand side (screen y grows down) is +y.
    const data = plane([0, 0], [0, 10], [0, 1], [1, 0], [1, 1]);
    const ctx = new RecordingContext();
    strokeLanes(ctx, IDENTITY, data, [0, 1], { ...STYLE, weight: 2 }, null);
    expect(ctx.strokes[0].segments).toEqual([
      [0, 2, 10, 2],
      [10, -2, 0, -2],
    ]);
  });

  it('skips lanes that miss the view and draws scenario-added lanes from their ends', () => {
    const data = plane([0, 1, 50, 51], [0, 1, 50, 51], [0, 2], [1, 3]);
    const ctx = new RecordingContext();
    const added = new Map([[-2, { from: 0, to: 3 }], [-3, { from: -1, to: 2 }]]);
    const drawn = strokeLanes(ctx, IDENTITY, data, [0, 1, -2, -3, 7], STYLE, { south: -1, west: -1, north: 2, east: 2 }, added);
    // Lane 0 is in view; lane 1 is not; added lane -2 crosses the view; -3 has no depot; 7 is no lane.
    expect(drawn).toBe(2);
    expect(ctx.strokes[0].segments).toEqual([
      [0, 0, 1, 1],
      [0, 0, 51, 51],
    ]);
  });

  it('strokes a wide style one pixel wide, fully opaque, above the wide-lines limit', () => {
    const n = WIDE_LINES_LIMIT + 1;
    const data = plane([0, 1], [0, 1], new Array(n).fill(0), new Array(n).fill(1));
    const lanes = Int32Array.from({ length: n }, (_, e) => e);
    const wide = { color: '#000', weight: 3, opacity: 0.85 };
    const dense = new RecordingContext();
    strokeLanes(dense, IDENTITY, data, lanes, wide, null);
    expect(dense.strokes[0]).toMatchObject({ width: 1, alpha: 1 });
    const sparse = new RecordingContext();
    strokeLanes(sparse, IDENTITY, data, lanes.subarray(0, WIDE_LINES_LIMIT), wide, null);
    expect(sparse.strokes[0]).toMatchObject({ width: 3, alpha: 0.85 });
  });
});

describe('paintAllLanes', () => {
  it('draws every lane in view under the threshold, and says so', () => {
    const data = plane([0, 1, 2, 40, 41], [0, 1, 2, 40, 41], [0, 1, 3], [1, 2, 4]);
    const ctx = new RecordingContext();
    const counts = paintAllLanes(ctx, IDENTITY, data, { south: -1, west: -1, north: 3, east: 3 }, STYLE);
    expect(counts).toEqual({ drawn: 2, inView: 2, total: 3 });
    expect(ctx.strokes[0].segments).toHaveLength(2);
  });

  it('thins above the threshold to the cap, drawing exactly the lanes lane-grid picks', () => {
    const next = seededRandom(7);
    const depots = 3000;
    const lanes = LANE_DETAIL_THRESHOLD + 5000;
    const lat = Array.from({ length: depots }, () => next() * 10);
    const lon = Array.from({ length: depots }, () => next() * 10);
    const from = Array.from({ length: lanes }, () => Math.floor(next() * depots));
    const to = from.map((a) => Math.min(depots - 1, a + 1));
    const data = plane(lat, lon, from, to);
    const view = { south: -1, west: -1, north: 11, east: 11 };
    const ctx = new RecordingContext();
    const counts = paintAllLanes(ctx, IDENTITY, data, view, STYLE);
    expect(counts.total).toBe(lanes);
    expect(counts.inView).toBe(lanes);
    expect(counts.drawn).toBeLessThanOrEqual(MAX_LANES_PER_FRAME);
    expect(counts.drawn).toBeGreaterThan(MAX_LANES_PER_FRAME * 0.95);
    const picked = Array.from(lanesInView(data.laneGrid, data, view, MAX_LANES_PER_FRAME).lanes);
    expect(ctx.strokes[0].segments).toEqual(picked.map((e) => [lon[from[e]], lat[from[e]], lon[to[e]], lat[to[e]]]));
  });
});
