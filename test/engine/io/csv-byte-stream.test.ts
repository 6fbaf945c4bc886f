// The byte path of the importer (UTF-8 chunks, plain lane rows read from the bytes) against the text
// path (the same chunks decoded first, as the CLI fed them before): on random and hostile files
// (quotes over lines, unclosed quotes, CRLF and mixed line ends, a BOM, non-ASCII ids, invalid UTF-8,
// NUL, empty fields, huge numbers, formula-looking cells, sep= lines, blank lines, short and long
// rows) the import must give the same lane table row by row and the same report item by item,
// with accepted + rejected = total, for chunks cut anywhere, inside a multi-byte character too.

import fc from 'fast-check';
import { describe, expect, it, vi } from 'vitest';
import { CsvRecordStream } from '../../../engine/io/csv-record-stream';
import { startImport } from '../../../engine/planning/import-network';
import { Utf8ChunkDecoder } from '../../../engine/text/utf8';
import type { ImportResult } from '../../../engine/planning/import-types';

const DEPOTS = 'id,name,lat,lon\nA,Alpha,50.1,8.6\nB,Beta,48.1,11.5\nC,Gamma,52.5,13.4\nLiège,Liège,50.63,5.57\nD-4,Delta,47.4,8.5\nLONGDEPOT123,Long,45.0,7.0\n';
const encoder = new TextEncoder();
const nativeText = (b: Uint8Array, s: number, e: number) => new TextDecoder().decode(b.subarray(s, e));

/** Byte chunks of `bytes` cut at `cuts` (offsets, any order). */
function cutAt(bytes: Uint8Array, cuts: number[]): Uint8Array[] {
  const points = [...new Set(cuts.map((c) => Math.min(c, bytes.length)))].sort((a, b) => a - b);
  const chunks: Uint8Array[] = [];
  let from = 0;
  for (const p of [...points, bytes.length]) {
    if (p > from) chunks.push(bytes.slice(from, p));
    from = Math.max(from, p);
  }
  return chunks;
}

function importWith(lanes: Uint8Array[], asBytes: boolean, native = false): ImportResult {
  const session = startImport({ plan: { date: '2026-06-01' }, skipInvalid: true, maxItems: 100_000, utf8Text: native ? nativeText : undefined });
  session.feedDepots(DEPOTS);
  session.finishDepots();
  if (asBytes) {
    // The reader may reuse its buffer: the importer must keep nothing of a chunk.
    for (const chunk of lanes) {
      const reused = chunk.slice();
      session.feedLanesBytes(reused);
      reused.fill(0x41);
    }
  } else {
    const decoder = new Utf8ChunkDecoder();
    for (const chunk of lanes) {
      const text = decoder.decode(chunk);
      if (text !== '') session.feedLanes(text);
    }
    const rest = decoder.decode(new Uint8Array(0), 0, 0, true);
    if (rest !== '') session.feedLanes(rest);
  }
  session.finishLanes();
  return session.result();
}

function view(result: ImportResult) {
  const t = result.lanes;
  const n = t.count;
  const column = (a: ArrayLike<number>) => Array.from(a).slice(0, n);
  const r = result.report;
  expect(r.accepted + r.rejected).toBe(r.total);
  return {
    columns: [t.from, t.to, t.sourceRow, t.toll, t.fuel, t.fees, t.rebate, t.distanceKm, t.driveMinutes, t.validFrom, t.validTo].map(column),
    classTolls: t.classTolls.map((c) => column(c.toll)),
    ref: t.ref.slice(0, n),
    notes: t.notes.slice(0, n),
    clause: t.clause?.slice(0, n),
    extra: t.extra.map((x) => x.values.slice(0, n)),
    currency: result.currency,
    report: r,
  };
}

function expectSamePaths(bytes: Uint8Array, cuts: number[]): void {
  const chunks = cutAt(bytes, cuts);
  const text = view(importWith(chunks, false));
  expect(view(importWith(chunks, true))).toEqual(text);
  expect(view(importWith(chunks, true, true))).toEqual(text);
}

// Cells by column kind: plain values (taken from the bytes) and hostile ones (the general path's).
const cells = {
  depot: ['A', 'B', 'C', 'D-4', 'LONGDEPOT123', 'Liège', 'LONGDEPOT12', 'Z', '', ' A', 'A ', '"A"', 'Li\u00e8ge', 'Lie\u0300ge', '=A'],
  amount: ['12.50', '12.5', '0', '0.05', '999999999.99', '', '12.505', '-3.00', '1,5', '€12', '"1,234.50"', '9999999999999999', '99999999999999999999999', '.5', '5.', '1e3', '+1', '=1+2', '12\u00a0'],
  distance: ['123.4', '0.5', '12', '39999.9', '', '40000.1', '1e3', '12,5', '-1', 'abc', '1.2345678'],
  drive: ['90', '0', '60000', '', '1:30', '60001', 'PT1H', '12.5', '9999999'],
  date: ['2026-01-01', '2026-12-31', '2024-02-29', '', '2026-02-29', '2026-13-01', '20260101', '2026-1-1'],
  text: ['R1', '', 'a longer reference text', 'R-2', 'Liège', 'München ✓', "'=x", '=cmd', '@SUM(A1)', '+1', '-x', ' padded ', '"quoted, with comma"', '"two\nlines"', '"two\r\nlines"', 'inch 48" trailer', '"open', 'tab\there', '"a ""b"""'],
};
type Kind = keyof typeof cells;
// How many of each list's first values a plain row holds.
const PLAIN: Record<Kind, number> = { depot: 5, amount: 6, distance: 5, drive: 4, date: 4, text: 4 };
const KINDS: Kind[] = ['depot', 'depot', 'text', 'amount', 'amount', 'amount', 'amount', 'distance', 'drive', 'date', 'date', 'text', 'text'];
const HEADER = ['from', 'to', 'ref', 'toll', 'fuel', 'fees', 'rebate', 'distance_km', 'drive_minutes', 'valid_from', 'valid_to', 'notes', 'extra column'];
// Raw byte sequences put into a cell: invalid UTF-8, a lone continuation, a cut 3-byte character, NUL.
const RAW = [[0xff], [0x80], [0xe2, 0x82], [0xc3], [0x00], [0xef, 0xbb, 0xbf], [0xef, 0xbf, 0xbd]];

/** `arb` one time in `every`, else null. */
function sometimes<T>(arb: fc.Arbitrary<T>, every: number): fc.Arbitrary<T | null> {
  return fc.oneof({ arbitrary: fc.constant(null), weight: every - 1 }, { arbitrary: arb, weight: 1 });
}

const rowArb = fc.tuple(
  fc.array(fc.nat(), { minLength: KINDS.length, maxLength: KINDS.length }),
  sometimes(fc.tuple(fc.nat({ max: KINDS.length - 1 }), fc.nat()), 3),
  fc.constantFrom('\n', '\n', '\n', '\n', '\n', '\r\n', '\r'),
  sometimes(fc.tuple(fc.nat({ max: KINDS.length - 1 }), fc.constantFrom(...RAW)), 12),
  fc.constantFrom(0, 0, 0, 0, 1, -1),
);

const fileArb = fc
  .record({
    rows: fc.array(rowArb, { minLength: 1, maxLength: 40 }),
    semicolon: fc.boolean(),
    bom: fc.boolean(),
    sepLine: fc.boolean(),
    crlfHeader: fc.boolean(),
    blank: fc.nat({ max: 30 }),
    // Where the file is cut, as shares of its length.
    cuts: fc.array(fc.integer({ min: 0, max: 1000 }), { maxLength: 12 }),
  })
  .map(({ rows, semicolon, bom, sepLine, crlfHeader, blank, cuts }) => {
    const d = semicolon ? ';' : ',';
    const parts: number[][] = [];
    const text = (t: string) => parts.push([...encoder.encode(t)]);
    if (bom) parts.push([0xef, 0xbb, 0xbf]);
    if (sepLine) text(`sep=${d}\n`);
    text(HEADER.join(d) + (crlfHeader ? '\r\n' : '\n'));
    rows.forEach(([picks, odd, eol, raw, fields], r) => {
      if (r === blank) text(eol);
      const line = KINDS.map((kind, k) => {
        const plainPick = cells[kind][picks[k] % PLAIN[kind]];
        const value = odd !== null && odd[0] === k ? cells[kind][odd[1] % cells[kind].length] : plainPick;
        return semicolon ? value.replace(/^(\d+)\.(\d+)$/, '$1,$2') : value;
      });
      if (fields === 1) line.push('surplus');
      if (fields === -1) line.pop();
      line.forEach((cell, k) => {
        if (k > 0) text(d);
        text(cell);
        if (raw !== null && raw[0] === k) parts.push(raw[1]);
      });
      text(eol);
    });
    const bytes = Uint8Array.from(parts.flat());
    return { bytes, cuts: cuts.map((c) => Math.round((c / 1000) * bytes.length)) };
  });

describe('CsvByteStream (the byte path) against the text path', () => {
  it('gives the same lane table and report on random hostile files, cut anywhere', () => {
    fc.assert(
      fc.property(fileArb, ({ bytes, cuts }) => expectSamePaths(bytes, cuts)),
      { numRuns: 400, seed: 20261203 },
    );
  });

  it('takes plain rows from the bytes and the rest the general way', () => {
    // Past 64 KB: the stream holds the first chunks until the NUL check has seen that much.
    const lines = ['from,to,ref,toll,fuel', ...Array.from({ length: 4040 }, (_, i) => (i === 4020 ? 'Liège,B,"R, 20",1.00,2.5' : `A,B,R${i},1.00,2.5`))];
    const bytes = encoder.encode(lines.join('\r\n') + '\r\n');
    const start = 70_000;
    // Rows read from the bytes are counted by the text stream's rowTaken.
    const taken = vi.spyOn(CsvRecordStream.prototype, 'rowTaken');
    const result = importWith(cutAt(bytes, [50, 51, 52, 300, start, start + 1, start + 2, start + 300]), true);
    // The text stream reads the first 70 000 bytes; every row ending after them but the quoted one is taken.
    const endsBefore = bytes.subarray(0, start).filter((b) => b === 10).length;
    expect(taken).toHaveBeenCalledTimes(lines.length - endsBefore - 1);
    taken.mockRestore();
    expect(result.lanes.count).toBe(4040);
    expect(result.lanes.ref[4020]).toBe('R, 20');
    expect(result.lanes.from[4020]).toBe(3);
    expect(result.lanes.toll[4039]).toBe(100);
    expect(result.report.errors).toEqual([]);
  });

  it('gives the same result for every single cut of a small hostile file (inside multi-byte characters too)', () => {
    const text = [
      '\ufeffsep=;',
      'from;to;ref;toll;fuel;notes',
      'A;B;R1;1,50;2;plain',
      'Liège;A;R2;3;4;"two',
      'lines; with ""quotes"""',
      'B;C;R3;=1+2;5;München',
      'C;A;R4;€ 7,00;;✓ done\r',
      'A;Z;R5;1;2;unknown depot',
      '',
      'B;A;R6;99999999999999999;1;huge',
      "A;C;'=R7;1;1;'@formula",
      'C;B;R8;1;1;"unclosed',
    ].join('\n');
    const bytes = encoder.encode(text);
    for (let p = 0; p <= bytes.length; p++) expectSamePaths(bytes, [p]);
  });

  it('reads invalid UTF-8 and NUL in later lines as the text path does', () => {
    const plain = Array.from({ length: 6000 }, (_, i) => `A,B,R${i},1.00,2`).join('\n');
    const bytes = Uint8Array.from([...encoder.encode(`from,to,ref,toll,fuel\n${plain}\nA,B,R`), 0xff, ...encoder.encode(',1,2\nB,A,X'), 0x00, ...encoder.encode(',1,2\nA,C,R99,1,2\n')]);
    for (let p = 0; p <= bytes.length; p += 9973) expectSamePaths(bytes, [p, p + 3]);
    // A NUL in the first 64 KB refuses the whole file (not text); past it, only its row.
    const early = Uint8Array.from([...encoder.encode('from,to,ref,toll,fuel\nA,B,X'), 0x00, ...encoder.encode(`,1,2\n${plain}\n`)]);
    expect(importWith(cutAt(early, [30, 4000]), true).report.errors.map((e) => [e.row, e.code])).toEqual([[null, 'not-text']]);
    const result = importWith(cutAt(bytes, [encoder.encode(`from,to,ref,toll,fuel\n${plain}\n`).length]), true);
    expect(result.lanes.count).toBe(6001);
    expect(result.report.errors.map((e) => [e.row, e.code])).toEqual([
      [6002, 'not-text'],
      [6003, 'not-text'],
    ]);
  });

  it('refuses a file fed partly as text and partly as bytes', () => {
    const session = startImport();
    session.feedDepotsBytes(encoder.encode(DEPOTS.slice(0, 20)));
    expect(() => session.feedDepots(DEPOTS.slice(20))).toThrow(/fed as bytes/);
    session.finishDepots();
    session.feedLanes('from,to\n');
    expect(() => session.feedLanesBytes(encoder.encode('A,B\n'))).toThrow(/fed as text/);
  });

  it('gives long lines (past what a byte chunk carries) to the text stream with the same result', () => {
    const rows = Array.from({ length: 60 }, (_, i) => (i % 20 === 7 ? `A,B,R${i},1.00,2,${'x'.repeat(100_000 + i)}` : i === 31 ? `A,B,R${i},1.00,2,"${'quoted, '.repeat(20_000)}"` : `A,B,R${i},1.00,2,n${i}`));
    const bytes = encoder.encode(['from,to,ref,toll,fuel,notes', ...rows].join('\n') + '\n');
    const cuts = Array.from({ length: Math.ceil(bytes.length / 9_000) }, (_, i) => i * 9_000);
    expectSamePaths(bytes, cuts);
    const result = importWith(cutAt(bytes, cuts), true);
    expect(result.lanes.count).toBe(60);
    expect(result.lanes.notes[7]?.length).toBe(100_007);
  });
});
