// `lanewright dispatch` on the sample carrier's loads: CSV with one row per load, the JSON shape of
// issue 11, the caution, row errors of a bad loads file, and refused options.

import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCsvText } from '../../../engine/io/csv-papaparse';
import { DISPATCH_CAUTION } from '../../../engine/text/cautions';
import { runCli, tempFiles } from './cli-harness';

const BASE = ['dispatch', '--depots', 'sample-data/depots.csv', '--lanes', 'sample-data/lanes.csv', '--loads', 'sample-data/loads.csv', '--vehicles', 'sample-data/vehicles.csv', '--date', '2026-08-15'];

describe('lanewright dispatch', () => {
  it('writes one CSV row per load with status, cost and the blocking limit', async () => {
    const r = await runCli(BASE);
    expect(r.status).toBe(0);
    const [header, ...rows] = parseCsvText(r.stdout).rows.filter((row) => row.length > 1);
    const rec = rows.map((row) => Object.fromEntries(header.map((h, i) => [h, row[i]])));
    expect(rec).toHaveLength(12);
    const blocked = rec.find((x) => x.load === 'L-0815-03')!;
    expect(blocked.status).toBe('blocked');
    expect(blocked.blocked_by).toBe('max_height_m 4.00 < 4.20 on lane row 36');
    const dd = rec.find((x) => x.load === 'L-0815-01')!;
    expect(dd.status).toBe('planned');
    expect(Number(dd.limits_extra)).toBeGreaterThan(0);
    expect(dd.avoided).toContain('max_height_m 4.10 < 4.20 on lane row 2');
    expect(rec.every((x) => x.caution === DISPATCH_CAUTION)).toBe(true);
    expect(r.stderr).toContain('CAUTION: ' + DISPATCH_CAUTION);
  });

  it('prints the JSON shape with alternatives and totals', async () => {
    const r = await runCli([...BASE, '--json', '--alternatives', '2']);
    expect(r.status).toBe(0);
    const report = JSON.parse(r.stdout);
    expect(report.date).toBe('2026-08-15');
    expect(report.caution).toBe(DISPATCH_CAUTION);
    const load = report.loads.find((l: { load: string }) => l.load === 'L-0815-05');
    expect(Object.keys(load)).toEqual(expect.arrayContaining(['load', 'from', 'to', 'date', 'vehicle', 'vehicle_class', 'status', 'cost_minor', 'cost', 'legs', 'path', 'lanes', 'limits_extra_minor', 'blocked_by', 'alternatives']));
    expect(load).toMatchObject({ vehicle: 'BFH-T3', status: 'planned', path: ['BSL', 'ZRH', 'MIL'] });
    expect(load.alternatives).toHaveLength(2);
    expect(load.alternatives[0].cost_minor).toBeGreaterThanOrEqual(load.cost_minor);
    expect(report.totals.by_date.map((t: { key: string }) => t.key)).toEqual(['2026-08-15', '2026-08-16']);
    expect(report.totals.all).toMatchObject({ loads: 12, blocked: 2 });
  });

  it('stops on loads-file errors naming file, row, column and value', async () => {
    const dir = tempFiles({ 'loads.csv': 'load,from,to\nL1,RTM,NOPE\nL2,RTM,RTM\n' });
    const r = await runCli([...BASE.slice(0, 5), '--loads', join(dir, 'loads.csv'), '--date', '2026-08-15']);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('row 2, column "to", value "NOPE"');
    expect(r.stderr).toContain('row 3, column "to", value "RTM"');
    const skipped = await runCli([...BASE.slice(0, 5), '--loads', join(dir, 'loads.csv'), '--date', '2026-08-15', '--skip-invalid']);
    expect(skipped.status).toBe(0);
    expect(skipped.stderr).toContain('2 rows, 0 accepted, 2 rejected');
  });

  it('refuses too many alternatives', async () => {
    const r = await runCli([...BASE, '--alternatives', '99']);
    expect(r.status).toBe(2);
  });
});
