// What the one-day review (audit-run.ts) and the calendar review (audit-calendar.ts) read and print
// alike: the --negotiable list and the --progress lines on stderr.

import type { ParsedArgs } from '../args';
import type { CommandOutput } from '../run';

/** The --negotiable names (contract references, clauses or lane keys), comma-separated, blanks dropped. */
export function negotiableOption(args: ParsedArgs): string[] {
  return (args.values.get('negotiable') ?? '').split(',').map((s) => s.trim()).filter((s) => s !== '');
}

/** With --progress, prints "audit: PHASE N%" to stderr each time the line changes; without it, undefined. */
export function auditProgress(args: ParsedArgs, out: CommandOutput): ((p: { phase: string; done: number; total: number }) => void) | undefined {
  if (!args.flags.has('progress')) return undefined;
  let lastLine = '';
  return ({ phase, done, total }) => {
    const line = `audit: ${phase} ${total === 0 ? 100 : Math.floor((100 * done) / total)}%`;
    if (line !== lastLine) out.warn((lastLine = line));
  };
}
