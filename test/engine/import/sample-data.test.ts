// The sample carrier stays what sample-data/README.md says it is: the clean lanes file has no errors,
// warnings or rebate loop; the loop variant has the FRA/SXB loop (-1.40 per lap) only on dates when
// both rebate clauses are valid, and the seasonal MHG/KRL loop (clause 8.1) only for the 2-axle class
// from June to August; RTM plans as an origin for both vehicle classes.

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { findDistinctLoops } from '../../../engine/audit/distinct-loops';
import { importNetwork } from '../../../engine/planning/import-network';

const sample = (name: string) => readFileSync(new URL(`../../../sample-data/${name}`, import.meta.url), 'utf8');
const depots = sample('depots.csv');

describe('sample data', () => {
  it('depots.csv: 40-60 depots, all accepted', () => {
    const r = importNetwork(depots, 'from,to\n');
    expect(r.depots.length).toBeGreaterThanOrEqual(40);
    expect(r.depots.length).toBeLessThanOrEqual(60);
    expect(r.report.files[0].rejected).toBe(0);
  });

  it.each(['2axle', '5axle', undefined])('lanes.csv is clean and loop-free for class %s', (vehicleClass) => {
    const r = importNetwork(depots, sample('lanes.csv'), { plan: { vehicleClass } });
    expect(r.report.errors).toEqual([]);
    expect(r.report.warnings).toEqual([]);
    expect(r.vehicleClasses).toEqual(['2axle', '5axle']);
    expect(findDistinctLoops(r.network!).loops).toEqual([]);
    expect(r.network!.depotIndex.has('RTM')).toBe(true);
  });

  it('lanes-rebate-loop.csv has the FRA/SXB loop, only while both clauses are valid', () => {
    const all = importNetwork(depots, sample('lanes-rebate-loop.csv'));
    const loops = findDistinctLoops(all.network!).loops;
    expect(loops).toHaveLength(1);
    expect(loops[0].depots.map((d) => all.network!.depotIds[d]).sort()).toEqual(['FRA', 'SXB']);
    expect(loops[0].netPerLap).toBe(-140);
    const summer = importNetwork(depots, sample('lanes-rebate-loop.csv'), { plan: { date: '2026-05-15' } });
    expect(findDistinctLoops(summer.network!).loops).toHaveLength(1);
    const november = importNetwork(depots, sample('lanes-rebate-loop.csv'), { plan: { date: '2026-11-01' } });
    expect(findDistinctLoops(november.network!).loops).toEqual([]);
  });

  it.each([
    ['2026-05-31', '2axle', []],
    ['2026-06-01', '2axle', ['KRL>MHG -582']],
    ['2026-08-31', '2axle', ['KRL>MHG -582']],
    ['2026-09-01', '2axle', []],
    ['2026-07-15', '5axle', []],
  ])('lanes-rebate-loop.csv: the seasonal clause 8.1 loop on %s for %s: %o', (date, vehicleClass, expected) => {
    const r = importNetwork(depots, sample('lanes-rebate-loop.csv'), { plan: { date, vehicleClass } });
    const ids = r.network!.depotIds;
    const seasonal = findDistinctLoops(r.network!).loops.filter((l) => !l.depots.some((d) => ids[d] === 'FRA'));
    expect(seasonal.map((l) => `${l.depots.map((d) => ids[d]).sort().join('>')} ${l.netPerLap}`)).toEqual(expected);
  });

  it('every rebate row names its clause; rows without a rebate name none', () => {
    for (const file of ['lanes.csv', 'lanes-rebate-loop.csv']) {
      const t = importNetwork(depots, sample(file)).lanes;
      for (let i = 0; i < t.count; i++) expect(t.clause![i] !== undefined).toBe(t.rebate[i] > 0);
    }
  });

  it('some lanes rely on the great-circle fallback and on estimated fuel', () => {
    const r = importNetwork(depots, sample('lanes.csv'));
    expect(r.plan.lanes.some((l) => l.distanceEstimated)).toBe(true);
    expect(r.plan.lanes.some((l) => !l.distanceEstimated)).toBe(true);
    expect(r.plan.lanes.some((l) => l.fuelEstimated)).toBe(true);
  });
});
