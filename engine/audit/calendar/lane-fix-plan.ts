// One fix plan for the whole calendar, by lane row: take the maximal period networks one by one;
// while one has a loop, cut the rebate of one of the loop's rows by what the lap pays (never below
// zero). Cuts only raise nets, so a network once free of loops stays free, and a covered network is
// free when its cover is: one pass settles every period and class. The row is chosen by the same
// ranking as the one-day plan's (engine/audit/rebate-cut-choice.ts).

import type { LaneTable } from '../../import/types';
import type { RebateLoop } from '../../routes/rebate-loop';
import { pickRebateCut } from '../rebate-cut-choice';
import type { PeriodNetwork } from './period-networks';
import { firstLoop, weightsWithCuts } from './period-weights';

export interface CalendarFixChange {
  /** LaneTable row. */
  row: number;
  /** Rebate removed (minor units, > 0). */
  cut: number;
  /** Set when the plan cut by clause. */
  clause?: { key: string; name: string; percent: number };
}

export interface UnfixableLoop {
  rows: number[];
  vehicleClass: string | null;
  period: number;
  netPerLap: number;
}

export interface CalendarFixPlan {
  by: 'lane' | 'clause';
  /** Per LaneTable row: rebate removed (0 for rows the plan leaves alone). */
  cut: Float64Array;
  changes: CalendarFixChange[];
  /** Loops on which no row carries rebate left to cut. */
  unfixable: UnfixableLoop[];
  /** True when a search ran out of steps or budget with loops left. */
  stepLimitReached: boolean;
  verified: boolean;
  /** How the plan was chosen, for the report (clause plans). */
  method?: string;
}

export interface LaneFixOptions {
  /** Per LaneTable row: 1 when negotiable (cut first). */
  negotiable?: Uint8Array;
  maxSteps?: number;
}

/** The plan's cuts, before verification (`verified` is false until `verifyCuts` says otherwise). */
export function laneFixPlan(table: LaneTable, nets: readonly PeriodNetwork[], options: LaneFixOptions = {}): CalendarFixPlan {
  const cut = new Float64Array(table.count);
  const negotiable = options.negotiable;
  const maxSteps = options.maxSteps ?? 10 * table.count + 1000;
  const unfixable: UnfixableLoop[] = [];
  let steps = 0;
  let stepLimitReached = false;
  const left = (r: number) => table.rebate[r] - cut[r];

  for (const net of nets) {
    if (!net.maximal || unfixable.length > 0 || stepLimitReached) continue;
    let weights = weightsWithCuts(net, cut);
    for (let loop: RebateLoop | null; (loop = firstLoop(net.network, weights)); ) {
      const rows = loop.lanes.map((e) => net.record[e]);
      const amount = -loop.netPerLap;
      const candidates = rows.filter((r) => left(r) > 0);
      if (candidates.length === 0) {
        unfixable.push({ rows, vehicleClass: net.vehicleClass, period: net.periods[0], netPerLap: loop.netPerLap });
        break;
      }
      if (steps++ >= maxSteps) {
        stepLimitReached = true;
        break;
      }
      const row = pickRebateCut(candidates, amount, (r) => ({ negotiable: !!negotiable?.[r], rebateLeft: left(r), alreadyCut: cut[r] > 0, sourceRow: table.sourceRow[r] }));
      cut[row] += Math.min(amount, left(row));
      weights = weightsWithCuts(net, cut);
    }
  }
  const changes: CalendarFixChange[] = [];
  for (let r = 0; r < table.count; r++) if (cut[r] > 0) changes.push({ row: r, cut: cut[r] });
  return { by: 'lane', cut, changes, unfixable, stepLimitReached, verified: false };
}

/**
 * Checks cuts independently of how they were found: every period network of every class (covered
 * ones too) is solved with the cuts and must have no loop; no cut is negative or removes more than
 * the row's rebate, so no lane gets cheaper and no rebate goes below zero.
 */
export function verifyCuts(table: LaneTable, nets: readonly PeriodNetwork[], cut: Float64Array): boolean {
  for (let r = 0; r < table.count; r++) if (cut[r] !== 0 && !(cut[r] > 0 && cut[r] <= table.rebate[r] && Number.isSafeInteger(cut[r]))) return false;
  for (const net of nets) if (firstLoop(net.network, weightsWithCuts(net, cut)) !== null) return false;
  return true;
}
