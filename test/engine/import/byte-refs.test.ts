// Refs kept as bytes (the byte reader's) beside refs kept as text (the general reader's) in one lane
// table: the duplicate check's comparison must agree with comparing the ref strings, before and after
// the strings are made, and the strings must be the refs read.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { LaneTableBuilder, sameRefOf } from '../../../engine/import/lane-table';

const encoder = new TextEncoder();

function tableOf(rows: { ref: string; asBytes: boolean }[]) {
  const builder = new LaneTableBuilder();
  for (const { ref, asBytes } of rows) {
    const i = builder.add();
    if (asBytes && ref !== '') {
      const bytes = encoder.encode(`x,${ref},y`);
      builder.addRefBytes(i, bytes, 2, bytes.length - 2);
    } else builder.setRef(i, ref === '' ? undefined : ref);
  }
  return builder.build();
}

describe('refs kept as bytes', () => {
  it('compare and read back like the ref strings, mixed with text refs, past the first capacity', () => {
    const refArb = fc.constantFrom('', 'R1', 'R2', 'R10', 'L-0001', 'a longer reference', 'R1 ');
    fc.assert(
      fc.property(fc.array(fc.record({ ref: refArb, asBytes: fc.boolean() }), { minLength: 1, maxLength: 1500 }), fc.array(fc.tuple(fc.nat(), fc.nat()), { maxLength: 50 }), (rows, pairs) => {
        const table = tableOf(rows);
        const same = sameRefOf(table);
        const expected = rows.map((r) => (r.ref === '' ? undefined : r.ref));
        const check = () => {
          for (const [p, q] of pairs) {
            const a = p % rows.length;
            const b = q % rows.length;
            expect(same(a, b)).toBe(expected[a] === expected[b]);
          }
        };
        check();
        expect(table.ref).toEqual(expected);
        check();
      }),
      { seed: 1203, numRuns: 200 },
    );
  });
});
