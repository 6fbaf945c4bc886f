// The importer's byte front end: UTF-8 chunks of a file go to the text record stream
// (csv-record-stream.ts) until it stands between records past the header, then plain lines are
// offered to the reader as bytes (no decoding, no line strings). A line the reader does not take is
// decoded and given to the text stream, which owns every rule (quotes, BOM, sep= line, NUL, U+FFFD,
// stray quotes); while a record is open there, whole chunks go that way, as decoded text would.
// So the records, their rows and the report are those of the text path on the same chunks.

import { Utf8ChunkDecoder, utf8Bytes, type Utf8TextOf } from '../text/utf8';
import type { CsvRecordStream } from './csv-record-stream';

/** `plainBytes` answers: not this line (it goes the text way), or not this file (nor any later line). */
export const PLAIN_LATER = -1;
export const PLAIN_NEVER = -2;

/**
 * Offered each whole line (from `start`, ended by LF or CRLF before `limit`) once the header is read:
 * returns the offset of the line's LF when it read the line as row `row`, else PLAIN_LATER or
 * PLAIN_NEVER, touching nothing. `delimiter` is a `byteDelimiter` code.
 */
export type PlainBytesTaker = (bytes: Uint8Array, start: number, limit: number, row: number, delimiter: number) => number;

// A partial line longer than this is left to the text stream (re-encoding it at every chunk would
// grow with the square of its length), as is an untaken line that long.
const MAX_LINE = 1 << 16;
const EMPTY = new Uint8Array(0);

/** The byte code lines may be cut at by the byte readers: a tab or printable ASCII but the quote; else -1. */
export function byteDelimiter(delimiter: string): number {
  const c = delimiter.length === 1 ? delimiter.charCodeAt(0) : -1;
  return c === 9 || (c >= 32 && c < 127 && c !== 34) ? c : -1;
}

function joined(head: Uint8Array, chunk: Uint8Array, end: number): Uint8Array {
  const out = new Uint8Array(head.length + end);
  out.set(head);
  out.set(chunk.subarray(0, end), head.length);
  return out;
}

export class CsvByteStream {
  private readonly decoder: Utf8ChunkDecoder;
  private bytesMode = false;
  private never = false;
  /** The partial last line while in byte mode. */
  private carry: Uint8Array | null = null;

  /** `textOf`: a native UTF-8 decoder of the host (Buffer#toString in Node), else the engine's own. */
  constructor(
    private readonly text: CsvRecordStream,
    private readonly take: PlainBytesTaker | undefined,
    textOf?: Utf8TextOf,
  ) {
    this.decoder = new Utf8ChunkDecoder(textOf);
    if (take === undefined) this.never = true;
  }

  /** The next chunk of the file's bytes; it is not kept after the call (a reader may reuse it). */
  feed(bytes: Uint8Array): void {
    if (bytes.length === 0) return;
    // A plain view: the readers' loops then see one kind of array (a Node Buffer is a subclass).
    const chunk = new Uint8Array(bytes.buffer, bytes.byteOffset, bytes.length);
    if (!this.bytesMode) {
      this.text.feed(this.decoder.decode(chunk));
      this.tryBytes();
      return;
    }
    let data = chunk;
    let from = 0;
    if (this.carry !== null) {
      // The carried partial line is completed by the chunk's first line; the chunk itself is not copied.
      const lf = chunk.indexOf(10);
      if (lf === -1 || this.carry.length + lf + 1 > MAX_LINE) data = joined(this.carry, chunk, chunk.length);
      else {
        const line = joined(this.carry, chunk, lf + 1);
        const stop = this.lines(line, 0, line.length);
        this.carry = null;
        if (stop !== -1) {
          this.toText(this.decoder.decode(line, stop, line.length) + this.decoder.decode(chunk, lf + 1, chunk.length));
          return;
        }
        from = lf + 1;
      }
      this.carry = null;
    }
    const last = data.lastIndexOf(10);
    let textFrom = last < from ? from : this.lines(data, from, last + 1);
    if (textFrom === -1 || last < from) {
      const rest = last < from ? from : last + 1;
      if (data.length - rest <= MAX_LINE) {
        if (rest < data.length) this.carry = data.slice(rest);
        return;
      }
      textFrom = rest;
    }
    this.toText(this.decoder.decode(data, textFrom, data.length));
  }

  // The text stream reads on from here; bytes resume when it stands between records again.
  private toText(text: string): void {
    this.bytesMode = false;
    if (text !== '') this.text.feed(text);
    this.tryBytes();
  }

  finish(): void {
    const rest = this.carry ?? EMPTY;
    this.carry = null;
    const tail = this.decoder.decode(rest, 0, rest.length, true);
    if (tail !== '') this.text.feed(tail);
    this.text.finish();
  }

  // Offers the whole lines of bytes[start, limit) (limit just after an LF) in order. Returns -1 when
  // all were read (as bytes or, one by one, as text), or the offset from which the text stream takes over.
  private lines(bytes: Uint8Array, start: number, limit: number): number {
    const take = this.take!;
    const delimiter = byteDelimiter(this.text.delimiter);
    let s = start;
    while (s < limit) {
      const lf = take(bytes, s, limit, this.text.row, delimiter);
      if (lf >= 0) {
        this.text.rowTaken();
        s = lf + 1;
        continue;
      }
      if (lf === PLAIN_NEVER) {
        this.never = true;
        return s;
      }
      const end = bytes.indexOf(10, s) + 1;
      if (end - s > MAX_LINE) return s;
      this.text.feed(this.decoder.decode(bytes, s, end, true));
      // A quote left open: the text stream reads on to the end of the chunk.
      if (this.text.handOver(0) === null) return end;
      s = end;
    }
    return -1;
  }

  // Back to bytes when the text stream stands between records (with its partial last line handed over).
  private tryBytes(): void {
    if (this.never || byteDelimiter(this.text.delimiter) === -1) return;
    const pending = this.text.handOver(MAX_LINE);
    if (pending === null) return;
    this.bytesMode = true;
    const cut = this.decoder.takeCarried();
    if (pending === '' && cut === null) return;
    const head = utf8Bytes(pending);
    const carry = new Uint8Array(head.length + (cut?.length ?? 0));
    carry.set(head);
    if (cut !== null) carry.set(cut, head.length);
    this.carry = carry;
  }
}
