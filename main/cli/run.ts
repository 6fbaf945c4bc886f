// Command dispatch for `lanewright`. Known errors print as one line on stderr with a non-zero exit
// status; only a genuine bug shows a stack trace. Everything but the usage text is imported when a
// command needs it, so `--help` starts without loading the engine.

import type { ParsedArgs } from './args';
import type { AtomicFileStream } from '../workspace/atomic-write';
import { USAGE } from './usage';

/** Where a command sends its results; --out redirects `write` to a file. */
export interface CommandOutput {
  /**
   * Writes text now: to stdout, or with --out to a temporary file renamed over the target once the
   * command has succeeded. Nothing is kept in memory, so output of any size can be written in chunks.
   */
  write(text: string): void;
  /**
   * Queues a whole output file; every file is written atomically once the command has succeeded,
   * and `done` (when given) is printed as "wrote <done>" only after its file is on disk. Text given
   * as chunks goes to a temporary file at once (never held whole) and is renamed in the same order.
   */
  writeFile(path: string, text: string | Iterable<string>, done?: string): void;
  warn(line: string): void;
  /** Prints figures as one JSON line; times are rounded to 0.01 ms here, once for every command. */
  timing(figures: Record<string, number>): void;
}

interface Command {
  flags: string[];
  run: (args: ParsedArgs, out: CommandOutput) => number;
}

// Each command's module, imported only when that command runs.
const COMMANDS: Record<string, () => Promise<Command>> = {
  routes: async () => import('./commands/routes').then((m) => ({ flags: m.routesFlags, run: m.runRoutes })),
  check: async () => import('./commands/check').then((m) => ({ flags: m.checkFlags, run: m.runCheck })),
  export: async () => import('./commands/export').then((m) => ({ flags: m.exportFlags, run: m.runExport })),
  audit: async () => import('./commands/audit').then((m) => ({ flags: m.auditFlags, run: m.runAudit })),
  compare: async () => import('./commands/compare').then((m) => ({ flags: m.compareFlags, run: m.runCompare })),
  dispatch: async () => import('./commands/dispatch').then((m) => ({ flags: m.dispatchFlags, run: m.runDispatch })),
};

/** Runs the command line; returns the exit status. */
export async function main(argv: readonly string[]): Promise<number> {
  try {
    const word = argv.find((a) => !a.startsWith('--'));
    if (argv.length === 0 || argv.includes('--help') || word === 'help') {
      process.stdout.write(USAGE + '\n');
      return argv.length === 0 ? 2 : 0;
    }
    const { parseArgs, UsageError } = await import('./args');
    const load = word === undefined ? undefined : Object.hasOwn(COMMANDS, word) ? COMMANDS[word] : undefined;
    if (!load) throw new UsageError(`unknown command "${word ?? ''}" (try: ${Object.keys(COMMANDS).join(', ')})`);
    const command = await load();
    const { openAtomicFileStream, writeFileAtomic } = await import('../workspace/atomic-write');
    const args = parseArgs(argv, new Set(command.flags));
    const outPath = args.values.get('out');
    // --out streams into a temporary file (see atomic-write.ts), opened at the first write.
    const opened: { file: AtomicFileStream | null } = { file: null };
    const files: [path: string, text: string | AtomicFileStream, done?: string][] = [];
    const output: CommandOutput = {
      write: (text) => {
        if (!outPath) {
          process.stdout.write(text);
          return;
        }
        opened.file ??= openAtomicFileStream(outPath);
        opened.file.write(text);
      },
      writeFile: (path, text, done) => {
        if (typeof text === 'string') {
          files.push([path, text, done]);
          return;
        }
        const stream = openAtomicFileStream(path);
        files.push([path, stream, done]);
        for (const chunk of text) stream.write(chunk);
      },
      warn: (line) => process.stderr.write(line + '\n'),
      timing: (figures) => process.stderr.write(JSON.stringify(figures, (_key, v) => (typeof v === 'number' ? Math.round(v * 100) / 100 : v)) + '\n'),
    };
    let status: number;
    try {
      status = command.run(args, output);
    } catch (error) {
      opened.file?.abort();
      for (const [, file] of files) if (typeof file !== 'string') file.abort();
      throw error;
    }
    // The same guarantees as workspace saves (temporary file, fsync, rename, clean-up on failure):
    // a failed or interrupted run never leaves half a report where a spreadsheet will read it.
    if (outPath) await (opened.file ?? openAtomicFileStream(outPath)).commit();
    for (let i = 0; i < files.length; i++) {
      const [path, file, done] = files[i];
      try {
        await (typeof file === 'string' ? writeFileAtomic(path, file) : file.commit());
      } catch (error) {
        // Files not yet renamed into place are dropped with their temporary files.
        for (const [, later] of files.slice(i)) if (typeof later !== 'string') later.abort();
        throw error;
      }
      if (done) process.stdout.write(`wrote ${done}\n`);
    }
    return status;
  } catch (error) {
    const [{ LanewrightError }, { UsageError }] = await Promise.all([import('../../engine/index'), import('./args')]);
    if (error instanceof LanewrightError) {
      process.stderr.write(`lanewright: ${error.message}\n`);
      return error instanceof UsageError ? 2 : 1;
    }
    throw error;
  }
}
