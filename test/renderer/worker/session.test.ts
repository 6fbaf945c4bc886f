// The engine worker's session driven directly (no browser): the sample imports with its report,
// solves match js-graph-algorithms' Bellman-Ford on the planned network, a scenario edit solved
// through per-lane weights matches the engine's own applyScenario, and exports re-read.

import { readFileSync } from 'node:fs';
import jsgraphs from 'js-graph-algorithms';
import { describe, expect, it } from 'vitest';
import { parseCsvText } from '../../../engine/io/csv-papaparse';
import { importNetwork } from '../../../engine/planning/import-network';
import { formatMinor, type Minor } from '../../../engine/money/minor';
import { cheapestRoutes } from '../../../engine/routes/cheapest-routes';
import { applyScenario } from '../../../engine/scenario/apply';
import { laneKeysOf } from '../../../engine/import/lane-key';
import { addedLaneRef } from '../../../renderer/model/added-lanes';
import { emptyScenario, setLaneAmount } from '../../../renderer/model/scenario-edits';
import type { FromWorker, NetworkView, PlanSettings, SolveView, ToWorker } from '../../../renderer/worker/protocol';
import { WorkerSession } from '../../../renderer/worker/session';
import type { ContractReviewView } from '../../../renderer/worker/review';
import { createHash } from 'node:crypto';
import { laneRef } from '../../../renderer/model/lane-names';

const text = (name: string) => readFileSync(`sample-data/${name}`, 'utf8');
const DATE = '2026-08-15';

function drive(messages: ToWorker[]): FromWorker[] {
  const out: FromWorker[] = [];
  const session = new WorkerSession((m) => out.push(m));
  messages.forEach((m) => session.handle(m));
  return out.filter((m) => m.kind !== 'progress');
}

const load = (lanes: string, acceptPartial = false): ToWorker => ({
  kind: 'load',
  id: 1,
  depots: { name: 'depots.csv', text: text('depots.csv') },
  lanes: { name: lanes, text: text(lanes) },
  acceptPartial,
  plan: { date: DATE, vehicleClass: '' },
});
const settings: PlanSettings = { origin: 'RTM', maxLegs: null, vehicleClass: '', dispatchDate: DATE };

describe('worker session', () => {
  it('solves the sample like js-graph-algorithms Bellman-Ford on the same planned lanes', () => {
    const [loaded, solved] = drive([load('lanes.csv'), { kind: 'solve', id: 2, settings, scenario: null }]);
    expect(loaded.kind).toBe('loaded');
    const view = (loaded as { network: NetworkView }).network;
    const result = (solved as { result: SolveView }).result;
    const graph = new jsgraphs.WeightedDiGraph(view.depotIds.length);
    for (let e = 0; e < view.laneFrom.length; e++) {
      const net = view.laneToll[e] + view.laneFuel[e] + view.laneFees[e] - view.laneRebate[e];
      graph.addEdge(new jsgraphs.Edge(view.laneFrom[e], view.laneTo[e], net));
    }
    const origin = view.depotIds.indexOf('RTM');
    const bf = new jsgraphs.BellmanFord(graph, origin);
    for (let d = 0; d < view.depotIds.length; d++) {
      if (bf.hasPathTo(d)) expect(result.cost[d], view.depotIds[d]).toBe(bf.distanceTo(d));
      else expect(result.status[d]).toBe(0);
    }
    expect(result.loops).toEqual([]);
    expect(result.treeLanes.length).toBe(view.depotIds.length - 1);
  });

  it('reports the loop variant and solves a rebate edit like the engine applies the scenario', () => {
    const [loaded, before] = drive([load('lanes-rebate-loop.csv'), { kind: 'solve', id: 2, settings, scenario: null }]);
    const view = (loaded as { network: NetworkView }).network;
    const loop = (before as { result: SolveView }).result.loops[0];
    expect(loop.netPerLap).toBeLessThan(0);

    const lane = loop.lanes.find((e) => view.laneRebate[e] > 0)!;
    const keys = laneKeysOf(Array.from(view.laneFrom, (a, e) => ({ from: view.depotIds[a], to: view.depotIds[view.laneTo[e]], ref: laneRef(view, e) })));
    const scenario = setLaneAmount(emptyScenario(), keys[lane], 'rebate', 0, view.laneRebate[lane]);
    const [, after] = drive([load('lanes-rebate-loop.csv'), { kind: 'solve', id: 3, settings, scenario }]);
    const result = (after as { result: SolveView }).result;

    const imported = importNetwork(text('depots.csv'), text('lanes-rebate-loop.csv'), { plan: { date: DATE }, skipInvalid: true });
    const applied = applyScenario(imported.network!, scenario, { date: DATE });
    expect(applied.problems).toEqual([]);
    const reference = cheapestRoutes(applied.network, applied.network.depotIndex.get('RTM')!);
    expect(Array.from(result.status)).toEqual(Array.from(reference.status));
    expect(Array.from(result.cost)).toEqual(Array.from(reference.cost));
    expect(result.loops).toEqual([]);
    expect(result.base).not.toBeNull();
    expect(Array.from(result.base!.status)).toContain(2); // the base still has the loop
  });

  it('holds an import with rejected rows for the user, and builds from the accepted rows on request', () => {
    const [held] = drive([load('broken/lanes-broken.csv')]);
    expect(held).toMatchObject({ kind: 'loaded', network: null });
    const report = (held as { report: { files: { kind: string; total: number; accepted: number; rejected: number }[]; issues: unknown[] } }).report;
    const lanes = report.files.find((f) => f.kind === 'lanes')!;
    expect(lanes.accepted + lanes.rejected).toBe(lanes.total);
    expect(report.issues.length).toBeGreaterThan(0);
    const [built] = drive([load('broken/lanes-broken.csv', true)]);
    expect((built as { network: NetworkView | null }).network).not.toBeNull();
  });

  it('exports the routes CSV with the solved costs, and answers errors as messages', () => {
    const out = drive([load('lanes.csv'), { kind: 'solve', id: 2, settings, scenario: null }, { kind: 'export', id: 3, what: 'routes-csv' }]);
    const file = out[2] as { kind: string; text: string };
    expect(file.kind).toBe('exported');
    const { rows } = parseCsvText(file.text);
    const cost = new Map(rows.slice(1).map((r) => [r[rows[0].indexOf('id')], r[rows[0].indexOf('cost')]]));
    const result = (out[1] as { result: SolveView }).result;
    const view = (out[0] as { network: NetworkView }).network;
    view.depotIds.forEach((id, d) => expect(cost.get(id)).toBe(formatMinor(result.cost[d] as Minor)));

    const [error] = drive([{ kind: 'solve', id: 9, settings, scenario: null }]);
    expect(error).toMatchObject({ kind: 'error', id: 9, error: { name: 'LanewrightError' } });
  });
});

describe('worker exports', () => {
  it('writes a lanes CSV that re-imports to the same planned lanes, and a GeoJSON FeatureCollection', () => {
    const out = drive([load('lanes-rebate-loop.csv'), { kind: 'solve', id: 2, settings, scenario: null }, { kind: 'export', id: 3, what: 'lanes-csv' }, { kind: 'export', id: 4, what: 'geojson' }, { kind: 'export', id: 5, what: 'loops-csv' }]);
    const lanes = (out[2] as { text: string }).text;
    const original = importNetwork(text('depots.csv'), text('lanes-rebate-loop.csv'), { plan: { date: DATE } }).network!;
    const again = importNetwork(text('depots.csv'), lanes, { plan: { date: DATE } }).network!;
    expect(Array.from(again.laneNet)).toEqual(Array.from(original.laneNet));
    const geo = JSON.parse((out[3] as { text: string }).text) as { type: string; features: { geometry: { type: string } }[] };
    expect(geo.type).toBe('FeatureCollection');
    expect(geo.features.filter((f) => f.geometry.type === 'Point')).toHaveLength(original.depotCount);
    const loops = parseCsvText((out[4] as { text: string }).text).rows;
    expect(loops.length).toBeGreaterThan(1); // header + the loop's lanes
  });
});

describe('route details', () => {
  it('answers a route with each lane\'s clause, validity and estimate flags', () => {
    const depots = 'id,name,lat,lon\nA,a,50,4\nB,b,51,5\n';
    const lanes = 'from,to,ref,toll,fuel,fees,rebate,clause,valid_from,valid_to\nA,B,R-1,1.00,,0,0,Clause 4.2 volume credit,2026-01-01,2026-12-31\n';
    const out = drive([
      { kind: 'load', id: 1, depots: { name: 'd.csv', text: depots }, lanes: { name: 'l.csv', text: lanes }, acceptPartial: false, plan: { date: DATE, vehicleClass: '' } },
      { kind: 'solve', id: 2, settings: { ...settings, origin: 'A' }, scenario: null },
      { kind: 'route', id: 3, target: 1, solveId: 2 },
    ]);
    const route = (out[2] as { route: { details: unknown[]; estimateRules: { distance: string } } }).route;
    expect(route.details).toEqual([{ validFrom: '2026-01-01', validTo: '2026-12-31', distanceEstimated: true, fuelEstimated: true, driveEstimated: true, notes: null, clause: 'Clause 4.2 volume credit' }]);
    expect(route.estimateRules.distance).toMatch(/detour factor 1\.3/);
  });
});

describe('planning settings', () => {
  it('re-plans with a fuel price, and reads the files again for exchange rates', () => {
    const planning = { fuelPrice: '2.00', fuelConsumption: null, drivingLimit: null, detourFactor: null, averageSpeed: null, defaultToll: null, currency: null, exchangeRates: null };
    const out = drive([load('lanes.csv'), { kind: 'replan', id: 2, plan: { date: DATE, vehicleClass: '', planning } }]);
    const before = (out[0] as { network: NetworkView }).network;
    const after = (out[1] as { network: NetworkView }).network;
    const engine = importNetwork(text('depots.csv'), text('lanes.csv'), { plan: { date: DATE, settings: { fuelPricePerLitre: '2.00' } } }).network!;
    expect(Array.from(after.laneFuel)).toEqual(Array.from(engine.laneFuel));
    expect(Array.from(after.laneFuel)).not.toEqual(Array.from(before.laneFuel));
    expect(after.plan.planning).toEqual(planning);

    // A USD lane is refused without a rate; with one the files are read again and it is converted.
    const depots = 'id,name,lat,lon\nA,a,50,4\nB,b,51,5\n';
    const lanes = 'from,to,toll,fuel,fees,rebate,currency\nA,B,10.00,0,0,0,EUR\nB,A,10.00,0,0,0,USD\n';
    const usd = drive([
      { kind: 'load', id: 1, depots: { name: 'd.csv', text: depots }, lanes: { name: 'l.csv', text: lanes }, acceptPartial: true, plan: { date: DATE, vehicleClass: '' } },
      { kind: 'replan', id: 2, plan: { date: DATE, vehicleClass: '', planning: { ...planning, fuelPrice: null, exchangeRates: 'USD=0.50' } } },
    ]);
    expect((usd[0] as { network: NetworkView }).network.laneFrom.length).toBe(1);
    const converted = (usd[1] as { network: NetworkView }).network;
    expect(converted.laneFrom.length).toBe(2);
    expect(Array.from(converted.laneToll)).toEqual([1000, 500]);
  });
});

describe('export names, dialect and settings', () => {
  it('names files by kind, origin, date and class, writes the chosen CSV dialect and puts the settings in the GeoJSON', () => {
    const twoAxle = { ...load('lanes.csv'), plan: { date: DATE, vehicleClass: '2axle' } } as ToWorker;
    const dialect = { separator: ';' as const, decimalMark: ',' as const, bom: true };
    const out = drive([twoAxle, { kind: 'solve', id: 2, settings: { ...settings, vehicleClass: '2axle' }, scenario: null }, { kind: 'export', id: 3, what: 'routes-csv', dialect }, { kind: 'export', id: 4, what: 'geojson' }]);
    const routes = out[2] as { fileName: string; text: string };
    expect(routes.fileName).toBe(`routes-RTM-${DATE}-2axle.csv`);
    expect(routes.text.charCodeAt(0)).toBe(0xfeff);
    const { rows, delimiter } = parseCsvText(routes.text);
    expect(delimiter).toBe(';');
    const cost = rows[0].indexOf('cost');
    expect(rows.slice(1).some((r) => /^\d+,\d\d$/.test(r[cost]))).toBe(true);
    const geo = out[3] as { fileName: string; text: string };
    expect(geo.fileName).toBe(`network-RTM-${DATE}-2axle.geojson`);
    const json = JSON.parse(geo.text) as { caution: string; settings: unknown };
    expect(json.caution).toMatch(/estimate/i);
    expect(json.settings).toEqual({ date: DATE, vehicle_class: '2axle', files: ['depots.csv', 'lanes.csv'], scenario: null });
  });
});

describe('scenarios that change the lane set', () => {
  it('solves an added lane through the engine and maps the answer back onto the drawn lanes', () => {
    const scenario = {
      ...emptyScenario(),
      changes: [
        {
          kind: 'add-lane' as const,
          note: null,
          lane: { from: 'RTM', to: 'MIL', ref: 'WHATIF-1', tollMinor: 1000, feesMinor: 0, fuelMinor: 5000, rebateMinor: 0, validFrom: null, validTo: null, distanceKm: null, driveMinutes: null },
        },
      ],
    };
    const out = drive([load('lanes.csv'), { kind: 'solve', id: 2, settings, scenario }, { kind: 'route', id: 3, target: 0, solveId: 2 }]);
    const view = (out[0] as { network: NetworkView }).network;
    const result = (out[1] as { result: SolveView }).result;
    const imported = importNetwork(text('depots.csv'), text('lanes.csv'), { plan: { date: DATE }, skipInvalid: true });
    const applied = applyScenario(imported.network!, scenario, { date: DATE });
    const reference = cheapestRoutes(applied.network, applied.network.depotIndex.get('RTM')!);
    expect(Array.from(result.cost)).toEqual(Array.from(reference.cost));
    const mil = view.depotIds.indexOf('MIL');
    expect(result.cost[mil]).toBe(6000);
    // Tree lanes are drawn lanes, or the added lane named by its change (addedLaneRef(0) = -2).
    expect(Array.from(result.treeLanes).every((e) => (e >= 0 && e < view.laneFrom.length) || e === addedLaneRef(0))).toBe(true);
    expect(Array.from(result.treeLanes)).toContain(addedLaneRef(0));

    const [, , route] = drive([load('lanes.csv'), { kind: 'solve', id: 2, settings, scenario }, { kind: 'route', id: 3, target: mil, solveId: 2 }]);
    expect((route as { route: { lanes: number[] } }).route.lanes).toEqual([addedLaneRef(0)]);
  });

  it('traces each added lane to its own change, past a change that failed and a twin in the same group', () => {
    const lane = (from: string, to: string, tollMinor: number) => ({ from, to, ref: 'WHATIF-2', tollMinor, feesMinor: 0, fuelMinor: 5000, rebateMinor: 0, validFrom: null, validTo: null, distanceKm: null, driveMinutes: null });
    const scenario = {
      ...emptyScenario(),
      changes: [
        { kind: 'add-lane' as const, note: 'unknown depot: a problem, no lane', lane: lane('RTM', 'NOWHERE', 1) },
        { kind: 'add-lane' as const, note: 'dearer twin', lane: lane('RTM', 'MIL', 9000) },
        { kind: 'add-lane' as const, note: 'cheaper twin', lane: lane('RTM', 'MIL', 1000) },
      ],
    };
    const first = drive([load('lanes.csv'), { kind: 'solve', id: 2, settings, scenario }]);
    const mil = (first[0] as { network: NetworkView }).network.depotIds.indexOf('MIL');
    expect((first[1] as { result: SolveView }).result.cost[mil]).toBe(6000);
    const [, solved, route] = drive([load('lanes.csv'), { kind: 'solve', id: 2, settings, scenario }, { kind: 'route', id: 3, target: mil, solveId: 2 }]);
    // Results name a lane only the scenario plans by its place in the solve's list, which says its change.
    const extra = (solved as { result: SolveView }).result.extraLanes;
    expect(extra.map((a) => a.changeIndex)).toEqual([1, 2]);
    expect((route as { route: { lanes: number[] } }).route.lanes).toEqual([addedLaneRef(1)]);
    expect(extra[1].changeIndex).toBe(2);
  });
  it('answers a route only for the solve the UI shows, not for a newer one it dropped', () => {
    const lane = { from: 'RTM', to: 'MIL', ref: 'WHATIF-3', tollMinor: 1000, feesMinor: 0, fuelMinor: 5000, rebateMinor: 0, validFrom: null, validTo: null, distanceKm: null, driveMinutes: null };
    const scenario = { ...emptyScenario(), changes: [{ kind: 'add-lane' as const, note: null, lane }] };
    const [loaded] = drive([load('lanes.csv')]);
    const mil = (loaded as { network: NetworkView }).network.depotIds.indexOf('MIL');
    // Solve 2 (with the added lane) is on screen; solve 3 (without it) ran before the route request.
    const out = drive([
      load('lanes.csv'),
      { kind: 'solve', id: 2, settings, scenario },
      { kind: 'solve', id: 3, settings, scenario: null },
      { kind: 'route', id: 4, target: mil, solveId: 2 },
      { kind: 'route', id: 5, target: mil, solveId: 3 },
    ]);
    const routes = out.filter((m): m is Extract<FromWorker, { kind: 'route' }> => m.kind === 'route');
    expect(routes.map((m) => m.id)).toEqual([4, 5]);
    expect(routes[0].route).toBeNull();
    expect(routes[1].route?.lanes.length).toBeGreaterThan(0);
    expect(routes[1].route?.lanes).not.toContain(addedLaneRef(0));
  });

  it('the review carries the whole calendar: a day without a loop does not hide the loops of other dates', async () => {
    const out: FromWorker[] = [];
    const session = new WorkerSession((m) => out.push(m));
    session.handle({ ...load('lanes-rebate-loop.csv'), plan: { date: '2026-11-01', vehicleClass: '' } } as ToWorker);
    await session.filesHashed; // the files' SHA-256 are computed as they arrive
    session.handle({ kind: 'review', id: 2, scenario: null, fixBy: 'clause' });
    const reviewed = out.find((m) => m.kind === 'reviewed') as { review: ContractReviewView };
    expect(reviewed.review.loops).toEqual([]);
    expect(reviewed.review.calendar!.loops.map((l) => [l.depots, l.ranges.map((r) => [r.from, r.to])])).toEqual([
      [['FRA', 'SXB'], [['2026-03-01', '2026-09-30']]],
      [['MHG', 'KRL'], [['2026-06-01', '2026-08-31']]],
    ]);
    expect(reviewed.review.calendar!.fix_by).toBe('clause');
    const expectedHash = createHash('sha256').update(readFileSync('sample-data/lanes-rebate-loop.csv')).digest('hex');
    expect(reviewed.review.calendarHtml).toContain(expectedHash);
  });

  it('the calendar review runs under the active scenario, and its fix plan comes back as scenario changes', async () => {
    const out: FromWorker[] = [];
    const session = new WorkerSession((m) => out.push(m));
    session.handle({ ...load('lanes-rebate-loop.csv'), plan: { date: '2026-11-01', vehicleClass: '' } } as ToWorker);
    await session.filesHashed;
    // Closing KRL > MHG (BFH-L-188) ends the MHG/KRL loop; the FRA/SXB loop stays.
    const scenario = { name: 'No KRL backhaul', description: null, changes: [{ kind: 'close-lane' as const, lane: { from: 'KRL', to: 'MHG', ref: 'BFH-L-188', occurrence: 1 }, note: null }] };
    session.handle({ kind: 'review', id: 2, scenario, fixBy: 'lane' });
    const { review } = out.find((m) => m.kind === 'reviewed') as { review: ContractReviewView };
    expect(review.calendar!.scenario?.name).toBe('No KRL backhaul');
    expect(review.calendar!.loops.map((l) => l.depots)).toEqual([['FRA', 'SXB']]);
    expect(review.calendarHtml).toContain('Under the what-if scenario “No KRL backhaul”');
    expect(review.calendarFix).toEqual([expect.objectContaining({ kind: 'set-amount', field: 'rebate', amountMinor: 16_860, lane: { from: 'FRA', to: 'SXB', ref: 'BFH-L-019', occurrence: 1 } })]);
  });

  it('a new date re-plans the day but reuses the calendar review; a new scenario or plan kind reviews it again', async () => {
    const out: FromWorker[] = [];
    const session = new WorkerSession((m) => out.push(m));
    session.handle({ ...load('lanes-rebate-loop.csv'), plan: { date: '2026-11-01', vehicleClass: '' } } as ToWorker);
    await session.filesHashed;
    const reviews = () => out.filter((m): m is Extract<FromWorker, { kind: 'reviewed' }> => m.kind === 'reviewed').map((m) => m.review);
    session.handle({ kind: 'review', id: 2, scenario: null, fixBy: 'lane' });
    const planning = { fuelPrice: null, fuelConsumption: null, drivingLimit: null, detourFactor: null, averageSpeed: null, defaultToll: null, currency: null, exchangeRates: null };
    session.handle({ kind: 'replan', id: 3, plan: { date: '2026-06-15', vehicleClass: '', planning } });
    session.handle({ kind: 'review', id: 4, scenario: null, fixBy: 'lane' });
    const [first, second] = reviews();
    expect(first.loops).toEqual([]);
    expect(second.loops.length).toBeGreaterThan(0); // the one-day review is of 2026-06-15
    expect(second.calendar).toBe(first.calendar);
    session.handle({ kind: 'review', id: 5, scenario: null, fixBy: 'clause' });
    const closed = { name: 'w', description: null, changes: [{ kind: 'close-lane' as const, lane: { from: 'KRL', to: 'MHG', ref: 'BFH-L-188', occurrence: 1 }, note: null }] };
    session.handle({ kind: 'review', id: 6, scenario: closed, fixBy: 'clause' });
    const [, , byClause, underScenario] = reviews();
    expect(byClause.calendar).not.toBe(first.calendar);
    expect(byClause.calendar!.fix_by).toBe('clause');
    expect(underScenario.calendar!.loops).toHaveLength(1);
  });
});
