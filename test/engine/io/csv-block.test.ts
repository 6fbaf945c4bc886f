import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { splitCsvBlock } from '../../../engine/io/csv-block';
import { parseCsvBlock } from '../../../engine/io/csv-papaparse';

// Reference: papaparse on the whole block (what the record stream used before the plain-line path),
// on well-formed RFC 4180 records: plain fields without quotes, quoted fields with doubled inner quotes.
const text = fc.array(fc.constantFrom('a', 'b', 'Liège', ' ', ',', ';', '\t', '"', '\n', '\r\n', '12.50', '=1+2'), { maxLength: 6 }).map((p) => p.join(''));
const field = fc.oneof(
  text.map((t) => t.replace(/[",;\t\r\n]/g, '')),
  text.map((t) => `"${t.replace(/"/g, '""')}"`),
);

const wholeBlock = (delimiter: string, lineBreak: string) =>
  fc
    .array(fc.array(field, { minLength: 1, maxLength: 5 }), { maxLength: 8 })
    .chain((rows) => fc.boolean().map((trailing) => rows.map((r) => r.join(delimiter)).join(lineBreak) + (trailing ? lineBreak : '')));

describe('splitCsvBlock', () => {
  it('gives the same records and malformed-quote rows as papaparse on the whole block', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(',', ';', '\t').chain((d) => fc.constantFrom('\n' as const, '\r\n' as const).chain((n) => wholeBlock(d, n).map((b) => [b, d, n] as const))),
        ([block, delimiter, newline]) => {
          expect(splitCsvBlock(block, delimiter, newline)).toEqual(parseCsvBlock(block, delimiter, newline));
        },
      ),
      { numRuns: 3000, seed: 20261203 },
    );
  });

  it('reads files that break lines with CR alone like papaparse', () => {
    fc.assert(
      fc.property(wholeBlock(',', '\r').filter((t) => !t.includes('\n')), (block) => {
        expect(splitCsvBlock(block, ',', '\r')).toEqual(parseCsvBlock(block, ',', '\r'));
      }),
      { numRuns: 1000, seed: 7 },
    );
  });

  it('cuts plain lines itself and keeps quoted records whole, with their row positions', () => {
    const block = 'a,b\r\n"x,\ny",2\nc,d\n"q ""1""",3\n\ne,f\n';
    expect(splitCsvBlock(block, ',', '\r\n')).toEqual({
      rows: [['a', 'b'], ['x,\ny', '2'], ['c', 'd'], ['q "1"', '3'], [''], ['e', 'f']],
      badQuoteRows: [],
    });
  });

  it('flags a malformed quoted record and still reads the plain lines after it as their own rows', () => {
    // papaparse alone would fold "e,f" into the malformed record; here it stays a row of its own.
    const { rows, badQuoteRows } = splitCsvBlock('a,b\n"bad"x,3\ne,f\n', ',', '\n');
    expect(badQuoteRows).toEqual([1]);
    expect(rows[0]).toEqual(['a', 'b']);
    expect(rows[2]).toEqual(['e', 'f']);
    expect(rows).toHaveLength(3);
  });
});
