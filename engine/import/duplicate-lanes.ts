// Finds lane rows that repeat an earlier one (same from, to, reference, vehicle class and validity)
// in linear time: lanes grouped by origin with a counting sort, then matched per destination through
// short chains, so a million lanes need no string keys. Each loop is its own function: one function
// holding them all was optimised inside its first loop and thrown back to the interpreter at each
// later one ("insufficient type feedback"), which cost more than the work (about 0.4 s per million rows).

import { sameRefOf } from './lane-table';
import type { LaneTable } from './types';

export interface DuplicateLane {
  /** Table index of the repeating row and of the first row it repeats. */
  lane: number;
  first: number;
}

export function findDuplicateLanes(table: LaneTable, depotCount: number): DuplicateLane[] {
  const start = originStarts(table.from, table.count, depotCount);
  const { order, toInOrder } = byOrigin(table.from, table.to, table.count, start);
  return repeats(table, depotCount, start, order, toInOrder).sort((a, b) => a.lane - b.lane);
}

// start[d] .. start[d + 1] - 1: the positions of depot d's lanes in the origin order.
function originStarts(from: Int32Array, n: number, depotCount: number): Int32Array {
  const start = new Int32Array(depotCount + 1);
  for (let e = 0; e < n; e++) start[from[e] + 1]++;
  for (let d = 0; d < depotCount; d++) start[d + 1] += start[d];
  return start;
}

// Lanes in order of origin (a counting sort, stable: file order within an origin), with each lane's
// destination beside it: the scan then reads both in sequence instead of jumping through the table.
function byOrigin(from: Int32Array, to: Int32Array, n: number, start: Int32Array): { order: Int32Array; toInOrder: Int32Array } {
  const fill = start.slice(0, start.length - 1);
  const order = new Int32Array(n);
  const toInOrder = new Int32Array(n);
  for (let e = 0; e < n; e++) {
    const p = fill[from[e]]++;
    order[p] = e;
    toInOrder[p] = to[e];
  }
  return { order, toInOrder };
}

// Per origin, lanes to the same destination are chained by position in the origin order; only a
// lane whose destination repeats is compared (reference, class, validity) with the chain's rows.
function repeats(table: LaneTable, depotCount: number, start: Int32Array, order: Int32Array, toInOrder: Int32Array): DuplicateLane[] {
  const { validFrom, validTo } = table;
  // Not `table.ref`: reading it would make every ref the byte reader kept a string.
  const sameRef = sameRefOf(table);
  const cls = table.vehicleClass;
  const stamp = new Int32Array(depotCount).fill(-1);
  const head = new Int32Array(depotCount);
  const next = new Int32Array(table.count);
  const found: DuplicateLane[] = [];
  for (let d = 0; d < depotCount; d++) {
    for (let p = start[d]; p < start[d + 1]; p++) {
      const t = toInOrder[p];
      if (stamp[t] !== d) {
        stamp[t] = d;
        head[t] = p;
        next[p] = -1;
        continue;
      }
      const e = order[p];
      let match = -1;
      for (let q = head[t]; q !== -1; q = next[q]) {
        const c = order[q];
        if (validFrom[c] === validFrom[e] && validTo[c] === validTo[e] && (cls === null || cls[c] === cls[e]) && sameRef(c, e)) {
          match = c;
          break;
        }
      }
      if (match !== -1) found.push({ lane: e, first: match });
      else {
        next[p] = head[t];
        head[t] = p;
      }
    }
  }
  return found;
}
