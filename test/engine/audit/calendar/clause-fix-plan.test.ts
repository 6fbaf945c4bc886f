// The clause plan against the exhaustive optimum on small random contracts: every whole-percent cut
// of up to two clauses (0% = the clause is not cut) is tried, feasibility checked day by day with
// js-graph-algorithms' Bellman-Ford; the optimum cuts the fewest clauses, then removes the least
// rebate x days. The plan must cut as few clauses and never beat the optimum; the ratio of rebate
// removed (plan / optimum) is recorded in test-output/clause-plan-ratio.json.

import { mkdirSync, writeFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { reviewCalendar } from '../../../../engine/audit/calendar/calendar-review';
import { percentCut } from '../../../../engine/audit/calendar/clause-fix-plan';
import { addDays } from '../../../../engine/audit/calendar/days';
import { clauseOf } from '../../../../engine/import/lane-clause';
import { importNetwork } from '../../../../engine/planning/import-network';
import { referenceHasNegativeLoop } from '../reference';
import { randomContract, rowNet, validOn } from './random-contract';

describe('fix plan by clause', () => {
  it('percentCut rounds the cut up to whole minor units', () => {
    expect(percentCut(1000, 5)).toBe(50);
    expect(percentCut(999, 5)).toBe(50); // 49.95 -> 50
    expect(percentCut(1, 1)).toBe(1);
    expect(percentCut(17000, 100)).toBe(17000);
  });

  it('cuts the fewest clauses and never beats the exhaustive optimum (ratio recorded)', () => {
    const ratios: { seed: number; clauses: number; plan: number; optimum: number; ratio: number }[] = [];
    for (let seed = 200; seed < 320 && ratios.length < 25; seed++) {
      const c = randomContract(seed, 4, 11);
      const imported = importNetwork(c.depotsCsv, c.lanesCsv);
      const review = reviewCalendar(imported, { fixBy: 'clause' });
      if (!review.fixPlan || !review.fixPlan.verified) continue;
      const table = imported.lanes;
      const keys = [...new Set(review.loops.flatMap((l) => l.rows.filter((r) => table.rebate[r] > 0).map((r) => clauseOf(table, r).key)))];
      if (keys.length > 2) continue;
      const rowsOf = (k: string) => Array.from({ length: table.count }, (_, r) => r).filter((r) => table.rebate[r] > 0 && clauseOf(table, r).key === k);
      const days: number[] = [];
      for (let d = review.window!.from; d <= review.window!.to; d = addDays(d, 1)) days.push(d);
      const cutOf = (percents: number[]) => {
        const cut = new Float64Array(table.count);
        keys.forEach((k, i) => rowsOf(k).forEach((r) => (cut[r] = percentCut(table.rebate[r], percents[i]))));
        return cut;
      };
      const removed = (cut: Float64Array) => cut.reduce((s, v, r) => s + v * review.rowDays[r], 0);
      // One check per distinct day network: the days of one period share their lanes.
      const checkDays = review.periods.map((p) => p.from).filter((d) => days.includes(d));
      const feasible = (percents: number[]) => {
        const cut = cutOf(percents);
        return checkDays.every((d) =>
          [0, 1].every((cls) => !referenceHasNegativeLoop(c.depots, c.rows.flatMap((x, row) => (validOn(x, d) ? [[x.from, x.to, rowNet(x, cls) + cut[row]] as [number, number, number]] : [])))),
        );
      };
      let best: { count: number; removed: number } | null = null;
      const consider = (percents: number[]) => {
        if (!feasible(percents)) return;
        const s = { count: percents.filter((p) => p > 0).length, removed: removed(cutOf(percents)) };
        if (!best || s.count < best.count || (s.count === best.count && s.removed < best.removed)) best = s;
      };
      if (keys.length === 1) for (let a = 0; a <= 100; a++) consider([a]);
      else {
        for (let a = 0; a <= 100; a++) {
          // Feasibility only grows with b: the smallest feasible b is the best for this a.
          let lo = 0;
          let hi = 100;
          if (!feasible([a, 100])) continue;
          while (lo < hi) {
            const mid = (lo + hi) >> 1;
            if (feasible([a, mid])) hi = mid;
            else lo = mid + 1;
          }
          consider([a, hi]);
        }
      }
      expect(best, `seed ${seed}: some cut is feasible`).not.toBeNull();
      const optimum = best!;
      const planClauses = new Set(review.fixPlan.changes.map((ch) => ch.clause!.key)).size;
      const plan = removed(review.fixPlan.cut);
      expect(planClauses, `seed ${seed}: fewest clauses`).toBe(optimum.count);
      expect(plan, `seed ${seed}: not below the optimum`).toBeGreaterThanOrEqual(optimum.removed);
      ratios.push({ seed, clauses: keys.length, plan, optimum: optimum.removed, ratio: optimum.removed === 0 ? 1 : plan / optimum.removed });
    }
    expect(ratios.length).toBeGreaterThanOrEqual(10);
    mkdirSync('test-output', { recursive: true });
    const worst = Math.max(...ratios.map((r) => r.ratio));
    writeFileSync('test-output/clause-plan-ratio.json', JSON.stringify({ contracts: ratios.length, worst, ratios }, null, 1));
    console.log(`clause plan vs exhaustive optimum: ${ratios.length} contracts, worst ratio ${worst.toFixed(3)}`);
  });
});
