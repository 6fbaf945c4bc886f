import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { runCli, tempFiles } from './cli-harness';

const depots = ['id,name,lat,lon', 'A,Alpha yard,51.0,4.0', 'B,Bravo yard,51.1,4.1', 'C,Charlie yard,51.2,4.2'].join('\n');
const lanes = ['from,to,toll,fuel,fees,rebate', 'A,B,10.00,0,0,0', 'B,C,10.00,0,0,0', 'A,C,25.00,0,0,0', 'C,B,2.00,0,0,0'].join('\n');
const scenario = JSON.stringify({
  format: 'lanewright-scenario',
  version: 1,
  name: 'Toll rise on A-B and a backhaul credit',
  description: null,
  changes: [
    { kind: 'set-amount', lane: { from: 'A', to: 'B', ref: null, occurrence: 1 }, field: 'toll', amountMinor: 2000, note: null },
    { kind: 'set-amount', lane: { from: 'C', to: 'B', ref: null, occurrence: 1 }, field: 'rebate', amountMinor: 1500, note: null },
    { kind: 'close-lane', lane: { from: 'C', to: 'A', ref: null, occurrence: 1 }, note: null },
  ],
});

describe('lanewright compare', () => {
  it('prints per-depot changes, changed routes, appearing loops and problems', async () => {
    const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': lanes, 'what-if.json': scenario });
    const args = ['compare', '--date', '2026-06-01', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--scenario', join(dir, 'what-if.json'), '--from', 'A'];
    const { status, stdout, stderr } = await runCli([...args, '--json']);
    expect(status).toBe(0);
    const report = JSON.parse(stdout);
    expect(report.depots.map((d: { id: string; base_status: string; scenario_status: string }) => [d.id, d.base_status, d.scenario_status])).toEqual([
      ['A', 'reachable', 'reachable'],
      ['B', 'reachable', 'unbounded'], // B>C>B nets 10 - 13 = -3 per lap in the scenario
      ['C', 'reachable', 'unbounded'],
    ]);
    expect(report.loops_appeared).toMatchObject([{ depots: ['B', 'C'], rows: [3, 5], net_per_lap_minor: -300, reached_from_origin: true }]);
    expect(report.problems).toMatchObject([{ change: 3, code: 'lane-missing', lane: 'C>A||1' }]);
    // The message names the lane in words; the key text stays in the JSON's lane field (for files).
    expect(stderr).toMatch(/names lane C → A, no ref, which/);
    expect(stderr).not.toMatch(/C>A\|\|1/);
    expect(stderr).toMatch(/creates a rebate loop B > C/);

    const csv = await runCli([...args, '--out', join(dir, 'compare.csv')]);
    expect(csv.status).toBe(0);
    expect(readFileSync(join(dir, 'compare.csv'), 'utf8').split('\r\n')[0]).toBe('id,name,base_status,scenario_status,base_cost,scenario_cost,change,route_changed,base_route,scenario_route');
    // The scenario file is read, never rewritten.
    expect(readFileSync(join(dir, 'what-if.json'), 'utf8')).toBe(scenario);
  });

  it('names the scenario file and field when the scenario is malformed', async () => {
    const broken = scenario.replace('"amountMinor":2000', '"amountMinor":"20.00"');
    const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': lanes, 'what-if.json': broken });
    const { status, stderr } = await runCli(['compare', '--date', '2026-06-01', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--scenario', join(dir, 'what-if.json'), '--from', 'A']);
    expect(status).toBe(1);
    expect(stderr).toMatch(/what-if\.json/);
    expect(stderr).toMatch(/\/changes\/0\/amountMinor/);
  });

  it('refuses an unknown origin and a missing --scenario', async () => {
    const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': lanes, 'what-if.json': scenario });
    const unknown = await runCli(['compare', '--date', '2026-06-01', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--scenario', join(dir, 'what-if.json'), '--from', 'ZZ']);
    expect(unknown.status).toBe(1);
    expect(unknown.stderr).toMatch(/ZZ/);
    const missing = await runCli(['compare', '--date', '2026-06-01', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--from', 'A']);
    expect(missing.status).toBe(2);
  });

  // Two rows A>B with ref R1, valid in the first and the second half of 2026: occurrences are
  // counted over the file, so on 2026-08-15 occurrence 2 (the second-half row) is the one planned.
  it('a change names a row of the file whatever --date and --vehicle-class plan', async () => {
    const halves = ['from,to,ref,toll,fuel,fees,rebate,valid_from,valid_to', 'A,B,R1,10.00,0,0,0,2026-01-01,2026-06-30', 'A,B,R1,20.00,0,0,0,2026-07-01,2026-12-31'].join('\n');
    const set = (occurrence: number, amountMinor: number, vehicleClass: string | null = null) =>
      JSON.stringify({ format: 'lanewright-scenario', version: 2, name: 'x', description: null, changes: [{ kind: 'set-amount', lane: { from: 'A', to: 'B', ref: 'R1', occurrence }, field: 'toll', amountMinor, vehicleClass, note: null }] });
    const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': halves, 'first.json': set(1, 100), 'second.json': set(2, 2500) });
    const compare = async (file: string, ...more: string[]) => {
      const { status, stdout } = await runCli(['compare', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--scenario', join(dir, file), '--from', 'A', '--json', ...more]);
      expect(status).toBe(0);
      return JSON.parse(stdout) as { problems: unknown[]; depots: { id: string; scenario_cost_minor: number | null }[] };
    };
    const first = await compare('first.json', '--date', '2026-08-15');
    expect(first.problems).toEqual([]);
    expect(first.depots.find((d) => d.id === 'B')!.scenario_cost_minor).toBe(2000); // the first-half row is not planned
    const second = await compare('second.json', '--date', '2026-08-15');
    expect(second.problems).toEqual([]);
    expect(second.depots.find((d) => d.id === 'B')!.scenario_cost_minor).toBe(2500);

    const perClass = ['from,to,ref,vehicle_class,toll,fuel,fees,rebate', 'A,B,R1,2axle,8.19,0,0,0', 'A,B,R1,5axle,18.20,0,0,0'].join('\n');
    const dir2 = tempFiles({ 'depots.csv': depots, 'lanes.csv': perClass, 's.json': set(2, 1900, '5axle') });
    const { stdout } = await runCli(['compare', '--depots', join(dir2, 'depots.csv'), '--lanes', join(dir2, 'lanes.csv'), '--scenario', join(dir2, 's.json'), '--from', 'A', '--json', '--vehicle-class', '5axle']);
    const report = JSON.parse(stdout) as { problems: unknown[]; depots: { id: string; scenario_cost_minor: number }[] };
    expect(report.problems).toEqual([]);
    expect(report.depots.find((d) => d.id === 'B')!.scenario_cost_minor).toBe(1900);
  });
});
