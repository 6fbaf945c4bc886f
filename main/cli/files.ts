// Reading input files for the command line. Missing or unreadable files become one-line
// InputFileErrors; output files go through CommandOutput.writeFile (atomic, see run.ts).

import { readFileSync, statSync } from 'node:fs';
import { documentSizeProblem, InputFileError } from '../../engine/index';

/** Reads a UTF-8 text file or throws InputFileError naming it. */
export function readTextFile(path: string): string {
  try {
    return readFileSync(path, 'utf8');
  } catch (error) {
    throw readError(path, error);
  }
}

/** Reads a scenario or workspace document, refusing one over MAX_DOCUMENT_BYTES before reading it. */
export function readDocumentFile(path: string, label: 'scenario' | 'workspace'): string {
  let size: number;
  try {
    size = statSync(path).size;
  } catch (error) {
    throw readError(path, error);
  }
  const problem = documentSizeProblem(size, label);
  if (problem !== null) throw new InputFileError(path, null, null, null, problem);
  return readTextFile(path);
}

function readError(path: string, error: unknown): InputFileError {
  const code = (error as NodeJS.ErrnoException).code;
  const reason = code === 'ENOENT' ? 'file not found' : code === 'EISDIR' ? 'is a folder, not a file' : `cannot read (${code ?? 'unknown error'})`;
  return new InputFileError(path, null, null, null, reason);
}
