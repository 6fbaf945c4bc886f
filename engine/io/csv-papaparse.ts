// The one module that imports papaparse. It turns CSV text into rows of strings and rows back into
// CSV, nothing more; header matching, amounts and validation live in engine/import. papaparse's
// string parser uses no DOM and no Node APIs, so this adapter runs in a worker, main and the CLI.

import Papa from 'papaparse';
import { guardFormulaCell, needsCsvQuotes } from './csv-cell-safety';

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

export interface CsvWriteOptions {
  /** Guard formula-like text (csv-cell-safety.ts, OWASP CSV-injection advice). Default true; tests only turn it off. */
  escapeFormulae?: boolean;
  /** Field separator; default comma (RFC 4180). */
  delimiter?: ',' | ';';
  /**
   * Columns whose every cell the caller has checked is plain (`isPlainCsvText`, or a finite number),
   * so they are written without testing each cell again: a routes file of every path repeats the
   * same depot ids hundreds of millions of times. Only for cells the caller built from such parts.
   */
  plainColumns?: readonly boolean[];
}

// A cell written as it is: a plain number, or text with no separator of any common dialect, quote,
// line break or byte-order mark, no space at either end and no formula-like start (so the guard and
// the quoting below would leave it unchanged).
const PLAIN_TEXT = /^(?:[-+]?(?:\d+(?:\.\d*)?|\.\d+)|(?![\s=+\-@'])[^\r\n",;\t\uFEFF]*(?<!\s))$/;

function isPlainRow(row: readonly (string | number | null)[], known: readonly boolean[] | undefined): boolean {
  for (let k = 0; k < row.length; k++) {
    if (known !== undefined && known[k] === true) continue;
    const cell = row[k];
    if (typeof cell === 'string' ? !PLAIN_TEXT.test(cell) : typeof cell === 'number' && !Number.isFinite(cell)) return false;
  }
  return true;
}

/**
 * Text written as it is (no guard, no quotes) that stays so when joined to others like it with a
 * character that is neither a separator nor a space (the routes file's `>`): plain, and not starting
 * with a sign, which a plain number may and a joined text may not ("-3>D1" would start a formula).
 */
export function isPlainCsvText(text: string): boolean {
  const first = text.charCodeAt(0);
  return first !== 45 && first !== 43 && PLAIN_TEXT.test(text);
}

/**
 * Writes rows as RFC 4180 CSV (CRLF line ends, doubled quotes). Every CSV the project writes goes
 * through here: text cells are guarded against formulas, and quoted when they hold a separator of
 * any common dialect (`,`, `;`, tab, quote, line break), so a spreadsheet that splits on `;` still
 * sees one cell. Numbers are written as numbers. Rows whose every cell needs no guard and no quotes
 * are joined directly (the same text, about twice as fast for large reports).
 */
export function formatCsvRows(rows: readonly (readonly (string | number | null)[])[], options: CsvWriteOptions = {}): string {
  const guard = options.escapeFormulae !== false;
  const delimiter = options.delimiter ?? ',';
  const papaOptions = {
    newline: '\r\n',
    quotes: (value: unknown) => typeof value === 'string' && needsCsvQuotes(value),
    delimiter,
    escapeFormulae: false,
  };
  let text = '';
  for (const row of rows) {
    if (guard && isPlainRow(row, options.plainColumns)) text += row.join(delimiter) + '\r\n';
    else text += Papa.unparse([guard ? row.map((cell) => (typeof cell === 'string' ? guardFormulaCell(cell) : cell)) : row] as unknown[][], papaOptions) + '\r\n';
  }
  return text;
}
