// CSV writing: RFC 4180 (CRLF, quotes only where needed, doubled quotes) and CSV-injection
// neutralising as OWASP advises (prefix an apostrophe to cells starting with =, +, -, @, tab, CR),
// while plain numbers such as -12.50 stay numbers.

import { describe, expect, it } from 'vitest';
import { formatCsvRows, parseCsvText } from '../../../engine/io/csv-papaparse';
import { withoutFormulaGuard } from '../../../engine/io/csv-cell-safety';
import { seededRandom } from '../../support/seeded-random';

describe('formatCsvRows', () => {
  it('quotes per RFC 4180 and ends lines with CRLF', () => {
    expect(formatCsvRows([['a', 'b, c', 'say "hi"', 'two\nlines']])).toBe('a,"b, c","say ""hi""","two\nlines"\r\n');
  });

  it('neutralises formula-like text and leaves numbers alone', () => {
    const cells = ['=1+1', '+SUM(A1)', '-A1', '@cmd', '\tx', '\rx', '-12.50', '+3', '12', '-0.05', '.5'];
    const [row] = parseCsvText(formatCsvRows([cells])).rows;
    expect(row).toEqual(["'=1+1", "'+SUM(A1)", "'-A1", "'@cmd", "'\tx", "'\rx", '-12.50', '+3', '12', '-0.05', '.5']);
    expect(parseCsvText(formatCsvRows([['=1']], { escapeFormulae: false })).rows[0]).toEqual(['=1']);
  });
});

describe('formatCsvRows fast path', () => {
  // Cells built from characters that need care (quote, comma, line breaks, space, formula starts,
  // byte-order mark) and plain ones, so both paths run and meet in the same output.
  const alphabet = ['a', 'Z', '7', '.', '>', '-', '+', '=', '@', ' ', ',', '"', '\n', '\r', '\t', '\uFEFF', "'", 'é'];
  const randomCell = (r: () => number): string | number | null => {
    const kind = r();
    if (kind < 0.1) return null;
    if (kind < 0.25) return Math.round((r() - 0.5) * 100_000) / 100;
    const length = Math.floor(r() * 6);
    let cell = '';
    for (let i = 0; i < length; i++) cell += alphabet[Math.floor(r() * alphabet.length)];
    return cell;
  };

  it('writes every row exactly as papaparse does (the same row with a comma cell appended goes through papaparse)', () => {
    const r = seededRandom(20261203);
    for (let i = 0; i < 3_000; i++) {
      const row = Array.from({ length: 1 + Math.floor(r() * 5) }, () => randomCell(r));
      const alone = formatCsvRows([row]);
      const throughPapa = formatCsvRows([[...row, 'x,y']]);
      expect(throughPapa, JSON.stringify(row)).toBe(alone.slice(0, -2) + ',"x,y"\r\n');
    }
  });

  it('reads back through papaparse, and through the guard removal the importer does, to the cells written', () => {
    const r = seededRandom(7);
    const rows = Array.from({ length: 500 }, () => Array.from({ length: 4 }, () => randomCell(r)));
    const back = parseCsvText(formatCsvRows(rows)).rows.map((row) => row.map(withoutFormulaGuard));
    const expected = rows.map((row) => row.map((c) => (c === null ? '' : String(c))));
    expect(back).toEqual(expected);
  });
});
