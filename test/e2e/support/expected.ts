// The figures the UI must show, computed by running the engine directly in the test process on the
// same files and settings (never hard-coded), so the browser is checked against the engine.

import { readFileSync } from 'node:fs';
import { importNetwork } from '../../../engine/planning/import-network';
import { cheapestRoutes, STATUS_REACHABLE, STATUS_UNBOUNDED } from '../../../engine/routes/cheapest-routes';
import { legLimitedRoutes } from '../../../engine/routes/leg-limited';
import { scenarioImport } from '../../../engine/scenario/overlay-network';
import type { Scenario } from '../../../engine/scenario/types';

export const sample = (name: string) => readFileSync(`sample-data/${name}`, 'utf8');

export interface ExpectedPlan {
  depotCount: number;
  /** Lanes of the planned network (lanes valid on the date). */
  laneCount: number;
  /** Cost in minor units per reachable depot id. */
  cost: Map<string, number>;
  unbounded: Set<string>;
  loops: { depots: string[]; rows: number[] }[];
}

/** Cheapest routes from `origin` as the engine computes them for these files on `date`. */
export function expectedPlan(depotsText: string, lanesText: string, origin: string, date: string, scenario?: Scenario, options: { vehicleClass?: string; maxLegs?: number } = {}): ExpectedPlan {
  const imported = importNetwork(depotsText, lanesText, { plan: { date, vehicleClass: options.vehicleClass }, skipInvalid: true });
  if (!imported.network) throw new Error('expected: the files do not import');
  // The scenario goes through the engine's overlay, over every row of the file, as in the app.
  const network = scenario ? scenarioImport(imported, scenario).network : imported.network;
  const from = network.depotIndex.get(origin)!;
  const tree = options.maxLegs === undefined ? cheapestRoutes(network, from) : legLimitedRoutes(network, from, options.maxLegs);
  const cost = new Map<string, number>();
  const unbounded = new Set<string>();
  for (let d = 0; d < network.depotCount; d++) {
    if (tree.status[d] === STATUS_REACHABLE) cost.set(network.depotIds[d], tree.cost[d]);
    if (tree.status[d] === STATUS_UNBOUNDED) unbounded.add(network.depotIds[d]);
  }
  return {
    depotCount: network.depotCount,
    laneCount: network.laneCount,
    cost,
    unbounded,
    loops: tree.loops.map((loop) => ({ depots: loop.depots.map((d) => network.depotIds[d]), rows: loop.lanes.map((e) => network.laneRow[e]) })),
  };
}
