// Finds lane rows that repeat an earlier one (same from, to, reference, vehicle class and validity)
// in linear time: each row's key is hashed (the ref by its FNV-1a hash, which refs the byte reader
// kept carry already) into one open table whose chains hold only rows with distinct keys, so a row is
// compared with the few rows of its bucket. Chaining by destination alone, as before, compared every
// pair of rows between the same two depots: a file of many lanes on one pair took quadratic time.
// No string keys: a million lanes would make a million strings.

import { refHashOf, sameRefOf } from './lane-table';
import type { LaneTable } from './types';

export interface DuplicateLane {
  /** Table index of the repeating row and of the first row it repeats. */
  lane: number;
  first: number;
}

export function findDuplicateLanes(table: LaneTable, _depotCount: number): DuplicateLane[] {
  const n = table.count;
  const keys = rowKeys(table);
  let size = 16;
  while (size < n) size *= 2;
  return repeats(table, keys, new Int32Array(size).fill(-1), new Int32Array(n));
}

// A 32-bit hash of each row's whole key.
function rowKeys(table: LaneTable): Int32Array {
  const { from, to, validFrom, validTo } = table;
  const cls = table.vehicleClass;
  const refHash = refHashOf(table);
  const keys = new Int32Array(table.count);
  for (let e = 0; e < table.count; e++) {
    let h = refHash(e);
    h = Math.imul(h ^ from[e], 0x01000193);
    h = Math.imul(h ^ to[e], 0x01000193);
    h = Math.imul(h ^ validFrom[e], 0x01000193);
    h = Math.imul(h ^ validTo[e], 0x01000193);
    if (cls !== null) h = Math.imul(h ^ cls[e], 0x01000193);
    // Spread the high bits into the low ones the table is indexed by.
    keys[e] = h ^ (h >>> 15);
  }
  return keys;
}

// Rows in file order; a row whose key no earlier row has joins its bucket's chain (newest first),
// a repeat is matched with the one chained row of its key and reported.
function repeats(table: LaneTable, keys: Int32Array, heads: Int32Array, next: Int32Array): DuplicateLane[] {
  const { from, to, validFrom, validTo } = table;
  const cls = table.vehicleClass;
  // Not `table.ref`: reading it would make every ref the byte reader kept a string.
  const sameRef = sameRefOf(table);
  const mask = heads.length - 1;
  const found: DuplicateLane[] = [];
  for (let e = 0; e < table.count; e++) {
    const key = keys[e];
    const bucket = key & mask;
    let match = -1;
    for (let q = heads[bucket]; q !== -1; q = next[q]) {
      if (keys[q] === key && from[q] === from[e] && to[q] === to[e] && validFrom[q] === validFrom[e] && validTo[q] === validTo[e] && (cls === null || cls[q] === cls[e]) && sameRef(q, e)) {
        match = q;
        break;
      }
    }
    if (match !== -1) found.push({ lane: e, first: match });
    else {
      next[e] = heads[bucket];
      heads[bucket] = e;
    }
  }
  return found;
}
