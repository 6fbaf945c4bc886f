// The parts a windowed table renders, against brute force: for every window and kept row of small
// tables, every row is rendered once or stood in for by exactly its share of spacer height, in
// order, and the kept row is always rendered.

import { describe, expect, it } from 'vitest';
import { windowParts } from '../../../../renderer/components/DataTable/window-parts';

/** Expands parts to one entry per row: the row index when rendered, 'gap' when a spacer stands in. */
function expand(parts: ReturnType<typeof windowParts>, rowPx: number): (number | 'gap')[] {
  const out: (number | 'gap')[] = [];
  for (const p of parts) {
    if ('spacer' in p) {
      expect(p.spacer % rowPx).toBe(0);
      expect(p.spacer).toBeGreaterThan(0);
      for (let i = 0; i < p.spacer / rowPx; i++) out.push('gap');
    } else for (let i = p.from; i < p.to; i++) out.push(i);
  }
  return out;
}

describe('windowParts', () => {
  it('renders the window, the kept row, and spacers for the rest, in order (all small cases)', () => {
    const rowPx = 7;
    for (let count = 0; count <= 6; count++)
      for (let start = 0; start <= count; start++)
        for (let end = start; end <= count; end++)
          for (const keep of [null, -1, ...Array.from({ length: count + 1 }, (_, k) => k)]) {
            const rows = expand(windowParts(count, start, end, rowPx, keep), rowPx);
            const expected = Array.from({ length: count }, (_, i) => ((i >= start && i < end) || i === keep ? i : 'gap'));
            expect(rows, `count ${count} window ${start}-${end} keep ${keep}`).toEqual(expected);
          }
  });

  it('is one range for an unwindowed table', () => {
    expect(windowParts(5, 0, 5, 26, 2)).toEqual([{ from: 0, to: 5 }]);
  });
});
