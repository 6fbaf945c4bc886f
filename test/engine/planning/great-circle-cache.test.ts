import { describe, expect, it } from 'vitest';
import { greatCircleOfRow } from '../../../engine/planning/great-circle-cache';
import { greatCircleKm } from '../../../engine/geo/turf';
import type { DepotRecord, LaneTable } from '../../../engine/import/types';

describe('greatCircleOfRow', () => {
  it('computes a row once per lane table and reuses it for every later plan', () => {
    const depots = [
      { id: 'RTM', lat: 51.9244, lon: 4.4777 },
      { id: 'ANR', lat: 51.2194, lon: 4.4025 },
    ] as DepotRecord[];
    const table = { count: 2, from: Int32Array.from([0, 1]), to: Int32Array.from([1, 0]) } as unknown as LaneTable;
    const first = greatCircleOfRow(table, depots, 0);
    expect(first).toBeCloseTo(greatCircleKm(51.9244, 4.4777, 51.2194, 4.4025), 9);
    // Moving a depot after the first call shows the cached figure is what later calls get.
    depots[1].lat = 0;
    expect(greatCircleOfRow(table, depots, 0)).toBe(first);
    // Another table (another import) computes afresh.
    const other = { count: 2, from: Int32Array.from([0, 1]), to: Int32Array.from([1, 0]) } as unknown as LaneTable;
    expect(greatCircleOfRow(other, depots, 0)).not.toBe(first);
  });
});
