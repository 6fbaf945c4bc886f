// Random networks for property tests and the answers of general-purpose graph libraries from npm
// (graphlib, js-graph-algorithms) on them, so the engine is checked against code it shares nothing with.
// Weights are small integers: exact in the doubles these libraries use.

import fc from 'fast-check';
import graphlib from 'graphlib';
import jsgraphs from 'js-graph-algorithms';
import type { Network } from '../../../engine/network/types';
import { networkOf, numberedIds } from '../../support/network-builder';

/** A generated network: depots 0..n-1 and lanes [from, to, net minor units]. */
export interface Spec {
  n: number;
  lanes: [number, number, number][];
  origin: number;
}

const laneOf = (n: number, weight: fc.Arbitrary<number>) =>
  fc.tuple(fc.integer({ min: 0, max: n - 1 }), fc.integer({ min: 0, max: n - 1 }), weight);

/** Any lanes with weights in [minW, maxW]; may hold negative loops when minW < 0. */
export function anyNetwork(maxDepots: number, maxLanes: number, minW: number, maxW: number): fc.Arbitrary<Spec> {
  return fc.integer({ min: 1, max: maxDepots }).chain((n) =>
    fc.record({
      n: fc.constant(n),
      lanes: fc.array(laneOf(n, fc.integer({ min: minW, max: maxW })) as fc.Arbitrary<[number, number, number]>, { maxLength: maxLanes }),
      origin: fc.integer({ min: 0, max: n - 1 }),
    }),
  );
}

/**
 * Networks with negative lanes but no negative loop: w = w0 + p(u) - p(v) with w0 >= 0, so the
 * potentials cancel around any loop. w0 is often 0, which gives zero-cost loops and ties.
 */
export function loopFreeNetwork(maxDepots: number, maxLanes: number): fc.Arbitrary<Spec> {
  return fc.integer({ min: 1, max: maxDepots }).chain((n) =>
    fc
      .record({
        potential: fc.array(fc.integer({ min: -40, max: 40 }), { minLength: n, maxLength: n }),
        raw: fc.array(laneOf(n, fc.oneof(fc.constant(0), fc.integer({ min: 0, max: 30 }))), { maxLength: maxLanes }),
        origin: fc.integer({ min: 0, max: n - 1 }),
      })
      .map(({ potential, raw, origin }) => ({
        n,
        origin,
        lanes: raw.map(([u, v, w0]) => [u, v, w0 + potential[u] - potential[v]] as [number, number, number]),
      })),
  );
}

export const toNetwork = (spec: Spec): Network =>
  networkOf(
    numberedIds(spec.n),
    spec.lanes.map(([u, v, w]) => [String(u), String(v), w]),
  );

/** All-pairs costs by graphlib's Floyd-Warshall (parallel lanes collapsed to the cheapest). */
export function floydWarshallCosts(spec: Spec): number[] {
  const g = new graphlib.Graph({ directed: true });
  for (let d = 0; d < spec.n; d++) g.setNode(String(d));
  for (const [u, v, w] of spec.lanes) {
    // graphlib overwrites its zero diagonal with a self-lane's weight; a non-negative self-lane never
    // shortens a route, so it is left out (loop-free specs have no negative one).
    if (u === v) continue;
    const old = g.edge(String(u), String(v)) as number | undefined;
    if (old === undefined || w < old) g.setEdge(String(u), String(v), w);
  }
  const all = graphlib.alg.floydWarshall(g, (e) => g.edge(e) as number);
  return Array.from({ length: spec.n }, (_, d) => all[String(spec.origin)][String(d)].distance);
}

/** Single-origin costs by graphlib's Dijkstra; only for non-negative lanes. */
export function dijkstraCosts(spec: Spec): number[] {
  const g = new graphlib.Graph({ directed: true, multigraph: true });
  for (let d = 0; d < spec.n; d++) g.setNode(String(d));
  spec.lanes.forEach(([u, v, w], i) => g.setEdge(String(u), String(v), w, `lane${i}`));
  const result = graphlib.alg.dijkstra(g, String(spec.origin), (e) => g.edge(e) as number);
  return Array.from({ length: spec.n }, (_, d) => result[String(d)].distance);
}

function jsGraph(n: number, lanes: readonly [number, number, number][]): jsgraphs.WeightedDiGraph {
  const g = new jsgraphs.WeightedDiGraph(n);
  for (const [u, v, w] of lanes) g.addEdge(new jsgraphs.Edge(u, v, w));
  return g;
}

/**
 * js-graph-algorithms' Bellman-Ford (V full rounds) from the origin: costs (Infinity when
 * unreachable), plus the lanes that still relax afterwards, which exist exactly when a negative
 * loop is reachable.
 */
export function jsBellmanFord(spec: Spec): { cost: number[]; stillRelaxing: [number, number, number][] } {
  const bf = new jsgraphs.BellmanFord(jsGraph(spec.n, spec.lanes), spec.origin);
  const cost = Array.from({ length: spec.n }, (_, d) => (bf.hasPathTo(d) ? bf.distanceTo(d) : Infinity));
  const stillRelaxing = spec.lanes.filter(([u, v, w]) => cost[u] !== Infinity && cost[u] + w < cost[v]);
  return { cost, stillRelaxing };
}

/** Depots reachable from `starts` (graphlib's preorder walk). */
export function reachableFrom(spec: Spec, starts: readonly number[]): Set<number> {
  const g = new graphlib.Graph({ directed: true });
  for (let d = 0; d < spec.n; d++) g.setNode(String(d));
  for (const [u, v] of spec.lanes) g.setEdge(String(u), String(v));
  return new Set(graphlib.alg.preorder(g, starts.map(String)).map(Number));
}

/**
 * The depots whose cost is unbounded, computed without the engine: a lane that still relaxes after
 * V rounds lies downstream of a reachable negative loop, and every reachable negative loop leaves at
 * least one such lane, so the unbounded set is everything reachable from the heads of those lanes.
 */
export function unboundedByReference(spec: Spec): Set<number> {
  const { stillRelaxing } = jsBellmanFord(spec);
  return reachableFrom(spec, [...new Set(stillRelaxing.map(([, v]) => v))]);
}

/** Strongly connected parts (graphlib's Tarjan) that hold a negative loop, each as its depot set. */
export function componentsWithNegativeLoop(spec: Spec): Set<number>[] {
  const g = new graphlib.Graph({ directed: true });
  for (let d = 0; d < spec.n; d++) g.setNode(String(d));
  for (const [u, v] of spec.lanes) g.setEdge(String(u), String(v));
  const result: Set<number>[] = [];
  for (const component of graphlib.alg.tarjan(g)) {
    const members = component.map(Number);
    const local = new Map(members.map((d, i) => [d, i]));
    const inside = spec.lanes
      .filter(([u, v]) => local.has(u) && local.has(v))
      .map(([u, v, w]) => [local.get(u)!, local.get(v)!, w] as [number, number, number]);
    // A virtual source (index m) with zero-cost lanes to every member reaches every loop inside.
    const m = members.length;
    const withSource: [number, number, number][] = [...inside, ...members.map((_, i) => [m, i, 0] as [number, number, number])];
    if (jsBellmanFord({ n: m + 1, lanes: withSource, origin: m }).stillRelaxing.length > 0) result.push(new Set(members));
  }
  return result;
}
