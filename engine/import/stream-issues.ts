// Turns problems the CSV stream finds with the file as a whole (not text, unclosed quotes) into
// report items, shared by the depots and lanes readers.

import type { CsvStreamIssue } from '../io/csv-record-stream';
import type { ReportCollector } from './report-collector';

export function streamIssueToReport(report: ReportCollector, file: string, issue: CsvStreamIssue, header: readonly string[]): void {
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
    `a quoted field opens here and never closes; ${issue.linesLost} line(s) from here to the end of the file could not be read`,
  );
}
