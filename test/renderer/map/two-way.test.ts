// Two-way lanes: the reverse lookup against a brute-force scan of the lane list, and the sideways
// shift checked with hand-worked vectors (screen y grows downwards, so "right" of east is south).

import { describe, expect, it } from 'vitest';
import { offsetFor, reverseLookup, shiftRings } from '../../../renderer/map/two-way';
import type { NetworkView } from '../../../renderer/worker/protocol';

function networkOf(lanes: [number, number][], depots = 5): NetworkView {
  return {
    depotIds: Array.from({ length: depots }, (_, i) => `D${i}`),
    laneFrom: Int32Array.from(lanes.map((l) => l[0])),
    laneTo: Int32Array.from(lanes.map((l) => l[1])),
  } as NetworkView;
}

describe('reverseLookup', () => {
  it('agrees with a brute-force scan on every ordered pair', () => {
    const lanes: [number, number][] = [[0, 1], [1, 0], [1, 2], [2, 3], [3, 2], [3, 2], [4, 4], [0, 4]];
    const has = reverseLookup(networkOf(lanes));
    for (let a = 0; a < 5; a++)
      for (let b = 0; b < 5; b++) {
        const brute = a !== b && lanes.some(([x, y]) => x === b && y === a);
        expect(has(a, b), `${a}->${b}`).toBe(brute);
      }
  });
});

describe('shiftRings', () => {
  it('moves a segment to the right of its direction, by the offset, and leaves offset 0 alone', () => {
    const east = [{ x: 0, y: 0 }, { x: 10, y: 0 }];
    const west = [{ x: 10, y: 0 }, { x: 0, y: 0 }];
    const still = [{ x: 0, y: 0 }, { x: 3, y: 4 }];
    shiftRings([east, west, still], [2, 2, 0]);
    expect(east).toEqual([{ x: 0, y: 2 }, { x: 10, y: 2 }]); // east's right is south (y down)
    expect(west).toEqual([{ x: 10, y: -2 }, { x: 0, y: -2 }]); // the reverse lane lands on the other side
    expect(still).toEqual([{ x: 0, y: 0 }, { x: 3, y: 4 }]);
  });

  it('shifts a diagonal segment by exactly the offset, perpendicular to it', () => {
    const ring = [{ x: 0, y: 0 }, { x: 3, y: 4 }];
    shiftRings([ring], [5]);
    // Right-hand normal of (3, 4) is (-4, 3)/5; times 5 = (-4, 3).
    expect(ring[0].x).toBeCloseTo(-4);
    expect(ring[0].y).toBeCloseTo(3);
    expect(ring[1].x).toBeCloseTo(-1);
    expect(ring[1].y).toBeCloseTo(7);
  });

  it('keeps two lines of a given weight apart: offset is half the width plus a gap', () => {
    expect(2 * offsetFor(6)).toBeGreaterThan(6);
  });
});
