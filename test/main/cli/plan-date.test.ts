// Without --date every command plans for today's local date and says so once on stderr; without a
// date the planner mixed lanes of every validity window (in the sample, AMS -> RTM's expired rebate
// beside its standard-rate twin gave 40.54 instead of 58.54). The JSON output names the date.

import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { todayIso } from '../../../main/cli/load-network';
import { runCli, tempFiles } from './cli-harness';

const SAMPLE = ['--depots', 'sample-data/depots.csv', '--lanes', 'sample-data/lanes.csv'];
const NOTE = 'note: planning for 2026-12-02 (today); --date to choose';

function noteCount(stderr: string): number {
  return stderr.split('\n').filter((line) => line.startsWith('note: planning for')).length;
}

describe('the date planned for', () => {
  beforeEach(() => {
    vi.useFakeTimers({ toFake: ['Date'] });
    // Local time, late evening: the local date, not the UTC one, is "today".
    vi.setSystemTime(new Date(2026, 11, 2, 23, 30));
  });
  afterEach(() => vi.useRealTimers());

  it('todayIso is the local calendar date', () => {
    expect(todayIso()).toBe('2026-12-02');
    expect(todayIso(new Date(2027, 0, 9, 0, 5))).toBe('2027-01-09');
  });

  it('routes without --date plans for today, prints one note and names the date in the JSON', async () => {
    const r = await runCli(['routes', ...SAMPLE, '--from', 'AMS', '--json']);
    expect(r.status).toBe(0);
    expect(r.stderr.split('\n')).toContain(NOTE);
    expect(noteCount(r.stderr)).toBe(1);
    const report = JSON.parse(r.stdout);
    expect(report.date).toBe('2026-12-02');
    // sample-data/lanes.csv: AMS -> RTM fuel 46.54 + fees 12.00; its 18.00 rebate ran out on 2026-06-30.
    expect(report.depots.find((d: { id: string }) => d.id === 'RTM').cost).toBe('58.54');
  });

  it('with --date there is no note and that day\'s lanes apply', async () => {
    const r = await runCli(['routes', ...SAMPLE, '--from', 'AMS', '--json', '--date', '2026-06-01']);
    expect(noteCount(r.stderr)).toBe(0);
    const report = JSON.parse(r.stdout);
    expect(report.date).toBe('2026-06-01');
    expect(report.depots.find((d: { id: string }) => d.id === 'RTM').cost).toBe('40.54');
  });

  it('check, compare, export and dispatch plan for today too, with one note each; audit reviews the whole calendar instead', async () => {
    const dir = tempFiles({ 'what-if.json': JSON.stringify({ format: 'lanewright-scenario', version: 1, name: 'none', description: null, changes: [] }) });
    const check = await runCli(['check', ...SAMPLE, '--json']);
    expect(JSON.parse(check.stdout).date).toBe('2026-12-02');
    // Without --date, audit is the review of the contract's whole calendar: no day is chosen for it.
    const audit = await runCli(['audit', ...SAMPLE, '--json']);
    expect(JSON.parse(audit.stdout).review).toBe('calendar');
    expect(noteCount(audit.stderr)).toBe(0);
    const compare = await runCli(['compare', ...SAMPLE, '--scenario', join(dir, 'what-if.json'), '--from', 'AMS', '--json']);
    expect(JSON.parse(compare.stdout).date).toBe('2026-12-02');
    const exported = await runCli(['export', ...SAMPLE, '--lanes-out', join(dir, 'lanes.csv')]);
    const dispatch = await runCli(['dispatch', ...SAMPLE, '--loads', 'sample-data/loads.csv', '--vehicles', 'sample-data/vehicles.csv', '--json']);
    for (const r of [check, compare, exported, dispatch]) {
      expect(r.stderr.split('\n')).toContain(NOTE);
      expect(noteCount(r.stderr)).toBe(1);
    }
    expect(JSON.parse(dispatch.stdout).date).toBe('2026-12-02');
  });
});
