// Rebate headroom for every lane, loop-free networks of 5,000 depots / 50,000 lanes and 20,000 /
// 200,000 (targets 1 s and 10 s): Johnson's reweighting, then bucketed balls (a backward ball per lane
// origin, one forward search per destination). Baseline in the same run: the previous method, one Dijkstra per
// distinct lane destination stopped at the last origin (headroom-per-destination.ts): run in full at
// 5k, on a sample of destinations at 20k (a full run takes minutes), scaled to all of them. Every
// floor the baseline computes is compared with the engine's.

import { buildNetwork } from '../../../engine/network/build';
import type { DepotInput, LaneInput, Network } from '../../../engine/network/types';
import type { Minor } from '../../../engine/money/minor';
import { headroomSetup, laneFloors } from '../../../engine/audit/headroom';
import { laneFloorsPerDestination } from '../../../engine/audit/headroom-per-destination';
import { auditNetwork } from '../../../engine/audit/network-audit';
import { createDijkstraWorkspace, dijkstra } from '../../../engine/routes/dijkstra';
import { restoreCost } from '../../../engine/routes/johnson-potentials';
import { seeded, timeBest, type BenchSuite } from '../harness';

/** Random sparse network with many negative lanes and no loop: net = c + p(u) - p(v), c >= 0; a ring keeps it connected. */
function network(depotCount: number, laneCount: number, seed: number, loops: number): Network {
  const rand = seeded(seed);
  const potential = Array.from({ length: depotCount }, () => Math.floor(rand() * 20_000));
  const depots: DepotInput[] = Array.from({ length: depotCount }, (_, d) => ({ id: `D${d}`, name: `Depot ${d}`, lat: 0, lon: 0 }));
  const lanes: LaneInput[] = [];
  const zero = 0 as Minor;
  const add = (u: number, v: number, net: number) =>
    lanes.push({ from: `D${u}`, to: `D${v}`, toll: (net > 0 ? net : 0) as Minor, fuel: zero, fees: zero, rebate: (net < 0 ? -net : 0) as Minor, sourceRow: lanes.length + 2 });
  for (let e = 0; e < laneCount - 2 * loops; e++) {
    const u = e < depotCount ? e : Math.floor(rand() * depotCount);
    const v = e < depotCount ? (e + 1) % depotCount : Math.floor(rand() * depotCount);
    add(u, v, Math.floor(rand() * 10_000) + potential[u] - potential[v]);
  }
  // Optional rebate loops for the full-audit figure: a pair of lanes whose lap nets -1 to -500.
  for (let i = 0; i < loops; i++) {
    const u = Math.floor(rand() * depotCount);
    const v = (u + 1 + Math.floor(rand() * (depotCount - 1))) % depotCount;
    add(u, v, 1_000);
    add(v, u, -1_000 - 1 - Math.floor(rand() * 500));
  }
  return buildNetwork(depots, lanes);
}

/**
 * The previous method on `sample` destinations only (its inner loop, as headroom-per-destination.ts
 * runs it): milliseconds, and the floors that differ from `floor`.
 */
function perDestinationSample(net: Network, sample: number[], floor: Float64Array): { ms: number; mismatches: number; compared: number } {
  const start = performance.now();
  const { potential, reweighted, inStart, inLane } = headroomSetup(net);
  const workspace = createDijkstraWorkspace(net.depotCount);
  let mismatches = 0;
  let compared = 0;
  for (const v of sample) {
    const targets: number[] = [];
    for (let i = inStart[v]; i < inStart[v + 1]; i++) targets.push(net.laneFrom[inLane[i]]);
    const { dist } = dijkstra(net, v, { weights: reweighted, workspace, targets, tree: false });
    for (let i = inStart[v]; i < inStart[v + 1]; i++) {
      const e = inLane[i];
      const u = net.laneFrom[e];
      const back = dist[u] === Infinity ? NaN : restoreCost(dist[u], potential, v, u);
      const expected = Number.isNaN(back) ? NaN : back === 0 ? 0 : -back;
      compared++;
      if (!Object.is(expected, floor[e]) && !(Number.isNaN(expected) && Number.isNaN(floor[e]))) mismatches++;
    }
  }
  return { ms: performance.now() - start, mismatches, compared };
}

export const suite: BenchSuite = {
  name: 'headroom',
  run(record) {
    for (const [depots, lanes, seed] of [[5_000, 50_000, 4], [20_000, 200_000, 6]] as const) {
      const net = network(depots, lanes, seed, 0);
      const label = `headroom, all lanes ${depots / 1000}k/${lanes / 1000}k, no loop`;
      let progressCalls = 0;
      const engine = timeBest(() => laneFloors(net, { onProgress: () => progressCalls++ }), 2);
      const { floor, sources, settled = 0 } = engine.result;
      let baselineMs: number;
      let check: string;
      if (depots <= 5_000) {
        const baseline = timeBest(() => laneFloorsPerDestination(net), 1);
        baselineMs = baseline.ms;
        let mismatches = 0;
        for (let e = 0; e < net.laneCount; e++) if (!Object.is(baseline.result.floor[e], floor[e])) mismatches++;
        check = `baseline run in full (${baseline.result.sources} Dijkstra runs), ${mismatches} of ${net.laneCount} floors differ`;
      } else {
        const step = 20;
        const sample: number[] = [];
        for (let v = 0; v < depots; v += step) sample.push(v);
        const baseline = perDestinationSample(net, sample, floor);
        baselineMs = (baseline.ms * depots) / sample.length;
        check = `baseline timed on ${sample.length} of ${depots} destinations and scaled; ${baseline.mismatches} of ${baseline.compared} sampled floors differ`;
      }
      record({
        case: `${label} (Johnson + bucketed balls)`,
        engine: engine.ms,
        baseline: baselineMs,
        unit: 'ms',
        target: depots <= 5_000 ? 1_000 : 10_000,
        note: `${sources} lane pairs, settling ${Math.round(settled / Math.max(1, sources))} depots per pair on average; ${check}; ${progressCalls} progress calls over 2 runs`,
      });
    }

    const looped = network(5_000, 50_000, 5, 20);
    const audit = timeBest(() => auditNetwork(looped), 1);
    record({
      case: 'full audit 5k/50k with 20 rebate loops (loops, fix plan, headroom after it)',
      engine: audit.ms,
      unit: 'ms',
      note: `${audit.result.loops.length} loops found, ${audit.result.fixPlan?.changes.length ?? 0} lanes cut, plan verified: ${audit.result.fixPlan?.verified}`,
    });
  },
};
