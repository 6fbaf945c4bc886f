// The calendar review under a what-if, as a whole review (import, overlay, review, JSON, HTML),
// beside the same review of the files as loaded, measured in the same run: the overlay plans every
// period from its own table, so this is what reviewing under a scenario costs on top. Contracts: the
// sample loop variant, and a generated 2,000-depot / 20,000-lane contract with 100 validity windows
// under a 35-change scenario (rebates, closures, validity changes, added lanes).

import { readFileSync } from 'node:fs';
import { importNetwork } from '../../../engine/planning/import-network';
import { calendarReviewHtml } from '../../../engine/report/calendar-html';
import { calendarReport } from '../../../engine/report/calendar-report';
import { calendarReportScenario, reviewCalendarUnder } from '../../../engine/scenario/calendar-under-scenario';
import { parseScenarioDocument } from '../../../engine/scenario/document';
import type { Scenario, ScenarioChange } from '../../../engine/scenario/types';
import { timeBest, type BenchSuite } from '../harness';
import { generated } from './calendar';

const sample = (name: string) => readFileSync(new URL(`../../../sample-data/${name}`, import.meta.url), 'utf8');

function wholeReview(depots: string, lanes: string, scenario: Scenario | null) {
  const imported = importNetwork(depots, lanes);
  const reviewed = reviewCalendarUnder(imported, scenario);
  const report = calendarReport({ ...imported, lanes: reviewed.overlay.table }, reviewed.review, 'lane', calendarReportScenario(scenario, reviewed));
  const bytes = JSON.stringify(report).length + calendarReviewHtml(report, { files: [], exponent: imported.exponent }).length;
  return { reviewed, bytes };
}

/** 20 rebate changes, 5 closures, 5 validity changes and 5 added lanes, on rows spread over the file. */
function whatIf(lanes: string): Scenario {
  const seen = new Map<string, number>();
  const keys = lanes
    .trim()
    .split('\n')
    .slice(1)
    .map((line) => {
      const [from, to, ref] = line.split(',');
      const group = `${from}|${to}|${ref}`;
      const occurrence = (seen.get(group) ?? 0) + 1;
      seen.set(group, occurrence);
      return { from, to, ref: ref || null, occurrence };
    });
  const at = (k: number) => keys[k % keys.length];
  const changes: ScenarioChange[] = [];
  for (let i = 0; i < 20; i++) changes.push({ kind: 'set-amount', lane: at(i * 997), field: 'rebate', amountMinor: 500, note: null });
  for (let i = 0; i < 5; i++) changes.push({ kind: 'close-lane', lane: at(i * 1931 + 7), note: null });
  for (let i = 0; i < 5; i++) changes.push({ kind: 'set-validity', lane: at(i * 2711 + 3), validFrom: '2026-04-01', validTo: '2026-09-30', note: null });
  for (let i = 0; i < 5; i++) {
    changes.push({
      kind: 'add-lane',
      lane: { from: `D${i}`, to: `D${i + 10}`, ref: `W-${i}`, tollMinor: 0, fuelMinor: 10_000, feesMinor: 0, rebateMinor: 0, validFrom: '2026-05-01', validTo: '2026-08-31', distanceKm: 50, driveMinutes: 40 },
      note: null,
    });
  }
  return { name: 'bench what-if', description: null, changes };
}

export const suite: BenchSuite = {
  name: 'calendar-scenario',
  run(record) {
    const cases: { name: string; depots: string; lanes: string; scenario: Scenario; repeat: number }[] = [];
    const sampleLanes = sample('lanes-rebate-loop.csv');
    // The what-if shipped for the sample (the same five changes the calendar-under-scenario test uses).
    cases.push({
      name: 'sample loop variant, 5-change what-if',
      depots: sample('depots.csv'),
      lanes: sampleLanes,
      repeat: 3,
      scenario: parseScenarioDocument(sample('what-if-spring-rebate.json'), 'what-if-spring-rebate.json'),
    });
    const big = generated(2_000, 20_000, 100, 20, 100);
    cases.push({ name: '2k/20k, 100 validity windows, 35-change what-if', depots: big.depots, lanes: big.lanes, scenario: whatIf(big.lanes), repeat: 1 });

    for (const c of cases) {
      const base = timeBest(() => wholeReview(c.depots, c.lanes, null), c.repeat);
      const under = timeBest(() => wholeReview(c.depots, c.lanes, c.scenario), c.repeat);
      const rv = under.result.reviewed;
      const applied = rv.changes.filter((x) => x.applied).length;
      record({
        case: `calendar review under a what-if: ${c.name} (import, overlay, review, JSON, HTML)`,
        engine: under.ms,
        baseline: base.ms,
        unit: 'ms',
        note: `${applied} of ${c.scenario.changes.length} changes applied; ${rv.review.periods.length} periods, ${rv.review.networks.length} networks (${rv.review.networks.filter((n) => n.maximal).length} maximal) vs ${base.result.reviewed.review.networks.length} (${base.result.reviewed.review.networks.filter((n) => n.maximal).length}); ${rv.review.loops.length} loops vs ${base.result.reviewed.review.loops.length}; baseline = the same review of the files as loaded`,
      });
    }
  },
};
