import { describe, expect, it } from 'vitest';
import { compareScenario } from '../../../engine/scenario/compare';
import { compareReport, compareReportRows } from '../../../engine/report/compare-report';
import type { Scenario } from '../../../engine/scenario/types';
import type { ScenarioLane } from '../../../engine/scenario/apply';
import type { Minor } from '../../../engine/money/minor';
import { MoneyOverflowError } from '../../../engine/errors';
import { referenceHasNegativeLoop, rng } from '../audit/reference';
import { createRequire } from 'node:module';

const depots = ['O', 'A', 'B', 'C'].map((id) => ({ id, name: `${id} depot`, lat: 0, lon: 0 }));
const lane = (from: string, to: string, toll: number, rebate: number, sourceRow: number): ScenarioLane => ({
  from, to, toll: toll as Minor, fuel: 0 as Minor, fees: 0 as Minor, rebate: rebate as Minor, sourceRow,
});
const key = (from: string, to: string) => ({ from, to, ref: null, occurrence: 1 });
const setToll = (from: string, to: string, amountMinor: number) => ({ kind: 'set-amount' as const, lane: key(from, to), field: 'toll' as const, amountMinor, note: null });
const setRebate = (from: string, to: string, amountMinor: number) => ({ kind: 'set-amount' as const, lane: key(from, to), field: 'rebate' as const, amountMinor, note: null });

describe('comparing a scenario with the base', () => {
  const base = { depots, lanes: [lane('O', 'A', 10, 0, 2), lane('A', 'B', 10, 0, 3), lane('O', 'B', 25, 0, 4), lane('B', 'C', 5, 0, 5), lane('C', 'B', 4, 0, 6)] };

  it('gives per-depot cost changes and the routes that changed (worked by hand)', () => {
    const scenario: Scenario = { name: 'toll rise', description: null, changes: [setToll('A', 'B', 20)] };
    const report = compareReport(compareScenario(base, scenario, 'O'));
    const row = (id: string) => report.depots.find((d) => d.id === id)!;
    expect([row('O'), row('A'), row('B'), row('C')].map((d) => [d.base_cost_minor, d.scenario_cost_minor, d.change_minor, d.route_changed])).toEqual([
      [0, 0, 0, false],
      [10, 10, 0, false],
      [20, 25, 5, true], // O>A>B (20) becomes O>B (25)
      [25, 30, 5, true],
    ]);
    expect(row('B').base_lanes).toEqual(['O>A||1', 'A>B||1']);
    expect(row('B').scenario_lanes).toEqual(['O>B||1']);
    expect(report.loops_appeared).toEqual([]);
    expect(compareReportRows(report, 2)[3]).toEqual(['B', 'B depot', 'reachable', 'reachable', '0.20', '0.25', '0.05', 'yes', 'O>A||1 A>B||1', 'O>B||1']);
  });

  it('reports a loop that appears and one that disappears, with the statuses they change', () => {
    const appear = compareReport(compareScenario(base, { name: 'credit', description: null, changes: [setRebate('C', 'B', 10)] }, 'O'));
    expect(appear.loops_appeared).toEqual([{ depots: ['B', 'C'], lanes: ['B>C||1', 'C>B||1'], rows: [5, 6], net_per_lap_minor: -1, reached_from_origin: true }]);
    expect(appear.depots.filter((d) => d.scenario_status === 'unbounded').map((d) => d.id)).toEqual(['B', 'C']);
    expect(appear.depots.find((d) => d.id === 'B')!.change_minor).toBeNull();

    const looped = { depots, lanes: base.lanes.map((l) => (l.from === 'C' ? lane('C', 'B', 4, 10, 6) : l)) };
    const disappear = compareReport(compareScenario(looped, { name: 'cut', description: null, changes: [setRebate('C', 'B', 9)] }, 'O'));
    expect(disappear.loops_disappeared.map((l) => l.lanes)).toEqual([['B>C||1', 'C>B||1']]);
    expect(disappear.loops_appeared).toEqual([]);
    expect(disappear.depots.find((d) => d.id === 'C')!.scenario_cost_minor).toBe(25);
  });

  it('refuses a cost change outside the exact range instead of rounding it', () => {
    const max = Number.MAX_SAFE_INTEGER;
    const wide = { depots, lanes: [lane('O', 'A', 0, max, 2)] };
    // -MAX before, +MAX after: the change, 2 x MAX, has no exact float.
    expect(() => compareScenario(wide, { name: 'swing', description: null, changes: [setRebate('O', 'A', 0), setToll('O', 'A', max)] }, 'O')).toThrow(MoneyOverflowError);
  });

  it('carries problems through to the report', () => {
    const report = compareReport(compareScenario(base, { name: 'x', description: null, changes: [setToll('C', 'O', 1)] }, 'O'));
    expect(report.problems).toMatchObject([{ change: 1, code: 'lane-missing', lane: 'C>O||1' }]);
  });

  it('scenario costs equal js-graph-algorithms Bellman-Ford on the changed lanes (random loop-free cases)', () => {
    const jsgraphs = createRequire(import.meta.url)('js-graph-algorithms');
    for (let seed = 1; seed <= 25; seed++) {
      const r = rng(seed);
      const ids = ['O', 'A', 'B', 'C', 'D', 'E'];
      const lanes = Array.from({ length: 14 }, (_, i) => lane(ids[Math.floor(r() * 6)], ids[Math.floor(r() * 6)], Math.floor(r() * 40), 0, i + 2));
      const scenarioLanes = lanes.map((l) => ({ ...l }));
      const changes = [0, 3, 7].map((i) => {
        const toll = Math.floor(r() * 40);
        const occurrence = lanes.slice(0, i + 1).filter((x) => x.from === lanes[i].from && x.to === lanes[i].to).length;
        scenarioLanes[i].toll = toll as Minor;
        return { kind: 'set-amount' as const, lane: { from: lanes[i].from, to: lanes[i].to, ref: null, occurrence }, field: 'toll' as const, amountMinor: toll, note: null };
      });
      const index = (id: string) => ids.indexOf(id);
      expect(referenceHasNegativeLoop(6, scenarioLanes.map((l) => [index(l.from), index(l.to), l.toll]))).toBe(false);
      const g = new jsgraphs.WeightedDiGraph(6);
      for (const l of scenarioLanes) g.addEdge(new jsgraphs.Edge(index(l.from), index(l.to), l.toll));
      const bf = new jsgraphs.BellmanFord(g, 0);
      const report = compareReport(compareScenario({ depots: ids.map((id) => ({ id, name: id, lat: 0, lon: 0 })), lanes }, { name: 'r', description: null, changes }, 'O'));
      expect(report.problems).toEqual([]);
      report.depots.forEach((d, i) => {
        const expected = bf.hasPathTo(i) ? bf.distanceTo(i) : null;
        expect(d.scenario_cost_minor, `seed ${seed} depot ${d.id}`).toBe(expected);
      });
    }
  });
});
