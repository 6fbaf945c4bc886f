// Header matching: case, surrounding spaces and space/hyphen/underscore differences are ignored,
// synonyms map to one field, a bracketed unit is read, per-class toll columns and unknown columns.

import { describe, expect, it } from 'vitest';
import { classKey, matchDepotHeaders, matchLaneHeaders } from '../../../engine/import/headers';

describe('header matching', () => {
  it('maps depot synonyms and spelling variants', () => {
    const m = matchDepotHeaders([' Depot-ID ', 'NAME', 'Latitude', 'lng', 'Depot type', 'Remarks']);
    expect([...m.columns.keys()]).toEqual(['id', 'name', 'lat', 'lon', 'type', 'notes']);
    expect(m.unknown).toEqual([]);
  });

  it('maps lane synonyms, units, per-class tolls; keeps unknown columns; flags repeats', () => {
    const m = matchLaneHeaders(['Origin', 'destination', 'Contract Ref', 'Distance (mi)', 'drive_hours', 'Toll 5-Axle', 'toll_2axle', 'Fuel_Cost', 'colour', 'from']);
    expect(m.columns.get('from')!.index).toBe(0);
    expect(m.columns.get('to')!.index).toBe(1);
    expect(m.columns.get('ref')!.index).toBe(2);
    expect(m.columns.get('distance')!.unit).toBe('mi');
    expect(m.columns.get('drive')!.unit).toBe('h');
    expect(m.classTolls.map((c) => [c.name, c.key])).toEqual([
      ['5-Axle', '5axle'],
      ['2axle', '2axle'],
    ]);
    expect(m.columns.get('fuel')!.index).toBe(7);
    expect(m.unknown).toEqual([{ index: 8, header: 'colour' }]);
    expect(m.duplicates).toEqual([{ index: 9, header: 'from', first: 'Origin' }]);
    expect(classKey(' 5 axle ')).toBe(classKey('5_Axle'));
  });

  it('reads a clause column under its synonyms, apart from the ref (it used to be taken for the ref)', () => {
    for (const header of ['clause', 'Contract Clause', 'clause-no', 'Rebate clause', 'CLAUSE_ID']) {
      const m = matchLaneHeaders(['from', 'to', 'ref', header]);
      expect(m.columns.get('clause')!.index).toBe(3);
      expect(m.columns.get('ref')!.index).toBe(2);
      expect(m.duplicates).toEqual([]);
    }
  });

  it('names an unnamed column by its position (a trailing delimiter on every line)', () => {
    expect(matchLaneHeaders(['from', 'to', '']).unknown).toEqual([{ index: 2, header: '(column 3)' }]);
  });

  it('ignores the derived columns of its own lanes export', () => {
    const m = matchLaneHeaders(['from', 'to', 'net', 'net_negative', 'on_rebate_loop', 'distance_source', 'fuel_source']);
    expect(m.unknown).toEqual([]);
  });
});
