// The network of an import reuses the depots reader's id index instead of building a second one,
// and builds its own when the depot list is not the one the index was made for.

import { describe, expect, it } from 'vitest';
import { depotColumns } from '../../../engine/network/build';
import { rememberDepotIndex } from '../../../engine/network/depot-index-registry';
import { importNetwork } from '../../../engine/planning/import-network';

const depot = (id: string) => ({ id, name: id, lat: 50, lon: 4 });

describe('depot index registry', () => {
  it("an import's network shares the reader's index, with every id at its position", () => {
    const r = importNetwork('id,name,lat,lon\nA,a,50,4\nB,b,51,4\nC,c,52,4\n', 'from,to,toll,fuel\nA,B,1,1\nB,C,1,1\n');
    const first = r.network!.depotIndex;
    expect([...first]).toEqual([['A', 0], ['B', 1], ['C', 2]]);
    expect(depotColumns(r.depots).depotIndex).toBe(first);
  });

  it('is used only while it covers exactly the list, else the index is built (and duplicates refused)', () => {
    const depots = [depot('A'), depot('B')];
    const index = new Map([['A', 0], ['B', 1]]);
    rememberDepotIndex(depots, index);
    expect(depotColumns(depots).depotIndex).toBe(index);
    depots.push(depot('C'));
    const rebuilt = depotColumns(depots).depotIndex;
    expect(rebuilt).not.toBe(index);
    expect(rebuilt.get('C')).toBe(2);
    expect(() => depotColumns([depot('A'), depot('A')])).toThrow(/duplicate depot id/);
  });
});
