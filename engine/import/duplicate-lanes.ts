// Finds lane rows that repeat an earlier one (same from, to, reference, vehicle class and validity)
// in linear time: lanes grouped by origin with a counting sort, then matched per destination through
// short chains, so a million lanes need no string keys. Each loop is its own function: one function
// holding them all was optimised inside its first loop and thrown back to the interpreter at each
// later one ("insufficient type feedback"), which cost more than the work (about 0.4 s per million rows).

import type { LaneTable } from './types';

export interface DuplicateLane {
  /** Table index of the repeating row and of the first row it repeats. */
  lane: number;
  first: number;
}

export function findDuplicateLanes(table: LaneTable, depotCount: number): DuplicateLane[] {
  const start = originStarts(table.from, table.count, depotCount);
  const order = byOrigin(table.from, table.count, start);
  return repeats(table, depotCount, start, order).sort((a, b) => a.lane - b.lane);
}

// start[d] .. start[d + 1] - 1: the positions of depot d's lanes in the origin order.
function originStarts(from: Int32Array, n: number, depotCount: number): Int32Array {
  const start = new Int32Array(depotCount + 1);
  for (let e = 0; e < n; e++) start[from[e] + 1]++;
  for (let d = 0; d < depotCount; d++) start[d + 1] += start[d];
  return start;
}

// Lanes in order of origin (a counting sort, stable: file order within an origin).
function byOrigin(from: Int32Array, n: number, start: Int32Array): Int32Array {
  const fill = start.slice(0, start.length - 1);
  const order = new Int32Array(n);
  for (let e = 0; e < n; e++) order[fill[from[e]]++] = e;
  return order;
}

function repeats(table: LaneTable, depotCount: number, start: Int32Array, order: Int32Array): DuplicateLane[] {
  const { to, ref, validFrom, validTo } = table;
  const cls = table.vehicleClass;
  const stamp = new Int32Array(depotCount).fill(-1);
  const head = new Int32Array(depotCount);
  const next = new Int32Array(table.count);
  const found: DuplicateLane[] = [];
  for (let d = 0; d < depotCount; d++) {
    for (let p = start[d]; p < start[d + 1]; p++) {
      const e = order[p];
      const t = to[e];
      if (stamp[t] !== d) {
        stamp[t] = d;
        head[t] = e;
        next[e] = -1;
        continue;
      }
      let match = -1;
      for (let c = head[t]; c !== -1; c = next[c]) {
        if (validFrom[c] === validFrom[e] && validTo[c] === validTo[e] && (cls === null || cls[c] === cls[e]) && ref[c] === ref[e]) {
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
  return found;
}
