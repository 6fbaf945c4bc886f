// `lanewright check`: reads the depots and lanes files and prints the validation report, as lines or
// JSON. Exit status 0 when there are no errors, 1 when there are; warnings alone do not fail.
// The command's work; its option table is in check.ts (engine-free), so this module loads only when it runs.

import { formatReport } from '../../../engine/index';
import type { ParsedArgs } from '../args';
import { planDateOf, readImport } from '../load-network';
import type { CommandOutput } from '../run';
import { counted } from '../../../engine/index';

export function runCheck(args: ParsedArgs, out: CommandOutput): number {
  // Every problem is found by reading and planning; the network itself is not needed for the report.
  const result = readImport(args, { skipInvalid: false, network: false });
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
