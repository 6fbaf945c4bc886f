// `lanewright check`: reads the depots and lanes files and prints the validation report, as lines or
// JSON. Exit status 0 when there are no errors, 1 when there are; warnings alone do not fail.

import { formatReport } from '../../../engine/index';
import type { ParsedArgs } from '../args';
import { planDateOf, readImport } from '../load-network';
import { JSON_OPTION, NETWORK_FILES, OUT_OPTION, PLANNING_OPTIONS, type CommandSpec } from '../options';
import type { CommandOutput } from '../run';
import { counted } from '../../../engine/index';

export const checkCommand: CommandSpec = {
  name: 'check',
  summary: 'check the depots and lanes files and print every problem by file, row and column',
  details:
    'Reads both files and prints each error and warning (file, row, column, value, reason) and the row counts\n' +
    '(accepted + rejected = total), as lines or one JSON object with --json. Exit status 0 without errors,\n' +
    '1 with errors (warnings alone do not fail), 2 for a mistake on the command line.',
  example: 'lanewright check --depots sample-data/depots.csv --lanes sample-data/lanes.csv',
  options: [...NETWORK_FILES, JSON_OPTION, OUT_OPTION, ...PLANNING_OPTIONS],
  run: runCheck,
};

function runCheck(args: ParsedArgs, out: CommandOutput): number {
  // Building the network is not needed to report on the files.
  const result = readImport(args, { skipInvalid: false });
  const { report } = result;
  const { date, note } = planDateOf(args);
  if (note !== null) out.warn(note);
  if (args.flags.has('json')) {
    out.write(
      JSON.stringify({
        date,
        total: report.total,
        accepted: report.accepted,
        rejected: report.rejected,
        errors: report.errors.map(({ file, row, column, value, message, code }) => ({ file, row, column, value, message, code })),
        warnings: report.warnings.map(({ file, row, column, value, message, code }) => ({ file, row, column, value, message, code })),
        files: report.files,
        omitted: report.omitted,
        currency: result.currency,
        vehicle_classes: result.vehicleClasses,
        notes: result.notes,
      }) + '\n',
    );
  } else {
    const lines = formatReport(report);
    lines.push(`total ${counted(report.total, 'row')}: ${report.accepted} accepted, ${report.rejected} rejected; ${counted(report.errors.length, 'error')}, ${counted(report.warnings.length, 'warning')}`);
    for (const note of result.notes) lines.push(`note: ${note}`);
    out.write(lines.join('\n') + '\n');
  }
  return report.errors.length > 0 ? 1 : 0;
}
