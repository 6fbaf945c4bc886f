// The repaired tree against a fresh solve: on random networks with negative lanes and no loop, with
// random lanes closed, repairTree must give exactly the statuses and costs of js-graph-algorithms'
// Bellman-Ford over the open lanes, and routes whose lanes add up to those costs.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { canRepair, repairTree } from '../../../engine/dispatch/restricted-repair';
import { cheapestRoutes, STATUS_REACHABLE } from '../../../engine/routes/cheapest-routes';
import { routePath } from '../../../engine/routes/route-path';
import { networkOf } from '../../support/network-builder';
import { jsBellmanFord, loopFreeNetwork, toNetwork } from '../routes/reference-graphs';

describe('repairTree', () => {
  it('equals Bellman-Ford over the open lanes', () => {
    fc.assert(
      fc.property(loopFreeNetwork(12, 40), fc.array(fc.boolean(), { minLength: 40, maxLength: 40 }), (spec, shut) => {
        const network = toNetwork(spec);
        const plain = cheapestRoutes(network, spec.origin);
        expect(canRepair(plain)).toBe(true);
        const closed = Uint8Array.from(spec.lanes.map((_, e) => (shut[e] ? 1 : 0)));
        const tree = repairTree(network, plain, closed);
        const open = spec.lanes.filter((_, e) => !shut[e]);
        const ref = jsBellmanFord({ n: spec.n, lanes: open, origin: spec.origin }).cost;
        for (let d = 0; d < spec.n; d++) {
          if (ref[d] === Infinity) {
            expect(tree.status[d]).not.toBe(STATUS_REACHABLE);
            continue;
          }
          expect(tree.status[d]).toBe(STATUS_REACHABLE);
          expect(tree.cost[d]).toBe(ref[d]);
          const path = routePath(network, tree, d)!;
          expect(path.lanes.every((e) => closed[e] === 0)).toBe(true);
          expect(path.lanes.reduce((s, e) => s + network.laneNet[e], 0)).toBe(ref[d]);
          expect(tree.legs[d]).toBe(path.lanes.length);
        }
      }),
      { numRuns: 500, seed: 7 },
    );
  });

  it('is refused for a solve with a rebate loop', () => {
    const network = networkOf(['A', 'B'], [['A', 'B', 1], ['B', 'A', -2]]);
    expect(canRepair(cheapestRoutes(network, 0))).toBe(false);
  });
});
