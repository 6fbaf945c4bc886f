// The one module that imports papaparse. It turns CSV text into rows of strings and rows back into
// CSV, nothing more; header matching, amounts and validation live in engine/import. papaparse's
// string parser uses no DOM and no Node APIs, so this adapter runs in a worker, main and the CLI.

import Papa from 'papaparse';

export interface CsvParseIssue {
  /** Row as a spreadsheet numbers it (header = 1), when known. */
  row: number | null;
  message: string;
}

export interface CsvTable {
  rows: string[][];
  delimiter: string;
  issues: CsvParseIssue[];
}

/** Parses a whole CSV text (RFC 4180 quoting; delimiter detected among comma, semicolon and tab). */
export function parseCsvText(text: string): CsvTable {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const result = Papa.parse<string[]>(body, {
    delimiter: '',
    delimitersToGuess: [',', ';', '\t'],
    skipEmptyLines: false,
  });
  const rows = result.data;
  // A trailing newline yields one empty row; blank trailing lines are not data.
  while (rows.length > 0 && rows[rows.length - 1].length === 1 && rows[rows.length - 1][0] === '') rows.pop();
  return {
    rows,
    delimiter: result.meta.delimiter,
    issues: result.errors
      .filter((e) => e.code !== 'UndetectableDelimiter')
      .map((e) => ({ row: typeof e.row === 'number' ? e.row + 1 : null, message: e.message })),
  };
}

/**
 * Parses a block of whole records with a known delimiter. The streaming reader
 * (csv-record-stream.ts) cuts blocks only at line breaks outside quotes, so every record is whole.
 * Records end at LF (CRLF and LF may even be mixed in one file; the CR is dropped) or, for files
 * that use CR alone, at CR. A block that ends with a line break yields no empty record for it.
 */
export function parseCsvBlock(block: string, delimiter: string, newline: '\n' | '\r\n' | '\r'): { rows: string[][]; badQuoteRows: number[] } {
  const lineBreak = newline === '\r' ? '\r' : '\n';
  const result = Papa.parse<string[]>(block, { delimiter, newline: lineBreak, skipEmptyLines: false });
  const rows = result.data;
  if (block.endsWith(lineBreak) && rows.length > 0) {
    const last = rows[rows.length - 1];
    if (last.length === 1 && last[0] === '') rows.pop();
  }
  if (lineBreak === '\n' && block.includes('\r')) {
    for (const row of rows) {
      const k = row.length - 1;
      if (row[k].charCodeAt(row[k].length - 1) === 13) row[k] = row[k].slice(0, -1);
    }
  }
  // A quote inside a field that is not itself quoted, or a closing quote followed by text.
  const badQuoteRows = result.errors.filter((e) => e.code === 'InvalidQuotes' && typeof e.row === 'number').map((e) => e.row as number);
  // Unclosed quotes are the record stream's to find: it tracks quote parity across chunks.
  return { rows, badQuoteRows };
}

// A text cell a spreadsheet would run as a formula; plain numbers such as -12.50 or +3 are exempt,
// because the exporters write amounts as text to keep their exact decimals.
const FORMULA_LIKE = /^(?![-+]?(?:\d+(?:\.\d*)?|\.\d+)$)[=+\-@\t\r]/;

export interface CsvWriteOptions {
  /** Prefix formula-like text cells with an apostrophe (OWASP CSV-injection advice). Default true. */
  escapeFormulae?: boolean;
}

// A cell papaparse writes unchanged (with formula escaping on): a plain number, or text with no
// quote, line break, comma or byte-order mark, no space at either end and no formula-like start.
const PLAIN_TEXT = /^(?:[-+]?(?:\d+(?:\.\d*)?|\.\d+)|(?![ =+\-@\t\r])[^\r\n",\uFEFF]*(?<! ))$/;

function isPlainRow(row: readonly (string | number | null)[]): boolean {
  for (const cell of row) {
    if (typeof cell === 'string' ? !PLAIN_TEXT.test(cell) : typeof cell === 'number' && !Number.isFinite(cell)) return false;
  }
  return true;
}

/**
 * Writes rows as RFC 4180 CSV (CRLF line ends, quotes only where needed). Rows whose every cell
 * needs no quoting or escaping are joined directly (the same text papaparse gives, about twice as
 * fast for large reports); any other row goes through papaparse.
 */
export function formatCsvRows(rows: readonly (readonly (string | number | null)[])[], options: CsvWriteOptions = {}): string {
  const escape = options.escapeFormulae !== false;
  const papaOptions = { newline: '\r\n', quotes: false, escapeFormulae: escape ? FORMULA_LIKE : false };
  if (!escape) return Papa.unparse(rows as unknown[][], papaOptions) + '\r\n';
  let text = '';
  for (const row of rows) text += (isPlainRow(row) ? row.join(',') : Papa.unparse([row] as unknown[][], papaOptions)) + '\r\n';
  return text;
}
