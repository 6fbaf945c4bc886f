import { describe, expect, it } from 'vitest';
import { headroomPlan, laneFloors, singleThreadRunner } from '../../../engine/audit/headroom';
import { seededRandom } from '../../support/seeded-random';
import { laneFloorsPerDestination } from '../../../engine/audit/headroom-per-destination';
import { auditNetwork } from '../../../engine/audit/network-audit';
import { networkOf } from '../../support/network-builder';
import { indexedLanes, randomNetwork, referenceHasNegativeLoop } from './reference';

/**
 * Brute force, independent of the engine: with lane e's net set to its floor there is no negative
 * loop (js-graph-algorithms' Bellman-Ford); one minor unit lower there is. "No limit" means even a
 * huge rebate on that lane makes no loop.
 */
function checkFloorsByBruteForce(depotCount: number, nets: Float64Array, floor: Float64Array, lanes: ReturnType<typeof indexedLanes>, label: string) {
  for (let e = 0; e < lanes.length; e++) {
    const withNet = (value: number) => lanes.map((l, i) => (i === e ? ([l[0], l[1], value] as typeof l) : l));
    if (Number.isNaN(floor[e])) {
      expect(referenceHasNegativeLoop(depotCount, withNet(-1_000_000_000)), `${label} lane ${e}: no limit`).toBe(false);
      continue;
    }
    expect(nets[e] >= floor[e], `${label} lane ${e}: net is above its floor`).toBe(true);
    expect(referenceHasNegativeLoop(depotCount, withNet(floor[e])), `${label} lane ${e}: at its floor`).toBe(false);
    expect(referenceHasNegativeLoop(depotCount, withNet(floor[e] - 1)), `${label} lane ${e}: one below its floor`).toBe(true);
  }
}

describe('rebate headroom', () => {
  it('a two-depot example worked by hand', () => {
    // A->B nets 10, B->A nets 4: A->B may fall to -4 before the pair pays; B->A to -10. C has no way back.
    const net = networkOf(['A', 'B', 'C'], [['A', 'B', 10], ['B', 'A', 4], ['B', 'C', 7], ['C', 'C', 0]]);
    const { floor } = laneFloors(net);
    expect(Array.from(floor)).toEqual([-4, -10, NaN, 0]);
  });

  it('matches brute force on 60 small random loop-free networks', () => {
    for (let seed = 1; seed <= 60; seed++) {
      const depots = 2 + (seed % 7);
      const net = randomNetwork(seed, depots, depots * 2 + (seed % 5), true, 20);
      const { floor, net: nets } = laneFloors(net);
      checkFloorsByBruteForce(depots, nets, floor, indexedLanes(net, nets), `seed ${seed}`);
    }
  });

  it('is computed on the fixed network when the network has loops, and matches brute force there', () => {
    let withLoops = 0;
    for (let seed = 100; seed < 160; seed++) {
      const depots = 3 + (seed % 5);
      const net = randomNetwork(seed, depots, depots * 2, false, 20);
      const audit = auditNetwork(net);
      expect(audit.headroom, `seed ${seed}`).not.toBeNull();
      const { floor, net: nets } = audit.headroom!;
      if (audit.loops.length > 0) {
        withLoops++;
        expect(audit.headroomAfterFixPlan).toBe(true);
      }
      checkFloorsByBruteForce(depots, nets, floor, indexedLanes(net, nets), `seed ${seed}`);
    }
    expect(withLoops).toBeGreaterThan(10);
  });

  it('reports progress up to the number of searches', () => {
    const net = randomNetwork(7, 30, 120, true);
    const seen: [number, number][] = [];
    const result = laneFloors(net, { onProgress: (done, total) => seen.push([done, total]) });
    expect(seen[0][0]).toBe(0);
    expect(seen.at(-1)).toEqual([result.sources, result.sources]);
  });

  it('equals the Dijkstra-per-destination method on 80 random networks, closed lanes and parallel lanes included', () => {
    let limited = 0;
    let unlimited = 0;
    for (let seed = 1; seed <= 80; seed++) {
      const depots = 5 + (seed % 13) * 7;
      const net = randomNetwork(seed, depots, depots * (2 + (seed % 5)), true, 40 + seed);
      // Every fifth network closes some lanes through weights, as a fix plan or a what-if does.
      let weights: Float64Array | undefined;
      if (seed % 5 === 0) {
        weights = Float64Array.from(net.outNet);
        for (let p = 0; p < weights.length; p += 3) weights[p] = Infinity;
      }
      const fast = laneFloors(net, { weights });
      const reference = laneFloorsPerDestination(net, { weights });
      expect(Array.from(fast.floor), `seed ${seed}`).toEqual(Array.from(reference.floor));
      expect(Array.from(fast.net)).toEqual(Array.from(reference.net));
      for (const f of fast.floor) if (Number.isNaN(f)) unlimited++;
      else limited++;
    }
    expect(limited).toBeGreaterThan(1_000);
    expect(unlimited).toBeGreaterThan(50);
  });

  it('equals the reference with balls of 1 to 5 depots, so forward searches run long and pruning decides', () => {
    // The default ball holds these small networks whole (radius +Infinity); tiny balls make every
    // answer depend on the stopping rule best(u) <= forward radius + R(u) and on the labels kept out of the heap.
    for (let seed = 1; seed <= 60; seed++) {
      const depots = 6 + (seed % 11) * 5;
      const net = randomNetwork(seed, depots, depots * (2 + (seed % 4)), true, 30 + seed);
      let weights: Float64Array | undefined;
      if (seed % 4 === 0) {
        weights = Float64Array.from(net.outNet);
        for (let p = 1; p < weights.length; p += 4) weights[p] = Infinity;
      }
      const reference = laneFloorsPerDestination(net, { weights });
      for (const ballSize of [1, 2, 5]) {
        expect(Array.from(laneFloors(net, { weights, ballSize }).floor), `seed ${seed} ball ${ballSize}`).toEqual(Array.from(reference.floor));
      }
    }
  });

  it('gives the same pair costs when started from known upper bounds and stopped at known lower bounds', () => {
    // The calendar review passes the core's cost as an upper bound and the union's as a lower one.
    for (let seed = 1; seed <= 30; seed++) {
      const depots = 20 + seed * 3;
      const net = randomNetwork(seed, depots, depots * 4, true, 60);
      const { arrays } = headroomPlan(net);
      const exact = singleThreadRunner.run(arrays, 2).cost;
      const rand = seededRandom(seed);
      const loose = (k: number, sign: number) => (exact[k] === Infinity || rand() < 0.3 ? sign * Infinity : exact[k] + sign * Math.floor(rand() * 3));
      const pairUpper = Float64Array.from(exact, (_, k) => loose(k, 1));
      const pairLower = Float64Array.from(exact, (_, k) => loose(k, -1));
      for (const ballSize of [1, 3, 50]) {
        expect(Array.from(singleThreadRunner.run({ ...arrays, pairUpper, pairLower }, ballSize).cost), `seed ${seed} ball ${ballSize}`).toEqual(Array.from(exact));
      }
    }
  });

  it('equals the reference on a larger sparse network with many rebates', () => {
    const net = randomNetwork(4242, 600, 3_000, true, 5_000);
    const reference = Array.from(laneFloorsPerDestination(net).floor);
    expect(Array.from(laneFloors(net).floor)).toEqual(reference);
    expect(Array.from(laneFloors(net, { ballSize: 8 }).floor)).toEqual(reference);
  });
});

