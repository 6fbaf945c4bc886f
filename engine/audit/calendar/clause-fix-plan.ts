// A calendar fix plan by clause: each chosen clause gets one whole-percent cut applied to every row
// of the clause (the cut per row rounded up to whole minor units). Aims, in order: the fewest
// clauses cut, the fewest of them not negotiable, the least rebate removed per year of validity.
//
// Method. Feasibility of a choice (no loop in any maximal period network of any class) only gets
// easier as any cut grows. Fewest clauses: exhaustive search over subsets of the clauses on loops,
// smallest size first, each checked at 100% (when at most `exhaustiveUpTo` clauses, default 12,
// and within the check budget); past that, greedy (add the clause on most loops until feasible, then
// drop any clause not needed). Percentages: for each chosen clause in turn (largest rebate per year
// first), the smallest whole percent that keeps the choice feasible, by bisection; two rounds.
// Guarantees: exhaustive -> no plan with fewer clauses exists; greedy -> no chosen clause can be
// dropped. Percentages -> no single clause's cut can be lowered by 1% alone; with one clause that
// is the optimum, with several the total is not proven minimal (the test records the ratio).

import type { LaneTable } from '../../import/types';
import { clauseOf } from '../../import/lane-clause';
import type { CalendarFixPlan, CalendarFixChange } from './lane-fix-plan';
import type { PeriodNetwork } from './period-networks';
import { firstLoopUnder } from './period-weights';
import { counted } from '../../text/plural';

export interface ClauseFixOptions {
  /** Per LaneTable row: 1 when negotiable. A clause is negotiable when any of its rows is. */
  negotiable?: Uint8Array;
  /** Most feasibility checks (each solves the maximal networks), default 4,000. */
  budget?: number;
  exhaustiveUpTo?: number;
}

interface Clause {
  key: string;
  name: string;
  rows: number[];
  /** Sum of rebate x days valid in the window, over its rows (minor-days). */
  rebateDays: number;
  negotiable: boolean;
}

export type Percents = Map<string, number>;

/** Whole-minor cut of a rebate at a whole percent, rounded up. */
export function percentCut(rebate: number, percent: number): number {
  return Math.floor((rebate * percent + 99) / 100);
}

/**
 * The plan. `rowDays[r]` = days row r is valid in the review window; `loopRows` the rows of the
 * loops found (their clauses are the first candidates).
 */
export function clauseFixPlan(table: LaneTable, nets: readonly PeriodNetwork[], loopRows: readonly (readonly number[])[], rowDays: Float64Array, options: ClauseFixOptions = {}): CalendarFixPlan {
  const budget = options.budget ?? 4000;
  const exhaustiveUpTo = options.exhaustiveUpTo ?? 12;
  const maximal = nets.filter((n) => n.maximal);
  const clauses = clausesWithRebate(table, rowDays, options.negotiable);
  let checks = 0;
  let budgetOut = false;

  const cutsOf = (percents: Percents): Float64Array => {
    const cut = new Float64Array(table.count);
    for (const [key, percent] of percents) for (const r of clauses.get(key)!.rows) cut[r] = percentCut(table.rebate[r], percent);
    return cut;
  };
  const blocking = (percents: Percents) => {
    checks++;
    return firstLoopUnder(maximal, cutsOf(percents));
  };
  const feasible = (percents: Percents) => blocking(percents) === null;
  const full = (keys: readonly string[]): Percents => new Map(keys.map((k) => [k, 100]));
  const clausesOnRows = (rows: readonly number[]) => [...new Set(rows.filter((r) => table.rebate[r] > 0).map((r) => clauseOf(table, r).key))];

  // Candidates: clauses on the loops found, grown by the clauses of any loop left with all of them cut.
  const loopCount = new Map<string, number>();
  for (const rows of loopRows) for (const key of clausesOnRows(rows)) loopCount.set(key, (loopCount.get(key) ?? 0) + 1);
  const candidates = [...loopCount.keys()];
  const unfixable: CalendarFixPlan['unfixable'] = [];
  for (;;) {
    if (checks >= budget) {
      budgetOut = true;
      break;
    }
    const left = blocking(full(candidates));
    if (left === null) break;
    const rows = left.loop.lanes.map((e) => maximal[left.net].record[e]);
    const more = clausesOnRows(rows).filter((k) => !candidates.includes(k));
    if (more.length === 0) {
      unfixable.push({ rows, vehicleClass: maximal[left.net].vehicleClass, period: maximal[left.net].periods[0], netPerLap: left.loop.netPerLap });
      break;
    }
    for (const k of more) loopCount.set(k, (loopCount.get(k) ?? 0) + 1);
    candidates.push(...more);
  }
  if (unfixable.length > 0 || budgetOut) {
    return { by: 'clause', cut: new Float64Array(table.count), changes: [], unfixable, stepLimitReached: budgetOut, verified: false, method: budgetOut ? `stopped: the budget of ${budget} checks ran out while gathering clauses` : 'no clause cut can fix a loop with no rebate on it' };
  }
  if (candidates.length === 0) return { by: 'clause', cut: new Float64Array(table.count), changes: [], unfixable, stepLimitReached: false, verified: false, method: 'no loop: nothing to cut' };

  const rebateDays = (k: string) => clauses.get(k)!.rebateDays;
  const score = (percents: Percents): [number, number, number] => {
    const cut = cutsOf(percents);
    let removed = 0;
    for (let r = 0; r < table.count; r++) removed += cut[r] * rowDays[r];
    return [percents.size, [...percents.keys()].filter((k) => !clauses.get(k)!.negotiable).length, removed];
  };
  const better = (a: [number, number, number], b: [number, number, number]) => a[0] - b[0] || a[1] - b[1] || a[2] - b[2];

  // Smallest whole percent per clause, one clause at a time, largest rebate per year first.
  const lower = (keys: readonly string[]): Percents => {
    const percents = full(keys);
    const order = keys.slice().sort((a, b) => rebateDays(b) - rebateDays(a) || a.localeCompare(b));
    for (let round = 0; round < 2; round++) {
      for (const k of order) {
        let lo = 1;
        let hi = percents.get(k)!;
        while (lo < hi && checks < budget) {
          const mid = (lo + hi) >> 1;
          percents.set(k, mid);
          if (feasible(percents)) hi = mid;
          else lo = mid + 1;
        }
        percents.set(k, hi);
      }
    }
    return percents;
  };

  let chosen: string[][] = [];
  let method: string;
  if (candidates.length <= exhaustiveUpTo) {
    let subsets = 0;
    for (let size = 1; size <= candidates.length && chosen.length === 0 && !budgetOut; size++) {
      for (const subset of combinations(candidates, size)) {
        if (checks >= budget) {
          budgetOut = true;
          break;
        }
        subsets++;
        if (feasible(full(subset))) chosen.push(subset);
      }
    }
    method = budgetOut
      ? `exhaustive search over the ${counted(candidates.length, 'clause')} on loops stopped by its budget of ${budget} checks; greedy used instead`
      : `fewest clauses: exhaustive over the ${counted(candidates.length, 'clause')} on loops (${counted(subsets, 'subset')} checked), so no plan cuts fewer clauses`;
  } else {
    method = `fewest clauses: greedy (${candidates.length} clauses on loops, more than ${exhaustiveUpTo} for an exhaustive search); no chosen clause can be dropped`;
  }
  if (chosen.length === 0) chosen = [greedy(candidates, loopCount, rebateDays, (keys) => feasible(full(keys)))];
  method += '; percentages: the smallest whole percent per clause, one clause at a time (two rounds), so no single cut can be lowered alone';

  let best: Percents | null = null;
  let bestScore: [number, number, number] | null = null;
  for (const subset of chosen) {
    const percents = lower(subset);
    const s = score(percents);
    if (bestScore === null || better(s, bestScore) < 0) {
      best = percents;
      bestScore = s;
    }
  }
  const cut = cutsOf(best!);
  const changes: CalendarFixChange[] = [];
  for (const [key, percent] of best!) {
    const clause = clauses.get(key)!;
    for (const r of clause.rows) if (cut[r] > 0) changes.push({ row: r, cut: cut[r], clause: { key, name: clause.name, percent } });
  }
  changes.sort((a, b) => a.row - b.row);
  return { by: 'clause', cut, changes, unfixable, stepLimitReached: checks >= budget, verified: false, method };
}

function greedy(candidates: readonly string[], loopCount: Map<string, number>, rebateDays: (k: string) => number, ok: (keys: string[]) => boolean): string[] {
  const order = candidates.slice().sort((a, b) => loopCount.get(b)! - loopCount.get(a)! || rebateDays(a) - rebateDays(b) || a.localeCompare(b));
  const keys: string[] = [];
  for (const k of order) {
    keys.push(k);
    if (ok(keys)) break;
  }
  for (const k of keys.slice().sort((a, b) => rebateDays(b) - rebateDays(a))) {
    const without = keys.filter((x) => x !== k);
    if (without.length > 0 && ok(without)) keys.splice(keys.indexOf(k), 1);
  }
  return keys;
}

function* combinations<T>(items: readonly T[], size: number, start = 0, picked: T[] = []): Generator<T[]> {
  if (picked.length === size) {
    yield picked.slice();
    return;
  }
  for (let i = start; i <= items.length - (size - picked.length); i++) {
    picked.push(items[i]);
    yield* combinations(items, size, i + 1, picked);
    picked.pop();
  }
}

/** Clauses whose rows carry a rebate, keyed by clause key. */
export function clausesWithRebate(table: LaneTable, rowDays: Float64Array, negotiable?: Uint8Array): Map<string, Clause> {
  const out = new Map<string, Clause>();
  for (let r = 0; r < table.count; r++) {
    if (!(table.rebate[r] > 0)) continue;
    const { key, name } = clauseOf(table, r);
    let clause = out.get(key);
    if (!clause) out.set(key, (clause = { key, name, rows: [], rebateDays: 0, negotiable: false }));
    clause.rows.push(r);
    clause.rebateDays += table.rebate[r] * rowDays[r];
    if (negotiable && negotiable[r]) clause.negotiable = true;
  }
  return out;
}
