// A row with fewer fields than the header is read (its missing cells are empty) but named in a
// warning with its row and first missing column: a missing fuel cell is estimated and a missing fee
// counts as 0, which the file never said. RFC 4180 2.4: each line should hold the same number of fields.

import { describe, expect, it } from 'vitest';
import { importLoads, importVehicles } from '../../../engine/import/import-loads';
import { importNetwork } from '../../../engine/planning/import-network';

describe('rows with too few fields', () => {
  it('lanes and depots: a warning per short row naming the first missing column; counts unchanged', () => {
    const r = importNetwork('id,name,lat,lon,notes\nA,a,51,4\nB,b,52,4,x\n', 'from,to,toll,fuel,fees,rebate\nA,B,1.00,2.00,0.50,0\nA,B,1.00\nB,A,1.00,2.00,0,0\n', { plan: { date: '2026-06-01' } });
    expect(r.report.errors).toEqual([]);
    expect(r.report.accepted).toBe(5);
    const short = r.report.warnings.filter((w) => w.code === 'too-few-fields');
    expect(short.map((w) => [w.file, w.row, w.column])).toEqual([
      ['depots.csv', 2, 'notes'],
      ['lanes.csv', 3, 'fuel'],
    ]);
    expect(short[1].message).toContain('"fuel", "fees", "rebate" read as empty');
  });
  it('the fast path leaves short rows to the general reader, so a large plain file warns too', () => {
    const rows = Array.from({ length: 2000 }, (_, i) => (i === 1500 ? 'A,B,1.00' : 'A,B,1.00,2.00,0,0'));
    const r = importNetwork('id,name,lat,lon\nA,a,51,4\nB,b,52,4\n', `from,to,toll,fuel,fees,rebate\n${rows.join('\n')}\n`, { plan: { date: '2026-06-01' } });
    expect(r.report.warnings.filter((w) => w.code === 'too-few-fields').map((w) => w.row)).toEqual([1502]);
  });
  it('vehicles and loads files too', () => {
    const v = importVehicles('vehicle,vehicle_class,height_m,width_m,length_m,weight_t,axle_load_t,notes\nV1,2axle,4,2.5,16,40,11\n', { classes: ['2axle'] });
    expect(v.report.warnings.map((w) => [w.code, w.column])).toEqual([['too-few-fields', 'notes']]);
    const l = importLoads('load,from,to,date,notes\nL1,A,B\n', { depots: new Map([['A', 0], ['B', 1]]), vehicles: v.byId, classes: ['2axle'], planDate: '2026-06-01' });
    expect(l.report.warnings.filter((w) => w.code === 'too-few-fields').map((w) => w.column)).toEqual(['date']);
  });
});
