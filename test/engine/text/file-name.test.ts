// Export file names safe on every platform: Windows' reserved characters and device names
// (Microsoft, "Naming Files, Paths, and Namespaces", from memory), control characters, trailing dots
// and spaces, and the 255-byte name limit of ext4/APFS. Every result passes the desktop host's own
// file-name check (main/ipc/validate-request.ts), which refused the export before.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MAX_FILE_NAME_BYTES, safeFileName } from '../../../engine/text/file-name';
import { validateRequest } from '../../../main/ipc/validate-request';

const accepted = (name: string) => validateRequest('file:save-export', { suggestedName: name, text: 'x', kind: 'csv' }).suggestedName;

describe('safeFileName', () => {
  it('replaces reserved and control characters and trims dots and spaces', () => {
    expect(safeFileName('routes-from-A:B/C*D?"E"<F>|G', 'csv')).toBe('routes-from-A-B-C-D-E-F-G.csv');
    expect(safeFileName('routes-from-\u0000x\u001b[2J', 'csv')).toBe('routes-from-x-[2J.csv');
    expect(safeFileName('..\\..\\etc', 'csv')).toBe('etc.csv');
    expect(safeFileName('name. ', 'csv')).toBe('name.csv');
    expect(safeFileName('', 'csv')).toBe('export.csv');
    expect(safeFileName('Liège-Köln', 'geojson')).toBe('Liège-Köln.geojson');
  });
  it('prefixes Windows device names, with or without an extension', () => {
    for (const name of ['CON', 'con', 'nul', 'COM1', 'lpt9', 'aux.routes', 'COM¹']) expect(safeFileName(name, 'csv')).toBe(`_${name}.csv`);
    expect(safeFileName('console', 'csv')).toBe('console.csv');
  });
  it('caps the name at 200 UTF-8 bytes, cutting whole characters, keeping the extension', () => {
    const long = safeFileName(`routes-from-${'Ä'.repeat(300)}`, 'csv');
    expect(new TextEncoder().encode(long).length).toBeLessThanOrEqual(MAX_FILE_NAME_BYTES);
    expect(long.endsWith('Ä.csv')).toBe(true);
    const emoji = safeFileName('🚚'.repeat(100), 'geojson');
    expect(emoji.endsWith('🚚.geojson')).toBe(true);
  });
  it('any origin id gives a name the desktop host accepts', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 400, unit: fc.oneof(fc.constantFrom(':', '/', '\\', '*', '?', '"', '<', '>', '|', '.', ' ', '\u0000', '\u007f'), fc.string({ minLength: 1, maxLength: 1 }), fc.string({ unit: 'grapheme', minLength: 1, maxLength: 1 })) }), (origin) => {
        const name = safeFileName(`routes-from-${origin}`, 'csv');
        expect(accepted(name)).toBe(name);
        expect(new TextEncoder().encode(name).length).toBeLessThanOrEqual(MAX_FILE_NAME_BYTES);
      }),
      { numRuns: 1000 },
    );
  });
});
