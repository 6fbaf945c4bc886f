// Headroom over the calendar against the one-day review, day by day: on small random contracts
// (two classes, windows that touch, nest and leave gaps) the calendar's fix plan is applied as a
// what-if (calendarFixChanges), every day of the window is planned under it and audited on its own
// by the engine's one-day audit (auditNetwork). No day may have a loop, each day's floors must equal
// graphlib's Floyd-Warshall (floor of u>v = -(cheapest v>u)), and each row's calendar headroom must
// equal the minimum over the days it is valid of that day's headroom ("no limit" when no day has one).

import graphlib from 'graphlib';
import { describe, expect, it } from 'vitest';
import { addDays } from '../../../../engine/audit/calendar/days';
import { auditNetwork } from '../../../../engine/audit/network-audit';
import { isoDateText } from '../../../../engine/import/cells';
import { importNetwork } from '../../../../engine/planning/import-network';
import { calendarFixChanges, reviewCalendarUnder } from '../../../../engine/scenario/calendar-under-scenario';
import { withChange } from '../../../../engine/scenario/edit';
import { buildOverlay } from '../../../../engine/scenario/overlay';
import { overlayNetwork } from '../../../../engine/scenario/overlay-network';
import type { Network } from '../../../../engine/network/types';
import { randomContract } from './random-contract';

const CLASSES = ['a', 'b'];

/** graphlib's all-pairs costs on the day network's nets (parallel lanes collapsed to the cheapest). */
function referenceFloors(network: Network): number[] {
  const g = new graphlib.Graph({ directed: true });
  for (let d = 0; d < network.depotCount; d++) g.setNode(String(d));
  for (let e = 0; e < network.laneCount; e++) {
    const [u, v, w] = [network.laneFrom[e], network.laneTo[e], network.laneNet[e]];
    if (u === v) continue;
    const old = g.edge(String(u), String(v)) as number | undefined;
    if (old === undefined || w < old) g.setEdge(String(u), String(v), w);
  }
  const all = graphlib.alg.floydWarshall(g, (edge) => g.edge(edge) as number);
  return Array.from({ length: network.laneCount }, (_, e) => {
    const back = all[String(network.laneTo[e])][String(network.laneFrom[e])].distance;
    return back === Infinity ? NaN : back === 0 ? 0 : -back;
  });
}

describe('calendar headroom = the minimum over its days of the one-day headroom', () => {
  it('on 30 random contracts, under the calendar fix plan applied as a what-if', () => {
    let withPlan = 0;
    let compared = 0;
    for (let seed = 401; seed <= 430; seed++) {
      const c = randomContract(seed, 4 + (seed % 2), 10 + (seed % 5));
      const imported = importNetwork(c.depotsCsv, c.lanesCsv);
      const reviewed = reviewCalendarUnder(imported, null);
      const { review } = reviewed;
      if (review.fixPlan) {
        expect(review.fixPlan.verified, `seed ${seed}`).toBe(true);
        withPlan++;
      }
      const fix = calendarFixChanges(reviewed).reduce(withChange, { name: 'fix', description: null, changes: [] });
      const overlay = buildOverlay(imported, fix);
      const minHeadroom = new Map<string, number>();
      for (let day = review.window!.from; day <= review.window!.to; day = addDays(day, 1)) {
        for (const vehicleClass of CLASSES) {
          const planned = overlayNetwork(overlay, imported, { date: isoDateText(day)!, vehicleClass, settings: imported.plan.settings });
          const audit = auditNetwork(planned.network);
          expect(audit.loops, `seed ${seed} ${isoDateText(day)} ${vehicleClass}: a loop after the plan`).toEqual([]);
          const floors = audit.headroom!;
          const reference = referenceFloors(planned.network);
          for (let e = 0; e < planned.network.laneCount; e++) {
            expect(floors.floor[e], `seed ${seed} day ${day} lane ${e}`).toEqual(reference[e]);
            const key = `${planned.plan.laneRecord[e]}|${vehicleClass}`;
            const room = Number.isNaN(floors.floor[e]) ? Infinity : planned.network.laneNet[e] - floors.floor[e];
            minHeadroom.set(key, Math.min(minHeadroom.get(key) ?? Infinity, room));
          }
        }
      }
      for (const h of review.headroom) {
        const key = `${h.row}|${h.vehicleClass}`;
        expect(minHeadroom.has(key), `seed ${seed} row ${key} is valid on some day`).toBe(true);
        const calendar = Number.isNaN(h.floor) ? Infinity : h.net - h.floor;
        expect(calendar, `seed ${seed} row ${key}`).toBe(minHeadroom.get(key));
        compared++;
      }
      // Every (row, class) valid on some day has a calendar headroom row.
      expect(review.headroom.length, `seed ${seed}`).toBe(minHeadroom.size);
    }
    console.log(`headroom by day: ${withPlan} contracts with a plan, ${compared} rows compared`);
    expect(withPlan).toBeGreaterThan(3);
    expect(compared).toBeGreaterThan(300);
  });
});
