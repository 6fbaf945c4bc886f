// The streaming CSV reader against RFC 4180 (sections 2.1-2.7: quoted fields with delimiters,
// doubled quotes and line breaks) and against papaparse's own whole-text parse: cutting the text
// into chunks anywhere must give the same records with the same spreadsheet row numbers.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CsvRecordStream, type CsvStreamIssue } from '../../../engine/io/csv-record-stream';
import { formatCsvRows, parseCsvText } from '../../../engine/io/csv-papaparse';

function read(chunks: string[]) {
  const records: { row: number; cells: string[] }[] = [];
  const issues: CsvStreamIssue[] = [];
  const stream = new CsvRecordStream({
    records: (rows, first) => rows.forEach((cells, i) => records.push({ row: first + i, cells })),
    issue: (issue) => issues.push(issue),
  });
  for (const c of chunks) stream.feed(c);
  stream.finish();
  return { records, issues, delimiter: stream.delimiter };
}

describe('CsvRecordStream', () => {
  it('reads RFC 4180 quoting: delimiters, doubled quotes and line breaks inside quoted fields', () => {
    const text = 'id,name,notes\r\nA,"Depot, north","He said ""yes"""\r\nB,"two\r\nlines",x\r\n';
    const { records } = read([text]);
    expect(records.map((r) => r.cells)).toEqual([
      ['id', 'name', 'notes'],
      ['A', 'Depot, north', 'He said "yes"'],
      ['B', 'two\r\nlines', 'x'],
    ]);
    // A record spanning two lines is one spreadsheet row.
    expect(records.map((r) => r.row)).toEqual([1, 2, 3]);
  });

  it('drops a UTF-8 byte order mark and detects semicolon and tab delimiters', () => {
    expect(read(['\ufeffid;name\nA;B\n']).records[0].cells).toEqual(['id', 'name']);
    expect(read(['\ufeffid;name\nA;B\n']).delimiter).toBe(';');
    expect(read(['id\tname\nA\tB\n']).records[1].cells).toEqual(['A', 'B']);
  });

  it('reads a file whose lines end in CRLF and LF mixed', () => {
    expect(read(['id,name\r\nA,"x"\nB,y\r\nC,"p\r\nq"\r\n']).records.map((r) => r.cells)).toEqual([
      ['id', 'name'],
      ['A', 'x'],
      ['B', 'y'],
      ['C', 'p\r\nq'],
    ]);
  });

  it('takes the delimiter from a "sep=" line and does not count it as a row', () => {
    const { records, delimiter } = read(['sep=;\r\nid;name,x\r\nA;b,c\r\n']);
    expect(delimiter).toBe(';');
    expect(records.map((r) => [r.row, r.cells])).toEqual([
      [1, ['id', 'name,x']],
      [2, ['A', 'b,c']],
    ]);
  });

  it('reads CR-only line breaks (old Mac files)', () => {
    expect(read(['id,name\rA,"x\ry"\rB,z\r']).records.map((r) => [r.row, r.cells])).toEqual([
      [1, ['id', 'name']],
      [2, ['A', 'x\ry']],
      [3, ['B', 'z']],
    ]);
  });

  it('gives the same records however the text is cut into chunks', () => {
    const cell = fc.string({ unit: fc.constantFrom('a', 'b', ',', '"', '\n', '\r\n', ' ', '1', '.') });
    fc.assert(
      fc.property(fc.array(fc.array(cell, { minLength: 2, maxLength: 2 }), { minLength: 1, maxLength: 6 }), fc.array(fc.nat(), { maxLength: 5 }), (rows, cuts) => {
        const text = formatCsvRows([['h1', 'h2'], ...rows], { escapeFormulae: false });
        const points = [...new Set(cuts.map((c) => c % (text.length + 1)))].sort((a, b) => a - b);
        const chunks: string[] = [];
        let at = 0;
        for (const p of points) {
          chunks.push(text.slice(at, p));
          at = p;
        }
        chunks.push(text.slice(at));
        const whole = parseCsvText(text).rows;
        expect(read(chunks).records.map((r) => r.cells)).toEqual(whole);
      }),
      { numRuns: 300 },
    );
  });

  it('reports an unclosed quote with its row and counts the lines it swallowed', () => {
    const { records, issues } = read(['from,to\nA,B\nC,"D\nE,F\n', 'G,H\n']);
    expect(records.map((r) => r.cells)).toEqual([['from', 'to'], ['A', 'B']]);
    expect(issues).toHaveLength(1);
    expect(issues[0]).toMatchObject({ code: 'unbalanced-quotes', row: 3, columnIndex: 1, linesLost: 3 });
  });

  it('refuses a file that is not text (NUL bytes: binary or UTF-16)', () => {
    const { records, issues } = read(['i\u0000d\u0000,\u0000']);
    expect(records).toEqual([]);
    expect(issues[0].code).toBe('not-text');
  });
});
