import { describe, expect, it } from 'vitest';
import { findDistinctLoops } from '../../../engine/audit/distinct-loops';
import { strongComponents } from '../../../engine/network/strong-components';
import { loopKey } from '../../../engine/routes/rebate-loop';
import { networkOf } from '../../support/network-builder';
import { indexedLanes, randomNetwork, referenceHasNegativeLoop } from './reference';
import type { Network } from '../../../engine/network/types';

/** The loop is a real closed walk of the network and its lanes sum to its (negative) net per lap. */
function expectRealLoop(net: Network, loop: { depots: number[]; lanes: number[]; netPerLap: number }) {
  expect(loop.lanes.length).toBe(loop.depots.length);
  loop.lanes.forEach((e, i) => {
    expect(net.laneFrom[e]).toBe(loop.depots[i]);
    expect(net.laneTo[e]).toBe(loop.depots[(i + 1) % loop.depots.length]);
  });
  const sum = loop.lanes.reduce((s, e) => s + net.laneNet[e], 0);
  expect(sum).toBe(loop.netPerLap);
  expect(sum).toBeLessThan(0);
  expect(new Set(loop.depots).size).toBe(loop.depots.length); // a simple loop
}

/** Every negative simple loop by exhaustive search (small networks only), as sorted lane lists. */
function allNegativeSimpleLoops(net: Network): string[] {
  const out: string[] = [];
  const onPath = new Uint8Array(net.depotCount);
  const lanes: number[] = [];
  const walk = (start: number, u: number, sum: number) => {
    for (let p = net.outStart[u]; p < net.outStart[u + 1]; p++) {
      const e = net.outLane[p];
      const v = net.outTo[p];
      if (v === start) {
        if (sum + net.laneNet[e] < 0) out.push([...lanes, e].sort((a, b) => a - b).join(','));
      } else if (v > start && !onPath[v]) {
        onPath[v] = 1;
        lanes.push(e);
        walk(start, v, sum + net.laneNet[e]);
        lanes.pop();
        onPath[v] = 0;
      }
    }
  };
  for (let s = 0; s < net.depotCount; s++) {
    onPath[s] = 1;
    walk(s, s, 0);
    onPath[s] = 0;
  }
  return out;
}

describe('distinct rebate loops', () => {
  it('finds both loops of a figure eight sharing one depot, and says when the cap hides one', () => {
    const net = networkOf(['H', 'A', 'B'], [['H', 'A', 5], ['A', 'H', -7], ['H', 'B', 3], ['B', 'H', -4], ['A', 'B', 100]]);
    const all = findDistinctLoops(net, { cap: 10 });
    expect(all.loops.map((l) => l.depots.map((d) => net.depotIds[d]).join('>')).sort()).toEqual(['H>A', 'H>B']);
    expect(all.capReached).toBe(false);
    const capped = findDistinctLoops(net, { cap: 1 });
    expect(capped.loops).toHaveLength(1);
    expect(capped.capReached).toBe(true);
  });

  it('a cap equal to the number of loops is not reported as reached', () => {
    const net = networkOf(['A', 'B'], [['A', 'B', 1], ['B', 'A', -2]]);
    const found = findDistinctLoops(net, { cap: 1 });
    expect(found.loops).toHaveLength(1);
    expect(found.capReached).toBe(false);
  });

  it('finds loops no origin would reach and loops in every component', () => {
    // Two separate components, each with a loop; nothing links them.
    const net = networkOf(['A', 'B', 'C', 'D'], [['A', 'B', 2], ['B', 'A', -3], ['C', 'D', -1], ['D', 'C', 0]]);
    const found = findDistinctLoops(net, { cap: 1 });
    expect(found.loops).toHaveLength(2); // one per component even under a cap of 1
  });

  it('on random networks: every loop is real and negative, and every component with a loop has one reported', () => {
    for (let seed = 1; seed <= 80; seed++) {
      const depots = 3 + (seed % 9);
      const net = randomNetwork(seed, depots, depots * 2, false, 20);
      const found = findDistinctLoops(net, { cap: 25 });
      for (const loop of found.loops) expectRealLoop(net, loop);
      expect(new Set(found.loops.map(loopKey)).size, `seed ${seed}: loops are distinct`).toBe(found.loops.length);
      // Reference: each component checked on its own by js-graph-algorithms' Bellman-Ford.
      const { componentOf, members } = strongComponents(net);
      members.forEach((component, c) => {
        const inside = indexedLanes(net).filter(([u, v]) => componentOf[u] === c && componentOf[v] === c);
        const hasLoop = referenceHasNegativeLoop(net.depotCount, inside);
        const reported = found.loops.some((l) => componentOf[l.depots[0]] === c);
        expect(reported, `seed ${seed} component ${component.join(',')}`).toBe(hasLoop);
      });
      if (!found.capReached) {
        // Below the cap the search is complete: exactly the negative simple loops, found by brute force.
        expect(found.loops.map(loopKey).sort(), `seed ${seed}`).toEqual(allNegativeSimpleLoops(net).sort());
      }
    }
  });
});
