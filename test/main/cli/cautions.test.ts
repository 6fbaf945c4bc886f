// The caution travels with every JSON and GeoJSON output that shows a route or a cost, on the sample
// with its rebate loop too (where no route has a cost), in the words of engine/text/cautions.ts;
// beside a CSV it is printed on stderr.

import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { DISPATCH_CAUTION, REVIEW_CAUTION, ROUTE_CAUTION } from '../../../engine/text/cautions';
import { runCli, tempFiles } from './cli-harness';

const LOOP = ['--depots', 'sample-data/depots.csv', '--lanes', 'sample-data/lanes-rebate-loop.csv', '--date', '2026-08-15'];

describe('cautions in the CLI outputs, with a rebate loop', () => {
  it.each([
    ['routes --json', ['routes', ...LOOP, '--from', 'RTM', '--json'], ROUTE_CAUTION],
    ['compare --json', ['compare', ...LOOP, '--from', 'RTM', '--scenario', 'sample-data/what-if-clause-7-2.json', '--json'], ROUTE_CAUTION],
    ['audit --json', ['audit', ...LOOP, '--json'], REVIEW_CAUTION],
    ['dispatch --json', ['dispatch', ...LOOP, '--loads', 'sample-data/loads.csv', '--vehicles', 'sample-data/vehicles.csv', '--json'], DISPATCH_CAUTION],
  ])('%s carries `caution`', async (_name, argv, caution) => {
    const run = await runCli(argv);
    expect(run.status, run.stderr).toBe(0);
    expect((JSON.parse(run.stdout) as { caution: unknown }).caution).toBe(caution);
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
