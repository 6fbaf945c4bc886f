// CSV injection (OWASP "CSV Injection", cheat sheet as of 2024, from memory): a cell must not start
// with =, +, -, @, tab or CR, not after leading spaces either, and no part of a cell that a
// spreadsheet splitting on `;`, a tab, a quote or a line break sees as a cell may either. Plain
// numbers stay numbers. Checked on the written CSV text, as a spreadsheet would read it.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { guardFormulaCell, withoutFormulaGuard } from '../../../engine/io/csv-cell-safety';
import { formatCsvRows, parseCsvBlock } from '../../../engine/io/csv-papaparse';
import { cellText } from '../../../engine/import/cells';

const PLAIN_NUMBER = /^[-+]?(?:\d+(?:\.\d*)?|\.\d+)$/;

/** Every piece a naive reader gets when it splits the CSV text on any separator and drops quotes. */
function naivePieces(csv: string): string[] {
  return csv.split(/[,;\t\r\n"]/);
}

function runsAsFormula(piece: string): boolean {
  const t = piece.replace(/^[ \u00a0]+/, '');
  return /^[=+\-@]/.test(t) && !PLAIN_NUMBER.test(t.trim());
}

describe('guardFormulaCell', () => {
  it('guards the start, after leading spaces, and after each separator', () => {
    expect(guardFormulaCell('=1+1')).toBe("'=1+1");
    expect(guardFormulaCell('  =cmd')).toBe("'  =cmd");
    expect(guardFormulaCell('\tx')).toBe("'\tx");
    expect(guardFormulaCell('a;=cmd|x')).toBe("a;'=cmd|x");
    expect(guardFormulaCell('a, @SUM(A1)')).toBe("a,' @SUM(A1)");
    expect(guardFormulaCell('note\n+HYPERLINK("x")')).toBe('note\n\'+HYPERLINK("x")');
    expect(guardFormulaCell('x"=y')).toBe("x\"'=y");
  });
  it('leaves plain numbers and ordinary text alone', () => {
    for (const s of ['-3.00', '+5', '-0.05', '.5', '12', 'Rotterdam', 'max 48" trailer', "O'Brien", '1;-2', 'a - b', 'e-mail']) expect(guardFormulaCell(s)).toBe(s);
  });
  it('the importer reads back exactly what was written (any text)', () => {
    fc.assert(
      fc.property(fc.string({ unit: fc.constantFrom('=', '+', '-', '@', '\t', '\r', '\n', ',', ';', '"', "'", ' ', 'a', '1', '.') }), (s) => {
        expect(withoutFormulaGuard(guardFormulaCell(s))).toBe(s);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('formatCsvRows: every CSV the project writes', () => {
  it('quotes a cell holding any separator of a common dialect', () => {
    expect(formatCsvRows([['a;b', 'c\td', 'plain']])).toBe('"a;b","c\td",plain\r\n');
  });
  it('keeps numbers and plain-number text unquoted and unchanged', () => {
    expect(formatCsvRows([[-3, '-3.00', '+5', 0]])).toBe('-3,-3.00,+5,0\r\n');
  });
  it('no piece a naive splitter sees runs as a formula, and a real CSV reader gives the text back', () => {
    const unit = fc.constantFrom('=', '+', '-', '@', '\t', '\r', '\n', ',', ';', '"', "'", ' ', 'cmd', '1', '.', '|');
    fc.assert(
      fc.property(fc.array(fc.string({ unit, maxLength: 12 }), { minLength: 1, maxLength: 4 }), (row) => {
        const csv = formatCsvRows([row]);
        for (const piece of naivePieces(csv)) expect(runsAsFormula(piece), JSON.stringify({ row, csv, piece })).toBe(false);
        // The block reader drops a CR that ends a line's last field (CRLF files); leave those out here.
        if (row[row.length - 1].endsWith('\r')) return;
        const [read] = parseCsvBlock(csv, ',', '\r\n').rows;
        // The importer's cell reader trims and removes the guard.
        expect(read.map((c) => withoutFormulaGuard(c))).toEqual(row);
        expect(read.map((_c, i) => cellText(read, i))).toEqual(row.map((c) => withoutFormulaGuard(guardFormulaCell(c).trim())));
      }),
      { numRuns: 1000 },
    );
  });
});
