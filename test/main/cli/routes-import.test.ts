// `lanewright routes` on files as they really come: a semicolon, decimal-comma, BOM, CRLF export of
// the same lanes gives the same routes as the clean file; --out writes the routes CSV with the
// breakdown; planning options reach the importer; a Latin-1 file is named, not crashed on.

import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { parseCsvText } from '../../../engine/io/csv-papaparse';

const root = fileURLToPath(new URL('../../../', import.meta.url));
const work = mkdtempSync(join(tmpdir(), 'lanewright-routes-import-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function run(...args: string[]) {
  const result = spawnSync(process.execPath, ['main/cli/lanewright.mjs', ...args], { cwd: root, encoding: 'utf8', timeout: 60_000 });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}
function file(name: string, text: string | Buffer): string {
  const path = join(work, name);
  writeFileSync(path, text);
  return path;
}
function rows(text: string) {
  const [header, ...body] = parseCsvText(text).rows;
  return body.map((cells) => Object.fromEntries(header.map((h, i) => [h, cells[i]])));
}

const depots = file('d.csv', 'id,name,lat,lon\nA,Alpha,51.9,4.1\nB,Bravo,51.2,4.3\nC,Charlie,50.6,3.0\n');
const clean = file('clean.csv', 'from,to,toll,fuel,fees,rebate,distance_km,drive_minutes\nA,B,1234.50,58.40,12.00,0,94.3,83\nB,C,0,64.10,10,8,143.6,120\n');
const messy = file('messy.csv', '\ufeffOrigin;Destination;Toll;Fuel;Fees;Rebate;Distance (km);Drive time\r\nA;B;"1.234,50 €";58,40;12;0;94,3;1:23\r\nB;C;0;64,1;10;8;143,6;PT2H\r\n\r\n');

describe('routes with the importer', () => {
  it('a messy export gives the same routes as its clean twin', () => {
    const a = run('routes', '--date', '2026-06-01', '--depots', depots, '--lanes', clean, '--from', 'A');
    const b = run('routes', '--date', '2026-06-01', '--depots', depots, '--lanes', messy, '--from', 'A');
    expect(a.status, a.stderr).toBe(0);
    expect(b.stdout).toBe(a.stdout);
    const c = rows(a.stdout).find((r) => r.id === 'C')!;
    // 1234.50 + 58.40 + 12.00 + 64.10 + 10.00 - 8.00 = 1371.00.
    expect(c).toMatchObject({ cost: '1371.00', toll: '1234.50', fuel: '122.50', fees: '22.00', rebate: '8.00', distance_km: '237.9', drive_minutes: '203' });
  });

  it('--out writes the routes CSV; --drive-limit changes the flag', () => {
    const out = join(work, 'routes.csv');
    expect(run('routes', '--date', '2026-06-01', '--depots', depots, '--lanes', clean, '--from', 'A', '--out', out, '--drive-limit', '3').status).toBe(0);
    const c = rows(readFileSync(out, 'utf8')).find((r) => r.id === 'C')!;
    expect(c.over_drive_limit).toBe('yes');
    const bad = run('routes', '--date', '2026-06-01', '--depots', depots, '--lanes', clean, '--from', 'A', '--drive-limit', 'moon');
    expect(bad.status).toBe(2);
  });

  it('names a Latin-1 file instead of reading it wrongly', () => {
    const latin1 = file('latin1.csv', Buffer.from('id,name,lat,lon\nA,K\xf6ln,50.9,6.9\n', 'latin1'));
    const result = run('check', '--date', '2026-06-01', '--depots', latin1, '--lanes', clean, '--json');
    expect(result.status).toBe(1);
    expect(JSON.parse(result.stdout).errors[0]).toMatchObject({ row: 2, column: 'name' });
  });
});

describe('currency options', () => {
  it('--rates converts a second currency; --currency must be a supported ISO 4217 code', () => {
    const mixed = file('mixed.csv', 'from,to,toll,currency\nA,B,10.00,EUR\nB,C,10.00,USD\n');
    expect(run('routes', '--date', '2026-06-01', '--depots', depots, '--lanes', mixed, '--from', 'A').status).toBe(1);
    const converted = run('routes', '--date', '2026-06-01', '--depots', depots, '--lanes', mixed, '--from', 'A', '--rates', 'USD=0.9', '--json', '--fuel-price', '0');
    expect(converted.status, converted.stderr).toBe(0);
    // 10.00 EUR + 10.00 USD x 0.9 = 19.00 EUR (fuel priced at 0 so only tolls count).
    expect(JSON.parse(converted.stdout).depots.find((d: { id: string }) => d.id === 'C').cost).toBe('19.00');
    const bad = run('check', '--date', '2026-06-01', '--depots', depots, '--lanes', clean, '--currency', 'ABC');
    expect(bad.status).toBe(1);
    expect(bad.stderr.trim().split('\n')).toHaveLength(1);
  });
});
