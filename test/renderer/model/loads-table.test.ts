// The Loads panel's rows: filter, sort (missing figures last both ways, ties in file order) and the
// printed sheet's pages (one per date, in date order), on the sample carrier's planned loads.

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { dispatchReport, importLoads, importNetwork, importVehicles, planLoads } from '../../../engine/index';
import { DEFAULT_LOADS_QUERY, loadCautions, queryLoads, sheetPages, toggleLoadSort } from '../../../renderer/model/loads-table';

const text = (name: string) => readFileSync(`sample-data/${name}`, 'utf8');
const imported = importNetwork(text('depots.csv'), text('lanes.csv'), { plan: { date: '2026-08-15' } });
const vehicles = importVehicles(text('vehicles.csv'), { classes: imported.vehicleClasses });
const loads = importLoads(text('loads.csv'), { depots: imported.network!.depotIndex, vehicles: vehicles.byId, classes: imported.vehicleClasses, planDate: '2026-08-15' });
const report = dispatchReport(planLoads(imported, loads.loads, { date: '2026-08-15', vehicles: vehicles.byId }));

describe('loads table model', () => {
  it('filters by status and by text (ids, vehicles, reasons)', () => {
    expect(queryLoads(report.loads, { ...DEFAULT_LOADS_QUERY, status: 'blocked' }).map((r) => r.load)).toEqual(['L-0815-03', 'L-0816-02']);
    expect(queryLoads(report.loads, { ...DEFAULT_LOADS_QUERY, text: 'max_height' }).map((r) => r.load)).toEqual(['L-0815-03', 'L-0816-02']);
    expect(queryLoads(report.loads, { ...DEFAULT_LOADS_QUERY, text: 'bfh-t3' })).toHaveLength(2);
  });

  it('sorts by cost with blocked loads last in both directions', () => {
    const up = queryLoads(report.loads, { ...DEFAULT_LOADS_QUERY, sortKey: 'cost' });
    const down = queryLoads(report.loads, toggleLoadSort({ ...DEFAULT_LOADS_QUERY, sortKey: 'cost' }, 'cost'));
    const costs = (rows: typeof up) => rows.map((r) => r.cost_minor);
    expect(costs(up).slice(0, 10)).toEqual([...costs(up).slice(0, 10)].sort((a, b) => a! - b!));
    expect(costs(down).slice(0, 10)).toEqual([...costs(down).slice(0, 10)].sort((a, b) => b! - a!));
    expect(costs(up).slice(10)).toEqual([null, null]);
    expect(costs(down).slice(10)).toEqual([null, null]);
  });

  it('names cautions per row', () => {
    const dd = report.loads.find((r) => r.load === 'L-0815-01')!;
    expect(loadCautions(dd)).toEqual(expect.arrayContaining(['over daily driving limit', 'detour for vehicle limits']));
  });

  it('puts each date on its own sheet page, dates in order', () => {
    expect(sheetPages(report).map((p) => [p.date, p.loads.length])).toEqual([
      ['2026-08-15', 9],
      ['2026-08-16', 3],
    ]);
  });
});
