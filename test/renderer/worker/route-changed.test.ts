// The scenario comparison in the app says whether each depot's route changed, and says it as
// `lanewright compare` does (engine compareImport): the same depots, for an amount-only scenario
// (weights) and for one that rebuilds the network (an added lane, a closed lane).

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { compareImport, importNetwork, type Scenario } from '../../../engine/index';
import type { FromWorker, SolveView, ToWorker } from '../../../renderer/worker/protocol';
import { WorkerSession } from '../../../renderer/worker/session';

const sample = (name: string) => readFileSync(`sample-data/${name}`, 'utf8');
const DATE = '2026-08-15';

function workerRouteChanged(scenario: Scenario): number[] {
  const out: FromWorker[] = [];
  const session = new WorkerSession((m) => out.push(m));
  const messages: ToWorker[] = [
    { kind: 'load', id: 1, depots: { name: 'depots.csv', text: sample('depots.csv') }, lanes: { name: 'lanes.csv', text: sample('lanes.csv') }, acceptPartial: false, plan: { date: DATE, vehicleClass: '' } },
    { kind: 'solve', id: 2, settings: { origin: 'RTM', maxLegs: null, vehicleClass: '', dispatchDate: DATE }, scenario },
  ];
  messages.forEach((m) => session.handle(m));
  const solved = out.find((m) => m.kind === 'solved') as { result: SolveView };
  return Array.from(solved.result.base!.routeChanged);
}

function cliRouteChanged(scenario: Scenario): number[] {
  const imported = importNetwork(sample('depots.csv'), sample('lanes.csv'), { plan: { date: DATE } });
  return compareImport(imported, scenario, 'RTM').depots.map((d) => (d.routeChanged ? 1 : 0));
}

const lane = (from: string, to: string) => {
  const imported = importNetwork(sample('depots.csv'), sample('lanes.csv'), { plan: { date: DATE } });
  const net = imported.network!;
  const e = Array.from({ length: net.laneCount }, (_, i) => i).find((i) => net.depotIds[net.laneFrom[i]] === from && net.depotIds[net.laneTo[i]] === to);
  if (e === undefined) throw new Error(`no lane ${from}>${to}`);
  return { from, to, ref: net.laneRef[e] ?? null, occurrence: 1 };
};

describe('route changed, per depot', () => {
  it('agrees with lanewright compare when a toll rise moves routes', () => {
    const first = cliRouteChanged({ name: 'probe', description: null, changes: [] });
    expect(first.every((c) => c === 0)).toBe(true);
    const imported = importNetwork(sample('depots.csv'), sample('lanes.csv'), { plan: { date: DATE } });
    const net = imported.network!;
    // Make every lane out of RTM dear: many routes move to other first lanes.
    const changes: Scenario['changes'] = [];
    for (let e = 0; e < net.laneCount; e++) {
      if (net.depotIds[net.laneFrom[e]] !== 'RTM') continue;
      changes.push({ kind: 'set-amount', lane: lane('RTM', net.depotIds[net.laneTo[e]]), field: 'toll', vehicleClass: null, amountMinor: 900_00, note: null });
      if (changes.length === 2) break;
    }
    const scenario: Scenario = { name: 'dear start', description: null, changes };
    const expected = cliRouteChanged(scenario);
    expect(expected.some((c) => c === 1)).toBe(true);
    expect(workerRouteChanged(scenario)).toEqual(expected);
  });

  it('agrees with lanewright compare when the scenario rebuilds the network (closed and added lanes)', () => {
    const scenario: Scenario = {
      name: 'closed and added',
      description: null,
      changes: [
        { kind: 'close-lane', lane: lane('RTM', 'ANR'), note: null },
        { kind: 'add-lane', lane: { from: 'RTM', to: 'LYS', ref: 'WHATIF-1', tollMinor: 100, feesMinor: 0, fuelMinor: 100, rebateMinor: 0, validFrom: null, validTo: null, distanceKm: 900, driveMinutes: 600 }, note: null },
      ],
    };
    const expected = cliRouteChanged(scenario);
    expect(expected.some((c) => c === 1)).toBe(true);
    expect(workerRouteChanged(scenario)).toEqual(expected);
  });
});
