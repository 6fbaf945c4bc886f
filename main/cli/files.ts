// Reading input files for the command line. Missing or unreadable files become one-line
// InputFileErrors; output files go through CommandOutput.writeFile (atomic, see run.ts).

import { readFileSync } from 'node:fs';
import { InputFileError } from '../../engine/index';

/** Reads a UTF-8 text file or throws InputFileError naming it. */
export function readTextFile(path: string): string {
  try {
    return readFileSync(path, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const reason = code === 'ENOENT' ? 'file not found' : code === 'EISDIR' ? 'is a folder, not a file' : `cannot read (${code ?? 'unknown error'})`;
    throw new InputFileError(path, null, null, null, reason);
  }
}
