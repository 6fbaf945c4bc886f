// Groups lanes by origin depot into compressed sparse rows. Shared by every builder of a Network
// (from LaneInput objects, or straight from a plan's columns) so the layout solvers rely on has
// one definition.

/** The CSR part of a Network. */
export interface CompressedRows {
  outStart: Int32Array;
  outLane: Int32Array;
  outTo: Int32Array;
  outNet: Float64Array;
}

/**
 * Counting sort of lanes by origin. Stable, so parallel lanes keep their input order and the first
 * of two equally cheap contract lines is the one routes use.
 */
export function compressRows(depotCount: number, laneFrom: Int32Array, laneTo: Int32Array, laneNet: Float64Array): CompressedRows {
  const laneCount = laneFrom.length;
  const outStart = new Int32Array(depotCount + 1);
  for (let e = 0; e < laneCount; e++) outStart[laneFrom[e] + 1]++;
  for (let d = 0; d < depotCount; d++) outStart[d + 1] += outStart[d];
  const fill = outStart.slice(0, depotCount);
  const outLane = new Int32Array(laneCount);
  const outTo = new Int32Array(laneCount);
  const outNet = new Float64Array(laneCount);
  for (let e = 0; e < laneCount; e++) {
    const p = fill[laneFrom[e]]++;
    outLane[p] = e;
    outTo[p] = laneTo[e];
    outNet[p] = laneNet[e];
  }
  return { outStart, outLane, outTo, outNet };
}
