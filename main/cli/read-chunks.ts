// Reads a file in chunks for the streaming importer, so a million-lane file never sits in memory at
// once. Synchronous on purpose: commands run synchronously and read one file at a time. The
// importer takes the bytes themselves (UTF-8, decoded only where a line is read as text);
// readTextChunks decodes for the readers that take text (loads, vehicles).

import { closeSync, fstatSync, openSync, readSync } from 'node:fs';
import { InputFileError, Utf8ChunkDecoder } from '../../engine/index';

const CHUNK_BYTES = 1 << 20;

/**
 * Node's UTF-8 decoder for the engine (WHATWG replacement, like the engine's own, faster). Its
 * strings live on the V8 heap and die young; TextDecoder's came back as external strings that stayed
 * until a full collection (about 40 MB more peak memory on a million-lane check).
 */
export function nodeUtf8Text(bytes: Uint8Array, start: number, end: number): string {
  const buffer = Buffer.isBuffer(bytes) ? bytes : Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  return buffer.toString('utf8', start, end);
}

/**
 * Yields the bytes of `path` in chunks with the share of the file read so far. Each chunk is a view
 * of one buffer that the next chunk overwrites: the importer keeps nothing of a chunk after the call.
 */
export function* readByteChunks(path: string, chunkBytes = CHUNK_BYTES): Generator<{ bytes: Uint8Array; fraction: number }> {
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
    const buffer = Buffer.allocUnsafe(chunkBytes);
    let read = 0;
    for (;;) {
      let n: number;
      try {
        n = readSync(fd, buffer, 0, chunkBytes, null);
      } catch (error) {
        const code = (error as NodeJS.ErrnoException).code;
        throw new InputFileError(path, null, null, null, code === 'EISDIR' ? 'is a folder, not a file' : `cannot read (${code ?? 'unknown error'})`);
      }
      if (n === 0) break;
      read += n;
      yield { bytes: buffer.subarray(0, n), fraction: size > 0 ? read / size : 1 };
    }
  } finally {
    closeSync(fd);
  }
}

/**
 * Yields decoded text chunks of `path` with the share of the file read so far. Bytes of a character
 * cut by the chunk are carried to the next one; invalid bytes become U+FFFD as the importer expects,
 * and a byte-order mark is kept for it to strip.
 */
export function* readTextChunks(path: string, chunkBytes = CHUNK_BYTES): Generator<{ text: string; fraction: number }> {
  const decoder = new Utf8ChunkDecoder(nodeUtf8Text);
  for (const chunk of readByteChunks(path, chunkBytes)) {
    const text = decoder.decode(chunk.bytes);
    if (text !== '') yield { text, fraction: chunk.fraction };
  }
  const rest = decoder.decode(new Uint8Array(0), 0, 0, true);
  if (rest !== '') yield { text: rest, fraction: 1 };
}
