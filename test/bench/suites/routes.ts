// Speed and memory of the cheapest-routes solve on seeded networks, side by side with a plain
// Bellman-Ford written here (rounds over every lane, early exit when a round changes nothing), so
// the figures show what the label-correcting core with subtree disassembly buys on the same machine.
// First, per family, the core's first call in a fresh process and its warm median beside a C++
// build of the same algorithm (solver-reference.ts).

import type { Network } from '../../../engine/network/types';
import { cheapestRoutes, STATUS_UNBOUNDED } from '../../../engine/routes/cheapest-routes';
import { retainedMb, timeBest, type BenchFigure, type BenchSuite } from '../harness';
import { chainOfPairs, randomSparse, roadGrid, withRebateLoop, type Generated } from '../route-families';
import { firstCallFigures } from '../solver-reference';

interface BaselineResult {
  dist: Float64Array;
  relaxations: number;
  rounds: number;
  /** Depots whose cost still dropped in the last round allowed (a negative loop reaches them). */
  stillDropping: number;
  stoppedEarly: boolean;
}

/**
 * Plain Bellman-Ford: up to `maxRounds` rounds over every lane in CSR order, stopping when a round
 * changes nothing or the time budget runs out.
 */
function plainBellmanFord(network: Network, origin: number, maxRounds: number, budgetMs: number): BaselineResult {
  const n = network.depotCount;
  const { outStart, outTo, outNet } = network;
  const dist = new Float64Array(n).fill(Infinity);
  dist[origin] = 0;
  let relaxations = 0;
  let rounds = 0;
  let changed = 0;
  const start = performance.now();
  let stoppedEarly = false;
  for (let round = 0; round < maxRounds; round++) {
    changed = 0;
    for (let u = 0; u < n; u++) {
      const du = dist[u];
      if (du === Infinity) continue;
      for (let p = outStart[u], end = outStart[u + 1]; p < end; p++) {
        const nd = du + outNet[p];
        const v = outTo[p];
        if (nd < dist[v]) {
          dist[v] = nd;
          changed++;
        }
      }
    }
    rounds++;
    relaxations += changed;
    if (changed === 0) break;
    if (performance.now() - start > budgetMs) {
      stoppedEarly = round + 1 < maxRounds;
      break;
    }
  }
  return { dist, relaxations, rounds, stillDropping: changed, stoppedEarly };
}

function sameCosts(network: Network, engine: Float64Array, baseline: Float64Array): boolean {
  for (let d = 0; d < network.depotCount; d++) {
    const a = Number.isNaN(engine[d]) ? Infinity : engine[d];
    if (a !== baseline[d]) return false;
  }
  return true;
}

function compare(record: (f: BenchFigure) => void, label: string, g: Generated, target: number): void {
  const { network, origin } = g;
  const engine = timeBest(() => cheapestRoutes(network, origin), 3);
  const baseline = timeBest(() => plainBellmanFord(network, origin, network.depotCount - 1, 120_000), 1);
  const agree = sameCosts(network, engine.result.cost, baseline.result.dist);
  let negative = 0;
  for (let e = 0; e < network.laneCount; e++) if (network.laneNet[e] < 0) negative++;
  const sizes = `${network.depotCount} depots, ${network.laneCount} lanes (${negative} with a net rebate)`;
  record({
    case: `${label}: solve`,
    engine: engine.ms,
    baseline: baseline.ms,
    unit: 'ms',
    target,
    note: `${sizes}; baseline took ${baseline.result.rounds} rounds; costs ${agree ? 'agree' : 'DIFFER'} with the baseline`,
  });
  record({ case: `${label}: relaxations`, engine: engine.result.stats.relaxations, baseline: baseline.result.relaxations, unit: 'count' });
  const engineMb = retainedMb(() => cheapestRoutes(network, origin)).mb;
  const baselineMb = retainedMb(() => plainBellmanFord(network, origin, network.depotCount - 1, 120_000)).mb;
  record({ case: `${label}: solve memory kept`, engine: engineMb, baseline: baselineMb, unit: 'MB' });
}

export const suite: BenchSuite = {
  name: 'routes',
  run(record) {
    // The label-correcting core's first call in a fresh process per family, beside the C++ reference.
    firstCallFigures(record);

    // Memory first, while the heap is clean: the compiled network plus one solved route tree.
    const built = retainedMb(() => {
      const g = randomSparse(100_000, 1_000_000, 11);
      return { g, tree: cheapestRoutes(g.network, g.origin) };
    });
    record({
      case: 'random sparse 100k/1M: network + routes in memory',
      engine: built.mb,
      unit: 'MB',
      target: 150,
      note: 'heap plus array buffers kept by the compiled network and one solved route tree',
    });
    compare(record, 'random sparse 100k/1M, rebates, no loop', built.result.g, 250);

    compare(record, 'road-like grid 500x500 (250k depots)', roadGrid(500, 23), 400);

    const looped = withRebateLoop(20_000, 100_000, 37);
    const { network, origin } = looped;
    const engine = timeBest(() => cheapestRoutes(network, origin), 10);
    let unbounded = 0;
    for (let d = 0; d < network.depotCount; d++) if (engine.result.status[d] === STATUS_UNBOUNDED) unbounded++;
    // The baseline needs V rounds to tell a loop apart; a full run here takes about a minute, so it
    // gets a 20 s budget and the note gives the rounds it managed and the projected full time.
    const budgetMs = 20_000;
    const baseline = timeBest(() => plainBellmanFord(network, origin, network.depotCount, budgetMs), 1);
    const perRound = baseline.ms / baseline.result.rounds;
    record({
      case: 'rebate loop 20k/100k: detect + mark unbounded',
      engine: engine.ms,
      baseline: baseline.ms,
      unit: 'ms',
      target: 50,
      note:
        `engine found ${engine.result.loops.length} loop(s), ${unbounded} depots unbounded; baseline ` +
        (baseline.result.stoppedEarly
          ? `stopped at its ${budgetMs / 1000} s budget after ${baseline.result.rounds} of ${network.depotCount} rounds (full V rounds projected ${Math.round((perRound * network.depotCount) / 1000)} s)`
          : `ran ${baseline.result.rounds} rounds, ${baseline.result.stillDropping} costs still dropping in the last`),
    });
    record({ case: 'rebate loop 20k/100k: relaxations', engine: engine.result.stats.relaxations, baseline: baseline.result.relaxations, unit: 'count' });

    // Loop reporting looks inside every strongly connected part of the unbounded region; this case
    // (a loop at the origin, then 50,000 two-depot parts in a chain) guards against that search
    // costing O(depots) per part.
    const chain = chainOfPairs(100_000);
    const chained = timeBest(() => cheapestRoutes(chain, 0), 3);
    record({
      case: 'loop ahead of 50k small parts (100k depots): solve + loop report',
      engine: chained.ms,
      unit: 'ms',
      note: `${chained.result.loops.length} loops reported (one per part that holds one); no baseline, plain Bellman-Ford has no per-part loop report`,
    });
  },
};
