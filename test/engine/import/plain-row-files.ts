// Random files for the fast-path property tests (depot-row-fast, lane-row-fast): rows of plain cells
// with at most one cell the general reader must handle or refuse, a surplus field on one row and a
// missing one on the next, comma or semicolon files, fed to a reader in chunks of random size with
// or without the CSV stream's plain-line path.

import fc from 'fast-check';
import { CsvRecordStream } from '../../../engine/io/csv-record-stream';
import type { RecordFileReader } from '../../../engine/import/record-file-reader';

/** Cell values per kind of column: those a plain row holds, and those that need the general reader. */
export interface CellValues<K extends string> {
  plain: Record<K, readonly string[]>;
  messy: Record<K, readonly string[]>;
}

/** Rows with one cell per entry of `kinds`: plain values, one messy cell in about a third of them. */
export function rowArb<K extends string>({ plain, messy }: CellValues<K>, kinds: readonly K[]): fc.Arbitrary<string[]> {
  return fc
    .tuple(fc.array(fc.nat(), { minLength: kinds.length, maxLength: kinds.length }), fc.option(fc.tuple(fc.nat({ max: kinds.length - 1 }), fc.nat()), { freq: 2 }))
    .map(([picks, odd]) =>
      kinds.map((kind, k) => {
        if (odd !== null && odd[0] === k) return messy[kind][odd[1] % messy[kind].length];
        return plain[kind][picks[k] % plain[kind].length];
      }),
    );
}

/**
 * Whole files: the header, then 1 to 40 rows written by `cells` (the row's cells as the file writes
 * them for `delimiter`), one row with a surplus field and the next one short, and a chunk size.
 */
export function fileArb(header: readonly string[], rows: fc.Arbitrary<string[]>, cells: (row: string[], delimiter: string) => string[]): fc.Arbitrary<{ text: string; chunk: number }> {
  return fc
    .record({
      semicolon: fc.boolean(),
      rows: fc.array(rows, { minLength: 1, maxLength: 40 }),
      extraField: fc.integer({ min: 0, max: 20 }),
      chunk: fc.integer({ min: 7, max: 200 }),
    })
    .map(({ semicolon, rows: picked, extraField, chunk }) => {
      const d = semicolon ? ';' : ',';
      const lines = picked.map((r, i) => {
        const written = cells(r, d);
        if (i === extraField) written.push('surplus');
        if (i === extraField + 1) written.pop();
        return written.join(d);
      });
      return { text: [header.join(d), ...lines].join('\n') + '\n', chunk };
    });
}

/** Feeds `text` to `reader` through the CSV stream in chunks of `chunk` characters; `fast` offers plain lines. */
export function streamInto(reader: RecordFileReader, text: string, chunk: number, fast: boolean): void {
  const stream: CsvRecordStream = new CsvRecordStream({
    records: (rows, first, bad, badText, stray) => {
      reader.decimalComma = stream.delimiter === ';';
      reader.records(rows, first, bad, badText, stray);
    },
    plainLine: fast ? (t, s, e, row, d) => reader.plainLine(t, s, e, row, d) : undefined,
    issue: (issue) => reader.issue(issue),
  });
  for (let i = 0; i < text.length; i += chunk) stream.feed(text.slice(i, i + chunk));
  stream.finish();
  reader.finish();
}
