// Splits a block of whole CSV records into cells. Lines without a quote character, nearly every line
// of a lanes file, are cut with indexOf and String.prototype.split (native, no per-character work in
// JavaScript); only records that hold a quote go through the general RFC 4180 parser, one run of such
// records at a time, so quoted files keep papaparse's exact rules and plain files do not pay for them.

import { parseCsvBlock } from './csv-papaparse';
import { strayQuotes } from './csv-quotes';

export interface CsvBlockRows {
  rows: string[][];
  /** Positions in `rows` whose quoting is malformed. */
  badQuoteRows: number[];
  /** Cells (position in `rows`, field) holding a quote as a literal character in an unquoted field. */
  strayQuoteCells: { row: number; column: number }[];
}

/**
 * The records of `block` (cut by csv-record-stream at a line break outside quotes, so every record is
 * whole). Records end at LF (a CR before it is dropped, so CRLF and LF may be mixed) or, for files
 * that use CR alone, at CR. A block that ends with a line break yields no empty record for it;
 * a blank line yields [""].
 */
/**
 * Offered each plain line (no quote) in order, with the records collected since the last offer (null
 * when there are none, the usual case: nothing is allocated per line); it must deliver `before`
 * itself. True = the line was read without being cut into cells.
 */
export type PlainLineTaker = (block: string, start: number, end: number, before: CsvBlockRows | null) => boolean;

export function splitCsvBlock(block: string, delimiter: string, newline: '\n' | '\r\n' | '\r', take?: PlainLineTaker): CsvBlockRows {
  const lineBreak = newline === '\r' ? '\r' : '\n';
  let rows: string[][] = [];
  let badQuoteRows: number[] = [];
  let strayQuoteCells: CsvBlockRows['strayQuoteCells'] = [];
  const length = block.length;
  let start = 0;
  // The next quote at or after `start`, found once per quote (not once per line), so the scan stays linear.
  let quote = block.indexOf('"');
  while (start < length) {
    let end = block.indexOf(lineBreak, start);
    if (end === -1) end = length;
    if (quote !== -1 && quote < start) quote = block.indexOf('"', start);
    if (quote !== -1 && quote < end) {
      const runEnd = quotedRunEnd(block, start, lineBreak, delimiter);
      const parsed = parseCsvBlock(block.slice(start, runEnd), delimiter, newline);
      for (const r of parsed.badQuoteRows) badQuoteRows.push(rows.length + r);
      for (const q of strayQuotes(block, start, runEnd, delimiter, lineBreak.charCodeAt(0))) strayQuoteCells.push({ row: rows.length + q.record, column: q.field });
      for (const row of parsed.rows) rows.push(row);
      start = runEnd;
      continue;
    }
    let lineEnd = end;
    if (lineBreak === '\n' && lineEnd > start && block.charCodeAt(lineEnd - 1) === 13) lineEnd--;
    if (take !== undefined) {
      let before: CsvBlockRows | null = null;
      if (rows.length > 0) {
        before = { rows, badQuoteRows, strayQuoteCells };
        rows = [];
        badQuoteRows = [];
        strayQuoteCells = [];
      }
      if (take(block, start, lineEnd, before)) {
        start = end + 1;
        continue;
      }
    }
    rows.push(block.slice(start, lineEnd).split(delimiter));
    start = end + 1;
  }
  return { rows, badQuoteRows, strayQuoteCells };
}

// The offset just after the line break (outside quotes) that ends the run of records from `start`
// whose lines hold quotes: the run stops before the first following line without a quote. Only
// these records are scanned character by character.
function quotedRunEnd(block: string, start: number, lineBreak: string, delimiter: string): number {
  const breakCode = lineBreak.charCodeAt(0);
  let inQuotes = false;
  for (let i = start; i < block.length; i++) {
    const c = block.charCodeAt(i);
    if (c === 34) {
      // The rules of csv-quotes.ts: opens only at a field's start; "" inside is an escaped quote.
      if (inQuotes) {
        if (block.charCodeAt(i + 1) === 34) i++;
        else inQuotes = false;
      } else if (i === 0 || block.charCodeAt(i - 1) === breakCode || block.charCodeAt(i - 1) === 13 || block[i - 1] === delimiter) inQuotes = true;
    } else if (c === breakCode && !inQuotes) {
      let next = i + 1;
      let hasQuote = false;
      for (; next < block.length; next++) {
        const d = block.charCodeAt(next);
        if (d === breakCode) break;
        if (d === 34) {
          hasQuote = true;
          break;
        }
      }
      if (!hasQuote) return i + 1;
    }
  }
  return block.length;
}
