// A fix plan that leaves the whole network free of rebate loops while changing as little as
// possible: take a loop, cut the rebate of one of its lanes by what the lap pays (never below 0),
// look again, until no loop is left. Only rebates shrink, so no lane ever gets cheaper; the plan is
// then checked by a separate solve of the changed network.

import { sumMinor, type Minor } from '../money/minor';
import type { Network } from '../network/types';
import { toRebateLoop, type RebateLoop } from '../routes/rebate-loop';
import { labelCorrect } from '../routes/label-correcting';
import { pickRebateCut } from './rebate-cut-choice';

export interface FixPlanOptions {
  /** 1 for lanes whose contract the user marks as negotiable; those are cut first. */
  negotiable?: Uint8Array;
  /** Most cuts before giving up (default 10 x lanes + 1,000). */
  maxSteps?: number;
  onProgress?: (done: number, total: number) => void;
}

/** One lane's change in the plan (all cuts on the lane summed). */
export interface FixLaneChange {
  lane: number;
  oldRebate: Minor;
  newRebate: Minor;
  oldNet: Minor;
  newNet: Minor;
  negotiable: boolean;
}

export interface FixPlan {
  /** Changed lanes in input order. */
  changes: FixLaneChange[];
  /** Cuts in the order made, with the loop that prompted each. */
  steps: { lane: number; cut: Minor; loop: RebateLoop }[];
  /** Net cost per CSR position after the plan. */
  weights: Float64Array;
  /** Loops no rebate cut can fix (no lane on them carries a rebate); the plan stops at the first. */
  unfixable: RebateLoop[];
  /** True when the plan stopped at maxSteps with loops left (then `verified` is false). */
  stepLimitReached: boolean;
  /** True when a final solve of the changed network finds no loop and no lane got cheaper. */
  verified: boolean;
}

const allDepots = (n: number) => Int32Array.from({ length: n }, (_, d) => d);

/** Builds the plan. Among a loop's rebate lanes it cuts the one `pickRebateCut` prefers. */
export function buildFixPlan(network: Network, options: FixPlanOptions = {}): FixPlan {
  const n = network.depotCount;
  const sources = allDepots(n);
  const weights = network.outNet.slice();
  const rebate = Float64Array.from(network.laneRebate);
  const positionOf = new Int32Array(network.laneCount);
  for (let p = 0; p < network.laneCount; p++) positionOf[network.outLane[p]] = p;
  const negotiable = options.negotiable;
  const maxSteps = options.maxSteps ?? 10 * network.laneCount + 1000;
  const steps: FixPlan['steps'] = [];
  // Lanes already in the plan: cutting one of them again keeps the number of clauses to renegotiate down.
  const cut = new Uint8Array(network.laneCount);
  const unfixable: RebateLoop[] = [];
  let stepLimitReached = false;

  for (;;) {
    const solved = labelCorrect(network, { sources, weights, onLoop: 'stop' });
    if (solved.loops.length === 0) break;
    const loop = toRebateLoop(network, solved.loops[0], weights);
    const amount = -loop.netPerLap;
    const candidates = loop.lanes.filter((e) => rebate[e] > 0);
    if (candidates.length === 0) {
      unfixable.push(loop);
      break;
    }
    if (steps.length >= maxSteps) {
      stepLimitReached = true;
      break;
    }
    const lane = pickRebateCut(candidates, amount, (e) => ({ negotiable: !!(negotiable && negotiable[e]), rebateLeft: rebate[e], alreadyCut: cut[e] === 1, sourceRow: network.laneRow[e] }));
    const amountCut = Math.min(amount, rebate[lane]) as Minor;
    rebate[lane] -= amountCut;
    weights[positionOf[lane]] = sumMinor([weights[positionOf[lane]], amountCut], 'net cost after a rebate cut');
    cut[lane] = 1;
    steps.push({ lane, cut: amountCut, loop });
    options.onProgress?.(steps.length, steps.length + 1);
  }
  options.onProgress?.(steps.length, steps.length);

  const touched = [...new Set(steps.map((s) => s.lane))].sort((a, b) => a - b);
  const changes = touched.map((lane) => ({
    lane,
    oldRebate: network.laneRebate[lane] as Minor,
    newRebate: rebate[lane] as Minor,
    oldNet: network.laneNet[lane] as Minor,
    newNet: weights[positionOf[lane]] as Minor,
    negotiable: !!(negotiable && negotiable[lane]),
  }));

  // Independent of the loop above: one more solve of the final network, and every lane compared.
  let verified = unfixable.length === 0 && !stepLimitReached && labelCorrect(network, { sources, weights, onLoop: 'stop' }).loops.length === 0;
  for (let p = 0; p < weights.length && verified; p++) if (weights[p] < network.outNet[p]) verified = false;
  for (let e = 0; e < rebate.length && verified; e++) if (rebate[e] < 0) verified = false;
  return { changes, steps, weights, unfixable, stepLimitReached, verified };
}
