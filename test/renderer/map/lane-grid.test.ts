// The map's lane culling against brute force: on random networks and random views, the grid finds
// exactly the lanes whose extent meets the view (a plain scan of every lane is the reference), and
// thinning keeps at most the cap, spread over the lanes in view, with no lane twice.

import { describe, expect, it } from 'vitest';
import { laneGrid, lanesInView, type ViewBox } from '../../../renderer/map/lane-grid';
import { seededRandom } from '../../support/seeded-random';

function randomNetwork(seed: number, depots: number, lanes: number) {
  const next = seededRandom(seed);
  const lat = Float64Array.from({ length: depots }, () => 43 + next() * 11);
  const lon = Float64Array.from({ length: depots }, () => -1 + next() * 16);
  const laneFrom = new Int32Array(lanes);
  const laneTo = new Int32Array(lanes);
  for (let e = 0; e < lanes; e++) {
    laneFrom[e] = Math.floor(next() * depots);
    // Mostly short lanes, some across the map (the grid's long list).
    laneTo[e] = next() < 0.9 ? Math.min(depots - 1, laneFrom[e] + Math.floor(next() * 5)) : Math.floor(next() * depots);
  }
  return { lat, lon, laneFrom, laneTo, next };
}

const meets = (n: ReturnType<typeof randomNetwork>, e: number, v: ViewBox) => {
  const a = n.laneFrom[e], b = n.laneTo[e];
  return Math.max(n.lat[a], n.lat[b]) >= v.south && Math.min(n.lat[a], n.lat[b]) <= v.north && Math.max(n.lon[a], n.lon[b]) >= v.west && Math.min(n.lon[a], n.lon[b]) <= v.east;
};

describe('lanesInView', () => {
  it.each([1, 2, 3, 4])('finds the same lanes as a scan of every lane (seed %i)', (seed) => {
    const n = randomNetwork(seed, 2000, 8000);
    const grid = laneGrid(n, 32);
    for (let k = 0; k < 25; k++) {
      const south = 42 + n.next() * 12;
      const west = -2 + n.next() * 17;
      const view = { south, west, north: south + n.next() * 4, east: west + n.next() * 6 };
      const expected = [];
      for (let e = 0; e < n.laneFrom.length; e++) if (meets(n, e, view)) expected.push(e);
      const found = lanesInView(grid, n, view, Infinity);
      expect(found.inView).toBe(expected.length);
      expect(Array.from(found.lanes).sort((a, b) => a - b)).toEqual(expected);
    }
  });

  it('thins to the cap, each lane once, from all over the view', () => {
    const n = randomNetwork(9, 3000, 20000);
    const grid = laneGrid(n);
    const view = { south: 40, west: -5, north: 60, east: 20 };
    const all = lanesInView(grid, n, view, Infinity);
    expect(all.inView).toBe(20000);
    const thinned = lanesInView(grid, n, view, 1000);
    expect(thinned.inView).toBe(20000);
    expect(thinned.lanes.length).toBeLessThanOrEqual(1000);
    expect(thinned.lanes.length).toBeGreaterThan(980);
    expect(new Set(thinned.lanes).size).toBe(thinned.lanes.length);
    // Spread: lanes from both halves of the map (west and east of 7°E).
    const west = Array.from(thinned.lanes).filter((e) => n.lon[n.laneFrom[e]] < 7).length;
    expect(west).toBeGreaterThan(300);
    expect(west).toBeLessThan(700);
  });
});
