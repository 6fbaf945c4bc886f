// Command dispatch for `lanewright`. Known errors print as one line on stderr with a non-zero exit
// status; only a genuine bug shows a stack trace. Every command is declared by its option table
// (options.ts); start-up speed comes from the prebuilt bundle (main/build/build-cli.ts).

import { readFileSync } from 'node:fs';
import { LanewrightError } from '../../engine/index';
import { parseCommandLine, UsageError } from './args';
import { openAtomicFileStream, writableTarget, writeFileAtomic, type AtomicFileStream } from '../workspace/atomic-write';
import type { CommandSpec } from './options';
import { commandHelp, overview } from './usage';
import { closestName } from './closest-name';
import { forStdout, printError } from './terminal-text';
import { routesCommand } from './commands/routes';
import { checkCommand } from './commands/check';
import { exportCommand } from './commands/export';
import { auditCommand } from './commands/audit';
import { compareCommand } from './commands/compare';
import { dispatchCommand } from './commands/dispatch';

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
  /**
   * Opens an output file written as it is made (for files too large to hold as one string): chunks
   * go to a temporary file at once; like `writeFile`, it replaces `path` only once the command has
   * succeeded (in the order the files were asked for), and a failure removes it.
   */
  openFile(path: string, done?: string): { write(text: string): void };
  warn(line: string): void;
  /** Printed on stderr after the output is written (the caution that goes with it); never with a failure. */
  afterOutput(line: string): void;
  /** Prints figures as one JSON line; times are rounded to 0.01 ms here, once for every command. */
  timing(figures: Record<string, number>): void;
}

/** Every command, in the order the overview lists them. */
export const COMMANDS: readonly CommandSpec[] = [routesCommand, checkCommand, exportCommand, auditCommand, compareCommand, dispatchCommand];

/** Option name -> the commands that take it, to say where a misplaced option belongs. */
function optionOwners(): Map<string, string[]> {
  const owners = new Map<string, string[]>();
  for (const c of COMMANDS) for (const o of c.options) owners.set(o.name, [...(owners.get(o.name) ?? []), c.name]);
  return owners;
}

function version(): string {
  const text = readFileSync(new URL('../../package.json', import.meta.url), 'utf8');
  return (JSON.parse(text) as { version: string }).version;
}

function findCommand(word: string): CommandSpec {
  const command = COMMANDS.find((c) => c.name === word);
  if (command) return command;
  const near = closestName(word, COMMANDS.map((c) => c.name));
  throw new UsageError(`unknown command "${word}"${near ? `; did you mean ${near}?` : ''} (commands: ${COMMANDS.map((c) => c.name).join(', ')})`);
}

/** Runs the command line; returns the exit status. */
export async function main(argv: readonly string[]): Promise<number> {
  try {
    const [word, ...rest] = argv;
    if (word === undefined || word === '--help' || word === '-h' || word === 'help') {
      // `lanewright help routes` is `lanewright routes --help`.
      if (word === 'help' && rest.length > 0) {
        process.stdout.write(commandHelp(findCommand(rest[0])));
        return 0;
      }
      process.stdout.write(overview(COMMANDS));
      return word === undefined ? 2 : 0;
    }
    if (word === '--version') {
      process.stdout.write(`lanewright ${version()}\n`);
      return 0;
    }
    if (word.startsWith('-')) throw new UsageError(`the command comes first: lanewright COMMAND [options], got "${word}" (commands: ${COMMANDS.map((c) => c.name).join(', ')})`);
    const command = findCommand(word);
    const args = parseCommandLine(command.name, rest, command.options, optionOwners());
    if (args.flags.has('help')) {
      process.stdout.write(commandHelp(command));
      return 0;
    }
    const outPath = args.values.get('out');
    // Refused before any work, like a shell redirection into a read-only file.
    if (outPath) await writableTarget(outPath);
    // --out streams into a temporary file (see atomic-write.ts), opened at the first write.
    const opened: { file: AtomicFileStream | null } = { file: null };
    // Whole files and streamed files, in the order the command asked for them.
    const files: { path: string; text: string | AtomicFileStream; done?: string }[] = [];
    const abortStreams = () => {
      for (const f of files) if (typeof f.text !== 'string') f.text.abort();
    };
    const after: string[] = [];
    const output: CommandOutput = {
      write: (text) => {
        if (!outPath) {
          process.stdout.write(forStdout(text));
          return;
        }
        opened.file ??= openAtomicFileStream(outPath);
        opened.file.write(text);
      },
      writeFile: (path, text, done) => files.push({ path, text, done }),
      openFile: (path, done) => {
        const stream = openAtomicFileStream(path);
        files.push({ path, text: stream, done });
        return { write: (text) => stream.write(text) };
      },
      warn: printError,
      afterOutput: (line) => after.push(line),
      timing: (figures) => process.stderr.write(JSON.stringify(figures, (_key, v) => (typeof v === 'number' ? Math.round(v * 100) / 100 : v)) + '\n'),
    };
    let status: number;
    try {
      status = (await command.load())(args, output);
    } catch (error) {
      opened.file?.abort();
      abortStreams();
      throw error;
    }
    // The same guarantees as workspace saves (temporary file, fsync, rename, clean-up on failure):
    // a failed or interrupted run never leaves half a report where a spreadsheet will read it.
    try {
      if (outPath) await (opened.file ?? openAtomicFileStream(outPath)).commit();
      for (const { path, text, done } of files) {
        if (typeof text === 'string') await writeFileAtomic(path, text);
        else await text.commit();
        if (done) process.stdout.write(forStdout(`wrote ${done}\n`));
      }
    } catch (error) {
      abortStreams();
      throw error;
    }
    for (const line of after) printError(line);
    return status;
  } catch (error) {
    if (error instanceof LanewrightError) {
      printError(`lanewright: ${error.message}`);
      return error instanceof UsageError ? 2 : 1;
    }
    throw error;
  }
}
