// The plain-row fast path against the general reader: the same lanes file read with and without it
// must give the same lane table (every column, every row) and the same report, on random files that
// mix plain rows with every kind of cell the general reader handles or refuses.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { LanesReader } from '../../../engine/import/lanes-reader';
import { ReportCollector } from '../../../engine/import/report-collector';
import { fileArb, rowArb, streamInto } from './plain-row-files';

const DEPOTS = new Map([['A', 0], ['B', 1], ['C', 2], ['Liège', 3], ['D-4', 4]]);

function readLanes(text: string, fast: boolean, chunk: number) {
  const report = new ReportCollector(10_000);
  const reader = new LanesReader('lanes.csv', report, DEPOTS, { plainRows: fast });
  streamInto(reader, text, chunk, fast);
  const t = reader.table;
  const n = t.count;
  const column = (a: ArrayLike<number>) => Array.from(a).slice(0, n);
  return {
    count: n,
    rows: reader.rows,
    columns: [t.from, t.to, t.sourceRow, t.toll, t.fuel, t.fees, t.rebate, t.distanceKm, t.driveMinutes, t.validFrom, t.validTo].map(column),
    classTolls: t.classTolls.map((c) => column(c.toll)),
    ref: t.build().ref.slice(0, n),
    notes: t.notes.slice(0, n),
    clause: t.clause?.slice(0, n),
    extra: t.extra.map((x) => x.values.slice(0, n)),
    currency: reader.currency,
    report: report.report(),
  };
}

// Per column: values a plain row holds, and values that need (or are refused by) the general reader.
const values = {
  plain: {
    depot: ['A', 'B', 'C', 'Liège', 'D-4'],
    amount: ['12.50', '12.5', '12', '0', '0.05', '007.10', '999999999.99', ''],
    distance: ['123.4', '0.5', '12', '39999.9', '1.234567', ''],
    drive: ['90', '0', '60000', ''],
    date: ['2026-01-01', '2026-12-31', '2024-02-29', ''],
    text: ['R1', '', 'a longer reference text', 'Liège'],
  },
  messy: {
    depot: ['Z', '', ' A', 'B ', 'a', 'A\u00a0', '"A"', '"B,C"'],
    amount: ['"12.50"', '"1,5"', '12.505', '-3.00', '-0.00', '0.00', '1,5', '1.234,56', '€12', '12 EUR', ' 12', '9999999999999999', '.5', '5.', 'x', '1e3'],
    distance: ['123456.7', '40000.1', '99999.9', '1e3', '12,5', '-1', '1.2345678', 'abc', '.5', ' 3'],
    drive: ['1:30', '9999999', '60001', '999999', 'PT1H', '12.5', '-5', ' 9'],
    date: ['2026-02-29', '2026-13-01', '2026-1-1', '20260101', '2026-00-10', '2026-04-31'],
    text: ["'=x", '=cmd', ' padded ', '@x', '"quoted, with comma"', '"quoted; with semicolon"', '"a ""b"""', '"R1"'],
  },
};
type Kind = keyof typeof values.plain;
const KINDS: Kind[] = ['depot', 'depot', 'text', 'amount', 'amount', 'amount', 'amount', 'distance', 'drive', 'date', 'date', 'text', 'text', 'amount', 'text'];

const HEADER = ['from', 'to', 'ref', 'toll', 'fuel', 'fees', 'rebate', 'distance_km', 'drive_minutes', 'valid_from', 'valid_to', 'notes', 'extra column', 'toll_2axle', 'clause'];
// Semicolon files use a decimal comma; the plain values are written that way there.
const files = fileArb(HEADER, rowArb(values, KINDS), (r, d) => (d === ';' ? r.map((c) => c.replace(/^(\d+)\.(\d+)$/, '$1,$2')) : [...r]));

describe('PlainLaneRows (the lanes reader fast path)', () => {
  it('reads random files to the same lane table and report as the general reader', () => {
    fc.assert(
      fc.property(files, ({ text, chunk }) => {
        expect(readLanes(text, true, chunk)).toEqual(readLanes(text, false, chunk));
      }),
      { numRuns: 600, seed: 20261203 },
    );
  });

  it('takes plain rows after the first block', () => {
    const text = ['from,to,ref,toll,fuel', ...Array.from({ length: 50 }, (_, i) => `A,B,R${i},1.00,2.5`)].join('\n') + '\n';
    const read = readLanes(text, true, 64);
    expect(read.count).toBe(50);
    expect(read.columns[3].slice(0, 3)).toEqual([100, 100, 100]);
    expect(read.columns[4][49]).toBe(250);
    expect(read.ref[49]).toBe('R49');
  });
});

describe('PlainLaneRows on rows cut into cells (first block, quoted records)', () => {
  it('does not read a short row whose quoted cell holds the delimiter as a whole row', () => {
    // Cells ["A,B", "R1", "1.00"] joined by the delimiter would look like a plain row of four cells.
    const text = 'from,to,ref,toll\n"A,B",R1,1.00\nA,B,R2,2.00\n';
    for (const fast of [true, false]) {
      const read = readLanes(text, fast, 1000);
      expect(read.count).toBe(1);
      expect(read.report.errors.map((e) => [e.row, e.column, e.code])).toEqual([
        [2, 'from', 'unknown-depot'],
        [2, 'to', 'unknown-depot'],
      ]);
    }
  });
});
