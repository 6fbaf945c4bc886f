// The demo scenario stays what sample-data/README.md says it is: the clean lanes file has no errors,
// warnings or rebate loop; the loop variant has exactly the FRA/SXB loop (-1.40 per lap), and only on
// dates when both rebate clauses are valid; RTM plans as an origin for both vehicle classes.

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

  it('some lanes rely on the great-circle fallback and on estimated fuel', () => {
    const r = importNetwork(depots, sample('lanes.csv'));
    expect(r.plan.lanes.some((l) => l.distanceEstimated)).toBe(true);
    expect(r.plan.lanes.some((l) => !l.distanceEstimated)).toBe(true);
    expect(r.plan.lanes.some((l) => l.fuelEstimated)).toBe(true);
  });
});
