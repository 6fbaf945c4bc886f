// A NUL byte anywhere in a file is refused, not only in the first 64 KB: there the whole file is
// refused as not text (UTF-16 and binaries are full of NULs); further on, each row holding one is a
// row error naming it, so a damaged tail cannot pass as data. Counts stay balanced.

import { describe, expect, it } from 'vitest';
import { importNetwork } from '../../../engine/planning/import-network';

const DEPOTS = 'id,name,lat,lon\nA,a,51,4\nB,b,52,4\n';

describe('NUL bytes', () => {
  it('in the first 64 KB: the file is refused as not text', () => {
    const r = importNetwork(DEPOTS, 'from,to,toll,fuel\nA,B,1.00,2\u0000.00\n');
    expect(r.report.errors.map((e) => e.code)).toEqual(['not-text']);
    expect(r.network).toBeNull();
  });

  it('past the first 64 KB, in one chunk or many: the rows holding one are refused and named', () => {
    const rows = Array.from({ length: 6000 }, (_, i) => (i === 5500 ? 'A,B,1.00,2.00,bad\u0000tail' : 'A,B,1.00,2.00,ok'));
    const text = `from,to,toll,fuel,notes\n${rows.join('\n')}\n`;
    expect(text.indexOf('\u0000')).toBeGreaterThan(65536);
    for (const source of [text, [text.slice(0, 70_000), text.slice(70_000)]]) {
      const r = importNetwork(DEPOTS, source, { plan: { date: '2026-06-01' } });
      expect(r.report.errors.map((e) => [e.row, e.column, e.code])).toEqual([[5502, 'notes', 'not-text']]);
      expect(r.report.errors[0].message).toMatch(/NUL byte/);
      expect(r.report).toMatchObject({ total: 2 + 6000, accepted: 2 + 5999, rejected: 1 });
      expect(r.network).toBeNull();
    }
  });
});
