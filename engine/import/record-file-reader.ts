// What the depots, lanes, vehicles and loads readers share: finding the header, counting every data
// row as accepted or rejected (so accepted + rejected = total holds by construction), rejecting rows
// the CSV stream flagged, the file-level problems (empty file, not text, header without rows), and the
// header and row problems every reader words alike (missing, repeated and unknown columns, surplus fields).

import type { CsvRecordSink, CsvStreamIssue } from '../io/csv-record-stream';
import type { HeaderMatch } from './headers';
import { PLAIN_LATER, PLAIN_NEVER } from '../io/csv-byte-stream';
import type { ReportCollector } from './report-collector';
import { rejectFlaggedRow, takeStreamIssue } from './stream-issues';
import type { FileCounts, IssueCode } from './types';
import { counted } from '../text/plural';

/** True when every cell is empty or white space (a blank line, or a line of delimiters). */
export function isBlankRecord(cells: readonly string[]): boolean {
  for (let k = 0; k < cells.length; k++) if (cells[k] !== '' && cells[k].trim() !== '') return false;
  return true;
}

export abstract class RecordFileReader implements CsvRecordSink {
  /** Set by the importer from the detected delimiter: semicolon files use a decimal comma. */
  decimalComma = false;
  protected headerCells: string[] = [];
  protected headerRead = false;
  /** The header's row as a spreadsheet shows it: 1 unless blank lines come first. */
  protected headerRow = 1;
  /** A header problem that makes every row unreadable (e.g. a required column is missing). */
  protected unusable = false;
  protected readonly counts: FileCounts;
  private notText = false;

  constructor(protected readonly file: string, protected readonly report: ReportCollector, kind: FileCounts['kind']) {
    this.counts = report.file(file, kind);
  }

  get rows(): number {
    return this.counts.total;
  }

  records(records: string[][], firstRow: number, badQuotes: readonly number[] = [], badText: readonly number[] = [], strayQuotes: readonly { row: number; column: number }[] = []): void {
    const bad = badQuotes.length > 0 ? new Set(badQuotes) : null;
    let stray = 0;
    const notUtf8 = badText.length > 0 ? new Set(badText) : null;
    let start = 0;
    if (!this.headerRead) {
      while (start < records.length && isBlankRecord(records[start])) start++;
      if (start === records.length) return;
      this.headerCells = records[start].map((c) => c.trim());
      this.headerRead = true;
      this.headerRow = firstRow + start;
      this.readHeader(records[start]);
      start++;
    }
    this.beforeRows(records, start);
    for (let i = start; i < records.length; i++) {
      const cells = records[i];
      if (isBlankRecord(cells)) continue;
      this.counts.total++;
      const flags = { badQuotes: bad?.has(i) ?? false, notUtf8: notUtf8?.has(i) ?? false };
      if (rejectFlaggedRow(this.report, this.file, this.counts, firstRow + i, cells, this.headerCells, flags)) continue;
      if (cells.length < this.headerCells.length && !this.unusable) this.warnShortRow(cells.length, firstRow + i);
      while (stray < strayQuotes.length && strayQuotes[stray].row < i) stray++;
      for (; stray < strayQuotes.length && strayQuotes[stray].row === i; stray++) this.warnStrayQuote(cells, strayQuotes[stray].column, firstRow + i);
      if (!this.unusable && (this.readPlainCells(cells, firstRow + i) || this.readRow(cells, firstRow + i))) this.counts.accepted++;
      else this.counts.rejected++;
    }
  }

  /** The CSV stream's fast path (CsvRecordSink.plainLine): true when the reader took the plain row. */
  plainLine(text: string, start: number, end: number, row: number, delimiter: string): boolean {
    if (!this.headerRead || this.unusable || !this.readPlainRow(text, start, end, row, delimiter)) return false;
    this.counts.total++;
    this.counts.accepted++;
    return true;
  }

  /** The byte stream's fast path (PlainBytesTaker): the offset of the line's LF when the reader took the plain row. */
  plainBytes(bytes: Uint8Array, start: number, limit: number, row: number, delimiter: number): number {
    if (!this.headerRead) return PLAIN_LATER;
    if (this.unusable) return PLAIN_NEVER;
    const lf = this.readPlainBytes(bytes, start, limit, row, delimiter);
    if (lf >= 0) {
      this.counts.total++;
      this.counts.accepted++;
    }
    return lf;
  }

  issue(issue: CsvStreamIssue): void {
    if (issue.code === 'not-text') this.notText = true;
    takeStreamIssue(this.report, this.file, this.counts, issue, this.headerRead, this.headerCells);
  }

  /**
   * A row with fewer fields than the header: its missing cells read as empty, which can mean an
   * estimated fuel or a zero fee the file never said, so it is named (a warning; the row is read).
   */
  private warnShortRow(fields: number, row: number): void {
    const missing = this.headerCells.slice(fields);
    const named = missing.slice(0, 5).map((h) => `"${h}"`).join(', ') + (missing.length > 5 ? `, … (${missing.length} in all)` : '');
    this.report.warning(this.file, row, missing[0] || `(column ${fields + 1})`, null, 'too-few-fields', `the row has ${counted(fields, 'field')} but the header has ${this.headerCells.length}; ${named} read as empty`);
  }

  /** A quote inside an unquoted field (an inch mark, say) is read as itself, and named. */
  private warnStrayQuote(cells: readonly string[], column: number, row: number): void {
    this.report.warning(
      this.file,
      row,
      this.headerCells[column] ?? `(column ${column + 1})`,
      cells[column] ?? null,
      'stray-quote',
      'a quote inside a field that does not start with one is read as a literal character (RFC 4180 quotes whole fields); quote the field to be sure',
    );
  }

  /**
   * A required column the header lacks is an error and makes the file unusable (no row can be read);
   * `required` pairs each field with the header name the message gives, `item` names a row ("depot").
   */
  protected requireColumns<F extends string>(match: HeaderMatch<F>, required: readonly (readonly [F, string])[], item: string): void {
    for (const [field, header] of required) {
      if (!match.columns.has(field)) {
        this.report.error(this.file, this.headerRow, header, null, 'missing-column', `required column "${header}" is missing; no ${item} can be read`);
        this.unusable = true;
      }
    }
  }

  /** A repeated column is an error (the first is read); an unknown one a warning, `unknownNote` saying what becomes of it. */
  protected reportColumnProblems(match: HeaderMatch<string>, unknownNote: string): void {
    for (const d of match.duplicates) this.report.error(this.file, this.headerRow, d.header, null, 'duplicate-column', `column repeats "${d.first}"; only the first is read`);
    for (const u of match.unknown) this.report.warning(this.file, this.headerRow, u.header, null, 'unknown-column', unknownNote);
  }

  /** A row with more fields than the header: the surplus is given to `fail` as one too-many-fields error. */
  protected refuseSurplusFields(cells: readonly string[], fail: (column: string, value: string, code: IssueCode, message: string) => void): void {
    const width = this.headerCells.length;
    if (cells.length > width) fail(`(column ${width + 1})`, cells.slice(width).join(','), 'too-many-fields', `the row has ${cells.length} fields but the header has ${width}`);
  }

  finish(): void {
    if (!this.headerRead && !this.notText) this.report.error(this.file, null, null, null, 'empty-file', 'the file is empty');
    else if (this.headerRead && this.counts.total === 0) this.noDataRows();
  }

  /** Matches the header row and reports its problems; `headerCells` is already set. */
  protected abstract readHeader(cells: string[]): void;
  /** Reads one data row (`row` as a spreadsheet numbers it); false when it is rejected. */
  protected abstract readRow(cells: string[], row: number): boolean;
  /** Reports a file that has a header but no data rows. */
  protected abstract noDataRows(): void;
  /** Reads a plain row straight from the text, or returns false to get it as cells in readRow. */
  protected readPlainRow(_text: string, _start: number, _end: number, _row: number, _delimiter: string): boolean {
    return false;
  }
  /** Reads a row already cut into cells by the fast path's rules, or returns false to get it in readRow. */
  protected readPlainCells(_cells: readonly string[], _row: number): boolean {
    return false;
  }
  /** Reads a plain row straight from UTF-8 bytes: the offset of its LF, or PLAIN_LATER / PLAIN_NEVER. */
  protected readPlainBytes(_bytes: Uint8Array, _start: number, _limit: number, _row: number, _delimiter: number): number {
    return PLAIN_NEVER;
  }
  /** Called with each block before its data rows are read. */
  protected beforeRows(_records: string[][], _start: number): void {}
}
