// Which lanes a map view draws, found without looking at every lane: lanes are binned once per
// network into a grid of cells by their origin depot (a lane longer than a cell goes to a short
// list tested every time), so a view tests only the lanes of the cells on its border. Above a cap
// the lanes in view are thinned by an even share of every cell, so the thinning is spread over the
// whole view. Pure arithmetic on typed arrays, unit-tested under Node (no Leaflet here).

export interface LaneEnds {
  lat: ArrayLike<number>;
  lon: ArrayLike<number>;
  laneFrom: ArrayLike<number>;
  laneTo: ArrayLike<number>;
}

export interface LaneGrid {
  cols: number;
  rows: number;
  minLat: number;
  minLon: number;
  cellLat: number;
  cellLon: number;
  /** Lanes of cell c are lanes[start[c] .. start[c + 1]). */
  start: Int32Array;
  lanes: Int32Array;
  /** Lanes whose extent is larger than a cell: tested against every view. */
  long: Int32Array;
}

// Scratch space for a view's lanes (one entry per lane), made on first use and reused: the grid
// itself is plain typed arrays, built in the engine worker and transferred with the network view.
const scratchOf = new WeakMap<LaneGrid, Int32Array>();

export interface ViewBox {
  south: number;
  west: number;
  north: number;
  east: number;
}

/** Bins every lane of `ends` into a `size` x `size` grid over the depots' extent. */
export function laneGrid(ends: LaneEnds, size = 128): LaneGrid {
  const n = ends.lat.length;
  let minLat = Infinity, maxLat = -Infinity, minLon = Infinity, maxLon = -Infinity;
  for (let d = 0; d < n; d++) {
    if (ends.lat[d] < minLat) minLat = ends.lat[d];
    if (ends.lat[d] > maxLat) maxLat = ends.lat[d];
    if (ends.lon[d] < minLon) minLon = ends.lon[d];
    if (ends.lon[d] > maxLon) maxLon = ends.lon[d];
  }
  if (n === 0) minLat = maxLat = minLon = maxLon = 0;
  const cols = size;
  const rows = size;
  // A tiny extent (one depot) still gets cells of a positive size.
  const cellLat = Math.max((maxLat - minLat) / rows, 1e-9);
  const cellLon = Math.max((maxLon - minLon) / cols, 1e-9);
  const m = ends.laneFrom.length;
  const cellOf = new Int32Array(m);
  const count = new Int32Array(rows * cols + 1);
  let longCount = 0;
  for (let e = 0; e < m; e++) {
    const a = ends.laneFrom[e];
    const b = ends.laneTo[e];
    if (Math.abs(ends.lat[a] - ends.lat[b]) > cellLat || Math.abs(ends.lon[a] - ends.lon[b]) > cellLon) {
      cellOf[e] = -1;
      longCount++;
      continue;
    }
    const r = Math.min(rows - 1, Math.floor((ends.lat[a] - minLat) / cellLat));
    const c = Math.min(cols - 1, Math.floor((ends.lon[a] - minLon) / cellLon));
    cellOf[e] = r * cols + c;
    count[r * cols + c + 1]++;
  }
  for (let c = 1; c < count.length; c++) count[c] += count[c - 1];
  const start = count.slice();
  const lanes = new Int32Array(m - longCount);
  const long = new Int32Array(longCount);
  let l = 0;
  for (let e = 0; e < m; e++) {
    if (cellOf[e] < 0) long[l++] = e;
    else lanes[count[cellOf[e]]++] = e;
  }
  return { cols, rows, minLat, minLon, cellLat, cellLon, start, lanes, long };
}

function touches(ends: LaneEnds, e: number, view: ViewBox): boolean {
  const a = ends.laneFrom[e];
  const b = ends.laneTo[e];
  const la = ends.lat[a], lb = ends.lat[b], oa = ends.lon[a], ob = ends.lon[b];
  return Math.max(la, lb) >= view.south && Math.min(la, lb) <= view.north && Math.max(oa, ob) >= view.west && Math.min(oa, ob) <= view.east;
}

/**
 * The lanes whose extent meets `view`, thinned to at most `cap`. `inView` counts every lane that
 * meets the view; `lanes` (a view of the grid's scratch space: read it before the next call) holds
 * the ones to draw. Cells wholly inside the view are not tested lane by lane (every lane starting in
 * them meets the view): they give their count, and when thinning, an even share of their lanes. So a
 * view costs about the cap plus the lanes of the cells on its border, never every lane.
 */
export function lanesInView(grid: LaneGrid, ends: LaneEnds, view: ViewBox, cap: number): { lanes: Int32Array; inView: number } {
  let out = scratchOf.get(grid);
  if (!out) scratchOf.set(grid, (out = new Int32Array(grid.lanes.length + grid.long.length)));
  const { cols, start } = grid;
  // A lane starts in its origin's cell and reaches at most one cell further: widen the box by one.
  const r0 = Math.max(0, Math.floor((view.south - grid.minLat) / grid.cellLat) - 1);
  const r1 = Math.min(grid.rows - 1, Math.floor((view.north - grid.minLat) / grid.cellLat) + 1);
  const c0 = Math.max(0, Math.floor((view.west - grid.minLon) / grid.cellLon) - 1);
  const c1 = Math.min(grid.cols - 1, Math.floor((view.east - grid.minLon) / grid.cellLon) + 1);
  const inside = (r: number, c: number) =>
    grid.minLat + r * grid.cellLat >= view.south && grid.minLat + (r + 1) * grid.cellLat <= view.north && grid.minLon + c * grid.cellLon >= view.west && grid.minLon + (c + 1) * grid.cellLon <= view.east;
  // First pass: the border cells' and long lanes' hits go to the front of `out`; inner cells are counted.
  let k = 0;
  let innerCount = 0;
  for (let r = r0; r <= r1; r++) {
    for (let c = c0; c <= c1; c++) {
      const cell = r * cols + c;
      if (inside(r, c)) {
        innerCount += start[cell + 1] - start[cell];
        continue;
      }
      for (let i = start[cell]; i < start[cell + 1]; i++) if (touches(ends, grid.lanes[i], view)) out[k++] = grid.lanes[i];
    }
  }
  for (let i = 0; i < grid.long.length; i++) if (touches(ends, grid.long[i], view)) out[k++] = grid.long[i];
  const inView = k + innerCount;
  // Share of lanes drawn: every lane up to the cap, else an even stride over all of them.
  const keep = inView <= cap ? 1 : cap / inView;
  if (keep < 1) {
    const kept = Math.floor(k * keep);
    const step = k / Math.max(kept, 1);
    for (let j = 0; j < kept; j++) out[j] = out[Math.floor(j * step)];
    k = kept;
  }
  // Second pass: the inner cells' lanes (a share of each cell, so the thinning is spread evenly;
  // the fractions carry over from cell to cell, so the shares add up to the cap).
  let carry = 0;
  for (let r = r0; r <= r1 && k < cap; r++) {
    for (let c = c0; c <= c1; c++) {
      if (!inside(r, c)) continue;
      const cell = r * cols + c;
      const size = start[cell + 1] - start[cell];
      const want = size * keep + carry;
      const take = Math.min(size, Math.floor(want + 1e-9));
      carry = want - take;
      const step = take > 0 ? size / take : 1;
      for (let j = 0; j < take && k < cap; j++) out[k++] = grid.lanes[start[cell] + Math.floor(j * step)];
    }
  }
  return { lanes: out.subarray(0, k), inView };
}
