// Property tests of the single-origin solve on random loop-free networks against graphlib's
// Floyd-Warshall and Dijkstra and js-graph-algorithms' Bellman-Ford (npm reference libraries).

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cheapestRoutes, STATUS_REACHABLE, STATUS_UNREACHABLE, type RouteTree } from '../../../engine/routes/cheapest-routes';
import { routePath } from '../../../engine/routes/route-path';
import type { Network } from '../../../engine/network/types';
import { anyNetwork, dijkstraCosts, floydWarshallCosts, jsBellmanFord, loopFreeNetwork, toNetwork, type Spec } from './reference-graphs';

const SEED = 20_261_202;

/** Engine costs with Infinity for unreachable depots. */
const engineCosts = (tree: RouteTree) => Array.from(tree.cost, (c, d) => (tree.status[d] === STATUS_REACHABLE ? c : Infinity));

/** Every reachable depot's path starts at the origin, follows real lanes, sums to the cost, and has `legs` lanes. */
function expectPathsHold(spec: Spec, net: Network, tree: RouteTree): void {
  for (let d = 0; d < spec.n; d++) {
    const path = routePath(net, tree, d);
    if (tree.status[d] === STATUS_UNREACHABLE) {
      expect(path).toBeNull();
      continue;
    }
    expect(path).not.toBeNull();
    const { depots, lanes } = path!;
    expect(depots[0]).toBe(spec.origin);
    expect(depots[depots.length - 1]).toBe(d);
    expect(lanes.length).toBe(depots.length - 1);
    expect(lanes.length).toBe(tree.legs[d]);
    let sum = 0;
    lanes.forEach((lane, i) => {
      const [from, to, w] = spec.lanes[lane];
      expect([from, to]).toEqual([depots[i], depots[i + 1]]);
      sum += w;
    });
    expect(sum).toBe(tree.cost[d]);
    // Ties keep the first predecessor, so even zero-cost loops never put a depot twice on a route.
    expect(new Set(depots).size).toBe(depots.length);
  }
}

describe('cheapest routes on loop-free networks match reference libraries', () => {
  it('negative lanes (by potentials): costs equal graphlib Floyd-Warshall and js-graph-algorithms Bellman-Ford', () => {
    fc.assert(
      fc.property(loopFreeNetwork(12, 45), (spec) => {
        const net = toNetwork(spec);
        const tree = cheapestRoutes(net, spec.origin);
        const costs = engineCosts(tree);
        expect(costs).toEqual(floydWarshallCosts(spec));
        const bf = jsBellmanFord(spec);
        expect(bf.stillRelaxing).toEqual([]);
        expect(costs).toEqual(bf.cost);
        expect(tree.loops).toEqual([]);
        expectPathsHold(spec, net, tree);
      }),
      { seed: SEED, numRuns: 3000 },
    );
  });

  it('non-negative lanes: costs equal graphlib Dijkstra and Floyd-Warshall', () => {
    fc.assert(
      fc.property(anyNetwork(14, 50, 0, 25), (spec) => {
        const net = toNetwork(spec);
        const tree = cheapestRoutes(net, spec.origin);
        const costs = engineCosts(tree);
        expect(costs).toEqual(dijkstraCosts(spec));
        expect(costs).toEqual(floydWarshallCosts(spec));
        expect(tree.loops).toEqual([]);
        expectPathsHold(spec, net, tree);
      }),
      { seed: SEED + 1, numRuns: 2000 },
    );
  });

  it('larger sparse networks with rebates: costs equal js-graph-algorithms Bellman-Ford', () => {
    fc.assert(
      fc.property(loopFreeNetwork(80, 240), (spec) => {
        const net = toNetwork(spec);
        const tree = cheapestRoutes(net, spec.origin);
        expect(engineCosts(tree)).toEqual(jsBellmanFord(spec).cost);
        expectPathsHold(spec, net, tree);
      }),
      { seed: SEED + 2, numRuns: 500 },
    );
  });

  it('a weights array overrides net costs and +Infinity closes a lane', () => {
    fc.assert(
      fc.property(loopFreeNetwork(10, 35), fc.infiniteStream(fc.boolean()), (spec, closeStream) => {
        const net = toNetwork(spec);
        const closed = new Set(spec.lanes.map((_, i) => i).filter(() => closeStream.next().value));
        const weights = new Float64Array(net.laneCount);
        for (let p = 0; p < net.laneCount; p++) weights[p] = closed.has(net.outLane[p]) ? Infinity : net.outNet[p];
        const open: Spec = { ...spec, lanes: spec.lanes.filter((_, i) => !closed.has(i)) };
        expect(engineCosts(cheapestRoutes(net, spec.origin, weights))).toEqual(jsBellmanFord(open).cost);
      }),
      { seed: SEED + 3, numRuns: 1000 },
    );
  });
});
