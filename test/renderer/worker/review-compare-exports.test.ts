// The contract review and the scenario comparison exported from the app (the worker's export
// request) are the files `lanewright audit` and `lanewright compare` write for the same input, in the
// chosen CSV dialect, through the one CSV writer (a depot name that reads as a formula is guarded).

import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseScenarioDocument, type CsvDialect } from '../../../engine/index';
import type { FromWorker, ToWorker } from '../../../renderer/worker/protocol';
import { WorkerSession } from '../../../renderer/worker/session';
import { runCli, tempFiles } from '../../main/cli/cli-harness';

const depots = ['id,name,lat,lon', 'A,Alpha yard,51.0,4.0', 'B,=HYPERLINK("x"),51.1,4.1', 'C,Charlie yard,51.2,4.2'].join('\n');
const lanes = ['from,to,toll,fuel,fees,rebate,valid_from', 'A,B,10.00,0,0,0,', 'B,C,10.00,0,0,0,', 'A,C,25.00,0,0,0,', 'C,B,2.00,0,0,0,', 'C,B,2.00,0,0,11.50,2026-07-01'].join('\n');
const scenarioText = JSON.stringify({
  format: 'lanewright-scenario',
  version: 2,
  name: 'Toll rise on A-B',
  description: null,
  changes: [{ kind: 'set-amount', lane: { from: 'A', to: 'B', ref: null, occurrence: 1 }, field: 'toll', vehicleClass: null, amountMinor: 2000, note: null }],
});
const scenario = parseScenarioDocument(scenarioText);
const SEMICOLON: CsvDialect = { separator: ';', decimalMark: ',', bom: true };
const DATE = '2026-06-01';

function drive(messages: ToWorker[]): FromWorker[] {
  const out: FromWorker[] = [];
  const session = new WorkerSession((m) => out.push(m));
  messages.forEach((m) => session.handle(m));
  return out.filter((m) => m.kind !== 'progress');
}

function exported(out: FromWorker[], id: number): { fileName: string; text: string } {
  const answer = out.find((m) => m.id === id);
  if (answer?.kind !== 'exported') throw new Error(`no export: ${JSON.stringify(answer)}`);
  return answer;
}

const load: ToWorker = { kind: 'load', id: 1, depots: { name: 'depots.csv', text: depots }, lanes: { name: 'lanes.csv', text: lanes }, acceptPartial: false, plan: { date: DATE, vehicleClass: '' } };
const settings = { origin: 'A', maxLegs: null, vehicleClass: '', dispatchDate: DATE };

describe('review and comparison exports from the app', () => {
  it('the comparison is the file lanewright compare writes, in the chosen dialect, named by origin and date', async () => {
    const out = drive([load, { kind: 'solve', id: 2, settings, scenario }, { kind: 'export', id: 3, what: 'compare-csv', dialect: SEMICOLON }]);
    const file = exported(out, 3);
    expect(file.fileName).toBe('comparison-A-2026-06-01-Toll-rise-on-A-B.csv');
    const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': lanes, 'what-if.json': scenarioText });
    const cli = await runCli(['compare', '--date', DATE, '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--scenario', join(dir, 'what-if.json'), '--from', 'A', '--csv-dialect', 'semicolon,comma,bom', '--out', join(dir, 'c.csv')]);
    expect(cli.status, cli.stderr).toBe(0);
    expect(file.text).toBe(readFileSync(join(dir, 'c.csv'), 'utf8'));
    expect(file.text.charCodeAt(0)).toBe(0xfeff);
    expect(file.text).toContain(`B;"'=HYPERLINK(""x"")";`);
    // C's route changed (A>B>C costs 30.00 now, A>C 25.00): the route_changed column says so.
    expect(file.text.split('\r\n')[0]).toContain('route_changed');
    expect(file.text).toMatch(/\r\nC;Charlie yard;reachable;reachable;"20,00";"25,00";"5,00";yes;/);
  });

  it('refuses a comparison planned with a leg limit, and one without changes, with a reason', () => {
    const limited = drive([load, { kind: 'solve', id: 2, settings: { ...settings, maxLegs: 2 }, scenario }, { kind: 'export', id: 3, what: 'compare-csv' }]);
    expect(limited.find((m) => m.id === 3)).toMatchObject({ kind: 'error', error: { message: expect.stringMatching(/Maximum legs \(2\)/) } });
    const plain = drive([load, { kind: 'solve', id: 2, settings, scenario: null }, { kind: 'export', id: 3, what: 'compare-csv' }]);
    expect(plain.find((m) => m.id === 3)).toMatchObject({ kind: 'error', error: { message: expect.stringMatching(/no changes/) } });
  });

  it('the one-day and calendar reviews are the files lanewright audit writes', async () => {
    const out = drive([
      load,
      { kind: 'solve', id: 2, settings, scenario: null },
      { kind: 'export', id: 3, what: 'review-csv' },
      { kind: 'review', id: 4, scenario: null, fixBy: 'lane' },
      { kind: 'export', id: 5, what: 'review-csv', dialect: SEMICOLON },
      { kind: 'export', id: 6, what: 'calendar-review-csv', dialect: SEMICOLON },
    ]);
    // Before a review is made there is nothing to export, and the message says what to do.
    expect(out.find((m) => m.id === 3)).toMatchObject({ kind: 'error', error: { message: expect.stringMatching(/Contract review/) } });
    const day = exported(out, 5);
    const calendar = exported(out, 6);
    expect(day.fileName).toBe('contract-review-2026-06-01.csv');
    expect(calendar.fileName).toBe('calendar-review-2026-07-01.csv');
    const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': lanes });
    const files = ['--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--csv-dialect', 'semicolon,comma,bom'];
    const dayCli = await runCli(['audit', '--date', DATE, ...files, '--out', join(dir, 'day.csv')]);
    expect(dayCli.status, dayCli.stderr).toBe(0);
    expect(day.text).toBe(readFileSync(join(dir, 'day.csv'), 'utf8'));
    const calendarCli = await runCli(['audit', ...files, '--out', join(dir, 'calendar.csv')]);
    expect(calendarCli.status, calendarCli.stderr).toBe(0);
    expect(calendar.text).toBe(readFileSync(join(dir, 'calendar.csv'), 'utf8'));
    // The calendar review follows --csv-dialect too (it was written as RFC 4180 whatever was asked).
    expect(calendar.text.split('\r\n')[0]).toMatch(/^\ufeffrow;from;to;ref;clause/);
  });

  it('a review made under a scenario exports the scenario network, named by the scenario', () => {
    const out = drive([load, { kind: 'solve', id: 2, settings, scenario }, { kind: 'review', id: 3, scenario, fixBy: 'lane' }, { kind: 'export', id: 4, what: 'review-csv' }]);
    const file = exported(out, 4);
    expect(file.fileName).toBe('contract-review-2026-06-01-Toll-rise-on-A-B.csv');
    // Row 2 is A>B: its toll is the scenario's 20.00.
    expect(file.text.split('\r\n').find((l) => l.startsWith('2,A,B,'))).toMatch(/^2,A,B,,20\.00,/);
  });
});
