import { describe, expect, it } from 'vitest';
import graphlib from 'graphlib';
import { createDijkstraWorkspace, dijkstra } from '../../../engine/routes/dijkstra';
import { networkOf, numberedIds, type LaneTuple } from '../../support/network-builder';
import { rng } from '../audit/reference';

describe('dijkstra: published worked example', () => {
  // Cormen, Leiserson, Rivest, Stein, "Introduction to Algorithms", 3rd edition, Figure 24.6
  // (Dijkstra from s on five vertices). Edge weights and final distances from memory.
  it('CLRS 3rd ed. Figure 24.6', () => {
    const net = networkOf(['s', 't', 'x', 'y', 'z'], [
      ['s', 't', 10], ['s', 'y', 5], ['t', 'x', 1], ['t', 'y', 2], ['x', 'z', 4],
      ['y', 't', 3], ['y', 'x', 9], ['y', 'z', 2], ['z', 's', 7], ['z', 'x', 6],
    ]);
    const { dist, parentPos } = dijkstra(net, net.depotIndex.get('s')!);
    expect(Array.from(dist)).toEqual([0, 8, 9, 5, 7]);
    // Shortest-path tree of the figure: t and z via y, x via t.
    const parentOf = (id: string) => net.depotIds[net.laneFrom[net.outLane[parentPos[net.depotIndex.get(id)!]]]];
    expect(['t', 'x', 'y', 'z'].map(parentOf)).toEqual(['y', 't', 's', 'y']);
  });
});

describe('dijkstra against graphlib alg.dijkstra', () => {
  it('agrees on 40 random multigraphs with parallel lanes and self-lanes', () => {
    for (let seed = 1; seed <= 40; seed++) {
      const r = rng(seed);
      const n = 2 + Math.floor(r() * 30);
      const m = Math.floor(r() * n * 4);
      const lanes: LaneTuple[] = [];
      for (let i = 0; i < m; i++) lanes.push([String(Math.floor(r() * n)), String(Math.floor(r() * n)), Math.floor(r() * 100)]);
      const net = networkOf(numberedIds(n), lanes);
      const g = new graphlib.Graph({ directed: true, multigraph: true });
      for (let d = 0; d < n; d++) g.setNode(String(d));
      lanes.forEach(([u, v, w], i) => g.setEdge(u, v, w, `lane${i}`));
      const workspace = createDijkstraWorkspace(n);
      for (let s = 0; s < n; s++) {
        const expected = graphlib.alg.dijkstra(g, String(s), (e) => g.edge(e) as number);
        const { dist } = dijkstra(net, s, { workspace });
        for (let d = 0; d < n; d++) expect(dist[d], `seed ${seed} ${s}->${d}`).toBe(expected[String(d)].distance);
      }
    }
  });

  it('stopping at targets leaves the targets exact', () => {
    const r = rng(99);
    const n = 60;
    const lanes: LaneTuple[] = [];
    for (let i = 0; i < 300; i++) lanes.push([String(Math.floor(r() * n)), String(Math.floor(r() * n)), Math.floor(r() * 50)]);
    const net = networkOf(numberedIds(n), lanes);
    const full = Float64Array.from(dijkstra(net, 0).dist);
    const targets = [5, 17, 42];
    const early = dijkstra(net, 0, { targets });
    for (const t of targets) expect(early.dist[t]).toBe(full[t]);
  });

  it('refuses a negative weight instead of giving a wrong answer', () => {
    const net = networkOf(['A', 'B'], [['A', 'B', -1]]);
    expect(() => dijkstra(net, 0)).toThrow(RangeError);
  });
});
