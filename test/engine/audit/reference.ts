// Outside references for the audit tests: js-graph-algorithms' Bellman-Ford (which has no loop
// detection of its own, so a final relaxation pass is added here, as the textbook method does) and
// seeded random networks small enough to check by brute force.

import { createRequire } from 'node:module';
import { numberedIds, networkOf, type LaneTuple } from '../../support/network-builder';
import type { Network } from '../../../engine/network/types';
import { seededRandom } from '../../support/seeded-random';

interface JsEdge {
  from(): number;
  to(): number;
  weight: number;
}
interface JsGraphs {
  WeightedDiGraph: new (v: number) => { addEdge(e: JsEdge): void; adj(v: number): JsEdge[]; V: number };
  Edge: new (v: number, w: number, weight: number) => JsEdge;
  BellmanFord: new (g: unknown, s: number) => { distanceTo(v: number): number };
}
const jsgraphs = createRequire(import.meta.url)('js-graph-algorithms') as JsGraphs;

/** Lanes as [from, to, weight] by depot index. */
export type IndexedLane = [number, number, number];

/**
 * True when the lanes hold a negative loop anywhere: js-graph-algorithms' Bellman-Ford from a
 * virtual depot joined to every depot at cost 0, then one more pass; any lane that still relaxes
 * proves a negative loop.
 */
export function referenceHasNegativeLoop(depotCount: number, lanes: readonly IndexedLane[]): boolean {
  const g = new jsgraphs.WeightedDiGraph(depotCount + 1);
  for (const [u, v, w] of lanes) g.addEdge(new jsgraphs.Edge(u, v, w));
  for (let d = 0; d < depotCount; d++) g.addEdge(new jsgraphs.Edge(depotCount, d, 0));
  const bf = new jsgraphs.BellmanFord(g, depotCount);
  return lanes.some(([u, v, w]) => bf.distanceTo(u) + w < bf.distanceTo(v));
}

/** The network's lanes with the given per-lane nets (input order). */
export function indexedLanes(network: Network, nets: ArrayLike<number> = network.laneNet): IndexedLane[] {
  return Array.from({ length: network.laneCount }, (_, e) => [network.laneFrom[e], network.laneTo[e], nets[e]] as IndexedLane);
}

/** Seeded pseudo-random numbers (kept under this name for the tests that import it). */
export const rng = seededRandom;

/**
 * A random network. With `loopFree`, nets are c + p(u) - p(v) with c >= 0 and random potentials p,
 * so many lanes are negative yet no loop is (zero-cost loops do occur, which tests the floor's edge).
 */
export function randomNetwork(seed: number, depots: number, lanes: number, loopFree: boolean, spread = 50): Network {
  const r = rng(seed);
  const pick = (k: number) => Math.floor(r() * k);
  const potential = Array.from({ length: depots }, () => pick(spread));
  const tuples: LaneTuple[] = [];
  for (let i = 0; i < lanes; i++) {
    const u = pick(depots);
    const v = r() < 0.05 ? u : pick(depots);
    const c = r() < 0.2 ? 0 : pick(spread);
    const net = loopFree ? c + potential[u] - potential[v] : pick(2 * spread) - Math.floor(spread * 0.7);
    tuples.push([String(u), String(v), u === v && loopFree ? Math.abs(net) : net]);
  }
  return networkOf(numberedIds(depots), tuples);
}
