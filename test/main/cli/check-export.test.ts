// `lanewright check` and `lanewright export` run as real processes: exit status 0/1 on errors, the
// documented JSON shape, one line per problem and no stack trace, --skip-invalid, and files written.

import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../../../', import.meta.url));
const work = mkdtempSync(join(tmpdir(), 'lanewright-check-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function run(...args: string[]) {
  const result = spawnSync(process.execPath, ['main/cli/lanewright.mjs', ...args], { cwd: root, encoding: 'utf8', timeout: 60_000 });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

const D = 'sample-data/depots.csv';

describe('lanewright check', () => {
  it('exits 0 on the clean sample and 1 on the broken one, with the documented JSON', () => {
    expect(run('check', '--date', '2026-06-01', '--depots', D, '--lanes', 'sample-data/lanes.csv').status).toBe(0);
    const bad = run('check', '--date', '2026-06-01', '--depots', D, '--lanes', 'sample-data/broken/lanes-broken.csv', '--json');
    expect(bad.status).toBe(1);
    const report = JSON.parse(bad.stdout);
    for (const key of ['total', 'accepted', 'rejected', 'errors', 'warnings']) expect(report).toHaveProperty(key);
    expect(report.accepted + report.rejected).toBe(report.total);
    for (const item of [...report.errors, ...report.warnings]) {
      for (const key of ['file', 'row', 'column', 'value', 'message']) expect(item).toHaveProperty(key);
    }
    const codes = new Set(report.errors.map((e: { code: string }) => e.code));
    for (const c of ['unknown-depot', 'not-a-number', 'not-finite', 'negative-value', 'bad-date', 'mixed-currency', 'unbalanced-quotes']) expect(codes).toContain(c);
    const depotErrors = JSON.parse(run('check', '--date', '2026-06-01', '--depots', 'sample-data/broken/depots-broken.csv', '--lanes', 'sample-data/lanes.csv', '--json').stdout);
    const depotCodes = new Set(depotErrors.errors.map((e: { code: string }) => e.code));
    for (const c of ['latitude-range', 'longitude-range', 'duplicate-depot']) expect(depotCodes).toContain(c);
  });
});

describe('routes with a broken lanes file', () => {
  it('refuses with one line per problem and no stack trace, or plans the accepted rows with --skip-invalid', () => {
    const refused = run('routes', '--date', '2026-06-01', '--depots', D, '--lanes', 'sample-data/broken/lanes-broken.csv', '--from', 'RTM');
    expect(refused.status).toBe(1);
    expect(refused.stdout).toBe('');
    expect(refused.stderr).not.toMatch(/^\s+at /m);
    expect(refused.stderr.split('\n').filter((l) => l.startsWith('error: ')).length).toBeGreaterThanOrEqual(10);
    const skipped = run('routes', '--date', '2026-06-01', '--depots', D, '--lanes', 'sample-data/broken/lanes-broken.csv', '--from', 'RTM', '--skip-invalid');
    expect(skipped.status).toBe(0);
    expect(skipped.stdout.split('\r\n')[0]).toMatch(/^id,name,status,cost/);
    expect(skipped.stderr).toMatch(/error: .*row 3/);
  });

  it('--vehicle-class and --date change the plan; an unknown class is refused in one line', () => {
    const five = run('routes', '--date', '2026-06-01', '--depots', D, '--lanes', 'sample-data/lanes.csv', '--from', 'RTM', '--vehicle-class', '5axle', '--json');
    const two = run('routes', '--depots', D, '--lanes', 'sample-data/lanes.csv', '--from', 'RTM', '--vehicle-class', '2axle', '--date', '2026-08-15', '--json');
    expect(five.status).toBe(0);
    expect(two.status).toBe(0);
    const cost = (out: string, id: string) => JSON.parse(out).depots.find((d: { id: string }) => d.id === id).cost_minor;
    expect(cost(two.stdout, 'PAR')).toBeLessThan(cost(five.stdout, 'PAR'));
    const bad = run('routes', '--date', '2026-06-01', '--depots', D, '--lanes', 'sample-data/lanes.csv', '--from', 'RTM', '--vehicle-class', '9axle');
    expect(bad.status).toBe(1);
    expect(bad.stderr.trim().split('\n')).toHaveLength(1);
  });
});

describe('lanewright export', () => {
  it('writes the chosen files', () => {
    const lanes = join(work, 'lanes.csv');
    const routes = join(work, 'routes.csv');
    const loops = join(work, 'loops.csv');
    const geo = join(work, 'net.geojson');
    const result = run('export', '--date', '2026-06-01', '--depots', D, '--lanes', 'sample-data/lanes-rebate-loop.csv', '--from', 'RTM', '--lanes-out', lanes, '--routes-out', routes, '--loops-out', loops, '--geojson-out', geo);
    expect(result.status, result.stderr).toBe(0);
    for (const f of [lanes, routes, loops, geo]) expect(existsSync(f)).toBe(true);
    const json = JSON.parse(readFileSync(geo, 'utf8'));
    expect(json.type).toBe('FeatureCollection');
    // Its settings and the caution travel with it, as in the app's export.
    expect(json.settings).toEqual({ date: '2026-06-01', vehicle_class: null, files: [D, 'sample-data/lanes-rebate-loop.csv'], scenario: null });
    expect(json.caution).toMatch(/estimate/i);
    expect(readFileSync(loops, 'utf8')).toMatch(/FRA,SXB,20/);
    expect(result.stderr).toMatch(/rebate loop/i);
    // The exported lanes re-import cleanly.
    expect(run('check', '--date', '2026-06-01', '--depots', D, '--lanes', lanes).status).toBe(0);
    expect(run('export', '--date', '2026-06-01', '--depots', D, '--lanes', 'sample-data/lanes.csv').status).toBe(2);
  });
});
