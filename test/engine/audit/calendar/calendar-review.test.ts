// The calendar review against brute force by day: for small random contracts with two vehicle
// classes and validity windows that touch, nest, overlap and leave gaps, every day of the window is
// solved on its own (lanes valid that day, nets per class from the generator, not the planner): the
// loops found per day by exhaustive search (cross-checked by js-graph-algorithms' Bellman-Ford) must
// equal the review's loops on that day; after the calendar-wide fix plan no day has a loop; and each
// row's headroom equals the minimum over its days of the one-day headroom.

import { describe, expect, it } from 'vitest';
import { reviewCalendar } from '../../../../engine/audit/calendar/calendar-review';
import { addDays } from '../../../../engine/audit/calendar/days';
import { periodOf } from '../../../../engine/audit/calendar/periods';
import { importNetwork } from '../../../../engine/planning/import-network';
import { referenceHasNegativeLoop } from '../reference';
import { allPairs, negativeLoops, randomContract, rowNet, validOn, type Contract } from './random-contract';

const CLASSES = ['a', 'b'];

function dayLanes(c: Contract, day: number, cls: number, cut: ArrayLike<number> | null) {
  return c.rows.flatMap((x, row) => (validOn(x, day) ? [{ row, from: x.from, to: x.to, net: rowNet(x, cls) + (cut ? cut[row] : 0) }] : []));
}

function check(seed: number, fixBy: 'lane' | 'clause') {
  const c = randomContract(seed, 4 + (seed % 2), 10 + (seed % 5));
  const imported = importNetwork(c.depotsCsv, c.lanesCsv);
  expect(imported.report.errors).toEqual([]);
  const review = reviewCalendar(imported, { fixBy });
  expect(review.classes).toEqual(CLASSES);
  const rowOf = (tableRow: number) => imported.lanes.sourceRow[tableRow] - 2;
  const cut = review.fixPlan ? Array.from({ length: c.rows.length }, (_, row) => review.fixPlan!.cut[row]) : null;
  let loopDays = 0;

  const maxFloor = new Map<string, { floor: number; days: number[] }>();
  for (let day = review.window!.from; day <= review.window!.to; day = addDays(day, 1)) {
    const period = periodOf(review.periods, day);
    expect(period, `day ${day} is in a period`).toBeGreaterThanOrEqual(0);
    for (let cls = 0; cls < 2; cls++) {
      const lanes = dayLanes(c, day, cls, null);
      const expected = negativeLoops(c.depots, lanes);
      expect(referenceHasNegativeLoop(c.depots, lanes.map((l) => [l.from, l.to, l.net])), `seed ${seed} day ${day}`).toBe(expected.length > 0);
      const reviewed = review.loops
        .filter((l) => l.presence.some((p) => p.period === period && p.vehicleClass === CLASSES[cls]))
        .map((l) => l.rows.map(rowOf).sort((a, b) => a - b).join(','))
        .sort();
      expect(reviewed, `seed ${seed} day ${day} class ${CLASSES[cls]}`).toEqual(expected);
      if (expected.length > 0) loopDays++;

      // After the plan, no loop on any day; one-day floors on the fixed day network.
      const fixed = dayLanes(c, day, cls, cut);
      if (review.fixPlan && !review.fixPlan.verified) continue;
      expect(referenceHasNegativeLoop(c.depots, fixed.map((l) => [l.from, l.to, l.net])), `seed ${seed} day ${day} after the plan`).toBe(false);
      const back = allPairs(c.depots, fixed);
      for (const l of fixed) {
        const cost = back[l.to][l.from];
        if (cost === Infinity) continue;
        const floor = cost === 0 ? 0 : -cost;
        const key = `${l.row}|${CLASSES[cls]}`;
        const seen = maxFloor.get(key);
        if (!seen || floor > seen.floor) maxFloor.set(key, { floor, days: [day] });
        else if (floor === seen.floor) seen.days.push(day);
      }
    }
  }
  if (review.fixPlan) {
    expect(review.fixPlan.verified, `seed ${seed}: ${review.fixPlan.method ?? ''}`).toBe(true);
    for (const ch of review.fixPlan.changes) {
      expect(ch.cut).toBeGreaterThan(0);
      expect(ch.cut).toBeLessThanOrEqual(c.rows[rowOf(ch.row)].rebate);
    }
  }
  for (const h of review.headroom) {
    const key = `${rowOf(h.row)}|${h.vehicleClass}`;
    const expected = maxFloor.get(key);
    if (!expected) {
      expect(h.floor, `seed ${seed} row ${key}: no limit`).toBeNaN();
      continue;
    }
    expect(h.floor, `seed ${seed} row ${key}`).toBe(expected.floor);
    const setBy = review.periods[h.setBy];
    expect(expected.days.some((d) => d >= setBy.from && d <= setBy.to), `seed ${seed} row ${key}: the period named sets the floor`).toBe(true);
  }
  return loopDays;
}

describe('calendar review against brute force by day', () => {
  it('loops per day, the fix plan by lane and headroom per row (60 random contracts)', () => {
    let withLoops = 0;
    for (let seed = 1; seed <= 60; seed++) if (check(seed, 'lane') > 0) withLoops++;
    // The generator must exercise loops on some days (and not on all).
    expect(withLoops).toBeGreaterThan(10);
  });

  it('the fix plan by clause leaves no loop on any day (40 random contracts)', () => {
    for (let seed = 101; seed <= 140; seed++) check(seed, 'clause');
  });
});
