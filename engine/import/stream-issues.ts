// Turns problems the CSV stream finds with the file as a whole (not text, unclosed quotes) into
// report items, shared by the depots and lanes readers.

import type { CsvStreamIssue } from '../io/csv-record-stream';
import type { ReportCollector } from './report-collector';
import type { FileCounts } from './types';
import { counted } from '../text/plural';

function streamIssueToReport(report: ReportCollector, file: string, issue: CsvStreamIssue, header: readonly string[]): void {
  if (issue.code === 'not-text') {
    report.error(file, null, null, null, 'not-text', 'not a text file (it holds NUL bytes: binary, or UTF-16); save it as UTF-8 CSV');
    return;
  }
  const column = issue.columnIndex === null ? null : (header[issue.columnIndex] ?? `(column ${issue.columnIndex + 1})`);
  report.error(
    file,
    issue.row,
    column,
    issue.value,
    'unbalanced-quotes',
    `a quoted field opens here and never closes; ${counted(issue.linesLost, 'line')} from here to the end of the file could not be read`,
  );
}

/**
 * Counts the lines a file-level problem swallowed as rejected rows and reports it. The header line
 * is not a row, so it is taken off when the header was never read; a file that is not text has no
 * lines to count (linesLost 0), so the count never goes below zero.
 */
export function takeStreamIssue(report: ReportCollector, file: string, counts: FileCounts, issue: CsvStreamIssue, headerRead: boolean, header: readonly string[]): void {
  const lost = Math.max(0, headerRead ? issue.linesLost : issue.linesLost - 1);
  counts.total += lost;
  counts.rejected += lost;
  streamIssueToReport(report, file, issue, header);
}

/**
 * Rejects a row the CSV stream flagged as unreadable (malformed quotes, or bytes that are not
 * UTF-8) with a report item; returns true when it did, so the caller skips the row.
 */
export function rejectFlaggedRow(
  report: ReportCollector,
  file: string,
  counts: FileCounts,
  row: number,
  cells: readonly string[],
  header: readonly string[],
  flags: { badQuotes: boolean; notUtf8: boolean },
): boolean {
  if (flags.badQuotes) {
    counts.rejected++;
    report.error(file, row, null, null, 'unbalanced-quotes', 'malformed quotes: text after the closing quote of a quoted field; the row cannot be read safely');
    return true;
  }
  if (flags.notUtf8) {
    counts.rejected++;
    const nul = cells.findIndex((c) => c.includes('\u0000'));
    if (nul !== -1) {
      report.error(file, row, header[nul] ?? `(column ${nul + 1})`, cells[nul], 'not-text', 'holds a NUL byte: binary data, not text (a damaged file, or not a CSV file); the row is refused');
      return true;
    }
    const k = cells.findIndex((c) => c.includes('\uFFFD'));
    report.error(file, row, header[k] ?? `(column ${k + 1})`, cells[k], 'not-text', 'holds bytes that are not UTF-8 text (the file may be saved as Latin-1 or Windows-1252); save it as UTF-8');
    return true;
  }
  return false;
}
