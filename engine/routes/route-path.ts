// Reads one depot's cheapest route out of a solved RouteTree. Refuses unbounded depots: following
// predecessors there would circle a rebate loop forever.

import { UnboundedPathError } from '../errors';
import type { Network } from '../network/types';
import { STATUS_REACHABLE, STATUS_UNBOUNDED, type RouteTree } from './cheapest-routes';

export interface RoutePath {
  /** Depot indices from the origin to the target. */
  depots: number[];
  /** Lane indices in travel order. */
  lanes: number[];
}

/** The cheapest route to `target`, null when unreachable, UnboundedPathError when unbounded. */
export function routePath(network: Network, tree: RouteTree, target: number): RoutePath | null {
  if (tree.status[target] === STATUS_UNBOUNDED) throw new UnboundedPathError(network.depotIds[target]);
  if (tree.status[target] !== STATUS_REACHABLE) return null;
  const lanes: number[] = [];
  const depots: number[] = [target];
  // A tree path has at most `legs` lanes; the bound guards against a corrupted tree looping.
  for (let d = target, steps = 0; d !== tree.origin; steps++) {
    if (steps > tree.legs[target]) throw new Error(`routes: predecessor chain of "${network.depotIds[target]}" is broken`);
    const lane = tree.viaLane[d];
    lanes.push(lane);
    d = network.laneFrom[lane];
    depots.push(d);
  }
  lanes.reverse();
  depots.reverse();
  return { depots, lanes };
}
