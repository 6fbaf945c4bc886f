import { describe, expect, it } from 'vitest';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { runCli, tempFiles } from './cli-harness';
import { referenceHasNegativeLoop } from '../../engine/audit/reference';
import { seededRandom } from '../../support/seeded-random';

const depots = ['id,name,lat,lon', 'A,Alpha yard,51.0,4.0', 'B,Bravo yard,51.1,4.1', 'C,Charlie yard,51.2,4.2', 'D,Delta yard,51.3,4.3'].join('\n');
// Rows 2-3 form a loop A>B>A netting 10.00 - 12.50 = -2.50 per lap; D has no way back to anything.
const lanes = ['from,to,toll,fuel,fees,rebate', 'A,B,4.00,5.00,1.00,0', 'B,A,3.00,4.00,0.50,20.00', 'B,C,2.00,3.00,0,0', 'C,D,1.00,0,0,0', 'C,B,6.00,0,0,0'].join('\n');

describe('lanewright audit', () => {
  it('prints the JSON the contract review asks for, with a verified fix plan and headroom after it', async () => {
    const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': lanes });
    const { status, stdout, stderr } = await runCli(['audit', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--json', '--date', '2026-01-01']);
    expect(status).toBe(0);
    const report = JSON.parse(stdout);
    expect([report.review, report.date]).toEqual(['day', '2026-01-01']);
    for (const k of ['loops', 'fix_plan', 'headroom', 'headroom_after_fix_plan', 'loop_cap_reached']) expect(report).toHaveProperty(k);
    expect(report.loops).toHaveLength(1);
    expect(report.loops[0]).toMatchObject({ depots: ['A', 'B'], lanes: [2, 3], net_per_lap_minor: -250, unbounded_depots: ['A', 'B', 'C', 'D'] });
    expect(report.fix_plan).toEqual([expect.objectContaining({ row: 3, from: 'B', to: 'A', net_minor: -1250, new_net_minor: -1000 })]);
    expect(report.headroom_after_fix_plan).toBe(true);
    expect(report.loop_cap_reached).toBe(false);
    // After the fix, A>B (10.00) may drop to -(B>A = -10.00) = 10.00: no headroom left; C>D has no way back.
    const head = (row: number) => report.headroom.find((h: { row: number }) => h.row === row);
    expect(head(2)).toMatchObject({ from: 'A', to: 'B', net_minor: 1000, floor_minor: 1000 });
    expect(head(5)).toMatchObject({ from: 'C', to: 'D', floor_minor: null });
    // The plan, checked outside the engine: no negative loop remains.
    const ids = ['A', 'B', 'C', 'D'];
    const after = report.headroom.map((h: { from: string; to: string; net_minor: number }) => [ids.indexOf(h.from), ids.indexOf(h.to), h.net_minor]);
    expect(referenceHasNegativeLoop(4, after)).toBe(false);
    expect(stderr).toMatch(/WARNING/);
  });

  it('writes the lane table with --out and the loop table with --loops-csv, leaving no temporary files', async () => {
    const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': lanes });
    const { status } = await runCli([
      'audit', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--out', join(dir, 'audit.csv'), '--loops-csv', join(dir, 'loops.csv'), '--date', '2026-01-01',
    ]);
    expect(status).toBe(0);
    const laneRows = readFileSync(join(dir, 'audit.csv'), 'utf8').trim().split('\r\n');
    expect(laneRows[0]).toBe('row,from,to,ref,toll,fuel,fees,rebate,net,on_loops,new_rebate,new_net,floor,headroom');
    expect(laneRows[2]).toBe('3,B,A,,3.00,4.00,0.50,20.00,-12.50,1,17.50,-10.00,-10.00,0.00');
    expect(laneRows[4]).toBe('5,C,D,,1.00,0.00,0.00,0.00,1.00,,,,no limit,no limit');
    const loopRows = readFileSync(join(dir, 'loops.csv'), 'utf8').trim().split('\r\n');
    expect(loopRows).toHaveLength(3);
    expect(loopRows[1].startsWith('1,1,2,A,B,')).toBe(true);
    expect(readdirSync(dir).filter((f) => f.endsWith('.tmp'))).toEqual([]);
  });

  it('a loop-free network: no loops, no plan, headroom on the network as is', async () => {
    const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': lanes.replace('20.00', '5.00') });
    const { stdout, stderr } = await runCli(['audit', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--json', '--date', '2026-01-01']);
    const report = JSON.parse(stdout);
    expect([report.loops, report.fix_plan, report.headroom_after_fix_plan]).toEqual([[], [], false]);
    expect(stderr).toBe('');
  });

  it('--negotiable moves the cut to the named contract', async () => {
    // A>B nets -2.00, B>A 0.00: the lap pays 2.00. Both rebates cover it; by default the cut that is the
    // smaller share (2 of 12 on K-1, not 2 of 10 on K-2) is chosen.
    const withRefs = ['from,to,ref,toll,fuel,fees,rebate', 'A,B,K-1,10.00,0,0,12.00', 'B,A,K-2,10.00,0,0,10.00'].join('\n');
    const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': withRefs });
    const args = ['audit', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--json', '--date', '2026-01-01'];
    const plain = JSON.parse((await runCli(args)).stdout);
    expect(plain.fix_plan.map((f: { ref: string; new_rebate_minor: number }) => [f.ref, f.new_rebate_minor])).toEqual([['K-1', 1000]]);
    const chosen = JSON.parse((await runCli([...args, '--negotiable', 'K-2'])).stdout);
    expect(chosen.fix_plan.map((f: { ref: string; new_rebate_minor: number; negotiable: boolean }) => [f.ref, f.new_rebate_minor, f.negotiable])).toEqual([['K-2', 800, true]]);
    // A name that matches no lane is said on stderr, not passed over in silence.
    const typo = await runCli([...args, '--negotiable', 'K-2,K-9']);
    expect(typo.stderr).toMatch(/--negotiable: .*"K-9"/);
    expect(typo.stderr).not.toMatch(/"K-2"/);
  });

  it('reports progress on stderr with --progress', async () => {
    const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': lanes });
    const { stderr } = await runCli(['audit', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--progress', '--date', '2026-01-01']);
    expect(stderr).toMatch(/audit: headroom 100%/);
    const calendar = await runCli(['audit', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--progress']);
    expect(calendar.stderr).toMatch(/audit: periods 100%[\s\S]*audit: headroom 100%/);
  });

  it('refuses a bad --loop-cap and a missing file with one line each', async () => {
    const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': lanes });
    const bad = await runCli(['audit', '--date', '2026-06-01', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--loop-cap', '0']);
    expect(bad.status).toBe(2);
    expect(bad.stderr.trim().split('\n')).toHaveLength(1);
    const missing = await runCli(['audit', '--date', '2026-06-01', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'nope.csv')]);
    expect(missing.status).toBe(1);
    expect(missing.stderr).toMatch(/nope\.csv/);
    expect(existsSync(join(dir, 'nope.csv'))).toBe(false);
  });

  it('--negotiable lane keys count occurrences over the file, whatever --date plans', async () => {
    const halves = ['from,to,ref,toll,fuel,fees,rebate,valid_from,valid_to', 'A,B,R1,10.00,0,0,0,2026-01-01,2026-06-30', 'A,B,R1,20.00,0,0,0,2026-07-01,2026-12-31', 'B,A,R2,5.00,0,0,30.00,,'].join('\n');
    const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': halves });
    const { status, stdout, stderr } = await runCli(['audit', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--date', '2026-08-15', '--negotiable', 'A>B|R1|2', '--json']);
    expect(status).toBe(0);
    expect(stderr).not.toMatch(/--negotiable: no lane/);
    // The second-half row (A>B|R1|2, file row 3) is the lane planned on 2026-08-15.
    expect(JSON.parse(stdout).loops[0].lanes).toContain(3);
  });

  describe('without --date: the whole calendar', () => {
    // Rows 2-3 loop (A>B>A -2.50) only while row 3's rebate holds (March to September); row 5 is a
    // rebate in another clause that never meets it. A ref with markup checks the report escapes it.
    const dated = ['from,to,ref,toll,fuel,fees,rebate,valid_from,valid_to,clause', 'A,B,<b>K-1</b>,4.00,5.00,1.00,0,,,', 'B,A,K-2,3.00,4.00,0.50,20.00,2026-03-01,2026-09-30,7.2',
      'B,A,K-2-BASE,3.00,4.00,0.50,0,,,', 'B,C,K-3,2.00,3.00,0,0,,,', 'C,B,K-4,6.00,0,0,3.00,2026-01-01,2026-12-31,7.2'].join('\n');

    it('prints the calendar JSON: window, periods with their loops, loop ranges, clauses and a verified plan', async () => {
      const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': dated });
      const { status, stdout, stderr } = await runCli(['audit', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--json']);
      expect(status).toBe(0);
      const report = JSON.parse(stdout);
      expect(report.review).toBe('calendar');
      expect(report.window).toEqual({ from: '2026-01-01', to: '2026-12-31' });
      expect(report.periods.map((p: { from: string; loops: number[] }) => [p.from, p.loops])).toEqual([['2026-01-01', []], ['2026-03-01', [1]], ['2026-10-01', []]]);
      expect(report.loops[0]).toMatchObject({ id: 1, depots: ['A', 'B'], lanes: [2, 3], clauses: ['7.2'], ranges: [{ from: '2026-03-01', to: '2026-09-30', net_per_lap_minor: -250 }] });
      expect(report.clauses[0]).toMatchObject({ clause: '7.2', lanes: [3, 6], rebate_minor: 2300, loops: [1], ranges: [{ from: '2026-03-01', to: '2026-09-30' }] });
      expect(report.fix_plan).toEqual([expect.objectContaining({ row: 3, cut_minor: 250, new_net_minor: -1000, clause: '7.2' })]);
      expect(report.fix_plan_verified).toBe(true);
      const head = report.headroom.find((h: { row: number }) => h.row === 2);
      expect(head).toMatchObject({ floor_minor: 1000, set_by: { from: '2026-03-01', to: '2026-09-30' } });
      expect(stderr).toMatch(/calendar review: 2026-01-01 to 2026-12-31, 3 periods/);
      expect(stderr).toMatch(/loop 1: A > B > A, clauses 7.2, 2026-03-01 to 2026-09-30/);
    });

    it('--fix-by clause cuts one percentage per clause; --report writes a self-contained, escaped HTML file', async () => {
      const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': dated });
      const html = join(dir, 'review.html');
      const { status, stdout } = await runCli(['audit', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--json', '--fix-by', 'clause', '--report', html]);
      expect(status).toBe(0);
      const report = JSON.parse(stdout);
      // 13% of 20.00 = 2.60 >= 2.50 (12% = 2.40 is not enough); the clause's other row is cut 13% too, rounded up.
      expect(report.fix_plan.map((f: { row: number; clause_percent: number; cut_minor: number }) => [f.row, f.clause_percent, f.cut_minor])).toEqual([[3, 13, 260], [6, 13, 39]]);
      const text = readFileSync(html, 'utf8');
      expect(text).toContain('&lt;b&gt;K-1&lt;/b&gt;');
      expect(text).not.toContain('<b>K-1</b>');
      expect(text).not.toMatch(/<script|src=|href=/i);
      expect(text).toMatch(/2026-01-01 to 2026-12-31/);
      expect(text).toMatch(/[0-9a-f]{64}/);
      expect(text).toContain('Defer to local codes');
    });

    it('--scenario reviews the calendar as the what-if changes it; --fix-scenario-out writes the plan as a scenario that leaves no loop', async () => {
      // The what-if: K-2's rebate only in March-April, K-4 closed, and a new lane C>A (net -20.00) from
      // November, which makes A>B>C>A pay 10.00 + 5.00 - 20.00 = -5.00 per lap.
      const k = (from: string, to: string, ref: string) => ({ from, to, ref, occurrence: 1 });
      const scenario = {
        format: 'lanewright-scenario',
        version: 2,
        name: 'Spring rebate, new backhaul',
        description: null,
        changes: [
          { kind: 'set-validity', lane: k('B', 'A', 'K-2'), validFrom: '2026-03-01', validTo: '2026-04-30', note: null },
          { kind: 'close-lane', lane: k('C', 'B', 'K-4'), note: null },
          { kind: 'add-lane', lane: { from: 'C', to: 'A', ref: 'NEW-1', tollMinor: 0, fuelMinor: 0, feesMinor: 0, rebateMinor: 2000, validFrom: '2026-11-01', validTo: '2026-12-31', distanceKm: 30, driveMinutes: 30 }, note: null },
        ],
      };
      const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': dated, 'what-if.json': JSON.stringify(scenario) });
      const base = ['audit', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--json'];
      const fixFile = join(dir, 'fix.json');
      const { status, stdout, stderr } = await runCli([...base, '--scenario', join(dir, 'what-if.json'), '--fix-scenario-out', fixFile]);
      expect([status, stderr]).toEqual([0, expect.stringMatching(/calendar review under scenario "Spring rebate, new backhaul"/)]);
      const report = JSON.parse(stdout);
      expect(report.scenario.name).toBe('Spring rebate, new backhaul');
      expect(report.scenario.changes.map((c: { applied: boolean }) => c.applied)).toEqual([true, true, true]);
      // The added lane has no file row: it reads row 0.
      expect(report.loops.map((l: { depots: string[]; lanes: number[]; ranges: { from: string; to: string }[] }) => [l.depots.join('>'), l.lanes, l.ranges.map((r) => `${r.from}..${r.to}`)])).toEqual([
        ['A>B', [2, 3], ['2026-03-01..2026-04-30']],
        ['A>B>C', [2, 5, 0], ['2026-11-01..2026-12-31']],
      ]);
      // K-4 is closed: clause 7.2 holds K-2 alone.
      expect(report.clauses.find((c: { clause: string }) => c.clause === '7.2')).toMatchObject({ lanes: [3], rebate_minor: 2000 });
      expect(report.fix_plan_verified).toBe(true);
      const fix = JSON.parse(readFileSync(fixFile, 'utf8'));
      expect(fix.changes.length).toBe(3 + report.fix_plan.length);
      const again = await runCli([...base, '--scenario', fixFile]);
      expect(JSON.parse(again.stdout).loops).toEqual([]);
      // One day under the scenario: the day report names it; without the scenario November has no loop.
      const day = await runCli([...base, '--scenario', join(dir, 'what-if.json'), '--date', '2026-11-15']);
      expect(JSON.parse(day.stdout)).toMatchObject({ review: 'day', date: '2026-11-15', scenario: 'Spring rebate, new backhaul', loops: [expect.objectContaining({ depots: ['A', 'B', 'C'] })] });
      const plain = await runCli([...base, '--date', '2026-11-15']);
      expect(JSON.parse(plain.stdout)).toMatchObject({ scenario: null, loops: [] });
      // A scenario file that is missing or not a scenario: one line naming it, nothing written.
      const missing = await runCli([...base, '--scenario', join(dir, 'nope.json')]);
      expect([missing.status, missing.stdout]).toEqual([1, '']);
      expect(missing.stderr.trim().split('\n')).toEqual([expect.stringMatching(/nope\.json.*file not found/)]);
      const notScenario = await runCli([...base, '--date', '2026-11-15', '--scenario', join(dir, 'lanes.csv')]);
      expect([notScenario.status, notScenario.stdout]).toEqual([1, '']);
      expect(notScenario.stderr).toMatch(/lanes\.csv/);
      const dayFix = await runCli([...base, '--date', '2026-11-15', '--fix-scenario-out', fixFile]);
      expect([dayFix.status, dayFix.stderr]).toEqual([2, expect.stringMatching(/--fix-scenario-out belongs to the calendar review/)]);
    });

    it('refuses calendar options with --date and an unknown --fix-by', async () => {
      const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': dated });
      const base = ['audit', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv')];
      const both = await runCli([...base, '--date', '2026-05-01', '--from-date', '2026-01-01']);
      expect([both.status, both.stderr]).toEqual([2, expect.stringMatching(/--from-date belongs to the calendar review/)]);
      const bad = await runCli([...base, '--fix-by', 'row']);
      expect([bad.status, bad.stderr]).toEqual([2, expect.stringMatching(/--fix-by must be lane or clause/)]);
      const backwards = await runCli([...base, '--from-date', '2026-05-01', '--to-date', '2026-04-01']);
      expect(backwards.status).toBe(1);
      expect(backwards.stderr).toMatch(/^lanewright: plan: to date "2026-04-01": the review window would end .* before it starts/m);
    });
  });
});

describe('lanewright audit --loop-cap with a huge count', () => {
  it('stops at its budget, says which, and does not claim more loops exist', async () => {
    const ids = Array.from({ length: 12 }, (_, i) => `D${i}`);
    const lanes = ids.flatMap((a) => ids.filter((b) => b !== a).map((b) => `${a},${b},1.00,0,0,2.00`));
    const dir = tempFiles({ 'depots.csv': `id,name,lat,lon\n${ids.map((id, i) => `${id},${id},${50 + i / 10},4`).join('\n')}\n`, 'lanes.csv': `from,to,toll,fuel,fees,rebate\n${lanes.join('\n')}\n` });
    const r = await runCli(['audit', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--date', '2026-06-01', '--loop-cap', '1000000', '--json']);
    expect(r.status).toBe(0);
    const report = JSON.parse(r.stdout);
    expect(['work-budget', 'memory-bound']).toContain(report.loop_search.stopped_by);
    expect(report.loops.length).toBeLessThan(1_000_000);
    expect(r.stderr).not.toMatch(/more loops exist than/);
    expect(r.stderr).toMatch(/WARNING: the loop search stopped at its (work budget|memory bound)/);
  });

  it('the calendar review (no --date) says the same, truthfully', async () => {
    const ids = Array.from({ length: 12 }, (_, i) => `D${i}`);
    const lanes = ids.flatMap((a) => ids.filter((b) => b !== a).map((b) => `${a},${b},1.00,0,0,2.00`));
    const dir = tempFiles({ 'depots.csv': `id,name,lat,lon\n${ids.map((id, i) => `${id},${id},${50 + i / 10},4`).join('\n')}\n`, 'lanes.csv': `from,to,toll,fuel,fees,rebate\n${lanes.join('\n')}\n` });
    const r = await runCli(['audit', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--loop-cap', '1000000', '--json']);
    expect(r.status).toBe(0);
    const report = JSON.parse(r.stdout);
    expect(report.review).toBe('calendar');
    expect(['work-budget', 'memory-bound']).toContain(report.loop_search.stopped_by);
    expect(r.stderr).not.toMatch(/more loops exist than/);
    expect(r.stderr).toMatch(/WARNING: the loop search stopped at its (work budget|memory bound)/);
  });
});

describe('lanewright audit --threads', () => {
  // Large enough for the headroom searches to go to worker threads (MIN_PAIRS_FOR_THREADS, engine/audit/headroom-shared-jobs.ts).
  const count = 2_500;
  const rand = seededRandom(31);
  const potential = Array.from({ length: count }, () => Math.floor(rand() * 5_000));
  const rows: string[] = [];
  for (let e = 0; e < 24_000; e++) {
    const u = e < count ? e : Math.floor(rand() * count);
    const v = e < count ? (e + 1) % count : Math.floor(rand() * count);
    const net = Math.floor(rand() * 4_000) + potential[u] - potential[v];
    rows.push(`D${u},D${v},${(Math.max(net, 0) / 100).toFixed(2)},0,0,${(Math.max(-net, 0) / 100).toFixed(2)}`);
  }
  const files = () =>
    tempFiles({
      'depots.csv': `id,name,lat,lon\n${potential.map((_, d) => `D${d},Depot ${d},${50 + d / 10_000},4`).join('\n')}\n`,
      'lanes.csv': `from,to,toll,fuel,fees,rebate\n${rows.join('\n')}\n`,
    });

  it('gives the same review with 1 and 2 threads, one day and over the calendar', async () => {
    const dir = files();
    const args = ['audit', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--json'];
    for (const day of [['--date', '2026-06-01'], []]) {
      const one = await runCli([...args, ...day, '--threads', '1']);
      const two = await runCli([...args, ...day, '--threads', '2']);
      expect([one.status, two.status]).toEqual([0, 0]);
      expect(two.stdout).toBe(one.stdout);
      expect(JSON.parse(one.stdout).headroom.filter((h: { floor_minor: number | null }) => h.floor_minor !== null).length).toBeGreaterThan(20_000);
    }
  });

  it('refuses a thread count below 1', async () => {
    const r = await runCli(['audit', '--depots', 'x.csv', '--lanes', 'y.csv', '--date', '2026-06-01', '--threads', '0']);
    expect(r.status).not.toBe(0);
    expect(r.stderr).toMatch(/--threads must be a whole number >= 1, got "0"/);
  });
});
