import { describe, expect, it } from 'vitest';
import graphlib from 'graphlib';
import { johnsonReweighting, restoreCost } from '../../../engine/routes/johnson-potentials';
import { createDijkstraWorkspace, dijkstra } from '../../../engine/routes/dijkstra';
import { RebateLoopPresentError } from '../../../engine/errors';
import type { Network } from '../../../engine/network/types';
import { networkOf } from '../../support/network-builder';
import { randomNetwork } from '../audit/reference';

/** All-pairs costs by Johnson's method (NaN-free: Infinity where unreachable). */
function allPairs(net: Network): number[][] {
  const { potential, reweighted } = johnsonReweighting(net);
  const workspace = createDijkstraWorkspace(net.depotCount);
  return Array.from({ length: net.depotCount }, (_, s) => {
    const { dist } = dijkstra(net, s, { weights: reweighted, workspace });
    return Array.from(dist, (d, t) => (d === Infinity ? Infinity : restoreCost(d, potential, s, t)));
  });
}

describe("Johnson's reweighting: published worked example", () => {
  // Cormen, Leiserson, Rivest, Stein, "Introduction to Algorithms", 3rd edition, Figure 25.6 (Johnson's
  // algorithm on the five-vertex graph of Figure 25.1). Weights, the potentials h and the final
  // distance matrix (the same as Figure 25.4's D(5)) are from memory.
  const net = networkOf(['1', '2', '3', '4', '5'], [
    ['1', '2', 3], ['1', '3', 8], ['1', '5', -4], ['2', '4', 1], ['2', '5', 7],
    ['3', '2', 4], ['4', '1', 2], ['4', '3', -5], ['5', '4', 6],
  ]);

  it('potentials are h = (0, -1, -5, 0, -4) and every reweighted lane is >= 0', () => {
    const { potential, reweighted } = johnsonReweighting(net);
    expect(Array.from(potential)).toEqual([0, -1, -5, 0, -4]);
    for (const w of reweighted) expect(w).toBeGreaterThanOrEqual(0);
  });

  it('all-pairs distances match the figure', () => {
    expect(allPairs(net)).toEqual([
      [0, 1, -3, 2, -4],
      [3, 0, -4, 1, -1],
      [7, 4, 0, 5, 3],
      [2, -1, -5, 0, -2],
      [8, 5, 1, 6, 0],
    ]);
  });
});

describe("Johnson's method against graphlib's Floyd-Warshall", () => {
  it('agrees on 30 random loop-free networks with many negative lanes', () => {
    for (let seed = 1; seed <= 30; seed++) {
      const net = randomNetwork(seed, 3 + (seed % 15), 4 * (3 + (seed % 15)), true);
      // graphlib's floydWarshall keeps the last of parallel edges and lets a self-edge replace the
      // 0 on the diagonal, so it gets the simple graph: cheapest of parallel lanes, no self-lanes.
      const g = new graphlib.Graph({ directed: true });
      for (const id of net.depotIds) g.setNode(id);
      for (let e = 0; e < net.laneCount; e++) {
        const [u, v, w] = [net.depotIds[net.laneFrom[e]], net.depotIds[net.laneTo[e]], net.laneNet[e]];
        if (u !== v && !(g.edge(u, v) <= w)) g.setEdge(u, v, w);
      }
      const expected = graphlib.alg.floydWarshall(g, (e) => g.edge(e) as number);
      const got = allPairs(net);
      net.depotIds.forEach((s, i) => net.depotIds.forEach((t, j) => expect(got[i][j], `seed ${seed} ${s}->${t}`).toBe(expected[s][t].distance)));
    }
  });

  it('refuses a network with a rebate loop, naming its depots', () => {
    const net = networkOf(['A', 'B', 'C'], [['A', 'B', 5], ['B', 'C', -4], ['C', 'B', 3]]);
    expect(() => johnsonReweighting(net)).toThrow(RebateLoopPresentError);
    try {
      johnsonReweighting(net);
    } catch (error) {
      expect((error as RebateLoopPresentError).depotIds.slice().sort()).toEqual(['B', 'C']);
    }
  });
});
