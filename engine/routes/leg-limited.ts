// Cheapest cost using at most K lanes: a round-by-round dynamic program (the bounded form of
// Bellman-Ford). Round k reads only the costs of round k-1, so no route uses more than K lanes.
// A route may repeat depots (a loop can pay off within the limit); costs are always finite.
// Rebate loops are still reported, from the unlimited solve, because the contract needs fixing anyway.

import { MoneyOverflowError } from '../errors';
import type { RebateLoop } from './rebate-loop';
import type { Network } from '../network/types';
import { cheapestRoutes, STATUS_REACHABLE, STATUS_UNREACHABLE } from './cheapest-routes';
import type { RoutePath } from './route-path';

export interface LegLimitedRoutes {
  readonly origin: number;
  readonly maxLegs: number;
  /** STATUS_REACHABLE (within the limit) or STATUS_UNREACHABLE per depot. */
  readonly status: Uint8Array;
  readonly cost: Float64Array;
  readonly legs: Int32Array;
  /** Status of each depot without the limit (shows where the limit hides an unbounded cost). */
  readonly unlimitedStatus: Uint8Array;
  readonly loops: RebateLoop[];
  readonly stats: { relaxations: number; rounds: number };
  /** The cheapest walk to `target` within the limit, or null when there is none. */
  path(target: number): RoutePath | null;
}

/** Solves cheapest costs from `origin` using at most `maxLegs` lanes. */
export function legLimitedRoutes(network: Network, origin: number, maxLegs: number, weights?: Float64Array): LegLimitedRoutes {
  if (!Number.isInteger(maxLegs) || maxLegs < 0) throw new RangeError(`routes: maximum legs must be a whole number >= 0, got ${maxLegs}`);
  const n = network.depotCount;
  const { outStart, outTo, outLane } = network;
  const w = weights ?? network.outNet;
  const MAX = Number.MAX_SAFE_INTEGER;

  const cost = new Float64Array(n).fill(Infinity);
  // Update log: every improvement (round, lane, previous entry of the same depot), so a walk can be
  // read back round by round even when a depot improved several times.
  let logRound = new Int32Array(1024);
  let logLane = new Int32Array(1024);
  let logPrev = new Int32Array(1024);
  let logSize = 0;
  const latest = new Int32Array(n).fill(-1);
  const log = (d: number, round: number, lane: number) => {
    if (logSize === logRound.length) {
      const grow = (a: Int32Array) => {
        const b = new Int32Array(a.length * 2);
        b.set(a);
        return b;
      };
      logRound = grow(logRound);
      logLane = grow(logLane);
      logPrev = grow(logPrev);
    }
    logRound[logSize] = round;
    logLane[logSize] = lane;
    logPrev[logSize] = latest[d];
    latest[d] = logSize++;
  };

  cost[origin] = 0;
  log(origin, 0, -1);
  let frontier = [origin];
  let frontierCost = [0];
  const changedIn = new Int32Array(n).fill(-1);
  let relaxations = 0;
  let rounds = 0;
  for (let k = 1; k <= maxLegs && frontier.length > 0; k++) {
    rounds = k;
    const nextFrontier: number[] = [];
    for (let i = 0; i < frontier.length; i++) {
      const u = frontier[i];
      const du = frontierCost[i];
      for (let p = outStart[u], end = outStart[u + 1]; p < end; p++) {
        const v = outTo[p];
        const nd = du + w[p];
        if (!(nd < cost[v])) continue;
        if (nd > MAX || nd < -MAX) throw new MoneyOverflowError(`route cost to depot "${network.depotIds[v]}"`);
        relaxations++;
        cost[v] = nd;
        if (changedIn[v] === k) {
          logLane[latest[v]] = outLane[p]; // a cheaper lane in the same round replaces the entry
        } else {
          changedIn[v] = k;
          log(v, k, outLane[p]);
          nextFrontier.push(v);
        }
      }
    }
    frontier = nextFrontier;
    frontierCost = nextFrontier.map((d) => cost[d]);
  }

  const status = new Uint8Array(n);
  const legs = new Int32Array(n).fill(-1);
  const finalCost = new Float64Array(n).fill(NaN);
  const walkBack = (target: number): RoutePath => {
    const lanes: number[] = [];
    const depots: number[] = [target];
    let entry = latest[target];
    while (logLane[entry] !== -1) {
      const lane = logLane[entry];
      const from = network.laneFrom[lane];
      lanes.push(lane);
      depots.push(from);
      // The cost used was the predecessor's latest value from an earlier round.
      const before = logRound[entry] - 1;
      entry = latest[from];
      while (logRound[entry] > before) entry = logPrev[entry];
    }
    lanes.reverse();
    depots.reverse();
    return { depots, lanes };
  };
  for (let d = 0; d < n; d++) {
    if (cost[d] === Infinity) continue;
    status[d] = STATUS_REACHABLE;
    finalCost[d] = cost[d];
    // Round k only extends walks that changed in round k-1, so an entry of round k ends a walk of
    // exactly k lanes: no need to walk back here.
    legs[d] = logRound[latest[d]];
  }

  const unlimited = cheapestRoutes(network, origin, weights);
  return {
    origin,
    maxLegs,
    status,
    cost: finalCost,
    legs,
    unlimitedStatus: unlimited.status,
    loops: unlimited.loops,
    stats: { relaxations, rounds },
    path: (target) => (status[target] === STATUS_UNREACHABLE ? null : walkBack(target)),
  };
}
