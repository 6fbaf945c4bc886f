// A quote inside an unquoted field (an inch mark in notes: `max 48" trailer`) is a literal character,
// as RFC 4180's usual leniency reads it and papaparse does: one such mark used to swallow every row
// after it (an "unbalanced quotes" error), two of them passed without a word. Now every row is read
// and each such cell is named in a warning, however the file is cut into chunks.

import { describe, expect, it } from 'vitest';
import { importNetwork } from '../../../engine/planning/import-network';

const DEPOTS = 'id,name,lat,lon\nA,a,51,4\nB,b,52,4\nC,c,53,4\n';
const HEADER = 'from,to,toll,fuel,notes';

function read(lanes: string | string[]) {
  const r = importNetwork(DEPOTS, lanes, { plan: { date: '2026-06-01' } });
  expect(r.report.accepted + r.report.rejected).toBe(r.report.total);
  return r;
}

const stray = (r: ReturnType<typeof read>) => r.report.warnings.filter((w) => w.code === 'stray-quote').map((w) => [w.row, w.column, w.value]);

describe('stray quotes', () => {
  const one = `${HEADER}\nA,B,1.00,2.00,max 48" trailer\nB,C,1.00,2.00,ok\nC,A,1.00,2.00,ok\n`;
  const two = `${HEADER}\nA,B,1.00,2.00,max 48" trailer\nB,C,1.00,2.00,ok\nC,A,1.00,2.00,a 12" b\nA,C,1.00,2.00,ok\n`;

  it('one mark: every row is read, the cell is named', () => {
    const r = read(one);
    expect(r.report.errors).toEqual([]);
    expect(r.report.accepted).toBe(3 + 3);
    expect(stray(r)).toEqual([[2, 'notes', 'max 48" trailer']]);
    expect(r.lanes.notes[0]).toBe('max 48" trailer');
  });

  it('two marks: both named, read the same way', () => {
    const r = read(two);
    expect(r.report.accepted).toBe(3 + 4);
    expect(stray(r)).toEqual([
      [2, 'notes', 'max 48" trailer'],
      [4, 'notes', 'a 12" b'],
    ]);
  });

  it('cut into chunks at every position, the result is the same', () => {
    const whole = read(two);
    for (let cut = 1; cut < two.length; cut++) {
      const r = read([two.slice(0, cut), two.slice(cut)]);
      expect(r.report.accepted, `cut at ${cut}`).toBe(whole.report.accepted);
      expect(stray(r), `cut at ${cut}`).toEqual(stray(whole));
    }
  });

  it('quoted fields with "" and line breaks inside still read whole across chunks', () => {
    const text = `${HEADER}\nA,B,1.00,2.00,"say ""hi""\nthen go"\nB,C,1.00,2.00,"a ""48"" b"\n`;
    for (let cut = 1; cut < text.length; cut++) {
      const r = read([text.slice(0, cut), text.slice(cut)]);
      expect(r.report.errors, `cut at ${cut}`).toEqual([]);
      expect(r.lanes.notes.slice(0, 2), `cut at ${cut}`).toEqual(['say "hi"\nthen go', 'a "48" b']);
      expect(stray(r)).toEqual([]);
    }
  });

  it('in a large file read on the fast path, the rows after the mark are kept', () => {
    const rows = Array.from({ length: 3000 }, (_, i) => `A,B,1.00,2.00,${i === 1500 ? 'max 48" trailer' : 'ok'}`);
    const r = read([`${HEADER}\n${rows.slice(0, 1000).join('\n')}\n`, `${rows.slice(1000).join('\n')}\n`]);
    expect(r.report.errors).toEqual([]);
    expect(r.report.accepted).toBe(3 + 3000);
    expect(stray(r)).toEqual([[1502, 'notes', 'max 48" trailer']]);
  });

  it('an opening quote that never closes is still refused', () => {
    const r = read(`${HEADER}\nA,B,1.00,2.00,"never closed\nB,C,1.00,2.00,ok\n`);
    expect(r.report.errors.map((e) => e.code)).toEqual(['unbalanced-quotes']);
  });
});
