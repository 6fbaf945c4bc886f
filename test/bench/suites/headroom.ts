// Rebate headroom for every lane of a 5,000-depot, 50,000-lane network (target <= 10 s, with
// progress), by Johnson's reweighting and a binary-heap Dijkstra per distinct lane destination.
// Baseline in the same run: one label-correcting (Bellman-Ford family) solve per distinct
// destination on the original costs, timed on a sample of destinations and scaled to all of them.

import { buildNetwork } from '../../../engine/network/build';
import type { DepotInput, LaneInput, Network } from '../../../engine/network/types';
import type { Minor } from '../../../engine/money/minor';
import { laneFloors } from '../../../engine/audit/headroom';
import { auditNetwork } from '../../../engine/audit/network-audit';
import { labelCorrect, IN_TREE } from '../../../engine/routes/label-correcting';
import { seeded, timeBest, type BenchSuite } from '../harness';

const DEPOTS = 5_000;
const LANES = 50_000;
const BASELINE_SAMPLE = 250;

/** Random sparse network with many negative lanes and no loop: net = c + p(u) - p(v), c >= 0; a ring keeps it connected. */
function network(seed: number, loops: number): Network {
  const rand = seeded(seed);
  const potential = Array.from({ length: DEPOTS }, () => Math.floor(rand() * 20_000));
  const depots: DepotInput[] = Array.from({ length: DEPOTS }, (_, d) => ({ id: `D${d}`, name: `Depot ${d}`, lat: 0, lon: 0 }));
  const lanes: LaneInput[] = [];
  const zero = 0 as Minor;
  const add = (u: number, v: number, net: number) =>
    lanes.push({ from: `D${u}`, to: `D${v}`, toll: (net > 0 ? net : 0) as Minor, fuel: zero, fees: zero, rebate: (net < 0 ? -net : 0) as Minor, sourceRow: lanes.length + 2 });
  for (let e = 0; e < LANES - 2 * loops; e++) {
    const u = e < DEPOTS ? e : Math.floor(rand() * DEPOTS);
    const v = e < DEPOTS ? (e + 1) % DEPOTS : Math.floor(rand() * DEPOTS);
    add(u, v, Math.floor(rand() * 10_000) + potential[u] - potential[v]);
  }
  // Optional rebate loops for the full-audit figure: a pair of lanes whose lap nets -1 to -500.
  for (let i = 0; i < loops; i++) {
    const u = Math.floor(rand() * DEPOTS);
    const v = (u + 1 + Math.floor(rand() * (DEPOTS - 1))) % DEPOTS;
    add(u, v, 1_000);
    add(v, u, -1_000 - 1 - Math.floor(rand() * 500));
  }
  return buildNetwork(depots, lanes);
}

export const suite: BenchSuite = {
  name: 'headroom',
  run(record) {
    const net = network(4, 0);
    let progressCalls = 0;
    const johnson = timeBest(() => laneFloors(net, { onProgress: () => progressCalls++ }), 2);
    const destinations = johnson.result.sources;

    // Baseline: label-correcting from each of a sample of destinations v; floor(u->v) = -dist(v, u).
    const sample: number[] = [];
    for (let v = 0; v < DEPOTS && sample.length < BASELINE_SAMPLE; v += Math.floor(DEPOTS / BASELINE_SAMPLE)) sample.push(v);
    let mismatches = 0;
    const baseline = timeBest(() => {
      for (const v of sample) {
        const solved = labelCorrect(net, { sources: [v] });
        for (let e = 0; e < net.laneCount; e++) {
          if (net.laneTo[e] !== v) continue;
          const u = net.laneFrom[e];
          const expected = solved.state[u] === IN_TREE ? (solved.dist[u] === 0 ? 0 : -solved.dist[u]) : NaN;
          if (!Object.is(expected, johnson.result.floor[e]) && !(Number.isNaN(expected) && Number.isNaN(johnson.result.floor[e]))) mismatches++;
        }
      }
    }, 1);
    const baselineMs = (baseline.ms * destinations) / sample.length;

    record({
      case: `headroom, all lanes ${DEPOTS / 1000}k/${LANES / 1000}k (Johnson + binary-heap Dijkstra)`,
      engine: johnson.ms,
      baseline: baselineMs,
      unit: 'ms',
      target: 10_000,
      note: `baseline = label-correcting solve per destination, ${sample.length} of ${destinations} timed and scaled; ${mismatches} floor mismatches on the sample; ${progressCalls} progress calls over 2 runs`,
    });

    const looped = network(5, 20);
    const audit = timeBest(() => auditNetwork(looped), 1);
    record({
      case: `full audit ${DEPOTS / 1000}k/${LANES / 1000}k with 20 rebate loops (loops, fix plan, headroom after it)`,
      engine: audit.ms,
      unit: 'ms',
      note: `${audit.result.loops.length} loops found, ${audit.result.fixPlan?.changes.length ?? 0} lanes cut, plan verified: ${audit.result.fixPlan?.verified}`,
    });
  },
};
