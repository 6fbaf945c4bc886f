// Property tests of rebate-loop detection on random networks that often hold negative loops. The
// expected unbounded set and loop-holding components come from js-graph-algorithms' Bellman-Ford
// (V rounds, then one more relaxation pass) and graphlib's reachability and Tarjan components.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { UnboundedPathError } from '../../../engine/errors';
import { findNegativeLoop } from '../../../engine/loops/find-negative-loop';
import { findNegativeLoops } from '../../../engine/routes/find-negative-loops';
import { loopKey, type RebateLoop } from '../../../engine/routes/rebate-loop';
import { strongComponents } from '../../../engine/network/strong-components';
import { cheapestRoutes, STATUS_REACHABLE, STATUS_UNBOUNDED, STATUS_UNREACHABLE } from '../../../engine/routes/cheapest-routes';
import { routePath } from '../../../engine/routes/route-path';
import {
  anyNetwork,
  componentsWithNegativeLoop,
  jsBellmanFord,
  reachableFrom,
  toNetwork,
  unboundedByReference,
  type Spec,
} from '../routes/reference-graphs';

const SEED = 20_261_203;

/** The loop exists lane by lane, closes on its first depot, visits no depot twice and costs netPerLap < 0. */
function expectRealLoop(spec: Spec, loop: RebateLoop): void {
  const k = loop.depots.length;
  expect(k).toBeGreaterThan(0);
  expect(loop.lanes).toHaveLength(k);
  let sum = 0;
  loop.lanes.forEach((lane, i) => {
    const [from, to, w] = spec.lanes[lane];
    expect([from, to]).toEqual([loop.depots[i], loop.depots[(i + 1) % k]]);
    sum += w;
  });
  expect(sum).toBe(loop.netPerLap);
  expect(sum).toBeLessThan(0);
  expect(new Set(loop.depots).size).toBe(k);
}

const setOf = (status: Uint8Array, code: number) => new Set([...status.keys()].filter((d) => status[d] === code));

describe('rebate loops on random networks match reference libraries', () => {
  // Weights from -8 to 20 on up to 10 depots: about half the cases hold a reachable negative loop.
  const loopy = anyNetwork(10, 28, -8, 20);

  it('unbounded set, statuses and bounded costs equal the reference', () => {
    let withLoop = 0;
    fc.assert(
      fc.property(loopy, (spec) => {
        const net = toNetwork(spec);
        const tree = cheapestRoutes(net, spec.origin);
        const unbounded = unboundedByReference(spec);
        if (unbounded.size > 0) withLoop++;
        expect(setOf(tree.status, STATUS_UNBOUNDED)).toEqual(unbounded);
        const reachable = reachableFrom(spec, [spec.origin]);
        expect(setOf(tree.status, STATUS_UNREACHABLE)).toEqual(new Set([...Array(spec.n).keys()].filter((d) => !reachable.has(d))));
        // Depots outside the unbounded region have exact costs, which V rounds of Bellman-Ford reach.
        const { cost } = jsBellmanFord(spec);
        for (const d of setOf(tree.status, STATUS_REACHABLE)) expect(tree.cost[d], `depot ${d}`).toBe(cost[d]);
        expect(tree.loops.length > 0).toBe(unbounded.size > 0);
      }),
      { seed: SEED, numRuns: 3000 },
    );
    expect(withLoop).toBeGreaterThan(600); // the generator really exercises loops
  });

  it('every reported loop exists, closes, sums below zero, is distinct and lies in the unbounded region', () => {
    fc.assert(
      fc.property(loopy, (spec) => {
        const net = toNetwork(spec);
        const tree = cheapestRoutes(net, spec.origin);
        for (const loop of tree.loops) {
          expectRealLoop(spec, loop);
          for (const d of loop.depots) expect(tree.status[d]).toBe(STATUS_UNBOUNDED);
        }
        expect(new Set(tree.loops.map(loopKey)).size).toBe(tree.loops.length);
      }),
      { seed: SEED + 1, numRuns: 3000 },
    );
  });

  it('every component reachable from the origin that holds a negative loop has a reported loop', () => {
    fc.assert(
      fc.property(loopy, (spec) => {
        const tree = cheapestRoutes(toNetwork(spec), spec.origin);
        const reachable = reachableFrom(spec, [spec.origin]);
        for (const component of componentsWithNegativeLoop(spec)) {
          const anyMember = component.values().next().value!;
          if (!reachable.has(anyMember)) continue;
          const covered = tree.loops.some((loop) => loop.depots.every((d) => component.has(d)));
          expect(covered, `component {${[...component].join(',')}}`).toBe(true);
        }
      }),
      { seed: SEED + 2, numRuns: 2000 },
    );
  });

  it('larger networks (up to 60 depots, several loops): unbounded set and reported loops hold', () => {
    fc.assert(
      fc.property(anyNetwork(60, 150, -4, 40), (spec) => {
        const tree = cheapestRoutes(toNetwork(spec), spec.origin);
        expect(setOf(tree.status, STATUS_UNBOUNDED)).toEqual(unboundedByReference(spec));
        for (const loop of tree.loops) expectRealLoop(spec, loop);
        const reachable = reachableFrom(spec, [spec.origin]);
        for (const component of componentsWithNegativeLoop(spec)) {
          if (!reachable.has(component.values().next().value!)) continue;
          expect(tree.loops.some((loop) => loop.depots.every((d) => component.has(d)))).toBe(true);
        }
      }),
      { seed: SEED + 5, numRuns: 400 },
    );
  });

  it('with lanes closed by a weights array, only open lanes count for loops and unbounded depots', () => {
    fc.assert(
      fc.property(loopy, fc.infiniteStream(fc.boolean()), (spec, closeStream) => {
        const net = toNetwork(spec);
        const closed = new Set(spec.lanes.map((_, i) => i).filter(() => closeStream.next().value));
        const weights = new Float64Array(net.laneCount);
        for (let p = 0; p < net.laneCount; p++) weights[p] = closed.has(net.outLane[p]) ? Infinity : net.outNet[p];
        // Closed lanes drop out of the reference; lane indices shift, so compare depot sets only.
        const open: Spec = { ...spec, lanes: spec.lanes.filter((_, i) => !closed.has(i)) };
        const tree = cheapestRoutes(net, spec.origin, weights);
        expect(setOf(tree.status, STATUS_UNBOUNDED)).toEqual(unboundedByReference(open));
        for (const loop of tree.loops) {
          expect(loop.lanes.some((lane) => closed.has(lane))).toBe(false);
          expectRealLoop(spec, loop);
        }
      }),
      { seed: SEED + 7, numRuns: 1500 },
    );
  });

  it('paths to unbounded depots are refused; paths to the others hold', () => {
    fc.assert(
      fc.property(loopy, (spec) => {
        const net = toNetwork(spec);
        const tree = cheapestRoutes(net, spec.origin);
        for (let d = 0; d < spec.n; d++) {
          if (tree.status[d] === STATUS_UNBOUNDED) {
            expect(() => routePath(net, tree, d)).toThrow(UnboundedPathError);
          } else if (tree.status[d] === STATUS_REACHABLE) {
            const path = routePath(net, tree, d)!;
            expect(path.lanes.reduce((sum, lane) => sum + spec.lanes[lane][2], 0)).toBe(tree.cost[d]);
            path.lanes.forEach((lane, i) => expect(spec.lanes[lane].slice(0, 2)).toEqual([path.depots[i], path.depots[i + 1]]));
          }
        }
      }),
      { seed: SEED + 3, numRuns: 2000 },
    );
  });

  it('findNegativeLoop finds a loop in exactly the components that hold one', () => {
    fc.assert(
      fc.property(loopy, (spec) => {
        const net = toNetwork(spec);
        const withLoop = componentsWithNegativeLoop(spec).map((c) => [...c].sort((a, b) => a - b).join(','));
        for (const members of strongComponents(net).members) {
          const loop = findNegativeLoop(net, members);
          const key = members.slice().sort((a, b) => a - b).join(',');
          expect(loop !== null, `component {${key}}`).toBe(withLoop.includes(key));
          if (loop) {
            expectRealLoop(spec, loop);
            expect(loop.depots.every((d) => members.includes(d))).toBe(true);
          }
        }
      }),
      { seed: SEED + 4, numRuns: 1500 },
    );
  });

  it('findNegativeLoops, all components in one pass, agrees with the reference per component', () => {
    fc.assert(
      fc.property(anyNetwork(30, 70, -6, 20), (spec) => {
        const net = toNetwork(spec);
        const withLoop = componentsWithNegativeLoop(spec).map((c) => [...c].sort((a, b) => a - b).join(','));
        const { members } = strongComponents(net);
        const loops = findNegativeLoops(net, members);
        expect(loops).toHaveLength(members.length);
        members.forEach((component, c) => {
          const key = component.slice().sort((a, b) => a - b).join(',');
          expect(loops[c] !== null, `component {${key}}`).toBe(withLoop.includes(key));
          if (loops[c]) {
            expectRealLoop(spec, loops[c]!);
            expect(loops[c]!.depots.every((d) => component.includes(d))).toBe(true);
          }
        });
      }),
      { seed: SEED + 6, numRuns: 1500 },
    );
  });
});
