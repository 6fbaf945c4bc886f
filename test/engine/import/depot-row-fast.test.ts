// The depots reader's fast path for plain rows against its general reader: the same depots file read
// with and without it must give the same depots (every field), the same index of ids and of rejected
// ids, and the same report, on random files that mix plain rows with every kind of cell the general
// reader handles or refuses.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DepotsReader } from '../../../engine/import/depots-reader';
import { ReportCollector } from '../../../engine/import/report-collector';
import { fileArb, rowArb, streamInto } from './plain-row-files';

function readDepots(text: string, fast: boolean, chunk: number) {
  const report = new ReportCollector(10_000);
  const reader = new DepotsReader('depots.csv', report);
  streamInto(reader, text, chunk, fast);
  return {
    depots: reader.depots.map((d) => ({ ...d, lat: Object.is(d.lat, -0) ? '-0' : d.lat, lon: Object.is(d.lon, -0) ? '-0' : d.lon, extra: d.extra && { ...d.extra } })),
    index: [...reader.index],
    rejected: [...reader.rejectedIds],
    rows: reader.rows,
    report: report.report(),
  };
}

const values = {
  plain: {
    id: ['A', 'B', 'D12', 'Liège', 'a-very-long-depot-code-17', 'X'],
    name: ['Depot one', '', 'Dépôt', 'a;b'],
    lat: ['45.0000', '-12.5', '0', '-0', '90', '-90.000', '51.123456789012', '1.5'],
    lon: ['2.0000', '-179.99', '180', '0.0', '13.4050', '-0.1276'],
    text: ['hub', '', 'note text that is long', 'x'],
  },
  messy: {
    id: ['', ' A', 'B ', "'=x", 'A\u00a0'],
    name: [' padded', "'=cmd", "a;'=b", '@x'],
    lat: ['91', '-90.0001', '45,5', '1e3', '.5', '5.', '+5', '1.234', 'x', '', '12345678901234567890', '0.1234567890123456789', '-'],
    lon: ['180.5', '-181', '2,5', 'abc', ' 3', '', '99999999999999999999999'],
    text: ["'=x", ' spaced ', '=cmd'],
  },
};
type Kind = keyof typeof values.plain;
const KINDS: Kind[] = ['id', 'name', 'lat', 'lon', 'text', 'text', 'text'];

// A cell holding the delimiter is quoted, so the line leaves the fast path as real files do.
const files = fileArb(['id', 'name', 'lat', 'lon', 'type', 'notes', 'region'], rowArb(values, KINDS), (r, d) => r.map((c) => (c.includes(d) ? `"${c}"` : c)));

describe('DepotsReader fast path (plain rows)', () => {
  it('reads random files to the same depots, ids and report as the general reader', () => {
    fc.assert(
      fc.property(files, ({ text, chunk }) => {
        expect(readDepots(text, true, chunk)).toEqual(readDepots(text, false, chunk));
      }),
      { numRuns: 600, seed: 20261203 },
    );
  });

  it('takes plain rows after the first block, with the values the general reader gives', () => {
    const text = ['id,name,lat,lon', ...Array.from({ length: 50 }, (_, i) => `D${i},Depot ${i},45.${i},-2.0${i}`)].join('\n') + '\n';
    const read = readDepots(text, true, 64);
    expect(read.depots).toHaveLength(50);
    expect(read.depots[49]).toMatchObject({ id: 'D49', name: 'Depot 49', lat: 45.49, lon: -2.049, sourceRow: 51 });
    expect(read.depots.map((d) => [d.lat, d.lon])).toEqual(Array.from({ length: 50 }, (_, i) => [Number(`45.${i}`), Number(`-2.0${i}`)]));
  });
});
