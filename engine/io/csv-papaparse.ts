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
}

/**
 * Writes rows as RFC 4180 CSV (CRLF line ends, doubled quotes). Every CSV the project writes goes
 * through here: text cells are guarded against formulas, and quoted when they hold a separator of
 * any common dialect (`,`, `;`, tab, quote, line break), so a spreadsheet that splits on `;` still
 * sees one cell. Numbers are written as numbers.
 */
export function formatCsvRows(rows: readonly (readonly (string | number | null)[])[], options: CsvWriteOptions = {}): string {
  const guard = options.escapeFormulae !== false;
  const cells = rows.map((row) => row.map((cell) => (typeof cell === 'string' && guard ? guardFormulaCell(cell) : cell)));
  return (
    Papa.unparse(cells as unknown[][], {
      newline: '\r\n',
      quotes: (value: unknown) => typeof value === 'string' && needsCsvQuotes(value),
      delimiter: options.delimiter ?? ',',
      escapeFormulae: false,
    }) + '\r\n'
  );
}
