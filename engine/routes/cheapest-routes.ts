// Cheapest routes from one depot to every other: the public single-origin solve. Wraps the
// label-correcting core, turns its states into reachable / unreachable / unbounded, and reports
// every rebate loop that makes costs unbounded for this origin (one per strongly connected part
// of the unbounded region that holds a loop, not only the first loop the solve ran into).

import { componentHasCycle, strongComponents } from '../network/strong-components';
import { findNegativeLoops } from './find-negative-loops';
import { loopKey, toRebateLoop, type RebateLoop } from './rebate-loop';
import type { Network } from '../network/types';
import { IN_TREE, UNBOUNDED, labelCorrect } from './label-correcting';

export type DepotStatus = 'reachable' | 'unreachable' | 'unbounded';

export const STATUS_UNREACHABLE = 0;
export const STATUS_REACHABLE = 1;
export const STATUS_UNBOUNDED = 2;
const STATUS_NAMES: readonly DepotStatus[] = ['unreachable', 'reachable', 'unbounded'];

/** Result of a single-origin solve. Arrays are indexed by depot. */
export interface RouteTree {
  readonly origin: number;
  /** STATUS_* per depot. */
  readonly status: Uint8Array;
  /** Exact cost in minor units where reachable; NaN elsewhere. */
  readonly cost: Float64Array;
  /** Lanes on the cheapest route where reachable; -1 elsewhere. */
  readonly legs: Int32Array;
  /** Lane index that ends each reachable depot's cheapest route (-1 at the origin and elsewhere). */
  readonly viaLane: Int32Array;
  readonly loops: RebateLoop[];
  readonly stats: { relaxations: number; scans: number };
}

export function statusName(code: number): DepotStatus {
  return STATUS_NAMES[code];
}

/** Solves cheapest routes from `origin` (a depot index). */
export function cheapestRoutes(network: Network, origin: number, weights?: Float64Array): RouteTree {
  const n = network.depotCount;
  const result = labelCorrect(network, { sources: [origin], weights, onLoop: 'mark' });
  const status = new Uint8Array(n);
  const cost = new Float64Array(n).fill(NaN);
  const legs = new Int32Array(n).fill(-1);
  const viaLane = new Int32Array(n).fill(-1);
  let anyUnbounded = false;
  for (let d = 0; d < n; d++) {
    const s = result.state[d];
    if (s === IN_TREE) {
      status[d] = STATUS_REACHABLE;
      cost[d] = result.dist[d];
      legs[d] = result.depth[d];
      const p = result.parentPos[d];
      viaLane[d] = p === -1 ? -1 : network.outLane[p];
    } else if (s === UNBOUNDED) {
      status[d] = STATUS_UNBOUNDED;
      anyUnbounded = true;
    }
  }

  const loops = result.loops.map((found) => toRebateLoop(network, found, weights));
  if (anyUnbounded) loops.push(...loopsMissedInside(network, status, loops, weights));
  return { origin, status, cost, legs, viaLane, loops, stats: { relaxations: result.relaxations, scans: result.scans } };
}

// The solve stops looking inside a region once it is unbounded, so a second loop further on would
// go unreported. Every strongly connected part of the unbounded region that can hold a loop and has
// none reported yet is searched, all parts in one pass (see find-negative-loops.ts).
function loopsMissedInside(network: Network, status: Uint8Array, known: RebateLoop[], weights?: Float64Array): RebateLoop[] {
  const allowed = new Uint8Array(network.depotCount);
  for (let d = 0; d < network.depotCount; d++) if (status[d] === STATUS_UNBOUNDED) allowed[d] = 1;
  const { componentOf, members } = strongComponents(network, allowed, weights);
  const covered = new Uint8Array(members.length);
  for (const loop of known) covered[componentOf[loop.depots[0]]] = 1;
  const open = members.filter((component, c) => !covered[c] && componentHasCycle(network, component, weights));
  const seen = new Set(known.map(loopKey));
  return findNegativeLoops(network, open, weights).filter((loop): loop is RebateLoop => loop !== null && !seen.has(loopKey(loop)));
}
