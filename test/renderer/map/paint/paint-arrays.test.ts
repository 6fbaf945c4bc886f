// The paint worker's copies of a network: equal to the source, sharing no buffer with it (so they
// can be transferred while the UI keeps its own), and every buffer listed once for the transfer.

import { describe, expect, it } from 'vitest';
import { laneGrid } from '../../../../renderer/map/lane-grid';
import { copyPaintArrays, paintBuffers } from '../../../../renderer/map/paint/paint-arrays';

describe('copyPaintArrays', () => {
  it('copies every array the paint worker needs into buffers of its own', () => {
    const ends = { lat: Float64Array.from([45, 46, 47]), lon: Float64Array.from([3, 4, 5]), laneFrom: Int32Array.from([0, 1, 2]), laneTo: Int32Array.from([1, 2, 0]) };
    const source = { ...ends, laneReverse: Uint8Array.from([0, 1, 0]), laneGrid: laneGrid(ends, 2) };
    const copy = copyPaintArrays(source);
    expect(copy).toEqual(source);
    const sourceBuffers = new Set(paintBuffers(source));
    const buffers = paintBuffers(copy);
    expect(buffers).toHaveLength(8);
    expect(new Set(buffers).size).toBe(8);
    for (const b of buffers) expect(sourceBuffers.has(b)).toBe(false);
    copy.laneFrom[0] = 2;
    expect(source.laneFrom[0]).toBe(0);
  });
});
