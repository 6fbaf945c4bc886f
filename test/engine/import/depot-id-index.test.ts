// The depot id index (ids looked up by their place in a line of bytes) against a plain Map: random
// sets of ids (short codes that sit in a slot, long ones, characters above 255 and NUL, ids that
// differ in one character or only in length) and random ranges of bytes that hold them or nearly
// do. Ids that are not printable ASCII are never found (their lines take the general path).

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DepotIdIndex } from '../../../engine/import/depot-id-index';

const bytes = (text: string) => new TextEncoder().encode(text);
const printable = (id: string) => /^[\x20-\x7e]*$/.test(id);

const alphabet = ['A', 'B', 'a', '0', '9', '-', ' ', 'é', 'Ł', '\u0000', '\uffff', '€', 'Z'];
const idArb = fc.array(fc.constantFrom(...alphabet), { minLength: 1, maxLength: 12 }).map((cs) => cs.join(''));

describe('DepotIdIndex', () => {
  it('finds exactly the ids a Map holds, from any range of text', () => {
    fc.assert(
      fc.property(fc.uniqueArray(idArb, { minLength: 1, maxLength: 60 }), fc.array(idArb, { maxLength: 30 }), (ids, others) => {
        const map = new Map(ids.map((id, i) => [id, i]));
        const index = new DepotIdIndex(map);
        for (const probe of [...ids, ...others, ...ids.map((id) => id.slice(1)), ...ids.map((id) => id + 'A')]) {
          const line = bytes(`x,${probe},y`);
          expect(index.find(line, 2, line.length - 2)).toBe(printable(probe) ? (map.get(probe) ?? -1) : -1);
        }
      }),
      { seed: 1207, numRuns: 300 },
    );
  });

  it('keeps ids of 8 characters or fewer apart from longer ones that start the same', () => {
    const map = new Map([['D1234567', 0], ['D12345678', 1], ['D1', 2], ['D10', 3]]);
    const index = new DepotIdIndex(map);
    const text = bytes('D12345678,D1234567,D10,D1,D100');
    expect(index.find(text, 0, 9)).toBe(1);
    expect(index.find(text, 10, 18)).toBe(0);
    expect(index.find(text, 19, 22)).toBe(3);
    expect(index.find(text, 23, 25)).toBe(2);
    expect(index.find(text, 26, 30)).toBe(-1);
  });

  it('finds every id of a large network (sequential codes share low hash bits)', () => {
    const map = new Map<string, number>();
    for (let i = 0; i < 50_000; i++) map.set(`D${i}`, i);
    const index = new DepotIdIndex(map);
    for (let i = 0; i < 50_000; i += 7) expect(index.find(bytes(`D${i}`), 0, `D${i}`.length)).toBe(i);
    expect(index.find(bytes('D50000'), 0, 6)).toBe(-1);
  });
});
