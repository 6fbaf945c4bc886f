// Command dispatch for `lanewright`. Known errors print as one line on stderr with a non-zero exit
// status; only a genuine bug shows a stack trace.

import { LanewrightError } from '../../engine/index';
import { parseArgs, UsageError } from './args';
import { openAtomicFileStream, writeFileAtomic, type AtomicFileStream } from '../workspace/atomic-write';
import { LOAD_NETWORK_USAGE } from './load-network';
import { routesFlags, runRoutes } from './commands/routes';
import { checkFlags, runCheck } from './commands/check';
import { exportFlags, runExport } from './commands/export';
import { auditFlags, runAudit } from './commands/audit';
import { compareFlags, runCompare } from './commands/compare';
import { dispatchFlags, runDispatch } from './commands/dispatch';

/** Where a command sends its results; --out redirects `write` to a file. */
export interface CommandOutput {
  /**
   * Writes text now: to stdout, or with --out to a temporary file renamed over the target once the
   * command has succeeded. Nothing is kept in memory, so output of any size can be written in chunks.
   */
  write(text: string): void;
  /**
   * Queues a whole output file; every file is written atomically once the command has succeeded,
   * and `done` (when given) is printed as "wrote <done>" only after its file is on disk.
   */
  writeFile(path: string, text: string, done?: string): void;
  warn(line: string): void;
  /** Prints figures as one JSON line; times are rounded to 0.01 ms here, once for every command. */
  timing(figures: Record<string, number>): void;
}

const USAGE = `usage:
  lanewright routes --depots FILE --lanes FILE --from DEPOT_ID [--to DEPOT_ID,...] [--no-paths] [--max-legs K] [--json]
                   [--out FILE] [--timings]
  lanewright check --depots FILE --lanes FILE [--json] [--date D] [--vehicle-class C]
  lanewright export --depots FILE --lanes FILE [--from DEPOT_ID] [--lanes-out FILE] [--routes-out FILE]
                    [--loops-out FILE] [--geojson-out FILE]
  lanewright audit --depots FILE --lanes FILE [--date D] [--vehicle-class C] [--loop-cap N] [--negotiable REF,...]
                   [--json] [--out FILE] [--loops-csv FILE] [--progress] [--timings]
  lanewright compare --depots FILE --lanes FILE --scenario FILE --from DEPOT_ID [--date D] [--loop-cap N] [--json] [--out FILE]
  lanewright dispatch --depots FILE --lanes FILE --loads FILE [--vehicles FILE] [--alternatives K] [--json] [--out FILE] [--timings]
  Planning options (routes, check, export, audit, compare, dispatch):
    ${LOAD_NETWORK_USAGE}

Results are cost estimates. Vehicle restrictions (height, weight, hazardous goods), driver hours and
local regulations apply; defer to local codes and licensed practice.`;

const COMMANDS: Record<string, { flags: string[]; run: (args: ReturnType<typeof parseArgs>, out: CommandOutput) => number }> = {
  routes: { flags: routesFlags, run: runRoutes },
  check: { flags: checkFlags, run: runCheck },
  export: { flags: exportFlags, run: runExport },
  audit: { flags: auditFlags, run: runAudit },
  compare: { flags: compareFlags, run: runCompare },
  dispatch: { flags: dispatchFlags, run: runDispatch },
};

/** Runs the command line; returns the exit status. */
export async function main(argv: readonly string[]): Promise<number> {
  try {
    const word = argv.find((a) => !a.startsWith('--'));
    if (argv.length === 0 || argv.includes('--help') || word === 'help') {
      process.stdout.write(USAGE + '\n');
      return argv.length === 0 ? 2 : 0;
    }
    const command = word === undefined ? undefined : COMMANDS[word];
    if (!command) throw new UsageError(`unknown command "${word ?? ''}" (try: ${Object.keys(COMMANDS).join(', ')})`);
    const args = parseArgs(argv, new Set(command.flags));
    const outPath = args.values.get('out');
    // --out streams into a temporary file (see atomic-write.ts), opened at the first write.
    const opened: { file: AtomicFileStream | null } = { file: null };
    const files: [path: string, text: string, done?: string][] = [];
    const output: CommandOutput = {
      write: (text) => {
        if (!outPath) {
          process.stdout.write(text);
          return;
        }
        opened.file ??= openAtomicFileStream(outPath);
        opened.file.write(text);
      },
      writeFile: (path, text, done) => files.push([path, text, done]),
      warn: (line) => process.stderr.write(line + '\n'),
      timing: (figures) => process.stderr.write(JSON.stringify(figures, (_key, v) => (typeof v === 'number' ? Math.round(v * 100) / 100 : v)) + '\n'),
    };
    let status: number;
    try {
      status = command.run(args, output);
    } catch (error) {
      opened.file?.abort();
      throw error;
    }
    // The same guarantees as workspace saves (temporary file, fsync, rename, clean-up on failure):
    // a failed or interrupted run never leaves half a report where a spreadsheet will read it.
    if (outPath) await (opened.file ?? openAtomicFileStream(outPath)).commit();
    for (const [path, text, done] of files) {
      await writeFileAtomic(path, text);
      if (done) process.stdout.write(`wrote ${done}\n`);
    }
    return status;
  } catch (error) {
    if (error instanceof LanewrightError) {
      process.stderr.write(`lanewright: ${error.message}\n`);
      return error instanceof UsageError ? 2 : 1;
    }
    throw error;
  }
}
