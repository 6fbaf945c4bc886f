// Yen's alternatives against brute force: on small random networks with negative lanes and no loop
// (lanes w0 + p(u) - p(v), w0 >= 0), every simple route from the origin to a target is enumerated
// and sorted by cost; the engine's best route plus its K alternatives must have the same K + 1 costs
// in the same order, each a distinct loopless route whose cost is the sum of its lanes.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { departingLanes, prepareYen, yenAlternatives } from '../../../engine/dispatch/yen-alternatives';
import { cheapestRoutes, STATUS_REACHABLE } from '../../../engine/routes/cheapest-routes';
import { routePath } from '../../../engine/routes/route-path';
import { networkOf } from '../../support/network-builder';
import { loopFreeNetwork, toNetwork, type Spec } from '../routes/reference-graphs';

/** Costs of every simple route origin -> target (depots never repeat), ascending. */
function bruteForceCosts(spec: Spec, target: number): number[] {
  const costs: number[] = [];
  const onPath = new Uint8Array(spec.n);
  const walk = (u: number, cost: number) => {
    if (u === target) {
      costs.push(cost);
      return;
    }
    onPath[u] = 1;
    for (const [a, b, w] of spec.lanes) if (a === u && !onPath[b]) walk(b, cost + w);
    onPath[u] = 0;
  };
  walk(spec.origin, 0);
  return costs.sort((x, y) => x - y);
}

describe('yenAlternatives', () => {
  it('gives the K + 1 cheapest simple routes of brute-force enumeration, in order', () => {
    fc.assert(
      fc.property(loopFreeNetwork(7, 16), fc.nat(6), fc.integer({ min: 1, max: 6 }), (spec, t, k) => {
        const target = t % spec.n;
        if (target === spec.origin) return;
        const network = toNetwork(spec);
        const tree = cheapestRoutes(network, spec.origin);
        const brute = bruteForceCosts(spec, target);
        if (tree.status[target] !== STATUS_REACHABLE) {
          expect(brute).toEqual([]);
          return;
        }
        const best = routePath(network, tree, target)!;
        const result = yenAlternatives(prepareYen(network, tree), target, { lanes: best.lanes, costMinor: tree.cost[target] }, k);
        const costs = [tree.cost[target], ...result.alternatives.map((a) => a.costMinor)];
        expect(costs).toEqual(brute.slice(0, k + 1));
        expect(result.stoppedBy).toBe(brute.length > k ? 'k' : 'exhausted');
        const keys = new Set([best.lanes.join(',')]);
        for (const a of result.alternatives) {
          keys.add(a.lanes.join(','));
          const depots = [spec.origin, ...a.lanes.map((e) => network.laneTo[e])];
          expect(new Set(depots).size).toBe(depots.length);
          expect(depots.at(-1)).toBe(target);
          expect(a.costMinor).toBe(a.lanes.reduce((s, e) => s + network.laneNet[e], 0));
        }
        expect(keys.size).toBe(result.alternatives.length + 1);
      }),
      { numRuns: 400, seed: 11 },
    );
  });

  it('parallel lanes are distinct routes; the departing lanes are those off the best route', () => {
    const network = networkOf(['A', 'B', 'C'], [['A', 'B', 5], ['A', 'B', 7], ['B', 'C', -3], ['A', 'C', 4]]);
    const tree = cheapestRoutes(network, 0);
    const best = routePath(network, tree, 2)!;
    expect(tree.cost[2]).toBe(2);
    const r = yenAlternatives(prepareYen(network, tree), 2, { lanes: best.lanes, costMinor: 2 }, 5);
    expect(r.alternatives.map((a) => a.costMinor)).toEqual([4, 4]);
    expect(r.alternatives.map((a) => a.lanes)).toEqual([[3], [1, 2]]); // equal costs: fewer lanes first
    expect(r.stoppedBy).toBe('exhausted');
    expect(departingLanes(best.lanes, [1, 2])).toEqual([1]);
  });

  it('stops at the search budget and says so', () => {
    const network = networkOf(['A', 'B', 'C', 'D'], [['A', 'B', 1], ['B', 'D', 1], ['A', 'C', 1], ['C', 'D', 2], ['A', 'D', 9]]);
    const tree = cheapestRoutes(network, 0);
    const best = routePath(network, tree, 3)!;
    const r = yenAlternatives(prepareYen(network, tree), 3, { lanes: best.lanes, costMinor: 2 }, 5, 1);
    expect(r.stoppedBy).toBe('budget');
    expect(r.searches).toBe(1);
  });
});
