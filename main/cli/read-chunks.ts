// Reads a UTF-8 file in chunks for the streaming importer, so a million-lane file never sits in
// memory as one string. Synchronous on purpose: commands run synchronously and read one file at a time.

import { closeSync, fstatSync, openSync, readSync } from 'node:fs';
import { InputFileError } from '../../engine/index';

const CHUNK_BYTES = 1 << 20;

/** Yields decoded text chunks of `path` with the share of the file read so far. */
export function* readTextChunks(path: string): Generator<{ text: string; fraction: number }> {
  let fd: number;
  try {
    fd = openSync(path, 'r');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    throw new InputFileError(path, null, null, null, code === 'ENOENT' ? 'file not found' : `cannot read (${code ?? 'unknown error'})`);
  }
  try {
    const stat = fstatSync(fd);
    if (stat.isDirectory()) throw new InputFileError(path, null, null, null, 'is a folder, not a file');
    const size = stat.size;
    const buffer = Buffer.allocUnsafe(CHUNK_BYTES);
    // A streaming decoder keeps a character split across two chunks whole.
    const decoder = new TextDecoder('utf-8', { fatal: false, ignoreBOM: true });
    let read = 0;
    for (;;) {
      let n: number;
      try {
        n = readSync(fd, buffer, 0, CHUNK_BYTES, null);
      } catch (error) {
        const code = (error as NodeJS.ErrnoException).code;
        throw new InputFileError(path, null, null, null, code === 'EISDIR' ? 'is a folder, not a file' : `cannot read (${code ?? 'unknown error'})`);
      }
      if (n === 0) break;
      read += n;
      const text = decoder.decode(buffer.subarray(0, n), { stream: true });
      if (text.length > 0) yield { text, fraction: size > 0 ? read / size : 1 };
    }
    const tail = decoder.decode();
    if (tail.length > 0) yield { text: tail, fraction: 1 };
  } finally {
    closeSync(fd);
  }
}
