// One scenario, three front ends, one answer: on random lane tables (wide or long vehicle classes,
// validity windows) and random scenarios, the engine's overlay, the CLI's `compare` and the app's
// worker session find the same route statuses and costs for every date and class, and the worker
// ships the overlay's own amounts. Seeded fast-check, so a failure reproduces.

import fc from 'fast-check';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { importNetwork } from '../../../engine/planning/import-network';
import { cheapestRoutes } from '../../../engine/routes/cheapest-routes';
import { buildOverlay } from '../../../engine/scenario/overlay';
import { overlayNetwork, overlayPlanAmounts, planRequestOf } from '../../../engine/scenario/overlay-network';
import { serializeScenarioDocument } from '../../../engine/scenario/document';
import type { FromWorker, NetworkView, SolveView, ToWorker } from '../../../renderer/worker/protocol';
import { WorkerSession } from '../../../renderer/worker/session';
import { runCli, tempFiles } from '../../main/cli/cli-harness';
import { DATES, DEPOTS_CSV, randomLaneFile, randomScenario } from './random-lanes';
import { laneKey } from '../../../renderer/model/lane-names';

function drive(messages: ToWorker[]): FromWorker[] {
  const out: FromWorker[] = [];
  const session = new WorkerSession((m) => out.push(m));
  messages.forEach((m) => session.handle(m));
  return out.filter((m) => m.kind !== 'progress');
}

describe('the overlay, the CLI compare and the worker session agree', () => {
  it('on random lane tables and scenarios, for a random date and class', async () => {
    await fc.assert(
      fc.asyncProperty(randomLaneFile(), fc.integer({ min: 0, max: 2 ** 31 - 1 }), fc.constantFrom(...DATES), fc.constantFrom<string | null>(null, '2axle', '5axle'), async (file, seed, date, wanted) => {
        const probe = importNetwork(DEPOTS_CSV, file, { skipInvalid: true });
        const vehicleClass = wanted !== null && probe.vehicleClasses.includes(wanted) ? wanted : undefined;
        const imported = importNetwork(DEPOTS_CSV, file, { skipInvalid: true, plan: { date, vehicleClass } });
        const scenario = randomScenario(imported, seed);

        // 1. The overlay.
        const overlay = buildOverlay(imported, scenario);
        const planned = overlayNetwork(overlay, imported, planRequestOf(imported));
        const tree = cheapestRoutes(planned.network, planned.network.depotIndex.get('A')!);
        const expected = { status: Array.from(tree.status), cost: Array.from(tree.cost, (c, d) => (tree.status[d] === 1 ? c : null)) };

        // 2. The CLI.
        const dir = tempFiles({ 'depots.csv': DEPOTS_CSV, 'lanes.csv': file, 's.json': serializeScenarioDocument(scenario) });
        const cli = await runCli(['compare', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--scenario', join(dir, 's.json'), '--from', 'A', '--date', date, '--skip-invalid', '--json', ...(vehicleClass ? ['--vehicle-class', vehicleClass] : [])]);
        expect(cli.status, cli.stderr).toBe(0);
        const report = JSON.parse(cli.stdout) as { depots: { scenario_status: string; scenario_cost_minor: number | null }[]; problems: { change: number }[] };
        const names = ['unreachable', 'reachable', 'unbounded'];
        expect(report.depots.map((d) => names.indexOf(d.scenario_status))).toEqual(expected.status);
        expect(report.depots.map((d) => d.scenario_cost_minor)).toEqual(expected.cost);
        expect(report.problems.map((p) => p.change - 1)).toEqual(overlay.problems.map((p) => p.changeIndex));

        // 3. The worker session, as the app drives it.
        const out = drive([
          { kind: 'load', id: 1, depots: { name: 'depots.csv', text: DEPOTS_CSV }, lanes: { name: 'lanes.csv', text: file }, acceptPartial: true, plan: { date, vehicleClass: vehicleClass ?? '' } },
          { kind: 'solve', id: 2, settings: { origin: 'A', maxLegs: null, vehicleClass: vehicleClass ?? '', dispatchDate: date }, scenario },
        ]);
        const view = (out[0] as { network: NetworkView }).network;
        const solved = (out[1] as { result: SolveView }).result;
        expect(Array.from(solved.status)).toEqual(expected.status);
        expect(Array.from(solved.cost, (c, d) => (solved.status[d] === 1 ? c : null))).toEqual(expected.cost);
        // The amounts the app shows are the overlay's.
        const amounts = overlayPlanAmounts(overlay, imported, planRequestOf(imported), imported.network!, imported.plan.laneRecord);
        expect(Array.from(solved.overlay.toll)).toEqual(Array.from(amounts.toll));
        expect(Array.from(solved.overlay.rebate)).toEqual(Array.from(amounts.rebate));
        expect(Array.from(solved.overlay.closed)).toEqual(Array.from(amounts.closed));
        expect(solved.overlay.changes.filter((c) => !c.applied).map((c) => c.index)).toEqual(overlay.problems.map((p) => p.changeIndex));
        expect(Array.from(view.laneRecord, (_, e) => laneKey(view, e))).toEqual(Array.from(imported.plan.laneRecord, (r) => overlay.keys[r]));
      }),
      { numRuns: 40, seed: 20261205 },
    );
  });
});
