// Finds lane rows that repeat an earlier one (same from, to, reference, vehicle class and validity)
// in linear time: lanes grouped by origin with a counting sort, then matched per destination through
// short chains, so a million lanes need no string keys.

import type { LaneTable } from './types';

export interface DuplicateLane {
  /** Table index of the repeating row and of the first row it repeats. */
  lane: number;
  first: number;
}

export function findDuplicateLanes(table: LaneTable, depotCount: number): DuplicateLane[] {
  const n = table.count;
  const start = new Int32Array(depotCount + 1);
  for (let e = 0; e < n; e++) start[table.from[e] + 1]++;
  for (let d = 0; d < depotCount; d++) start[d + 1] += start[d];
  const fill = start.slice(0, depotCount);
  const order = new Int32Array(n);
  for (let e = 0; e < n; e++) order[fill[table.from[e]]++] = e;

  const stamp = new Int32Array(depotCount).fill(-1);
  const head = new Int32Array(depotCount);
  const next = new Int32Array(n);
  const cls = table.vehicleClass;
  const same = (a: number, b: number) =>
    table.ref[a] === table.ref[b] &&
    table.validFrom[a] === table.validFrom[b] &&
    table.validTo[a] === table.validTo[b] &&
    (cls === null || cls[a] === cls[b]);
  const found: DuplicateLane[] = [];
  for (let d = 0; d < depotCount; d++) {
    for (let p = start[d]; p < start[d + 1]; p++) {
      const e = order[p];
      const t = table.to[e];
      if (stamp[t] !== d) {
        stamp[t] = d;
        head[t] = e;
        next[e] = -1;
        continue;
      }
      let match = -1;
      for (let c = head[t]; c !== -1; c = next[c]) {
        if (same(c, e)) {
          match = c;
          break;
        }
      }
      if (match !== -1) found.push({ lane: e, first: match });
      else {
        next[e] = head[t];
        head[t] = e;
      }
    }
  }
  return found.sort((a, b) => a.lane - b.lane);
}
