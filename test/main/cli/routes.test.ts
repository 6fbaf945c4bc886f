// `lanewright routes` run as a real process: the CSV and JSON outputs issue 2 asks for, --out,
// --timings, --max-legs, and one-line errors with a non-zero exit for bad input. Assertions name
// the columns and fields the command must carry, so added columns do not break them.

import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseCsvText } from '../../../engine/io/csv-papaparse';
import { afterAll, describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../../../', import.meta.url));
const work = mkdtempSync(join(tmpdir(), 'lanewright-cli-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function run(...args: string[]) {
  const result = spawnSync(process.execPath, ['main/cli/lanewright.mjs', ...args], { cwd: root, encoding: 'utf8', timeout: 60_000 });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

function file(name: string, text: string): string {
  const path = join(work, name);
  writeFileSync(path, text);
  return path;
}

/** Parses CSV output into objects keyed by header. */
function csvObjects(text: string): Record<string, string>[] {
  const [header, ...rows] = parseCsvText(text).rows;
  return rows.map((cells) => Object.fromEntries(header.map((h, i) => [h, cells[i]])));
}

/** A bad-input run: non-zero exit, one line on stderr, no stack trace. */
function expectOneLineError(result: ReturnType<typeof run>, mentions: string) {
  expect(result.status).not.toBe(0);
  const lines = result.stderr.trim().split('\n');
  expect(lines, result.stderr).toHaveLength(1);
  expect(lines[0]).toContain(mentions);
  expect(result.stderr).not.toMatch(/^\s+at /m);
}

// A -> B 10.00, B -> C 10.00 (with a 2.50 rebate), A -> C 50.00 direct; D has no lanes.
const depots = file('depots.csv', 'id,name,lat,lon\nA,Alpha yard,51.9,4.1\nB,Bravo dock,51.2,4.3\nC,Charlie hub,50.6,3.0\nD,Delta depot,48.7,2.3\n');
// Every fuel figure is given (the importer may estimate a missing one); the empty fees count as 0.
const lanes = file('lanes.csv', 'from,to,toll,fuel,fees,rebate\nA,B,2.00,7.00,1.00,0\nB,C,0,10.00,,2.50\nA,C,50,0,0,0\n');

describe('lanewright routes', () => {
  it('prints CSV by default: one row per depot with id, name, status, cost, legs and path', () => {
    const result = run('routes', '--date', '2026-06-01', '--depots', 'sample-data/depots.csv', '--lanes', 'sample-data/lanes.csv', '--from', 'RTM');
    expect(result.status).toBe(0);
    const rows = csvObjects(result.stdout);
    const sampleDepots = csvObjects(readFileSync(join(root, 'sample-data/depots.csv'), 'utf8'));
    expect(rows.map((r) => r.id)).toEqual(sampleDepots.map((d) => d.id));
    for (const column of ['id', 'name', 'status', 'cost', 'legs', 'path']) expect(Object.keys(rows[0])).toContain(column);
    expect(rows[0]).toMatchObject({ id: 'RTM', status: 'reachable', cost: '0.00', legs: '0', path: 'RTM' });
    // RTM -> ANR is 58.40 + 12.00 = 70.40; from the sample lanes file.
    expect(rows[1]).toMatchObject({ id: 'ANR', status: 'reachable', cost: '70.40', legs: '1', path: 'RTM>ANR' });
    expect(rows.every((r) => ['reachable', 'unreachable', 'unbounded'].includes(r.status))).toBe(true);
  });

  it('--json prints one object with depots and loops in the documented shape', () => {
    const result = run('routes', '--date', '2026-06-01', '--depots', depots, '--lanes', lanes, '--from', 'A', '--json');
    expect(result.status).toBe(0);
    expect(result.stdout.trim().split('\n')).toHaveLength(1);
    const report = JSON.parse(result.stdout);
    expect(report.origin).toBe('A');
    expect(report.loops).toEqual([]);
    const byId = Object.fromEntries(report.depots.map((d: { id: string }) => [d.id, d]));
    expect(report.depots.map((d: { id: string }) => d.id)).toEqual(['A', 'B', 'C', 'D']);
    expect(byId.A).toMatchObject({ id: 'A', name: 'Alpha yard', status: 'reachable', cost_minor: 0, cost: '0.00', legs: 0, path: ['A'], lanes: [] });
    expect(byId.B).toMatchObject({ status: 'reachable', cost_minor: 1000, cost: '10.00', legs: 1, path: ['A', 'B'], lanes: [2] });
    // 10.00 + 10.00 - 2.50 = 17.50 beats the 50.00 direct lane; lanes are given by source row.
    expect(byId.C).toMatchObject({ status: 'reachable', cost_minor: 1750, cost: '17.50', legs: 2, path: ['A', 'B', 'C'], lanes: [2, 3] });
    expect(byId.D).toMatchObject({ status: 'unreachable', cost_minor: null, cost: null, path: [], lanes: [] });
    for (const depot of report.depots) {
      for (const key of ['id', 'name', 'status', 'cost_minor', 'cost', 'legs', 'path', 'lanes']) expect(depot).toHaveProperty(key);
    }
  });

  it('--json reports rebate loops and unbounded depots, and warns on stderr', () => {
    const result = run('routes', '--date', '2026-06-01', '--depots', 'sample-data/depots.csv', '--lanes', 'sample-data/lanes-rebate-loop.csv', '--from', 'RTM', '--json');
    expect(result.status).toBe(0);
    const report = JSON.parse(result.stdout);
    expect(report.loops.length).toBeGreaterThan(0);
    for (const loop of report.loops) {
      expect(loop.depots.length).toBeGreaterThan(0);
      expect(loop.lanes).toHaveLength(loop.depots.length);
      expect(Number.isInteger(loop.net_per_lap_minor) && loop.net_per_lap_minor < 0).toBe(true);
    }
    const unbounded = report.depots.filter((d: { status: string }) => d.status === 'unbounded');
    expect(unbounded.length).toBeGreaterThan(0);
    for (const d of unbounded) expect(d).toMatchObject({ cost_minor: null, cost: null, path: [], lanes: [] });
    expect(result.stderr).toMatch(/rebate loop/i);
  });

  it('--out writes the output to a file instead of stdout', () => {
    const out = join(work, 'routes-out.csv');
    const result = run('routes', '--date', '2026-06-01', '--depots', depots, '--lanes', lanes, '--from', 'A', '--out', out);
    expect(result.status).toBe(0);
    expect(result.stdout).toBe('');
    expect(existsSync(out)).toBe(true);
    expect(csvObjects(readFileSync(out, 'utf8')).map((r) => [r.id, r.cost])).toEqual([['A', '0.00'], ['B', '10.00'], ['C', '17.50'], ['D', '']]);
  });

  it('--out that cannot be written is one line naming the file, and leaves no temporary file', () => {
    const folder = mkdtempSync(join(work, 'out-'));
    const blocked = join(folder, 'routes.csv');
    mkdirSync(blocked); // a folder where the file should go: the final rename fails
    const result = run('routes', '--date', '2026-06-01', '--depots', depots, '--lanes', lanes, '--from', 'A', '--out', blocked);
    expectOneLineError(result, blocked);
    expect(readdirSync(folder)).toEqual(['routes.csv']);
  });

  it('--timings prints one JSON line on stderr with read_ms and solve_ms', () => {
    const result = run('routes', '--date', '2026-06-01', '--depots', depots, '--lanes', lanes, '--from', 'A', '--timings');
    expect(result.status).toBe(0);
    const lines = result.stderr.trim().split('\n').filter((line) => line.startsWith('{'));
    expect(lines).toHaveLength(1);
    const timings = JSON.parse(lines[0]);
    expect(typeof timings.read_ms).toBe('number');
    expect(typeof timings.solve_ms).toBe('number');
    expect(timings.read_ms).toBeGreaterThanOrEqual(0);
  });

  it('--max-legs gives the cheapest cost within the limit', () => {
    const result = run('routes', '--date', '2026-06-01', '--depots', depots, '--lanes', lanes, '--from', 'A', '--max-legs', '1', '--json');
    expect(result.status).toBe(0);
    const report = JSON.parse(result.stdout);
    const c = report.depots.find((d: { id: string }) => d.id === 'C');
    expect(c).toMatchObject({ status: 'reachable', cost_minor: 5000, legs: 1, path: ['A', 'C'], lanes: [4] });
  });

  it('an unknown origin is one line on stderr naming it, non-zero exit', () => {
    expectOneLineError(run('routes', '--date', '2026-06-01', '--depots', depots, '--lanes', lanes, '--from', 'NOWHERE'), 'NOWHERE');
  });

  it('a missing file is one line on stderr naming the file, non-zero exit', () => {
    const missing = join(work, 'no-such-lanes.csv');
    expectOneLineError(run('routes', '--date', '2026-06-01', '--depots', depots, '--lanes', missing, '--from', 'A'), missing);
  });

  it('a folder given as a file is one line on stderr naming it, non-zero exit', () => {
    expectOneLineError(run('routes', '--date', '2026-06-01', '--depots', work, '--lanes', lanes, '--from', 'A'), work);
  });

  it('an unreadable CSV is refused with the file and row named, non-zero exit, no stack trace', () => {
    // The importer lists every bad row and the accepted/rejected counts, so this may be more than
    // one line; the line naming the problem must name the file and the row.
    const broken = file('broken.csv', 'from,to,toll\nA,"B,1.00\nB,C,2.00\n');
    const result = run('routes', '--date', '2026-06-01', '--depots', depots, '--lanes', broken, '--from', 'A');
    expect(result.status).not.toBe(0);
    expect(result.stdout).toBe('');
    expect(result.stderr).not.toMatch(/^\s+at /m);
    expect(result.stderr.split('\n').some((line) => line.includes(broken) && /row 2\b/.test(line))).toBe(true);
  });

  it('runs as `npx lanewright` from the repository root', () => {
    const result = spawnSync('npx', ['--offline', 'lanewright', 'routes', '--depots', depots, '--lanes', lanes, '--from', 'A'], {
      cwd: root,
      encoding: 'utf8',
      timeout: 60_000,
    });
    expect(result.status, result.stderr).toBe(0);
    expect(csvObjects(result.stdout).find((r) => r.id === 'C')).toMatchObject({ cost: '17.50', path: 'A>B>C' });
  });

  it('a bad --max-legs is refused in one line', () => {
    expectOneLineError(run('routes', '--date', '2026-06-01', '--depots', depots, '--lanes', lanes, '--from', 'A', '--max-legs', 'two'), 'max-legs');
  });
});
