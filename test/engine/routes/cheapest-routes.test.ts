import { describe, expect, it } from 'vitest';
import { cheapestRoutes, STATUS_REACHABLE, STATUS_UNBOUNDED, STATUS_UNREACHABLE, type RouteTree } from '../../../engine/routes/cheapest-routes';
import { routePath } from '../../../engine/routes/route-path';
import { MoneyOverflowError, UnboundedPathError } from '../../../engine/errors';
import type { Network } from '../../../engine/network/types';
import { networkOf } from '../../support/network-builder';
import { buildNetwork } from '../../../engine/network/build';
import { parseMinor, ZERO } from '../../../engine/money/minor';

const solve = (net: Network, from: string) => cheapestRoutes(net, net.depotIndex.get(from)!);
const costOf = (net: Network, tree: RouteTree, id: string) => {
  const d = net.depotIndex.get(id)!;
  return tree.status[d] === STATUS_REACHABLE ? tree.cost[d] : tree.status[d] === STATUS_UNBOUNDED ? -Infinity : Infinity;
};
const pathIds = (net: Network, tree: RouteTree, id: string) =>
  routePath(net, tree, net.depotIndex.get(id)!)!.depots.map((d) => net.depotIds[d]).join('>');

describe('published worked examples', () => {
  // Cormen, Leiserson, Rivest, Stein, "Introduction to Algorithms", 3rd edition, Figure 24.4
  // (Bellman-Ford on five vertices with negative edges). Edge weights and final values from memory.
  it('CLRS 3rd ed. Figure 24.4: Bellman-Ford from s', () => {
    const net = networkOf(['s', 't', 'x', 'y', 'z'], [
      ['s', 't', 6], ['s', 'y', 7], ['t', 'x', 5], ['t', 'y', 8], ['t', 'z', -4],
      ['x', 't', -2], ['y', 'x', -3], ['y', 'z', 9], ['z', 's', 2], ['z', 'x', 7],
    ]);
    const tree = solve(net, 's');
    expect(['s', 't', 'x', 'y', 'z'].map((id) => costOf(net, tree, id))).toEqual([0, 2, 4, 7, -2]);
    expect(pathIds(net, tree, 'z')).toBe('s>y>x>t>z');
    expect(tree.loops).toEqual([]);
  });

  // CLRS 3rd edition, Figure 24.1: negative-weight edges, a reachable negative cycle <e, f> and an
  // unreachable one <h, i, j>. Weights and values from memory: e, f, g are -infinity; h, i, j are
  // unreachable (infinity) although they hold a negative cycle.
  it('CLRS 3rd ed. Figure 24.1: reachable and unreachable negative cycles', () => {
    const net = networkOf(['s', 'a', 'b', 'c', 'd', 'e', 'f', 'g', 'h', 'i', 'j'], [
      ['s', 'a', 3], ['s', 'c', 5], ['s', 'e', 2], ['a', 'b', -4], ['b', 'g', 4], ['c', 'd', 6], ['d', 'c', -3],
      ['d', 'g', 8], ['e', 'f', 3], ['f', 'e', -6], ['f', 'g', 7], ['h', 'i', 2], ['i', 'j', 3], ['j', 'h', -8],
    ]);
    const tree = solve(net, 's');
    expect(['s', 'a', 'b', 'c', 'd'].map((id) => costOf(net, tree, id))).toEqual([0, 3, -1, 5, 11]);
    for (const id of ['e', 'f', 'g']) expect(costOf(net, tree, id), id).toBe(-Infinity);
    for (const id of ['h', 'i', 'j']) expect(costOf(net, tree, id), id).toBe(Infinity);
    expect(tree.loops).toHaveLength(1);
    expect(tree.loops[0].depots.map((d) => net.depotIds[d])).toEqual(['e', 'f']);
    expect(tree.loops[0].netPerLap).toBe(-3);
    expect(() => routePath(net, tree, net.depotIndex.get('g')!)).toThrow(UnboundedPathError);
  });

  // Sedgewick and Wayne, "Algorithms", 4th edition, section 4.4 (shortest paths), the tinyEWDn
  // network: negative edges, no negative cycle, distances from vertex 0. Edges and distances from
  // memory, converted to cents.
  const tinyEWDn: [string, string, number][] = [
    ['4', '5', 35], ['5', '4', 35], ['4', '7', 37], ['5', '7', 28], ['7', '5', 28], ['5', '1', 32], ['0', '4', 38], ['0', '2', 26],
    ['7', '3', 39], ['1', '3', 29], ['2', '7', 34], ['6', '2', -120], ['3', '6', 52], ['6', '0', -140], ['6', '4', -125],
  ];
  const eight = ['0', '1', '2', '3', '4', '5', '6', '7'];

  it('Sedgewick & Wayne, Algorithms 4th ed., tinyEWDn: distances from 0', () => {
    const net = networkOf(eight, tinyEWDn);
    const tree = solve(net, '0');
    expect(eight.map((id) => costOf(net, tree, id))).toEqual([0, 93, 26, 99, 26, 61, 151, 60]);
    expect(pathIds(net, tree, '1')).toBe('0>2>7>3>6>4>5>1');
    expect(tree.loops).toEqual([]);
  });

  // Same book and section, tinyEWDnc: tinyEWDn with 5->4 weighted -0.66, which makes the negative
  // cycle 4->5->4 (0.35 - 0.66 = -0.31). Values from memory. The cycle is reachable from 0 and
  // every vertex is reachable from it, so every depot is unbounded.
  it('Sedgewick & Wayne, Algorithms 4th ed., tinyEWDnc: negative cycle 4->5->4', () => {
    const lanes = tinyEWDn.map(([u, v, w]): [string, string, number] => (u === '5' && v === '4' ? [u, v, -66] : [u, v, w]));
    const net = networkOf(eight, lanes);
    const tree = solve(net, '0');
    for (const id of eight) expect(costOf(net, tree, id), id).toBe(-Infinity);
    expect(tree.loops).toHaveLength(1); // one strongly connected part holds every negative loop
    const fiveToFour = lanes.findIndex(([u, v]) => u === '5' && v === '4');
    const loop = tree.loops[0];
    // The book names 4->5->4; 4->7->5->4 (0.37 + 0.28 - 0.66 = -0.01) is negative too and also
    // valid. Either way the loop runs through the changed lane 5->4.
    expect(loop.lanes).toContain(fiveToFour);
    expect([-31, -1]).toContain(loop.netPerLap);
    expect(() => routePath(net, tree, 0)).toThrow(UnboundedPathError);
  });
});

describe('edge cases', () => {
  it('a zero-cost loop is not a rebate loop and keeps paths intact', () => {
    const net = networkOf(['A', 'B', 'C'], [['A', 'B', 5], ['B', 'C', 3], ['C', 'B', -3]]);
    const tree = solve(net, 'A');
    expect(tree.loops).toEqual([]);
    expect(costOf(net, tree, 'C')).toBe(8);
    expect(pathIds(net, tree, 'B')).toBe('A>B');
    expect(pathIds(net, tree, 'C')).toBe('A>B>C');
  });

  it('+0.10, +0.20 and -0.30 lanes form no rebate loop', () => {
    const lane = (from: string, to: string, toll: string, rebate: string, row: number) => ({
      from, to, toll: parseMinor(toll), fuel: ZERO, fees: ZERO, rebate: parseMinor(rebate), sourceRow: row,
    });
    const net = buildNetwork(
      ['A', 'B', 'C'].map((id) => ({ id, name: id, lat: 0, lon: 0 })),
      [lane('A', 'B', '0.10', '0', 2), lane('B', 'C', '0.20', '0', 3), lane('C', 'A', '0', '0.30', 4)],
    );
    const tree = solve(net, 'A');
    expect(tree.loops).toEqual([]);
    expect(costOf(net, tree, 'C')).toBe(30);
  });

  it('a loop the origin cannot reach raises no warning and changes no cost', () => {
    const net = networkOf(['A', 'B', 'X', 'Y'], [['A', 'B', 4], ['X', 'Y', -5], ['Y', 'X', 1], ['X', 'B', 1]]);
    const tree = solve(net, 'A');
    expect(tree.loops).toEqual([]);
    expect(costOf(net, tree, 'B')).toBe(4);
    expect(costOf(net, tree, 'X')).toBe(Infinity);
  });

  it('a rebate on a lane from a depot to itself is a loop of one lane', () => {
    const net = networkOf(['A', 'B', 'C'], [['A', 'B', 2], ['B', 'B', -1], ['A', 'C', 1]]);
    const tree = solve(net, 'A');
    expect(tree.loops).toHaveLength(1);
    expect(tree.loops[0]).toMatchObject({ depots: [1], lanes: [1], netPerLap: -1 });
    expect(tree.status[1]).toBe(STATUS_UNBOUNDED);
    expect(costOf(net, tree, 'C')).toBe(1);
  });

  it('parallel lanes are kept and routing uses the cheapest; equal ones keep the first', () => {
    const net = networkOf(['A', 'B'], [['A', 'B', 9], ['A', 'B', 4], ['A', 'B', 4]]);
    expect(net.laneCount).toBe(3);
    const tree = solve(net, 'A');
    expect(costOf(net, tree, 'B')).toBe(4);
    expect(routePath(net, tree, 1)!.lanes).toEqual([1]);
  });

  it('a depot with no lanes is unreachable; a single-depot network is just its origin', () => {
    const net = networkOf(['A', 'B', 'Lonely'], [['A', 'B', 1]]);
    expect(solve(net, 'A').status[2]).toBe(STATUS_UNREACHABLE);
    const single = networkOf(['Only'], []);
    const tree = solve(single, 'Only');
    expect(tree.cost[0]).toBe(0);
    expect(tree.legs[0]).toBe(0);
    expect(routePath(single, tree, 0)).toEqual({ depots: [0], lanes: [] });
  });

  it('a loop through the origin makes the origin itself unbounded', () => {
    const net = networkOf(['A', 'B', 'C'], [['A', 'B', 1], ['B', 'A', -2], ['C', 'A', 0]]);
    const tree = solve(net, 'A');
    expect(Array.from(tree.status)).toEqual([STATUS_UNBOUNDED, STATUS_UNBOUNDED, STATUS_UNREACHABLE]);
    expect(tree.loops[0].netPerLap).toBe(-1);
  });

  it('a zero-cost lane from a depot to itself is no loop; a single depot with a rebate on one is unbounded', () => {
    const zero = networkOf(['A', 'B'], [['A', 'A', 0], ['A', 'B', 3]]);
    const tree = solve(zero, 'A');
    expect(tree.loops).toEqual([]);
    expect(pathIds(zero, tree, 'B')).toBe('A>B');
    const single = networkOf(['Only'], [['Only', 'Only', -1]]);
    const lone = solve(single, 'Only');
    expect(lone.status[0]).toBe(STATUS_UNBOUNDED);
    expect(lone.loops).toEqual([{ depots: [0], lanes: [0], netPerLap: -1 }]);
  });

  it('a loop the origin cannot reach, feeding depots it does reach, changes no cost', () => {
    const base: [string, string, number][] = [['A', 'B', 4], ['B', 'C', 2], ['A', 'C', 7]];
    const withLoop: [string, string, number][] = [...base, ['X', 'Y', -9], ['Y', 'X', 2], ['Y', 'C', -20], ['X', 'B', 0]];
    const ids = ['A', 'B', 'C', 'X', 'Y'];
    const plain = solve(networkOf(ids, base), 'A');
    const net = networkOf(ids, withLoop);
    const tree = solve(net, 'A');
    expect(tree.loops).toEqual([]);
    expect(Array.from(tree.cost)).toEqual(Array.from(plain.cost));
    expect(Array.from(tree.status)).toEqual([STATUS_REACHABLE, STATUS_REACHABLE, STATUS_REACHABLE, STATUS_UNREACHABLE, STATUS_UNREACHABLE]);
    // From X the same loop is reachable: warned, and everything downstream is unbounded.
    const fromX = solve(net, 'X');
    expect(fromX.loops).toHaveLength(1);
    expect(Array.from(fromX.status)).toEqual([STATUS_UNREACHABLE, STATUS_UNBOUNDED, STATUS_UNBOUNDED, STATUS_UNBOUNDED, STATUS_UNBOUNDED]);
  });

  it('parallel lanes: only the cheaper one closes a rebate loop, and the loop names that lane', () => {
    const net = networkOf(['A', 'B'], [['A', 'B', 5], ['B', 'A', -2], ['B', 'A', -7]]);
    const tree = solve(net, 'A');
    expect(tree.loops).toHaveLength(1);
    expect(tree.loops[0].lanes).toEqual([0, 2]);
    expect(tree.loops[0].netPerLap).toBe(-2);
  });

  it('a closed lane (weight +Infinity) neither routes nor closes a loop', () => {
    const net = networkOf(['A', 'B', 'C'], [['A', 'B', 1], ['B', 'A', -5], ['B', 'C', 1]]);
    const weights = Float64Array.from(net.outNet);
    const closing = Array.from(net.outLane).indexOf(1);
    weights[closing] = Infinity;
    const tree = cheapestRoutes(net, 0, weights);
    expect(tree.loops).toEqual([]);
    expect(Array.from(tree.cost)).toEqual([0, 1, 2]);
    expect(solve(net, 'A').loops).toHaveLength(1);
  });

  it('the origin with no lanes reaches nothing else', () => {
    const net = networkOf(['A', 'B', 'C'], [['B', 'C', 1], ['C', 'A', 1]]);
    const tree = solve(net, 'A');
    expect(Array.from(tree.status)).toEqual([STATUS_REACHABLE, STATUS_UNREACHABLE, STATUS_UNREACHABLE]);
    expect(tree.cost[0]).toBe(0);
  });

  it('a route cost beyond the exact range is refused, not rounded', () => {
    const big = Number.MAX_SAFE_INTEGER - 10;
    const net = networkOf(['A', 'B', 'C'], [['A', 'B', big], ['B', 'C', big]]);
    expect(() => solve(net, 'A')).toThrow(MoneyOverflowError);
  });

  it('reports a loop in each of many small components downstream of a loop', () => {
    // O <-> A is a rebate loop; behind it a chain of 200 two-depot parts, every fifth with a rebate loop.
    const ids = ['O', 'A'];
    const lanes: [string, string, number][] = [['O', 'A', 5], ['A', 'O', -6]];
    let previous = 'A';
    for (let i = 0; i < 200; i++) {
      const [x, y] = [`X${i}`, `Y${i}`];
      ids.push(x, y);
      lanes.push([previous, x, 1], [x, y, 3], [y, x, i % 5 === 0 ? -4 : 3]);
      previous = y;
    }
    const tree = solve(networkOf(ids, lanes), 'O');
    expect(tree.loops).toHaveLength(1 + 40);
    expect(Array.from(tree.status).every((s) => s === STATUS_UNBOUNDED)).toBe(true);
  });

  it('reports a second loop further inside the unbounded region', () => {
    // Loop 1 (A<->B) is met first; loop 2 (C<->D) lies downstream of it in another component.
    const net = networkOf(['O', 'A', 'B', 'C', 'D'], [
      ['O', 'A', 1], ['A', 'B', 1], ['B', 'A', -3], ['B', 'C', 1], ['C', 'D', 2], ['D', 'C', -5],
    ]);
    const tree = solve(net, 'O');
    const loops = tree.loops.map((l) => l.depots.map((d) => net.depotIds[d]).join('>')).sort();
    expect(loops).toEqual(['A>B', 'C>D']);
    expect(tree.loops.every((l) => l.netPerLap < 0)).toBe(true);
  });
});
