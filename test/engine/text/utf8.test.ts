// The engine's UTF-8 decoder against Node's (TextDecoder and Buffer#toString follow the WHATWG
// Encoding Standard: one U+FFFD per maximal ill-formed subpart) on random and hostile bytes, whole
// and cut at every offset, and the encoder against TextEncoder.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { asciiText, decodeUtf8, Utf8ChunkDecoder, utf8Bytes } from '../../../engine/text/utf8';

// Bytes that make every kind of sequence: ASCII, leads of 2/3/4-byte characters, the leads with
// narrowed second-byte ranges (E0, ED, F0, F4), continuations, and bytes never valid (C0, C1, F5-FF).
const hostileByte = fc.constantFrom(0x41, 0x0a, 0x2c, 0x00, 0x80, 0x8f, 0x90, 0x9f, 0xa0, 0xbf, 0xc0, 0xc1, 0xc2, 0xc3, 0xdf, 0xe0, 0xe2, 0xed, 0xef, 0xf0, 0xf4, 0xf5, 0xff);
const bytesArb = fc.oneof(fc.uint8Array({ maxLength: 40 }), fc.array(hostileByte, { maxLength: 40 }).map((a) => Uint8Array.from(a)), fc.string({ unit: 'binary', maxLength: 20 }).map((s) => new TextEncoder().encode(s)));

describe('decodeUtf8 and Utf8ChunkDecoder', () => {
  it('decode like TextDecoder, whole and cut anywhere (own decoder and a native one)', () => {
    const native = (b: Uint8Array, s: number, e: number) => Buffer.from(b.buffer, b.byteOffset, b.byteLength).toString('utf8', s, e);
    fc.assert(
      fc.property(bytesArb, fc.array(fc.nat(), { maxLength: 4 }), (bytes, cuts) => {
        const expected = new TextDecoder().decode(bytes);
        expect(decodeUtf8(bytes, 0, bytes.length)).toBe(expected);
        expect(Buffer.from(bytes).toString('utf8')).toBe(expected);
        const points = [...new Set(cuts.map((c) => c % (bytes.length + 1)))].sort((a, b) => a - b);
        for (const textOf of [undefined, native]) {
          const decoder = new Utf8ChunkDecoder(textOf);
          let text = '';
          let from = 0;
          for (const p of points) {
            text += decoder.decode(bytes, from, p);
            from = p;
          }
          text += decoder.decode(bytes, from, bytes.length, true);
          expect(text).toBe(expected);
        }
      }),
      { seed: 20261203, numRuns: 3000 },
    );
  });

  it('decodes a long text (past the code units made at once)', () => {
    const text = 'Liège;Zürich;東京;😀\n'.repeat(3000);
    const bytes = new TextEncoder().encode(text);
    expect(decodeUtf8(bytes, 0, bytes.length)).toBe(text);
  });
});

describe('utf8Bytes and asciiText', () => {
  it('encode like TextEncoder', () => {
    fc.assert(
      fc.property(fc.string({ unit: fc.oneof(fc.constant('\ud800'), fc.constant('\udc00'), fc.string({ unit: 'binary', minLength: 1, maxLength: 1 })), maxLength: 30 }), (text) => {
        expect(Array.from(utf8Bytes(text))).toEqual(Array.from(new TextEncoder().encode(text)));
      }),
      { seed: 1203, numRuns: 2000 },
    );
  });

  it('asciiText gives the characters of any range', () => {
    const bytes = new TextEncoder().encode('x,L1234567890123,y');
    for (let s = 0; s < bytes.length; s++) for (let e = s; e <= bytes.length; e++) expect(asciiText(bytes, s, e)).toBe('x,L1234567890123,y'.slice(s, e));
  });
});
