// The CLI's chunked file reader against a whole-file TextDecoder: random byte streams (ASCII,
// multi-byte characters, a byte-order mark, invalid and truncated sequences) read in small chunks
// give the same text, so a character cut by a chunk boundary is never split or lost.

import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readTextChunks } from '../../../main/cli/read-chunks';

const pieces = ['a', ',', '\n', 'é', '€', '𝄞', '\ufeff', 'Ł'].map((t) => [...Buffer.from(t, 'utf8')]);
const invalid = [[0xff], [0xc3], [0xe2, 0x82], [0xf0, 0x9d, 0x84], [0x80], [0xc0, 0xaf], [0xed, 0xa0, 0x80]];

describe('readTextChunks', () => {
  it('decodes in chunks exactly as TextDecoder decodes the whole file', () => {
    const dir = mkdtempSync(join(tmpdir(), 'lw-chunks-'));
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.constantFrom(...pieces), fc.constantFrom(...invalid)), { maxLength: 80 }), fc.integer({ min: 4, max: 9 }), (parts, chunk) => {
        const bytes = Uint8Array.from(parts.flat());
        const file = join(dir, 'f.csv');
        writeFileSync(file, bytes);
        const chunks = [...readTextChunks(file, chunk)];
        expect(chunks.map((c) => c.text).join('')).toBe(new TextDecoder('utf-8', { ignoreBOM: true }).decode(bytes));
        if (chunks.length > 0) expect(chunks[chunks.length - 1].fraction).toBe(1);
      }),
      { seed: 44, numRuns: 500 },
    );
  });
});
