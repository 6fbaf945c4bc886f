// `lanewright export`: the lanes file keeps every row and class column whatever --date and
// --vehicle-class plan (it dropped the class tolls and the rows of other dates), and --scenario
// exports the contract as the scenario changes it, through the same overlay as `compare`.

import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCsvText } from '../../../engine/io/csv-papaparse';
import { parseCommandLine } from '../../../main/cli/args';
import { exportCommand } from '../../../main/cli/commands/export';
import type { CommandOutput } from '../../../main/cli/run';
import { runCli, tempFiles } from './cli-harness';

const depots = ['id,name,lat,lon', 'A,Alpha yard,51.0,4.0', 'B,Bravo yard,51.1,4.1', 'C,Charlie yard,51.2,4.2'].join('\n');
const lanes = [
  'from,to,ref,toll,toll_2axle,toll_5axle,fuel,fees,rebate,valid_from,valid_to',
  'A,B,R1,18.20,8.19,18.20,10.00,0,0,2026-01-01,2026-06-30',
  'A,B,R1,19.00,9.00,19.00,10.00,0,0,2026-07-01,2026-12-31',
  'B,C,,5.00,,,1.00,0,0,,',
].join('\n');

describe('lanewright export', () => {
  it('writes every row with every class column and the validity columns, and re-imports for another class', async () => {
    const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': lanes });
    const out = join(dir, 'out.csv');
    const run = await runCli(['export', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--date', '2026-08-15', '--vehicle-class', '2axle', '--lanes-out', out]);
    expect(run.status).toBe(0);
    const [header, ...rows] = parseCsvText(readFileSync(out, 'utf8')).rows;
    expect(header.slice(0, 6)).toEqual(['from', 'to', 'ref', 'toll', 'toll_2axle', 'toll_5axle']);
    expect(header).toContain('valid_from');
    expect(rows).toHaveLength(3);
    const again = await runCli(['routes', '--depots', join(dir, 'depots.csv'), '--lanes', out, '--from', 'A', '--vehicle-class', '5axle', '--date', '2026-03-01', '--json']);
    expect(again.status).toBe(0);
    expect(JSON.parse(again.stdout).depots.find((d: { id: string }) => d.id === 'B').cost_minor).toBe(2820);
  });

  it('--scenario exports the changed contract; a change whose lane is missing is named and kept', async () => {
    const scenario = JSON.stringify({
      format: 'lanewright-scenario', version: 2, name: 's', description: null,
      changes: [
        { kind: 'set-amount', lane: { from: 'A', to: 'B', ref: 'R1', occurrence: 2 }, field: 'toll', amountMinor: 1500, vehicleClass: '2axle', note: null },
        { kind: 'close-lane', lane: { from: 'C', to: 'A', ref: null, occurrence: 1 }, note: null },
      ],
    });
    const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': lanes, 's.json': scenario });
    const out = join(dir, 'out.csv');
    const routes = join(dir, 'routes.csv');
    const run = await runCli(['export', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--vehicle-class', '2axle', '--date', '2026-08-15', '--scenario', join(dir, 's.json'), '--from', 'A', '--lanes-out', out, '--routes-out', routes]);
    expect(run.status).toBe(0);
    expect(run.stderr).toMatch(/C → A, no ref/);
    const [header, ...rows] = parseCsvText(readFileSync(out, 'utf8')).rows;
    expect(rows[1][header.indexOf('toll_2axle')]).toBe('15.00');
    expect(rows[1][header.indexOf('toll_5axle')]).toBe('19.00');
    const [rh, ...rr] = parseCsvText(readFileSync(routes, 'utf8')).rows;
    expect(rr.find((r) => r[0] === 'B')![rh.indexOf('cost')]).toBe('25.00');
  });

  it('--routes-out writes the same file as routes --out, row by row through a streamed file (never one string)', async () => {
    const dir = tempFiles({});
    const common = ['--depots', 'sample-data/depots.csv', '--lanes', 'sample-data/lanes.csv', '--from', 'RTM', '--date', '2026-06-01'];
    const exported = join(dir, 'export-routes.csv');
    const routed = join(dir, 'routes.csv');
    const a = await runCli(['export', ...common, '--routes-out', exported]);
    const b = await runCli(['routes', ...common, '--out', routed]);
    expect([a.status, b.status]).toEqual([0, 0]);
    expect(readFileSync(exported, 'utf8')).toBe(readFileSync(routed, 'utf8'));
    expect(a.stdout).toMatch(/^wrote routes from RTM: .*export-routes\.csv \(\d+ depots\)$/m);
    expect(a.stderr).toContain('CAUTION: ');

    // The command asks for a streamed file; a whole-text file for the routes would hold the output in memory.
    const args = parseCommandLine('export', [...common, '--routes-out', exported, '--lanes-out', join(dir, 'lanes.csv')], exportCommand.options, new Map());
    const whole: string[] = [];
    const streamed: { path: string; chunks: string[] }[] = [];
    const output: CommandOutput = {
      write: () => undefined,
      writeFile: (path) => whole.push(path),
      openFile: (path) => {
        const file = { path, chunks: [] as string[] };
        streamed.push(file);
        return { write: (text) => file.chunks.push(text) };
      },
      warn: () => undefined,
      afterOutput: () => undefined,
      timing: () => undefined,
    };
    expect((await exportCommand.load())(args, output)).toBe(0);
    expect(whole).toEqual([join(dir, 'lanes.csv')]);
    expect(streamed.map((f) => f.path)).toEqual([exported]);
    expect(streamed[0].chunks.join('')).toBe(readFileSync(routed, 'utf8'));
  });
});
