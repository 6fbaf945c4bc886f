import { describe, expect, it } from 'vitest';
import { buildFixPlan } from '../../../engine/audit/fix-plan';
import { auditNetwork } from '../../../engine/audit/network-audit';
import { buildNetwork } from '../../../engine/network/build';
import type { Minor } from '../../../engine/money/minor';
import type { Network } from '../../../engine/network/types';
import { indexedLanes, randomNetwork, referenceHasNegativeLoop } from './reference';

const lane = (from: string, to: string, toll: number, rebate: number, row: number, ref?: string) => ({
  from, to, toll: toll as Minor, fuel: 0 as Minor, fees: 0 as Minor, rebate: rebate as Minor, sourceRow: row, ...(ref ? { ref } : {}),
});
const depots = (ids: string[]) => ids.map((id) => ({ id, name: id, lat: 0, lon: 0 }));
const netPerLane = (net: Network, weights: Float64Array) => {
  const out = new Float64Array(net.laneCount);
  for (let p = 0; p < net.laneCount; p++) out[net.outLane[p]] = weights[p];
  return out;
};

describe('fix plan', () => {
  it('cuts one rebate by exactly what the loop pays per lap', () => {
    // A->B nets 10, B->A nets 60 - 90 = -30: the lap nets -20, so row 3's rebate goes from 90 to 70.
    const net = buildNetwork(depots(['A', 'B']), [lane('A', 'B', 10, 0, 2), lane('B', 'A', 60, 90, 3)]);
    const plan = buildFixPlan(net);
    expect(plan.changes).toEqual([{ lane: 1, oldRebate: 90, newRebate: 70, oldNet: -30, newNet: -10, negotiable: false }]);
    expect(plan.verified).toBe(true);
  });

  it('prefers a lane the user marks negotiable, by contract reference', () => {
    const lanes = [lane('A', 'B', 10, 40, 2, 'K-1'), lane('B', 'A', 10, 40, 3, 'K-2')];
    const net = buildNetwork(depots(['A', 'B']), lanes);
    // Lap = -30 + -30 = -60; both rebates are 40 < 60, so two cuts are needed either way.
    const byDefault = auditNetwork(net).fixPlan!;
    expect(byDefault.verified).toBe(true);
    const preferK2 = auditNetwork(net, { negotiable: ['K-2'] }).fixPlan!;
    expect(preferK2.steps[0].lane).toBe(1);
    expect(preferK2.changes.find((c) => c.lane === 1)!.negotiable).toBe(true);
  });

  it('prefers the cut that is the smallest share of a rebate, and cuts twice when no rebate covers the lap', () => {
    // Lap = (20 - 22) + (40 - 50) = -12: row 2's rebate 22 would lose 55 %, row 3's 50 only 24 %: row 3 is cut.
    const net = buildNetwork(depots(['A', 'B']), [lane('A', 'B', 20, 22, 2), lane('B', 'A', 40, 50, 3)]);
    const plan = buildFixPlan(net);
    expect(plan.steps).toHaveLength(1);
    expect(plan.changes).toEqual([{ lane: 1, oldRebate: 50, newRebate: 38, oldNet: -10, newNet: 2, negotiable: false }]);
    // Lap = -5 - 50 = -55: no single rebate covers 55, so one is cut to 0 and the other takes the rest.
    const both = buildFixPlan(buildNetwork(depots(['A', 'B']), [lane('A', 'B', 0, 5, 2), lane('B', 'A', 0, 50, 3)]));
    expect(both.verified).toBe(true);
    expect(both.changes.map((c) => [c.oldRebate, c.newRebate])).toEqual([[5, 0], [50, 0]]);
  });

  it('says so when it stops at its step limit with loops left', () => {
    const net = buildNetwork(depots(['A', 'B']), [lane('A', 'B', 0, 5, 2), lane('B', 'A', 0, 50, 3)]);
    const plan = buildFixPlan(net, { maxSteps: 1 }); // the lap of -55 needs two cuts
    expect([plan.stepLimitReached, plan.verified, plan.unfixable.length]).toEqual([true, false, 0]);
  });

  it('reports a loop that no rebate cut can fix (a negative toll), and does not pretend', () => {
    const net = buildNetwork(depots(['A', 'B']), [lane('A', 'B', -10, 0, 2), lane('B', 'A', 5, 0, 3)]);
    const plan = buildFixPlan(net);
    expect(plan.unfixable).toHaveLength(1);
    expect(plan.verified).toBe(false);
    const audit = auditNetwork(net);
    expect(audit.headroom).toBeNull();
  });

  it('on random networks: no loop left (js-graph-algorithms Bellman-Ford), no lane cheaper, only rebates reduced', () => {
    let fixed = 0;
    for (let seed = 1; seed <= 80; seed++) {
      const n = 3 + (seed % 10);
      const net = randomNetwork(seed, n, n * 3, false, 30);
      const plan = buildFixPlan(net);
      expect(plan.verified, `seed ${seed}`).toBe(true);
      const after = netPerLane(net, plan.weights);
      expect(referenceHasNegativeLoop(n, indexedLanes(net, after)), `seed ${seed}`).toBe(false);
      for (let e = 0; e < net.laneCount; e++) {
        expect(after[e]).toBeGreaterThanOrEqual(net.laneNet[e]);
        if (after[e] !== net.laneNet[e]) expect(plan.changes.some((c) => c.lane === e)).toBe(true);
      }
      for (const c of plan.changes) {
        expect(c.newRebate).toBeGreaterThanOrEqual(0);
        expect(c.newRebate).toBeLessThan(c.oldRebate);
        expect(c.newNet - c.oldNet).toBe(c.oldRebate - c.newRebate);
      }
      if (plan.changes.length > 0) fixed++;
    }
    expect(fixed).toBeGreaterThan(20);
  });
});
