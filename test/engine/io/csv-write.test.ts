// CSV writing: RFC 4180 (CRLF, quotes only where needed, doubled quotes) and CSV-injection
// neutralising as OWASP advises (prefix an apostrophe to cells starting with =, +, -, @, tab, CR),
// while plain numbers such as -12.50 stay numbers.

import { describe, expect, it } from 'vitest';
import { formatCsvRows, parseCsvText } from '../../../engine/io/csv-papaparse';

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
