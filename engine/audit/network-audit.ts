// The contract review of a whole network, independent of any origin: every distinct rebate loop
// (up to a cap) with the depots it makes unbounded and what would neutralise it, a verified fix
// plan, and rebate headroom for every lane (on the fixed network when there were loops).

import type { Network } from '../network/types';
import { laneKeysOf, laneKeyText, type LaneKey } from '../import/lane-key';
import { DEFAULT_LOOP_MEMORY_BOUND, DEFAULT_LOOP_WORK_BUDGET, findDistinctLoops, type LoopSearchStop } from './distinct-loops';
import { buildFixPlan, type FixPlan } from './fix-plan';
import { laneFloors, type HeadroomRunner, type LaneFloors } from './headroom';
import { reachableFrom } from './loop-reach';
import { neutralisers, type LaneNeutraliser } from './neutralise';
import type { RebateLoop } from '../routes/rebate-loop';

export type AuditPhase = 'loops' | 'fix-plan' | 'headroom';

export interface AuditOptions {
  /** Most distinct loops to report (default 100). */
  loopCap?: number;
  /** Work budget and memory bound of the loop search (defaults in distinct-loops.ts). */
  loopWorkBudget?: number;
  loopMemoryBound?: number;
  /** Contract references or lane key texts ("FROM>TO|ref|n") the user marks as negotiable. */
  negotiable?: Iterable<string>;
  /**
   * Key of each lane as a scenario names it (occurrences counted over the lanes file's rows, e.g.
   * `overlayKeys(imported)[plan.laneRecord[e]]`); default: counted over the network's own lanes.
   */
  laneKeys?: readonly LaneKey[];
  /** Runs the headroom searches (e.g. over worker threads); default: the calling thread. */
  headroomRunner?: HeadroomRunner;
  onProgress?: (progress: { phase: AuditPhase; done: number; total: number }) => void;
}

export interface AuditLoop {
  loop: RebateLoop;
  /** Depots every route reaching the loop sees as unbounded (all depots reachable from it). */
  unboundedDepots: number[];
  neutralisers: LaneNeutraliser[];
}

export interface NetworkAudit {
  loops: AuditLoop[];
  loopCapReached: boolean;
  /** How the loop search went: what stopped it, with its count, budget and bound. */
  loopSearch: { stoppedBy: LoopSearchStop; cap: number; searches: number; work: number; workBudget: number; memoryBound: number };
  /** Null when the network has no loop (nothing to fix). */
  fixPlan: FixPlan | null;
  /** Null only when the fix plan could not remove every loop. */
  headroom: LaneFloors | null;
  headroomAfterFixPlan: boolean;
  /** Per lane: 1 when marked negotiable. */
  negotiable: Uint8Array;
  /** Names given as negotiable that match no lane's reference or key (a typo, or a lane no longer in the file). */
  negotiableUnmatched?: string[];
}

/** Runs the whole audit. */
export function auditNetwork(network: Network, options: AuditOptions = {}): NetworkAudit {
  const report = options.onProgress;
  const { marks: negotiable, unmatched } = markNegotiable(network, options.negotiable, options.laneKeys);

  const cap = Math.max(1, options.loopCap ?? 100);
  const workBudget = options.loopWorkBudget ?? DEFAULT_LOOP_WORK_BUDGET;
  const memoryBound = options.loopMemoryBound ?? DEFAULT_LOOP_MEMORY_BOUND;
  const distinct = findDistinctLoops(network, {
    cap,
    workBudget,
    memoryBound,
    onProgress: (done, total) => report?.({ phase: 'loops', done, total }),
  });
  const reachOfComponent = new Map<number, number[]>();
  const loops = distinct.loops.map((loop, i) => {
    const component = distinct.componentOfLoop[i];
    let reach = reachOfComponent.get(component);
    if (!reach) {
      reach = reachableFrom(network, distinct.components[component]);
      reachOfComponent.set(component, reach);
    }
    return { loop, unboundedDepots: reach, neutralisers: neutralisers(network, loop) };
  });

  let fixPlan: FixPlan | null = null;
  let weights = network.outNet;
  if (loops.length > 0) {
    fixPlan = buildFixPlan(network, { negotiable, onProgress: (done, total) => report?.({ phase: 'fix-plan', done, total }) });
    weights = fixPlan.weights;
  }
  const headroom =
    fixPlan && !fixPlan.verified ? null : laneFloors(network, { weights, runner: options.headroomRunner, onProgress: (done, total) => report?.({ phase: 'headroom', done, total }) });
  const loopSearch = { stoppedBy: distinct.stoppedBy, cap, searches: distinct.searches, work: distinct.work, workBudget, memoryBound };
  return { loops, loopCapReached: distinct.capReached, loopSearch, fixPlan, headroom, headroomAfterFixPlan: fixPlan !== null, negotiable, negotiableUnmatched: unmatched };
}

function markNegotiable(network: Network, names: Iterable<string> | undefined, laneKeys: readonly LaneKey[] | undefined): { marks: Uint8Array; unmatched: string[] } {
  const marks = new Uint8Array(network.laneCount);
  if (!names) return { marks, unmatched: [] };
  const wanted = new Set([...names].map((s) => s.trim()).filter((s) => s !== ''));
  if (wanted.size === 0) return { marks, unmatched: [] };
  const matched = new Set<string>();
  const keys = laneKeys ?? laneKeysOf(network);
  for (let e = 0; e < network.laneCount; e++) {
    const ref = network.laneRef[e];
    const keyText = laneKeyText(keys[e]);
    for (const name of [ref, keyText]) {
      if (name === undefined || !wanted.has(name)) continue;
      marks[e] = 1;
      matched.add(name);
    }
  }
  return { marks, unmatched: [...wanted].filter((name) => !matched.has(name)) };
}
