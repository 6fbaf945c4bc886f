// File access for the command line. Missing or unreadable files become one-line InputFileErrors.

import { readFileSync, renameSync, writeFileSync } from 'node:fs';
import { InputFileError } from '../../engine/errors';

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

/** Writes a file atomically: a temporary file beside it, then a rename, so a crash never leaves half a file. */
export function writeTextFileAtomic(path: string, text: string): void {
  const temporary = `${path}.${process.pid}.tmp`;
  try {
    writeFileSync(temporary, text, 'utf8');
    renameSync(temporary, path);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    throw new InputFileError(path, null, null, null, `cannot write (${code ?? 'unknown error'})`);
  }
}
