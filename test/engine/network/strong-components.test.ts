// Strongly connected components against graphlib's Tarjan (npm reference library), with masks and
// closed lanes, plus a long chain that would overflow a recursive implementation's call stack.

import fc from 'fast-check';
import graphlib from 'graphlib';
import { describe, expect, it } from 'vitest';
import { componentHasCycle, strongComponents } from '../../../engine/network/strong-components';
import { networkOf, numberedIds } from '../../support/network-builder';
import { anyNetwork, toNetwork, type Spec } from '../routes/reference-graphs';

const canonical = (components: readonly (readonly number[])[]) =>
  components.map((c) => c.slice().sort((a, b) => a - b).join(',')).sort();

function graphlibComponents(spec: Spec, keep: (d: number) => boolean, laneOpen: (i: number) => boolean): string[] {
  const g = new graphlib.Graph({ directed: true });
  for (let d = 0; d < spec.n; d++) if (keep(d)) g.setNode(String(d));
  spec.lanes.forEach(([u, v], i) => {
    if (keep(u) && keep(v) && laneOpen(i)) g.setEdge(String(u), String(v));
  });
  return canonical(graphlib.alg.tarjan(g).map((c) => c.map(Number)));
}

describe('strongComponents', () => {
  it('equals graphlib Tarjan, also with a depot mask and closed lanes', () => {
    fc.assert(
      fc.property(anyNetwork(25, 60, -5, 5), fc.infiniteStream(fc.boolean()), (spec, coin) => {
        const net = toNetwork(spec);
        expect(canonical(strongComponents(net).members)).toEqual(graphlibComponents(spec, () => true, () => true));

        const allowed = Uint8Array.from({ length: spec.n }, () => (coin.next().value ? 1 : 0));
        const closedLane = spec.lanes.map(() => coin.next().value && coin.next().value);
        const weights = new Float64Array(net.laneCount);
        for (let p = 0; p < net.laneCount; p++) weights[p] = closedLane[net.outLane[p]] ? Infinity : net.outNet[p];
        const { members, componentOf } = strongComponents(net, allowed, weights);
        expect(canonical(members)).toEqual(graphlibComponents(spec, (d) => allowed[d] === 1, (i) => !closedLane[i]));
        for (let d = 0; d < spec.n; d++) if (!allowed[d]) expect(componentOf[d]).toBe(-1);
        members.forEach((component, c) => component.forEach((d) => expect(componentOf[d]).toBe(c)));
      }),
      { seed: 20_261_206, numRuns: 800 },
    );
  });

  it('handles a 200,000-depot chain without deep recursion', () => {
    const n = 200_000;
    const ids = numberedIds(n);
    const lanes: [string, string, number][] = [];
    for (let i = 0; i + 1 < n; i++) lanes.push([ids[i], ids[i + 1], 1]);
    lanes.push([ids[n - 1], ids[0], 1]); // closes one big loop
    const { members } = strongComponents(networkOf(ids, lanes));
    expect(members).toHaveLength(1);
    expect(members[0]).toHaveLength(n);
  });

  it('a single depot holds a loop only with an open lane to itself', () => {
    const net = networkOf(['A', 'B'], [['A', 'A', 3], ['A', 'B', 1]]);
    expect(componentHasCycle(net, [0])).toBe(true);
    expect(componentHasCycle(net, [1])).toBe(false);
    expect(componentHasCycle(net, [0], Float64Array.from([Infinity, 1]))).toBe(false);
  });
});
