// The caution travels with every JSON and GeoJSON output that shows a route or a cost, on the sample
// with its rebate loop too (where no route has a cost), in the words of engine/text/cautions.ts;
// beside a CSV it is printed on stderr. Each JSON output also says what it was made from
// (`settings`: date, vehicle class, input files, scenario), as the app's exports do.

import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CAUTIONS, DISPATCH_CAUTION, REVIEW_CAUTION, ROUTE_CAUTION } from '../../../engine/text/cautions';
import { runCli, tempFiles } from './cli-harness';

const LOOP = ['--depots', 'sample-data/depots.csv', '--lanes', 'sample-data/lanes-rebate-loop.csv', '--date', '2026-08-15'];
const FILES = ['sample-data/depots.csv', 'sample-data/lanes-rebate-loop.csv'];
const WHAT_IF = 'sample-data/what-if-clause-7-2.json';

describe('cautions in the CLI outputs, with a rebate loop', () => {
  it.each([
    ['routes --json', ['routes', ...LOOP, '--from', 'RTM', '--json'], ROUTE_CAUTION, { date: '2026-08-15', vehicle_class: null, files: FILES, scenario: null }],
    [
      'compare --json',
      ['compare', ...LOOP, '--from', 'RTM', '--scenario', WHAT_IF, '--vehicle-class', '5axle', '--json'],
      ROUTE_CAUTION,
      { date: '2026-08-15', vehicle_class: '5axle', files: [...FILES, WHAT_IF], scenario: 'Clause 7.2 refund capped at 168.00' },
    ],
    ['audit --date --json', ['audit', ...LOOP, '--json'], REVIEW_CAUTION, { date: '2026-08-15', vehicle_class: null, files: FILES, scenario: null }],
    ['audit --json (calendar)', ['audit', ...LOOP.slice(0, 4), '--json'], CAUTIONS.join(' '), { date: null, vehicle_class: null, files: FILES, scenario: null }],
    [
      'dispatch --json',
      ['dispatch', ...LOOP, '--loads', 'sample-data/loads.csv', '--vehicles', 'sample-data/vehicles.csv', '--json'],
      DISPATCH_CAUTION,
      { date: '2026-08-15', vehicle_class: null, files: [...FILES, 'sample-data/loads.csv', 'sample-data/vehicles.csv'], scenario: null },
    ],
  ])('%s carries `caution` and `settings`', async (_name, argv, caution, settings) => {
    const run = await runCli(argv);
    expect(run.status, run.stderr).toBe(0);
    const json = JSON.parse(run.stdout) as { caution: unknown; settings: unknown };
    expect(json.caution).toBe(caution);
    expect(json.settings).toEqual(settings);
  }, 60_000);

  it('the GeoJSON of export carries `caution`; the routes CSV has it on stderr', async () => {
    const dir = tempFiles({});
    const run = await runCli(['export', ...LOOP, '--from', 'RTM', '--geojson-out', join(dir, 'n.geojson'), '--routes-out', join(dir, 'r.csv')]);
    expect(run.status, run.stderr).toBe(0);
    expect((JSON.parse(readFileSync(join(dir, 'n.geojson'), 'utf8')) as { caution: unknown }).caution).toBe(ROUTE_CAUTION);
    expect(run.stderr).toContain(`CAUTION: ${ROUTE_CAUTION}`);
    const routes = await runCli(['routes', ...LOOP, '--from', 'RTM']);
    expect(routes.stderr).toContain(`CAUTION: ${ROUTE_CAUTION}`);
  }, 60_000);
});
