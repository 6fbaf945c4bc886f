// Reads a UTF-8 file in chunks for the streaming importer, so a million-lane file never sits in
// memory as one string. Synchronous on purpose: commands run synchronously and read one file at a time.

import { closeSync, fstatSync, openSync, readSync } from 'node:fs';
import { InputFileError } from '../../engine/index';

const CHUNK_BYTES = 1 << 20;

/**
 * Where `bytes[0, end)` can be cut so no UTF-8 character is split: before the lead byte of a last
 * character whose continuation bytes are not all there yet (at most 3 bytes are left over).
 */
export function utf8Cut(bytes: Uint8Array, end: number): number {
  let lead = end;
  while (end - lead < 3 && lead > 0 && (bytes[lead - 1] & 0xc0) === 0x80) lead--;
  if (lead === 0 || bytes[lead - 1] < 0xc0) return end; // ASCII or stray continuation bytes: nothing to wait for
  const b = bytes[lead - 1];
  const length = b >= 0xf0 ? 4 : b >= 0xe0 ? 3 : 2;
  return end - (lead - 1) >= length ? end : lead - 1;
}

/**
 * Yields decoded text chunks of `path` with the share of the file read so far. Decoded with
 * Buffer#toString, whose strings live on the V8 heap and die young; TextDecoder's came back as
 * external strings that stayed until a full collection (about 40 MB more peak memory on a
 * million-lane check). Bytes of a character cut by the chunk are carried to the next one; invalid
 * bytes become U+FFFD as the importer expects, and a byte-order mark is kept for it to strip.
 */
export function* readTextChunks(path: string, chunkBytes = CHUNK_BYTES): Generator<{ text: string; fraction: number }> {
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
    // Room for a full chunk after the (at most 3) carried bytes of a cut character.
    const buffer = Buffer.allocUnsafe(chunkBytes + 3);
    let carried = 0;
    let read = 0;
    for (;;) {
      let n: number;
      try {
        n = readSync(fd, buffer, carried, chunkBytes, null);
      } catch (error) {
        const code = (error as NodeJS.ErrnoException).code;
        throw new InputFileError(path, null, null, null, code === 'EISDIR' ? 'is a folder, not a file' : `cannot read (${code ?? 'unknown error'})`);
      }
      if (n === 0) break;
      read += n;
      const end = carried + n;
      const cut = utf8Cut(buffer, end);
      if (cut > 0) yield { text: buffer.toString('utf8', 0, cut), fraction: size > 0 ? read / size : 1 };
      buffer.copy(buffer, 0, cut, end);
      carried = end - cut;
    }
    if (carried > 0) yield { text: buffer.toString('utf8', 0, carried), fraction: 1 };
  } finally {
    closeSync(fd);
  }
}
