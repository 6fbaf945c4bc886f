// UTF-8 for the byte-level importer, in plain TypeScript (the engine has no TextDecoder: it also runs
// in a bare JavaScript context). Decoding follows the WHATWG Encoding Standard's UTF-8 decoder: each
// maximal ill-formed subpart becomes one U+FFFD, as Node's Buffer#toString and TextDecoder do, so a
// file read as bytes gives the very text a file decoded up front gave.

const REPLACEMENT = 0xfffd;
// Code units made at once by String.fromCharCode.apply (well under any engine's argument limit).
const PIECE = 8192;

/** Text of whole UTF-8 bytes[start, end) (an incomplete last character becomes U+FFFD). */
export type Utf8TextOf = (bytes: Uint8Array, start: number, end: number) => string;

/** The engine's own decoder (WHATWG UTF-8, fatal = false); a host may pass a native one instead. */
export const decodeUtf8: Utf8TextOf = (bytes, start, end) => {
  let out = '';
  const units = new Uint16Array(PIECE + 2);
  let n = 0;
  let i = start;
  while (i < end) {
    if (n >= PIECE) {
      out += String.fromCharCode.apply(null, units.subarray(0, n) as unknown as number[]);
      n = 0;
    }
    const b = bytes[i++];
    if (b < 0x80) {
      units[n++] = b;
      continue;
    }
    let needed: number;
    let cp: number;
    let lower = 0x80;
    let upper = 0xbf;
    if (b >= 0xc2 && b <= 0xdf) {
      needed = 1;
      cp = b & 0x1f;
    } else if (b >= 0xe0 && b <= 0xef) {
      if (b === 0xe0) lower = 0xa0;
      if (b === 0xed) upper = 0x9f;
      needed = 2;
      cp = b & 0xf;
    } else if (b >= 0xf0 && b <= 0xf4) {
      if (b === 0xf0) lower = 0x90;
      if (b === 0xf4) upper = 0x8f;
      needed = 3;
      cp = b & 0x7;
    } else {
      units[n++] = REPLACEMENT;
      continue;
    }
    // A byte out of range ends the ill-formed subpart (one U+FFFD) and is read afresh.
    for (; needed > 0; needed--) {
      const c = i < end ? bytes[i] : -1;
      if (c < lower || c > upper) break;
      cp = (cp << 6) | (c & 0x3f);
      lower = 0x80;
      upper = 0xbf;
      i++;
    }
    if (needed > 0) units[n++] = REPLACEMENT;
    else if (cp < 0x10000) units[n++] = cp;
    else {
      units[n++] = 0xd800 + ((cp - 0x10000) >> 10);
      units[n++] = 0xdc00 + ((cp - 0x10000) & 0x3ff);
    }
  }
  if (n > 0) out += String.fromCharCode.apply(null, units.subarray(0, n) as unknown as number[]);
  return out;
};

/**
 * Where bytes[start, end) can be cut so that no character is split: before the lead byte of a last
 * character whose continuation bytes are not all there yet (at most 3 bytes are left over). A lead
 * byte is always where a decoder starts afresh, so text decoded on both sides of the cut is the
 * text of the whole.
 */
export function utf8Cut(bytes: Uint8Array, start: number, end: number): number {
  let lead = end;
  while (end - lead < 3 && lead > start && (bytes[lead - 1] & 0xc0) === 0x80) lead--;
  if (lead === start || bytes[lead - 1] < 0xc0) return end; // ASCII or stray continuation bytes: nothing to wait for
  const b = bytes[lead - 1];
  const length = b >= 0xf0 ? 4 : b >= 0xe0 ? 3 : 2;
  return end - (lead - 1) >= length ? end : lead - 1;
}

/** Decodes chunks in order, carrying the bytes of a character cut by a chunk to the next one. */
export class Utf8ChunkDecoder {
  private carried: Uint8Array | null = null;

  constructor(private readonly textOf: Utf8TextOf = decodeUtf8) {}

  /** The text of bytes[start, end) after what was carried; with `final` nothing is carried on. */
  decode(bytes: Uint8Array, start = 0, end = bytes.length, final = false): string {
    if (this.carried !== null) {
      const joined = new Uint8Array(this.carried.length + end - start);
      joined.set(this.carried);
      joined.set(bytes.subarray(start, end), this.carried.length);
      this.carried = null;
      bytes = joined;
      start = 0;
      end = joined.length;
    }
    const cut = final ? end : utf8Cut(bytes, start, end);
    // A copy (a Node Buffer's slice would be a view of a buffer the reader reuses).
    if (cut < end) this.carried = Uint8Array.prototype.slice.call(bytes, cut, end);
    return cut > start ? this.textOf(bytes, start, cut) : '';
  }

  /** The bytes carried to the next chunk (at most 3), and forgets them. */
  takeCarried(): Uint8Array | null {
    const c = this.carried;
    this.carried = null;
    return c;
  }
}

/** The UTF-8 bytes of `text` (a lone surrogate becomes U+FFFD, as TextEncoder does). */
export function utf8Bytes(text: string): Uint8Array {
  const out = new Uint8Array(text.length * 3);
  let n = 0;
  for (let i = 0; i < text.length; i++) {
    let c = text.charCodeAt(i);
    if (c < 0x80) {
      out[n++] = c;
      continue;
    }
    if (c >= 0xd800 && c <= 0xdfff) {
      const next = text.charCodeAt(i + 1);
      if (c <= 0xdbff && next >= 0xdc00 && next <= 0xdfff) {
        const cp = 0x10000 + ((c - 0xd800) << 10) + (next - 0xdc00);
        i++;
        out[n++] = 0xf0 | (cp >> 18);
        out[n++] = 0x80 | ((cp >> 12) & 0x3f);
        out[n++] = 0x80 | ((cp >> 6) & 0x3f);
        out[n++] = 0x80 | (cp & 0x3f);
        continue;
      }
      c = REPLACEMENT;
    }
    if (c < 0x800) {
      out[n++] = 0xc0 | (c >> 6);
      out[n++] = 0x80 | (c & 0x3f);
    } else {
      out[n++] = 0xe0 | (c >> 12);
      out[n++] = 0x80 | ((c >> 6) & 0x3f);
      out[n++] = 0x80 | (c & 0x3f);
    }
  }
  return out.slice(0, n);
}

/**
 * The text of bytes[start, end), which the caller knows to be ASCII (a cell the fast path keeps).
 * Short ranges, the usual ref or note, are made in one call without a view of the bytes.
 */
export function asciiText(bytes: Uint8Array, start: number, end: number): string {
  switch (end - start) {
    case 0:
      return '';
    case 1:
      return String.fromCharCode(bytes[start]);
    case 2:
      return String.fromCharCode(bytes[start], bytes[start + 1]);
    case 3:
      return String.fromCharCode(bytes[start], bytes[start + 1], bytes[start + 2]);
    case 4:
      return String.fromCharCode(bytes[start], bytes[start + 1], bytes[start + 2], bytes[start + 3]);
    case 5:
      return String.fromCharCode(bytes[start], bytes[start + 1], bytes[start + 2], bytes[start + 3], bytes[start + 4]);
    case 6:
      return String.fromCharCode(bytes[start], bytes[start + 1], bytes[start + 2], bytes[start + 3], bytes[start + 4], bytes[start + 5]);
    case 7:
      return String.fromCharCode(bytes[start], bytes[start + 1], bytes[start + 2], bytes[start + 3], bytes[start + 4], bytes[start + 5], bytes[start + 6]);
    case 8:
      return String.fromCharCode(bytes[start], bytes[start + 1], bytes[start + 2], bytes[start + 3], bytes[start + 4], bytes[start + 5], bytes[start + 6], bytes[start + 7]);
    default: {
      // In pieces: one apply over a cell of a million bytes overflows the stack.
      let out = '';
      for (let s = start; s < end; s += PIECE) out += String.fromCharCode.apply(null, bytes.subarray(s, Math.min(end, s + PIECE)) as unknown as number[]);
      return out;
    }
  }
}
