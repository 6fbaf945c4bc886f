// What the command line prints to a terminal. Messages on stderr may quote text from the files
// (values, column names, depot ids); a control character or escape sequence in it is printed as a
// visible escape, so a file cannot clear the screen, retitle the terminal or hide a line.
// Standard output is data: it is escaped only when it goes to a terminal, never into a pipe or file.

import { escapeControls } from '../../engine/index';

/** Prints one message line (or lines) on stderr with control characters escaped. */
export function printError(line: string): void {
  process.stderr.write(escapeControls(line, '\n') + '\n');
}

/** Text for standard output: as is into a pipe or file; to a terminal, controls escaped (tabs and line ends kept). */
export function forStdout(text: string, isTerminal: boolean = process.stdout.isTTY === true): string {
  return isTerminal ? escapeControls(text.replace(/\r\n/g, '\n'), '\n\t') : text;
}
