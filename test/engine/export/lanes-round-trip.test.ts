// The lanes export round trip on random lane tables (wide or long vehicle-class layout, validity
// windows, blank distances) and random scenarios: exporting and re-importing gives the same lane
// table, and the same routes for every date and class; with a scenario, the re-imported file plans
// the same network the overlay made. Seeded fast-check, so a failure reproduces.

import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { lanesCsv } from '../../../engine/export/lanes-csv';
import type { LaneTable } from '../../../engine/import/types';
import { importNetwork, planNetwork } from '../../../engine/planning/import-network';
import type { ImportResult } from '../../../engine/planning/import-types';
import { cheapestRoutes } from '../../../engine/routes/cheapest-routes';
import { scenarioImport } from '../../../engine/scenario/overlay-network';
import type { Network } from '../../../engine/network/types';
import { randomLaneFile, randomScenario, DATES, DEPOTS_CSV } from '../scenario/random-lanes';

function tableColumns(t: LaneTable) {
  const a = (x: ArrayLike<number> | null) => (x ? Array.from(x) : null);
  return {
    count: t.count,
    from: a(t.from), to: a(t.to), toll: a(t.toll), fuel: a(t.fuel), fees: a(t.fees), rebate: a(t.rebate),
    distanceKm: a(t.distanceKm), driveMinutes: a(t.driveMinutes), validFrom: a(t.validFrom), validTo: a(t.validTo),
    vehicleClass: a(t.vehicleClass), classNames: t.classNames,
    classTolls: t.classTolls.map((c) => [c.name, Array.from(c.toll)]),
    ref: Array.from({ length: t.count }, (_, i) => t.ref[i] ?? null),
    notes: Array.from({ length: t.count }, (_, i) => t.notes[i] ?? null),
  };
}

function routesOf(network: Network | null) {
  if (!network) return null;
  const tree = cheapestRoutes(network, network.depotIndex.get('A')!);
  return { status: Array.from(tree.status), cost: Array.from(tree.cost) };
}

/** Routes from A for every date and class (plus the default), the plan's problems counted. */
function everyPlan(result: ImportResult) {
  return DATES.flatMap((date) =>
    [undefined, ...result.vehicleClasses].map((vehicleClass) => {
      const plan = planNetwork(result, { date, vehicleClass }, { skipInvalid: true });
      return { date, vehicleClass, errors: plan.report.errors.length, lanes: plan.network?.laneCount ?? null, routes: routesOf(plan.network) };
    }),
  );
}

const reimport = (text: string) => {
  const again = importNetwork(DEPOTS_CSV, text, { skipInvalid: true });
  expect(again.importReport.errors).toEqual([]);
  return again;
};

describe('lanes export round trip', () => {
  it('random lane tables re-import to the same table and the same routes for every date and class', () => {
    fc.assert(
      fc.property(randomLaneFile(), (file) => {
        const first = importNetwork(DEPOTS_CSV, file, { skipInvalid: true });
        expect(first.importReport.errors).toEqual([]);
        const second = reimport(lanesCsv(first));
        expect(tableColumns(second.lanes)).toEqual(tableColumns(first.lanes));
        expect(everyPlan(second)).toEqual(everyPlan(first));
      }),
      { numRuns: 60, seed: 20261203 },
    );
  });

  it('with a scenario, the export re-imports to the network the overlay plans', () => {
    fc.assert(
      fc.property(randomLaneFile(), fc.integer({ min: 0, max: 2 ** 31 - 1 }), fc.constantFrom(...DATES), (file, seed, date) => {
        const first = importNetwork(DEPOTS_CSV, file, { skipInvalid: true, plan: { date } });
        const scenario = randomScenario(first, seed);
        const what = scenarioImport(first, scenario);
        const again = planNetwork(reimport(lanesCsv(what)), { date, vehicleClass: first.plan.vehicleClass ?? undefined }, { skipInvalid: true });
        expect(routesOf(again.network)).toEqual(routesOf(what.network));
        expect(again.network!.laneCount).toBe(what.network.laneCount);
      }),
      { numRuns: 60, seed: 20261204 },
    );
  });

  it('writes every row of the sample, not only those valid on the chosen date (147 data rows)', () => {
    const sample = (name: string) => readFileSync(new URL(`../../../sample-data/${name}`, import.meta.url), 'utf8');
    const dated = importNetwork(sample('depots.csv'), sample('lanes.csv'), { plan: { date: '2026-08-15', vehicleClass: '2axle' } });
    const text = lanesCsv(dated);
    const again = importNetwork(sample('depots.csv'), text, { plan: { vehicleClass: '5axle' } });
    expect(again.lanes.count).toBe(dated.lanes.count);
    expect(again.report.errors).toEqual([]);
    expect(again.vehicleClasses).toEqual(['2axle', '5axle']);
  });
});
