// Duplicate lane rows (same from, to, reference, vehicle class and validity) against brute force: every
// pair of rows compared, on random small tables where repeats are common, with refs kept as text or
// (as the byte reader keeps them) as bytes. And the work stays linear when every lane joins the same
// two depots.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { findDuplicateLanes } from '../../../engine/import/duplicate-lanes';
import { LaneTableBuilder } from '../../../engine/import/lane-table';

const rowArb = fc.record({
  from: fc.nat({ max: 3 }),
  to: fc.nat({ max: 3 }),
  ref: fc.constantFrom(undefined, 'R1', 'R2', 'Rü'),
  asBytes: fc.boolean(),
  validFrom: fc.constantFrom(0, 20260101),
  validTo: fc.constantFrom(0, 20261231),
  cls: fc.constantFrom(-1, 0, 1),
});

describe('findDuplicateLanes', () => {
  it('finds each repeating row and the first row it repeats, as brute force does', () => {
    fc.assert(
      fc.property(fc.array(rowArb, { maxLength: 60 }), fc.boolean(), (rows, long) => {
        const b = new LaneTableBuilder();
        if (long) b.vehicleClass = new Int16Array(1024);
        for (const r of rows) {
          const i = b.add();
          b.from[i] = r.from;
          b.to[i] = r.to;
          b.validFrom[i] = r.validFrom;
          b.validTo[i] = r.validTo;
          if (b.vehicleClass) b.vehicleClass[i] = r.cls;
          // Only printable ASCII refs are ever kept as bytes.
          if (r.asBytes && r.ref !== undefined && r.ref !== 'Rü') {
            const bytes = new TextEncoder().encode(r.ref);
            b.addRefBytes(i, bytes, 0, bytes.length);
          } else b.setRef(i, r.ref);
        }
        const key = (i: number) => [rows[i].from, rows[i].to, rows[i].ref, rows[i].validFrom, rows[i].validTo, long ? rows[i].cls : 0].join('|');
        const expected = [];
        for (let i = 0; i < rows.length; i++) {
          const first = rows.findIndex((_, j) => j < i && key(j) === key(i));
          if (first !== -1) expected.push({ lane: i, first });
        }
        expect(findDuplicateLanes(b.build(), 4)).toEqual(expected);
      }),
      { seed: 31, numRuns: 400 },
    );
  });

  it('finds the repeats among 300,000 lanes between the same two depots (no pair-by-pair comparison)', () => {
    const b = new LaneTableBuilder();
    const bytes = new TextEncoder().encode('R0123456');
    for (let k = 0; k < 300_000; k++) {
      const i = b.add();
      b.from[i] = 0;
      b.to[i] = 1;
      // Every 1000th lane repeats ref "R0123456"; the others are all different.
      if (k % 1000 === 0) b.addRefBytes(i, bytes, 0, bytes.length);
      else b.setRef(i, `L${k}`);
    }
    const found = findDuplicateLanes(b.build(), 2);
    expect(found.length).toBe(299);
    expect(found[0]).toEqual({ lane: 1000, first: 0 });
  });
});
