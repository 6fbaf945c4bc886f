// The one module that imports papaparse. It turns CSV text into rows of strings and nothing more;
// header matching, amounts and validation live in engine/import. papaparse's string parser uses
// no DOM and no Node APIs, so this adapter keeps the engine runnable in a worker, main and the CLI.

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

/** Writes rows as RFC 4180 CSV (CRLF line ends, quotes only where needed). */
export function formatCsvRows(rows: readonly (readonly (string | number | null)[])[]): string {
  return Papa.unparse(rows as unknown[][], { newline: '\r\n', quotes: false }) + '\r\n';
}
