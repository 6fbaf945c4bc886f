import { describe, expect, it } from 'vitest';
import { applyScenario, type ScenarioLane } from '../../../engine/scenario/apply';
import { laneKeysOf, laneKeyText, parseLaneKeyText } from '../../../engine/import/lane-key';
import { parseScenarioDocument, serializeScenarioDocument } from '../../../engine/scenario/document';
import type { Scenario } from '../../../engine/scenario/types';
import { buildNetwork } from '../../../engine/network/build';
import { importNetwork } from '../../../engine/planning/import-network';
import type { Minor } from '../../../engine/money/minor';

const depots = ['A', 'B', 'C', 'D'].map((id) => ({ id, name: id, lat: 0, lon: 0 }));
const lane = (from: string, to: string, toll: number, rebate: number, sourceRow: number, ref?: string): ScenarioLane => ({
  from, to, toll: toll as Minor, fuel: 0 as Minor, fees: 0 as Minor, rebate: rebate as Minor, sourceRow, ...(ref ? { ref } : {}),
});
const key = (from: string, to: string, ref: string | null = null, occurrence = 1) => ({ from, to, ref, occurrence });

describe('lane keys', () => {
  it('count occurrences among lanes with the same from, to and reference', () => {
    const keys = laneKeysOf([lane('A', 'B', 1, 0, 2), lane('A', 'B', 2, 0, 3, 'K'), lane('A', 'B', 3, 0, 4), lane('B', 'A', 1, 0, 5)]);
    expect(keys.map(laneKeyText)).toEqual(['A>B||1', 'A>B|K|1', 'A>B||2', 'B>A||1']);
    expect(parseLaneKeyText('A>B|K|1')).toEqual(key('A', 'B', 'K', 1));
    expect(parseLaneKeyText('A>B|K')).toBeNull();
  });
});

describe('applying a scenario', () => {
  const base = { depots, lanes: [lane('A', 'B', 100, 0, 2, 'K1'), lane('B', 'C', 50, 10, 3, 'K2'), lane('C', 'D', 70, 0, 4), lane('C', 'D', 90, 0, 5)] };

  it('sets amounts, closes, re-dates and adds lanes; the base is untouched', () => {
    const scenario: Scenario = {
      name: 's',
      description: null,
      changes: [
        { kind: 'set-amount', lane: key('B', 'C', 'K2'), field: 'rebate', amountMinor: 30, note: null },
        { kind: 'close-lane', lane: key('C', 'D', null, 1), note: null },
        { kind: 'set-validity', lane: key('A', 'B', 'K1'), validFrom: '2025-06-01', validTo: null, note: null },
        { kind: 'add-lane', lane: { from: 'D', to: 'A', ref: null, tollMinor: 5, fuelMinor: 6, feesMinor: 7, rebateMinor: 1, validFrom: null, validTo: null, distanceKm: null, driveMinutes: null }, note: null },
      ],
    };
    const applied = applyScenario(base, scenario);
    expect(applied.problems).toEqual([]);
    expect(Array.from(applied.network.laneNet)).toEqual([100, 20, 90, 17]);
    expect(Array.from(applied.baseLaneOf)).toEqual([0, 1, 3, -1]);
    expect(applied.laneKeys.map(laneKeyText)).toEqual(['A>B|K1|1', 'B>C|K2|1', 'C>D||2', 'D>A||1']);
    expect(base.lanes[1].rebate).toBe(10);
    // On a date before the new validity, the re-dated lane drops out.
    const dated = applyScenario(base, scenario, { date: '2025-05-31' });
    expect(dated.network.laneCount).toBe(3);
    expect(applyScenario(base, scenario, { date: '2025-06-01' }).network.laneCount).toBe(4);
  });

  it('works from a built network as well as from lane rows', () => {
    const net = buildNetwork(base.depots, base.lanes);
    const scenario: Scenario = { name: 's', description: null, changes: [{ kind: 'set-amount', lane: key('A', 'B', 'K1'), field: 'toll', amountMinor: 1, note: null }] };
    expect(Array.from(applyScenario(net, scenario).network.laneNet)).toEqual([1, 40, 70, 90]);
  });

  it('reports a change it cannot apply and keeps it in the scenario', () => {
    const scenario: Scenario = {
      name: 's',
      description: null,
      changes: [
        { kind: 'close-lane', lane: key('D', 'C'), note: null },
        { kind: 'add-lane', lane: { from: 'A', to: 'ZZZ', ref: null, tollMinor: 0, fuelMinor: 0, feesMinor: 0, rebateMinor: 0, validFrom: null, validTo: null, distanceKm: null, driveMinutes: null }, note: null },
        { kind: 'set-amount', lane: key('A', 'B', 'K1'), field: 'fuel', amountMinor: Number.MAX_SAFE_INTEGER, note: null },
      ],
    };
    const applied = applyScenario({ depots, lanes: [lane('A', 'B', 5, 0, 2, 'K1')] }, scenario);
    expect(applied.problems.map((p) => [p.changeIndex, p.code])).toEqual([[0, 'lane-missing'], [1, 'unknown-depot'], [2, 'amount-overflow']]);
    expect(applied.network.laneNet[0]).toBe(5); // toll 5 + fuel 2^53 - 1 is not exact: not applied
    expect(scenario.changes).toHaveLength(3);
  });
});

describe('scenario changes survive a save, a reload and a re-import', () => {
  // Read through the real importer, so rows, references and validity come as they do in the app.
  const depotsCsv = ['id,name,lat,lon', 'A,Alpha,51.0,4.0', 'B,Bravo,51.1,4.1', 'C,Charlie,51.2,4.2', 'D,Delta,51.3,4.3'].join('\n');
  const header = 'from,to,ref,toll,fuel,fees,rebate,valid_from,valid_to';
  const v1 = [header, 'A,B,K-1,10.00,0,0,0,,', 'B,C,K-2,20.00,0,0,5.00,,', 'C,A,,5.00,0,0,0,,', 'C,A,,7.00,0,0,0,,', 'C,D,K-9,3.00,0,0,0,,'].join('\n');
  // The file edited: two new rows on top, the A>B toll changed, C>D deleted, rows reordered.
  const v2 = [header, 'D,A,K-7,1.00,0,0,0,,', 'A,D,K-8,2.00,0,0,0,,', 'C,A,,5.00,0,0,0,,', 'B,C,K-2,20.00,0,0,5.00,,', 'A,B,K-1,12.00,0,0,0,,', 'C,A,,7.00,0,0,0,,'].join('\n');
  const load = (lanesCsv: string) => {
    const result = importNetwork(depotsCsv, lanesCsv, { depotsFile: 'depots.csv', lanesFile: 'lanes.csv' });
    expect(result.report.errors).toEqual([]);
    return { depots: result.depots, lanes: result.plan.lanes, currency: result.currency, exponent: result.exponent };
  };

  it('applies to the same lanes by key although every row number moved', () => {
    const scenario: Scenario = {
      name: 'credit cut',
      description: null,
      changes: [
        { kind: 'set-amount', lane: key('B', 'C', 'K-2'), field: 'rebate', amountMinor: 100, note: 'halve it' },
        { kind: 'set-amount', lane: key('C', 'A', null, 2), field: 'toll', amountMinor: 650, vehicleClass: null, note: null },
        { kind: 'set-validity', lane: key('A', 'B', 'K-1'), validFrom: '2026-04-01', validTo: null, note: null },
        { kind: 'close-lane', lane: key('C', 'D', 'K-9'), note: null },
      ],
    };
    const saved = serializeScenarioDocument(scenario);
    const reloaded = parseScenarioDocument(saved, 'credit-cut.json');
    expect(reloaded).toEqual(scenario);

    const first = applyScenario(load(v1), reloaded);
    expect(first.problems).toEqual([]);
    const lanesOf = (a: typeof first, k: string) => a.lanes.filter((_, i) => laneKeyText(a.laneKeys[i]) === k);
    expect(lanesOf(first, 'B>C|K-2|1').map((l) => [l.sourceRow, l.rebate])).toEqual([[3, 100]]);
    expect(lanesOf(first, 'C>A||2').map((l) => [l.sourceRow, l.toll])).toEqual([[5, 650]]);
    expect(lanesOf(first, 'C>D|K-9|1')).toEqual([]);

    const second = applyScenario(load(v2), reloaded);
    expect(lanesOf(second, 'B>C|K-2|1').map((l) => [l.sourceRow, l.rebate])).toEqual([[5, 100]]);
    expect(lanesOf(second, 'C>A||2').map((l) => [l.sourceRow, l.toll])).toEqual([[7, 650]]);
    expect(lanesOf(second, 'A>B|K-1|1').map((l) => [l.sourceRow, l.toll, l.validFrom])).toEqual([[6, 1200, '2026-04-01']]); // the file's own edit stays
    expect(applyScenario(load(v2), reloaded, { date: '2026-03-31' }).lanes.some((l) => l.from === 'A' && l.to === 'B')).toBe(false);
    // C>D is gone from the file: the change is reported, not dropped, and survives another save.
    expect(second.problems.map((p) => [p.changeIndex, p.code, laneKeyText(p.lane)])).toEqual([[3, 'lane-missing', 'C>D|K-9|1']]);
    expect(parseScenarioDocument(serializeScenarioDocument(reloaded)).changes).toEqual(scenario.changes);
  });
});
