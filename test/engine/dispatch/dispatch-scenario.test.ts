// A day's loads under a what-if: a scenario that raises a toll on a load's route changes that load's
// cost and route the same way in the engine (planLoads through the overlay), in `lanewright dispatch
// --scenario` and in the app's worker session, and all three match the plan of a lanes file whose
// toll cells were edited by hand (the check outside the overlay).

import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { planLoads } from '../../../engine/dispatch/plan-loads';
import { importLoads, importVehicles } from '../../../engine/import/import-loads';
import { importNetwork } from '../../../engine/planning/import-network';
import { dispatchReport, type DispatchReport } from '../../../engine/report/dispatch-report';
import { serializeScenarioDocument } from '../../../engine/scenario/document';
import type { Scenario, ScenarioChange } from '../../../engine/scenario/types';
import type { FromWorker, ToWorker } from '../../../renderer/worker/protocol';
import { WorkerSession } from '../../../renderer/worker/session';
import { runCli, tempFiles } from '../../main/cli/cli-harness';

const DATE = '2026-08-15';
const depots = readFileSync('sample-data/depots.csv', 'utf8');
const lanes = readFileSync('sample-data/lanes.csv', 'utf8');
const loadsText = readFileSync('sample-data/loads.csv', 'utf8');
const vehiclesText = readFileSync('sample-data/vehicles.csv', 'utf8');

// ZRH>MIL (BFH-L-211) is on the best route of load L-0815-05 (BSL > ZRH > MIL); the what-if raises
// its toll for every class to 900.00.
const RAISED = 90_000;
const raise = (ref: string): ScenarioChange => ({ kind: 'set-amount', lane: { from: 'ZRH', to: 'MIL', ref, occurrence: 1 }, field: 'toll', amountMinor: RAISED, vehicleClass: null, note: null });
const scenario: Scenario = { name: 'Gotthard toll up', description: null, changes: [raise('BFH-L-211')] };
const handEdited = lanes.replace('ZRH,MIL,BFH-L-211,141.04,63.47,141.04,', 'ZRH,MIL,BFH-L-211,900.00,900.00,900.00,');

function engineReport(lanesText: string, what: Scenario | null): DispatchReport {
  const imported = importNetwork(depots, lanesText, { plan: { date: DATE } });
  const vehicles = importVehicles(vehiclesText, { classes: imported.vehicleClasses });
  const loads = importLoads(loadsText, { depots: imported.network!.depotIndex, vehicles: vehicles.byId, classes: imported.vehicleClasses, planDate: DATE });
  return dispatchReport(planLoads(imported, loads.loads, { date: DATE, vehicles: vehicles.byId, scenario: what }));
}

const summary = (r: DispatchReport) => r.loads.map((l) => ({ load: l.load, status: l.status, cost: l.cost_minor, path: l.path, lanes: l.lanes, extra: l.limits_extra_minor }));

describe('dispatch under a what-if scenario', () => {
  it('moves the load off the dearer lane the same way in the overlay, the CLI and the worker session', async () => {
    expect(handEdited).not.toBe(lanes);
    const base = engineReport(lanes, null);
    const expected = engineReport(handEdited, null);
    const before = base.loads.find((l) => l.load === 'L-0815-05')!;
    const after = expected.loads.find((l) => l.load === 'L-0815-05')!;
    expect(before.path).toEqual(['BSL', 'ZRH', 'MIL']);
    expect(after.path).not.toEqual(before.path);
    expect(after.cost_minor!).toBeGreaterThan(before.cost_minor!);

    // 1. The engine, through the overlay.
    const overlaid = engineReport(lanes, scenario);
    expect(summary(overlaid)).toEqual(summary(expected));
    expect(overlaid.scenario).toBe('Gotthard toll up');
    expect(base.scenario).toBeNull();

    // 2. The CLI.
    const dir = tempFiles({ 's.json': serializeScenarioDocument(scenario) });
    const cli = await runCli(['dispatch', '--depots', 'sample-data/depots.csv', '--lanes', 'sample-data/lanes.csv', '--loads', 'sample-data/loads.csv', '--vehicles', 'sample-data/vehicles.csv', '--date', DATE, '--scenario', join(dir, 's.json'), '--json']);
    expect(cli.status, cli.stderr).toBe(0);
    expect(cli.stderr).toContain('Gotthard toll up');
    const fromCli = JSON.parse(cli.stdout) as DispatchReport;
    expect(summary(fromCli)).toEqual(summary(expected));
    expect(fromCli.scenario).toBe('Gotthard toll up');

    // 3. The worker session, as the Loads panel drives it.
    const out: FromWorker[] = [];
    const session = new WorkerSession((m) => out.push(m));
    const messages: ToWorker[] = [
      { kind: 'load', id: 1, depots: { name: 'depots.csv', text: depots }, lanes: { name: 'lanes.csv', text: lanes }, acceptPartial: true, plan: { date: DATE, vehicleClass: '' } },
      { kind: 'dispatch', id: 2, request: { loads: { name: 'loads.csv', text: loadsText }, vehicles: { name: 'vehicles.csv', text: vehiclesText }, date: DATE, alternatives: 0, acceptPartial: false, scenario } },
    ];
    messages.forEach((m) => session.handle(m));
    const answer = out.find((m) => m.kind === 'dispatched');
    expect(answer?.kind).toBe('dispatched');
    if (answer?.kind !== 'dispatched') return;
    expect(summary(answer.result.report!)).toEqual(summary(expected));
  });

  it('names a change whose lane is missing as not applied, and plans the base', () => {
    const missing: Scenario = { ...scenario, changes: [raise('NOPE')] };
    const r = engineReport(lanes, missing);
    expect(summary(r)).toEqual(summary(engineReport(lanes, null)));
    expect(r.warnings.some((w) => w.includes('change 1') && w.includes('not applied'))).toBe(true);
  });
});
