// The what-if overlay on a 5,000-depot, 50,000-row lanes file with two vehicle classes and two
// validity windows: one edit solved as the app does it (overlay weights on the base network, no
// rebuild) beside the baseline of rebuilding the scenario's network, measured in the same run; and
// the whole `compare` (overlay, both plans, both solves, loops) as the command runs it.

import { importNetwork } from '../../../engine/planning/import-network';
import { cheapestRoutes } from '../../../engine/routes/cheapest-routes';
import { buildOverlay, overlayIndex } from '../../../engine/scenario/overlay';
import { overlayNetwork, overlayPlanAmounts, planRequestOf } from '../../../engine/scenario/overlay-network';
import { compareImport } from '../../../engine/scenario/compare';
import type { Scenario } from '../../../engine/scenario/types';
import { seeded, timeBest, type BenchSuite } from '../harness';

const DEPOTS = 5_000;
const ROWS = 50_000;

function files(seed: number): { depots: string; lanes: string } {
  const rand = seeded(seed);
  const depots = ['id,name,lat,lon', ...Array.from({ length: DEPOTS }, (_, d) => `D${d},Depot ${d},${(45 + rand() * 8).toFixed(4)},${(2 + rand() * 12).toFixed(4)}`)];
  const lanes = ['from,to,ref,toll,toll_2axle,toll_5axle,fuel,fees,rebate,distance_km,valid_from,valid_to'];
  const cents = (max: number) => (Math.floor(rand() * max) / 100).toFixed(2);
  for (let i = 0; i < ROWS; i++) {
    const u = i < DEPOTS ? i : Math.floor(rand() * DEPOTS);
    const v = i < DEPOTS ? (i + 1) % DEPOTS : Math.floor(rand() * DEPOTS);
    const window = i % 3 === 0 ? ',' : i % 3 === 1 ? '2026-01-01,2026-06-30' : '2026-07-01,2026-12-31';
    lanes.push(`D${u},D${v},R${i % 7},${cents(5000)},${cents(3000)},${cents(6000)},${cents(20000)},${cents(1000)},0.00,${10 + Math.floor(rand() * 400)},${window}`);
  }
  return { depots: depots.join('\n'), lanes: lanes.join('\n') };
}

export const suite: BenchSuite = {
  name: 'overlay',
  run(record) {
    const f = files(9);
    const imported = importNetwork(f.depots, f.lanes, { plan: { date: '2026-08-15', vehicleClass: '2axle' } });
    const network = imported.network!;
    const index = overlayIndex(imported);
    const keys = index.keys;
    const request = planRequestOf(imported);
    // Ten toll edits for the class on screen, on rows planned for the day.
    const rand = seeded(10);
    const scenario: Scenario = { name: 'bench', description: null, changes: [] };
    for (let i = 0; i < 10; i++) {
      const row = imported.plan.laneRecord[Math.floor(rand() * network.laneCount)];
      scenario.changes.push({ kind: 'set-amount', lane: keys[row], field: 'toll', amountMinor: Math.floor(rand() * 9000), vehicleClass: '2axle', note: null });
    }
    const origin = network.depotIndex.get('D0')!;
    const edit = timeBest(() => {
      const overlay = buildOverlay(imported, scenario, index);
      const amounts = overlayPlanAmounts(overlay, imported, request, network, imported.plan.laneRecord);
      return cheapestRoutes(network, origin, amounts.weights!);
    }, 3);
    const rebuild = timeBest(() => {
      const overlay = buildOverlay(imported, scenario, index);
      const planned = overlayNetwork(overlay, imported, request);
      return cheapestRoutes(planned.network, planned.network.depotIndex.get('D0')!);
    }, 3);
    const same = edit.result.cost.every((c, d) => Object.is(c, rebuild.result.cost[d]));
    record({
      case: `app edit: 10 toll changes, ${DEPOTS / 1000}k depots / ${ROWS / 1000}k rows (${network.laneCount} planned), overlay weights + solve`,
      engine: edit.ms,
      baseline: rebuild.ms,
      unit: 'ms',
      note: `baseline = rebuild the scenario's network and solve; same costs: ${same}`,
    });
    const compare = timeBest(() => compareImport(imported, scenario, 'D0', { loopCap: 10 }), 1);
    record({
      case: `compare (overlay, both plans, both solves, loops) ${DEPOTS / 1000}k / ${ROWS / 1000}k rows`,
      engine: compare.ms,
      unit: 'ms',
      note: `${compare.result.depots.filter((d) => d.change !== 0 && d.change !== null).length} depots changed`,
    });
  },
};
