// The import's shared key index against the reference: on random lane tables whose depot ids and
// refs are made to collide if the index joined them carelessly ("A:1" + "B" vs "A" + ":1B", a ref
// of "-" vs no ref), its keys equal laneKeysOfTable's, every key finds its own row, group sizes equal
// a count by hand, and keys that name no row find none.

import { describe, expect, it } from 'vitest';
import { laneKeysOfTable, laneKeyId } from '../../../engine/import/lane-key';
import { importNetwork } from '../../../engine/planning/import-network';
import { overlayIndex } from '../../../engine/scenario/overlay';
import { seededRandom } from '../../support/seeded-random';

const IDS = ['A', 'A:1', '1B', ':1B', 'B', '2:AB', 'AB', '-', '+'];
const REFS = ['', '', '-', '+', 'R', 'R:1', '1:R', '+R', '-R'];

function table(seed: number) {
  const next = seededRandom(seed);
  const depots = ['id,name,lat,lon', ...IDS.map((id, i) => `"${id}",Depot ${i},${45 + i / 10},${3 + i / 10}`)];
  const lanes = ['from,to,ref,toll,fuel,fees,rebate'];
  for (let e = 0; e < 400; e++) {
    const pick = (list: string[]) => list[Math.floor(next() * list.length)];
    lanes.push(`"${pick(IDS)}","${pick(IDS)}","${pick(REFS)}",1.00,1.00,0,0`);
  }
  return importNetwork(depots.join('\n') + '\n', lanes.join('\n') + '\n', { plan: { date: '2026-08-15' }, skipInvalid: true });
}

describe('overlayIndex', () => {
  it.each([1, 2, 3])('agrees with laneKeysOfTable and finds every row by its key (seed %i)', (seed) => {
    const imported = table(seed);
    const index = overlayIndex(imported);
    const reference = laneKeysOfTable(imported.lanes, imported.depots);
    expect(index.keys).toEqual(reference);
    const sizes = new Map<string, number>();
    reference.forEach((k, r) => {
      expect(index.rowOfKey(k), laneKeyId(k)).toBe(r);
      const group = JSON.stringify([k.from, k.to, k.ref]);
      sizes.set(group, Math.max(sizes.get(group) ?? 0, k.occurrence));
    });
    for (const from of IDS)
      for (const to of IDS)
        for (const ref of [null, ...REFS.filter((x) => x !== '')]) expect(index.groupSize(from, to, ref)).toBe(sizes.get(JSON.stringify([from, to, ref])) ?? 0);
    const k = reference[0];
    for (const occurrence of [0, -1, 1.5, (sizes.get(JSON.stringify([k.from, k.to, k.ref])) ?? 0) + 1]) expect(index.rowOfKey({ ...k, occurrence })).toBeUndefined();
    expect(index.rowOfKey({ ...k, from: 'nowhere' })).toBeUndefined();
  });
});
