// The header and row problems the four readers (depots, lanes, vehicles, loads) word alike, from the
// one place in RecordFileReader: a required column missing, a column repeated, an unknown column and
// a row with more fields than the header; what each file does with an unknown column is its own.

import { describe, expect, it } from 'vitest';
import { importLoads, importVehicles } from '../../../engine/import/import-loads';
import { importNetwork } from '../../../engine/planning/import-network';
import type { ValidationReport } from '../../../engine/import/types';

const SHARED = new Set(['missing-column', 'duplicate-column', 'unknown-column', 'too-many-fields']);
const issues = (report: ValidationReport) => [...report.errors, ...report.warnings].filter((e) => SHARED.has(e.code)).map((e) => [e.file, e.row, e.column, e.value, e.code, e.message]);

describe('header and surplus-field problems of every reader', () => {
  it('depots and lanes', () => {
    const { report } = importNetwork('id,lat,lon,lat,colour\nA,1,1,2,red\nB,2,2,3,blue,surplus', 'from,toll,to,toll,colour\nA,1,B,2,red,surplus\nB,1,A,1,red', { depotsFile: 'd.csv', lanesFile: 'l.csv', plan: { date: '2026-08-15' }, skipInvalid: true });
    expect(issues(report)).toEqual([
      ['d.csv', 1, 'lat', null, 'duplicate-column', 'column repeats "lat"; only the first is read'],
      ['d.csv', 3, '(column 6)', 'surplus', 'too-many-fields', 'the row has 6 fields but the header has 5'],
      ['l.csv', 1, 'toll', null, 'duplicate-column', 'column repeats "toll"; only the first is read'],
      ['l.csv', 2, '(column 6)', 'surplus', 'too-many-fields', 'the row has 6 fields but the header has 5'],
      ['d.csv', 1, 'colour', null, 'unknown-column', 'unknown column, kept with the depot but not used'],
      ['l.csv', 1, 'colour', null, 'unknown-column', 'unknown column, kept with the lane but not used'],
    ]);
    const missing = importNetwork('id,lat\nA,1', 'from,toll\nA,1', { depotsFile: 'd.csv', lanesFile: 'l.csv', skipInvalid: true }).report;
    expect(missing.errors.filter((e) => e.code === 'missing-column').map((e) => [e.file, e.column, e.message])).toEqual([
      ['d.csv', 'lon', 'required column "lon" is missing; no depot can be read'],
      ['l.csv', 'to', 'required column "to" is missing; no lane can be read'],
    ]);
  });

  it('vehicles and loads', () => {
    const vehicles = importVehicles('vehicle,height_m,width_m,length_m,weight_t,height_m,colour\nV1,4,2.5,12,40,4,red,surplus', { file: 'v.csv', classes: [] });
    expect(issues(vehicles.report)).toEqual([
      ['v.csv', 1, 'axle_load_t', null, 'missing-column', 'required column "axle_load_t" is missing; no vehicle can be read'],
      ['v.csv', 1, 'height_m', null, 'duplicate-column', 'column repeats "height_m"; only the first is read'],
      ['v.csv', 1, 'colour', null, 'unknown-column', 'unknown column, not used'],
    ]);
    const loads = importLoads('load,from,from,colour\nL1,A,A,red,surplus', { file: 'o.csv', depots: new Map([['A', 0]]), vehicles: new Map(), classes: [], planDate: '2026-08-15' });
    expect(issues(loads.report)).toEqual([
      ['o.csv', 1, 'to', null, 'missing-column', 'required column "to" is missing; no load can be read'],
      ['o.csv', 1, 'from', null, 'duplicate-column', 'column repeats "from"; only the first is read'],
      ['o.csv', 1, 'colour', null, 'unknown-column', 'unknown column, not used'],
    ]);
    const surplus = importLoads('load,from,to\nL1,A,B,surplus', { file: 'o.csv', depots: new Map([['A', 0], ['B', 1]]), vehicles: new Map(), classes: [], planDate: '2026-08-15' });
    expect(issues(surplus.report)).toContainEqual(['o.csv', 2, '(column 4)', 'surplus', 'too-many-fields', 'the row has 4 fields but the header has 3']);
  });
});
