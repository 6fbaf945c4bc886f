// The contract review across the calendar, as whole commands (import the text, review, build the
// JSON and the HTML report), beside a one-audit-per-day baseline measured in the same run:
// - the sample loop variant (target <= 1 s), baseline: every day of the window for each class;
// - generated 5,000-depot / 50,000-lane contracts with 100 distinct validity windows (half-month
//   boundaries in 2026), seasonal rebates on 1 % and on 10 % of the lanes and 20 seasonal rebate
//   loops (target <= 30 s); there a day's audit takes seconds, so the baseline times two days and
//   scales to the window's days (said in the note).

import { readFileSync } from 'node:fs';
import { reviewCalendar } from '../../../engine/audit/calendar/calendar-review';
import { addDays, daysInRange } from '../../../engine/audit/calendar/days';
import { auditNetwork } from '../../../engine/audit/network-audit';
import { isoDateText } from '../../../engine/import/cells';
import { importNetwork, planNetwork } from '../../../engine/planning/import-network';
import type { ImportResult } from '../../../engine/planning/import-types';
import { auditReport } from '../../../engine/report/audit-report';
import { calendarReviewHtml } from '../../../engine/report/calendar-html';
import { calendarReport } from '../../../engine/report/calendar-report';
import { seeded, timeBest, type BenchSuite } from '../harness';

const sample = (name: string) => readFileSync(new URL(`../../../sample-data/${name}`, import.meta.url), 'utf8');

/** Import + calendar review + JSON + HTML, as `lanewright audit --json --report` does (less the disk). */
function wholeReview(depots: string, lanes: string) {
  const imported = importNetwork(depots, lanes);
  const review = reviewCalendar(imported);
  const report = calendarReport(imported, review);
  const json = JSON.stringify(report);
  const html = calendarReviewHtml(report, { files: [], exponent: imported.exponent });
  return { imported, review, report, bytes: json.length + html.length };
}

/** One day: plan for the date and class, full one-day audit and its report. */
function oneDayAudit(imported: ImportResult, date: number, vehicleClass: string | null) {
  const planned = planNetwork(imported, { date: isoDateText(date)!, vehicleClass: vehicleClass ?? undefined, settings: imported.plan.settings });
  const audit = auditNetwork(planned.network!);
  return JSON.stringify(auditReport(planned.network!, audit)).length;
}

const money = (minor: number) => (minor / 100).toFixed(2);
const iso = (d: number) => isoDateText(d)!;

/** A generated contract: nets c + p(u) - p(v) (rebates without loops), seasonal cheaper twins in 100 windows, 20 seasonal loops. */
export function generated(depotCount: number, laneCount: number, windows: number, loops: number, seasonalEvery: number): { depots: string; lanes: string } {
  const rand = seeded(12);
  const pick = (k: number) => Math.floor(rand() * k);
  const potential = Array.from({ length: depotCount }, () => pick(20_000));
  const bounds: number[] = [];
  for (let m = 1; m <= 12; m++) bounds.push(20260000 + m * 100 + 1, 20260000 + m * 100 + 16);
  const windowSet = new Map<string, [number, number]>();
  while (windowSet.size < windows) {
    const a = pick(bounds.length);
    const b = a + 1 + pick(Math.min(8, bounds.length - a));
    const from = bounds[a];
    const to = b >= bounds.length ? 20261231 : addDays(bounds[b], -1);
    windowSet.set(`${from}-${to}`, [from, to]);
  }
  const windowList = [...windowSet.values()];
  const depots = 'id,lat,lon\n' + potential.map((_, d) => `D${d},${(45 + (d % 100) / 20).toFixed(3)},${(2 + Math.floor(d / 100) / 10).toFixed(3)}`).join('\n') + '\n';
  const rows: string[] = ['from,to,ref,toll,fuel,fees,rebate,distance_km,valid_from,valid_to,clause'];
  const row = (u: number, v: number, net: number, ref: string, win: [number, number] | null, clause: string) => {
    const toll = net > 0 ? net : 0;
    const rebate = net < 0 ? -net : 0;
    rows.push([`D${u}`, `D${v}`, ref, money(toll), '0.00', '0.00', money(rebate), '50', win ? iso(win[0]) : '', win ? iso(win[1]) : '', win ? clause : ''].join(','));
  };
  let made = 0;
  for (let e = 0; made < laneCount - 2 * loops; e++) {
    const u = e < depotCount ? e : pick(depotCount);
    const v = e < depotCount ? (e + 1) % depotCount : pick(depotCount);
    const c = pick(10_000);
    row(u, v, c + potential[u] - potential[v], `L-${e}`, null, '');
    made++;
    // Every seasonalEvery-th lane has a seasonal twin with a larger rebate (still no loop: its c stays >= 0).
    if (e % seasonalEvery === 0 && made < laneCount - 2 * loops) {
      const w = e % windows;
      row(u, v, pick(c + 1) + potential[u] - potential[v], `L-${e}-S`, windowList[w], `S-${w}`);
      made++;
    }
  }
  // Seasonal loops: a pair u -> v -> u netting -1 to -500 per lap, with nets that follow the
  // potentials, so other routes back rarely make further loops through the rebated lane.
  for (let i = 0; i < loops; i++) {
    const u = pick(depotCount);
    const v = (u + 1 + pick(depotCount - 1)) % depotCount;
    const c = pick(100);
    row(u, v, c + potential[u] - potential[v], `P-${i}-A`, null, '');
    row(v, u, potential[v] - potential[u] - c - 1 - pick(500), `P-${i}-B`, windowList[(i * 7) % windows], `S-${(i * 7) % windows}`);
  }
  return { depots, lanes: rows.join('\n') + '\n' };
}

export const suite: BenchSuite = {
  name: 'calendar',
  run(record) {
    // The sample: every day for each class is cheap enough to run in full.
    const depots = sample('depots.csv');
    const lanes = sample('lanes-rebate-loop.csv');
    const small = timeBest(() => wholeReview(depots, lanes), 3);
    const { imported, review } = small.result;
    const days = daysInRange(review.window!.from, review.window!.to);
    const perDay = timeBest(() => {
      const again = importNetwork(depots, lanes);
      for (let d = review.window!.from; d <= review.window!.to; d = addDays(d, 1)) for (const c of review.classes) oneDayAudit(again, d, c);
    }, 1);
    record({
      case: 'calendar review of the sample loop variant (import, review, JSON, HTML)',
      engine: small.ms,
      baseline: perDay.ms,
      unit: 'ms',
      target: 1_000,
      note: `${imported.lanes.count} lane rows, ${days} days, ${review.periods.length} periods x ${review.classes.length} classes = ${review.networks.length} networks, ${review.networks.filter((n) => n.maximal).length} maximal; ${review.loops.length} loops; baseline = one full audit per day and class (${days * review.classes.length} audits)`,
    });

    // The generated contracts: seasonal twins on 1 % of the lanes (rebates on a few corridors) and on
    // 10 % (a worst case for sharing: back paths mix rebates of many different windows).
    for (const [share, every] of [['1 %', 100], ['10 %', 10]] as const) {
      const big = generated(5_000, 50_000, 100, 20, every);
      const phases: Record<string, number> = {};
      let phaseStart = 0;
      let phase = '';
      const run = timeBest(() => {
        const importStart = performance.now();
        const imp = importNetwork(big.depots, big.lanes);
        phases.import = performance.now() - importStart;
        phaseStart = performance.now();
        phase = '';
        const rv = reviewCalendar(imp, {
          onProgress: (p) => {
            if (p.phase === phase) return;
            if (phase) phases[phase] = (phases[phase] ?? 0) + performance.now() - phaseStart;
            phase = p.phase;
            phaseStart = performance.now();
          },
        });
        phases[phase] = (phases[phase] ?? 0) + performance.now() - phaseStart;
        const reportStart = performance.now();
        const report = calendarReport(imp, rv);
        const bytes = JSON.stringify(report).length + calendarReviewHtml(report, { files: [], exponent: imp.exponent }).length;
        phases.report = performance.now() - reportStart;
        return { imp, rv, bytes };
      }, 1);
      const { imp, rv } = run.result;
      const bigDays = daysInRange(rv.window!.from, rv.window!.to);
      const sampleDays = [rv.window!.from, addDays(rv.window!.from, Math.floor(bigDays / 2))];
      const baseline = timeBest(() => {
        for (const d of sampleDays) oneDayAudit(imp, d, null);
      }, 1);
      const baselineMs = (baseline.ms / sampleDays.length) * bigDays;
      record({
        case: `calendar review 5k/50k, 100 validity windows, seasonal rebates on ${share} of lanes, 20 seasonal loops (import, review, JSON, HTML)`,
        engine: run.ms,
        baseline: baselineMs,
        unit: 'ms',
        target: 30_000,
        note:
          `${rv.periods.length} periods, ${rv.networks.length} networks, ${rv.networks.filter((n) => n.maximal).length} maximal; ${rv.loops.length} loops, ` +
          `${rv.fixPlan?.changes.length ?? 0} rows cut, verified ${rv.fixPlan?.verified}; headroom: ${rv.headroomWork?.together} class(es) searched over all maximal networks at once (${rv.headroomWork?.pairs} lane pairs, ${rv.headroomWork?.openPairs} made cheaper by a seasonal lane and searched again in ${rv.headroomWork?.networkRuns} network runs), ${rv.headroomWork?.wholeSolves} whole-network solves; ` +
          `phases ms: ${Object.entries(phases).map(([k, v]) => `${k} ${Math.round(v)}`).join(', ')}; ` +
          `baseline = full one-day audit on ${sampleDays.length} days (${Math.round(baseline.ms / sampleDays.length)} ms each) x ${bigDays} days`,
      });
    }
  },
};
