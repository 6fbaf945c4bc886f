// Collects the problems of one import and counts rows per file, so the report can always state
// total, accepted and rejected exactly, even when the stored items are capped for huge files.

import { fileLocationText } from '../errors';
import type { FileCounts, IssueCode, ValidationItem, ValidationReport } from './types';
import { counted } from '../text/plural';

export class ReportCollector {
  readonly errors: ValidationItem[] = [];
  readonly warnings: ValidationItem[] = [];
  readonly files: FileCounts[] = [];
  omitted = 0;
  errorCount = 0;

  constructor(private readonly maxItems: number) {}

  file(file: string, kind: FileCounts['kind']): FileCounts {
    const counts: FileCounts = { file, kind, total: 0, accepted: 0, rejected: 0 };
    this.files.push(counts);
    return counts;
  }

  error(file: string, row: number | null, column: string | null, value: string | null, code: IssueCode, message: string): void {
    this.errorCount++;
    this.push(this.errors, { file, row, column, value, message, code });
  }

  warning(file: string, row: number | null, column: string | null, value: string | null, code: IssueCode, message: string): void {
    this.push(this.warnings, { file, row, column, value, message, code });
  }

  private push(list: ValidationItem[], item: ValidationItem): void {
    if (list.length >= this.maxItems) this.omitted++;
    else list.push(item);
  }

  report(): ValidationReport {
    const sum = (key: 'total' | 'accepted' | 'rejected') => this.files.reduce((s, f) => s + f[key], 0);
    return {
      total: sum('total'),
      accepted: sum('accepted'),
      rejected: sum('rejected'),
      errors: this.errors.slice(),
      warnings: this.warnings.slice(),
      files: this.files.map((f) => ({ ...f })),
      omitted: this.omitted,
    };
  }
}

/** One line per item, as the command line prints it. */
export function formatItem(item: ValidationItem, severity: 'error' | 'warning'): string {
  return `${severity}: ${fileLocationText(item.file, item.row, item.column, item.value)}: ${item.message}`;
}

/** Every line of a report: errors first, then warnings, then the counts. */
export function formatReport(report: ValidationReport): string[] {
  const lines = [...report.errors.map((e) => formatItem(e, 'error')), ...report.warnings.map((w) => formatItem(w, 'warning'))];
  if (report.omitted > 0) lines.push(`... ${counted(report.omitted, 'more problem')} not listed`);
  for (const f of report.files) lines.push(`${f.file}: ${counted(f.total, 'row')}, ${f.accepted} accepted, ${f.rejected} rejected`);
  return lines;
}
