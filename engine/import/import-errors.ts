// Named errors of importing and planning. Front ends catch them by class; the CLI prints `message`
// (one line per problem for InvalidInputError) without a stack trace.

import { LanewrightError } from '../errors';
import { shownText } from '../text/shown-text';
import { formatReport } from './report-collector';
import type { ValidationReport } from './types';
import { counted, plural } from '../text/plural';

/** The caller's signal asked the import to stop. */
export class ImportCancelledError extends LanewrightError {
  constructor(readonly file: string, readonly rowsRead: number) {
    super(`import: cancelled while reading ${file} after ${counted(rowsRead, 'row')}`);
  }
}

/** The input has errors and planning was not asked to skip them. */
export class InvalidInputError extends LanewrightError {
  constructor(readonly report: ValidationReport) {
    super(
      `the input has ${report.errors.length}${report.omitted > 0 ? '+' : ''} ${plural(report.errors.length + report.omitted, 'error')}; nothing was planned (--skip-invalid plans with the ${counted(report.accepted, 'accepted row')}):\n` +
        formatReport(report).join('\n'),
    );
  }
}

/** A plan request that cannot apply to this lanes file (unknown vehicle class, bad date, bad setting). */
export class PlanRequestError extends LanewrightError {
  constructor(readonly option: string, readonly value: string, readonly reason: string) {
    super(`plan: ${option} "${shownText(value)}": ${reason}`);
  }
}
