// The importer end to end on a corpus of clean, messy and broken files: the messy twin gives the same
// network as the clean one, every error and warning of issue 3 has its code, file, row, column and
// value, and accepted + rejected = total always holds.

import { describe, expect, it } from 'vitest';
import { importNetwork, planNetwork, startImport } from '../../../engine/planning/import-network';
import { ImportCancelledError, PlanRequestError } from '../../../engine/import/import-errors';
import type { IssueCode } from '../../../engine/import/types';
import type { ImportResult } from '../../../engine/planning/import-types';

const DEPOTS = 'id,name,lat,lon\nA,Alpha yard,51.9490,4.1420\nB,"Bravo, north",51.2810,4.3300\nC,Charlie hub,50.6290,3.0570\n';
const LANES = 'from,to,toll,fuel,fees,rebate,distance_km,drive_minutes\nA,B,1234.50,58.40,12.00,0.00,94.3,83\nB,C,0.00,64.10,10.00,8.00,143.6,120\nC,A,2.00,10.00,0.00,0.00,200,150\n';
// The same data as a European spreadsheet saves it: BOM, CRLF, semicolons, decimal commas,
// thousands points, currency marks, synonyms and odd header spelling.
const DEPOTS_MESSY = '\ufeff Depot-ID ;Name;Latitude;Longitude\r\nA;Alpha yard;51,9490;4,1420\r\nB;"Bravo, north";51,2810;4,3300\r\nC;Charlie hub;50,6290;3,0570\r\n\r\n\r\n';
const LANES_MESSY = '\ufeffOrigin;Destination;TOLL;Fuel Cost;fees;Rebate;Distance (km);Drive_Minutes\r\nA;B;1.234,50 €;58,40;12;0;94,3;83\r\nB;C;EUR 0,00;64,1;10,00;8;143,6;2:00\r\nC;A;2;10;;;200;PT2H30M\r\n\r\n';

function lanesOf(result: ImportResult) {
  const n = result.network!;
  return Array.from({ length: n.laneCount }, (_, e) => [n.depotIds[n.laneFrom[e]], n.depotIds[n.laneTo[e]], n.laneToll[e], n.laneFuel[e], n.laneFees[e], n.laneRebate[e], n.laneDistanceKm[e], n.laneDriveMinutes[e]]);
}

function codes(result: ImportResult, kind: 'errors' | 'warnings' = 'errors'): IssueCode[] {
  return result.report[kind].map((i) => i.code);
}

function balanced(result: ImportResult) {
  const r = result.report;
  expect(r.accepted + r.rejected).toBe(r.total);
  for (const f of r.files) expect(f.accepted + f.rejected).toBe(f.total);
}

describe('importNetwork', () => {
  it('reads a messy file (BOM, CRLF, semicolons, decimal commas, quoted names) into the same network as its clean twin', () => {
    const clean = importNetwork(DEPOTS, LANES);
    const messy = importNetwork(DEPOTS_MESSY, LANES_MESSY);
    expect(clean.report.errors).toEqual([]);
    expect(messy.report.errors).toEqual([]);
    expect(lanesOf(messy)).toEqual(lanesOf(clean));
    // Every field of the compiled network, typed arrays included, is identical.
    const { depotIndex: a, ...cleanRest } = clean.network!;
    const { depotIndex: b, ...messyRest } = messy.network!;
    expect(messyRest).toEqual(cleanRest);
    expect([...b]).toEqual([...a]);
    expect(lanesOf(clean)[0]).toEqual(['A', 'B', 123450, 5840, 1200, 0, 94.3, 83]);
    expect(clean.report).toMatchObject({ total: 6, accepted: 6, rejected: 0 });
  });

  it('reads tab-delimited files and miles', () => {
    const r = importNetwork('id\tname\tlat\tlon\nA\ta\t1\t1\nB\tb\t2\t2\n', 'from\tto\ttoll\tdistance (mi)\nA\tB\t1.00\t10\n');
    expect(r.report.errors).toEqual([]);
    // International mile = 1.609344 km exactly (by definition, 1959 agreement).
    expect(r.network!.laneDistanceKm[0]).toBeCloseTo(16.09344, 9);
  });

  it('reports every depot error kind with file, row, column and value', () => {
    const r = importNetwork('id,name,lat,lon\nA,a,95,1\nB,b,1,181\nC,c,x,1\nA,a2,1,1\n,e,1,1\nD,d,1,1\nD,d2,2,2\n', 'from,to\n', { depotsFile: 'd.csv' });
    expect(r.report.errors.map((e) => [e.file, e.row, e.column, e.value, e.code])).toEqual([
      ['d.csv', 2, 'lat', '95', 'latitude-range'],
      ['d.csv', 3, 'lon', '181', 'longitude-range'],
      ['d.csv', 4, 'lat', 'x', 'not-a-number'],
      ['d.csv', 6, 'id', '', 'missing-value'],
      ['d.csv', 8, 'id', 'D', 'duplicate-depot'],
    ]);
    balanced(r);
    expect(r.network).toBeNull();
    // The column is named as the file names it.
    const named = importNetwork('Depot code,lat,lon\n,1,1\nA,1,1\n', 'from,to\n');
    expect(named.report.errors.map((e) => [e.row, e.column, e.code])).toEqual([[2, 'Depot code', 'missing-value']]);
  });

  it('reports every lane error kind and never loses a row', () => {
    const lanes = [
      'from,to,toll,fuel,fees,rebate,currency,distance_km,drive_minutes,valid_from,valid_to',
      'A,Z,1,1,1,0,EUR,,,,', // 2 unknown depot
      'A,B,abc,1,1,0,EUR,,,,', // 3 non-numeric
      'A,B,1,NaN,1,0,EUR,,,,', // 4 non-finite
      'A,B,1,1,1,0,EUR,-5,,,', // 5 negative distance
      'A,B,1,1,1,0,EUR,,-5,,', // 6 negative drive time
      'A,B,1,1,1,0,EUR,,,2026-13-01,', // 7 bad date
      'A,B,1,1,1,0,EUR,,,2026-05-01,2026-04-30', // 8 period reversed
      'A,B,1,1,1,0,USD,,,,', // 9 mixed currency
      'A,B,"1,234",1,1,0,EUR,,,,', // 10 ambiguous
      'A,B,1.234,1,1,0,EUR,,,,', // 11 more decimals than EUR has
      'A,B,1,1,1,0,XYZ,,,,', // 12 unknown currency
      'A,B,1,1,1,0,EUR,,,,,extra', // 13 too many fields
      'A,B,1,1,1,0,EUR,,,,', // 14 fine
    ].join('\n');
    const r = importNetwork(DEPOTS, lanes, { lanesFile: 'l.csv' });
    expect(r.report.errors.map((e) => [e.row, e.code])).toEqual([
      [2, 'unknown-depot'],
      [3, 'not-a-number'],
      [4, 'not-finite'],
      [5, 'negative-value'],
      [6, 'negative-value'],
      [7, 'bad-date'],
      [8, 'bad-period'],
      [9, 'mixed-currency'],
      [10, 'ambiguous-number'],
      [11, 'bad-amount'],
      [12, 'unknown-currency'],
      [13, 'too-many-fields'],
    ]);
    const first = r.report.errors[0];
    expect(first).toMatchObject({ file: 'l.csv', row: 2, column: 'to', value: 'Z' });
    expect(r.report.files[1]).toMatchObject({ total: 13, accepted: 1, rejected: 12 });
    balanced(r);
  });

  it('reports file-level errors: empty file, not text, unbalanced quotes, missing column', () => {
    expect(codes(importNetwork('', LANES))).toContain('empty-file');
    expect(codes(importNetwork('  \n\n', LANES))).toContain('empty-file');
    expect(codes(importNetwork(DEPOTS, '\u0000\u0001binary'))).toEqual(['not-text']);
    const binary = importNetwork(DEPOTS, '\u0000\u0001binary');
    expect(binary.report.files[1]).toMatchObject({ total: 0, accepted: 0, rejected: 0 }); // never negative counts
    balanced(binary);
    const quotes = importNetwork(DEPOTS, 'from,to,toll\nA,B,1\nA,"B,2\nB,C,3\n');
    expect(quotes.report.errors[0]).toMatchObject({ code: 'unbalanced-quotes', row: 3, column: 'to' });
    balanced(quotes);
    expect(quotes.report.files[1]).toMatchObject({ total: 3, accepted: 1, rejected: 2 });
    const missing = importNetwork('id,name,lon\nA,a,1\n', 'from,to\n');
    expect(missing.report.errors[0]).toMatchObject({ code: 'missing-column', row: 1, column: 'lat' });
    balanced(missing);
  });

  it('warns on unknown columns, duplicate lanes, self lanes and net-negative lanes', () => {
    const r = importNetwork(DEPOTS, 'from,to,ref,toll,fuel,rebate,colour\nA,B,R1,5,0,0,red\nA,B,R1,5,0,0,\nA,A,R2,1,0,0,\nB,C,R3,1,0,50,\n');
    expect(r.report.errors).toEqual([]);
    expect(r.report.warnings.map((w) => [w.row, w.code])).toEqual([
      [1, 'unknown-column'],
      [4, 'self-lane'],
      [3, 'duplicate-lane'],
      [5, 'net-negative-lane'],
    ]);
    // The unknown column is kept with the lane.
    expect(r.lanes.extra[0]).toMatchObject({ column: 'colour' });
    expect(r.lanes.extra[0].values[0]).toBe('red');
  });

  it('one currency per network, unless an exchange rate converts the other', () => {
    const lanes = 'from,to,toll,currency\nA,B,10.00,EUR\nB,C,10.00,USD\n';
    expect(codes(importNetwork(DEPOTS, lanes))).toEqual(['mixed-currency']);
    const converted = importNetwork(DEPOTS, lanes, { exchangeRates: { USD: '0.9245' } });
    expect(converted.report.errors).toEqual([]);
    // 10.00 USD x 0.9245 = 9.245 EUR, rounded half away from zero to 9.25.
    expect(converted.network!.laneToll[1]).toBe(925);
    // JPY has no minor digits (ISO 4217), so "1200" is 1200 minor units and "12.5" is refused.
    const yen = importNetwork(DEPOTS, 'from,to,toll,fuel\nA,B,¥1200,0\nB,C,12.5,0\n');
    expect(yen.currency).toBe('JPY');
    expect(yen.report.errors.map((e) => [e.row, e.code])).toEqual([[3, 'bad-amount']]);
  });

  it('a currency mark on a later amount sets the minor digits of the whole row', () => {
    // JPY has no minor digits (ISO 4217): the unmarked toll "100" on a yen row is 100 yen (1.00 EUR at
    // 0.01), not 10000.
    const r = importNetwork(DEPOTS, 'from,to,toll,fuel\nA,B,100,¥200\nB,C,1.50,¥100\n', { currency: 'EUR', exchangeRates: { JPY: '0.01' } });
    expect(r.report.errors.map((e) => [e.row, e.column, e.value, e.code])).toEqual([[3, 'toll', '1.50', 'bad-amount']]);
    balanced(r);
    expect(importNetwork(DEPOTS, 'from,to,toll,fuel\nA,B,100,¥200\n', { currency: 'EUR', exchangeRates: { JPY: '0.01' } }).lanes.toll[0]).toBe(100);
  });

  it('--skip-invalid builds the network from the accepted rows', () => {
    const r = importNetwork(DEPOTS, 'from,to,toll\nA,B,1\nA,Z,1\n', { skipInvalid: true });
    expect(r.report.errors).toHaveLength(1);
    expect(r.network!.laneCount).toBe(1);
  });

  it('reports progress and stops when cancelled between chunks', () => {
    const big = 'from,to,toll\n' + 'A,B,1.00\n'.repeat(50_000);
    const seen: number[] = [];
    importNetwork(DEPOTS, big, { onProgress: (p) => p.file === 'lanes' && seen.push(p.rows) });
    expect(seen.length).toBeGreaterThan(1);
    expect(seen[seen.length - 1]).toBe(50_000);
    const signal = { aborted: false };
    const session = startImport({ signal });
    session.feedDepots(DEPOTS);
    session.finishDepots();
    session.feedLanes('from,to\nA,B\n');
    signal.aborted = true;
    expect(() => session.feedLanes('B,C\n')).toThrow(ImportCancelledError);
  });
});

describe('planning by date and vehicle class', () => {
  const wide = 'from,to,toll,toll_2axle,toll 5-Axle,fuel,valid_from,valid_to\nA,B,9.00,2.00,,1,,\nB,C,,3.00,7.00,1,2026-01-01,2026-06-30\nB,C,,3.50,7.50,1,2026-07-01,\n';

  it('applies the class toll, falls back to the default toll, and refuses a lane with neither', () => {
    const two = importNetwork(DEPOTS, wide, { plan: { vehicleClass: '2-axle' } });
    expect(Array.from(two.network!.laneToll)).toEqual([200, 300, 350]);
    const five = importNetwork(DEPOTS, wide, { plan: { vehicleClass: '5axle' } });
    expect(Array.from(five.network!.laneToll)).toEqual([900, 700, 750]);
    const none = importNetwork(DEPOTS, wide);
    expect(none.report.errors.map((e) => [e.row, e.code])).toEqual([
      [3, 'no-toll-for-class'],
      [4, 'no-toll-for-class'],
    ]);
    balanced(none);
    const withDefault = importNetwork(DEPOTS, wide, { plan: { settings: { defaultToll: '1.00' } } });
    expect(Array.from(withDefault.network!.laneToll)).toEqual([900, 100, 100]);
    expect(() => importNetwork(DEPOTS, wide, { plan: { vehicleClass: '7axle' } })).toThrow(PlanRequestError);
  });

  it('reads a distance in a decimal-comma file as it reads an amount: "1.234" is ambiguous, "94.3" is not', () => {
    const semicolonDepots = 'id;name;lat;lon\nA;a;50,1;8\nB;b;51;9\n';
    const r = importNetwork(semicolonDepots, 'from;to;toll;distance_km\nA;B;1;1.234\nB;A;1;94.3\n');
    expect(r.report.errors.map((e) => [e.row, e.column, e.value, e.code])).toEqual([[2, 'distance_km', '1.234', 'ambiguous-number']]);
    expect(r.lanes.distanceKm[0]).toBe(94.3);
    balanced(r);
  });

  it("names the file's own column in planning problems", () => {
    const r = importNetwork(DEPOTS, 'from,to,Toll 5-Axle,fuel,Rebates\nA,B,,0,0\nB,C,1.00,0,5.00\n', { plan: { vehicleClass: '5axle' } });
    expect(r.report.errors.map((e) => [e.row, e.column, e.code])).toEqual([[2, 'Toll 5-Axle', 'no-toll-for-class']]);
    expect(r.report.warnings.map((w) => [w.row, w.column, w.code])).toEqual([[3, 'Rebates', 'net-negative-lane']]);
  });

  it('--date keeps only the lanes valid that day (inclusive bounds)', () => {
    const r = importNetwork(DEPOTS, wide, { plan: { vehicleClass: '5axle', date: '2026-06-30' } });
    expect(r.plan.lanes.map((l) => l.sourceRow)).toEqual([2, 3]);
    const later = planNetwork(r, { vehicleClass: '5axle', date: '2026-07-01' });
    expect(later.plan.lanes.map((l) => l.sourceRow)).toEqual([2, 4]);
    expect(later.plan.excluded).toBe(1);
    expect(() => planNetwork(r, { date: '2026-02-30' })).toThrow(PlanRequestError);
  });

  it('long layout: a vehicle_class column with one row per class', () => {
    const long = 'from,to,vehicle_class,toll\nA,B,2axle,2.00\nA,B,5axle,9.00\nB,C,,4.00\nC,A,5axle,1.00\n';
    const two = importNetwork(DEPOTS, long, { plan: { vehicleClass: '2axle' } });
    // C->A has a row for 5axle only and no default row: an error for 2axle.
    expect(two.report.errors.map((e) => [e.row, e.code])).toEqual([[5, 'no-toll-for-class']]);
    const five = importNetwork(DEPOTS, long, { plan: { vehicleClass: '5axle' } });
    expect(five.report.errors).toEqual([]);
    expect(five.plan.lanes.map((l) => [l.sourceRow, l.toll])).toEqual([
      [3, 900],
      [4, 400],
      [5, 100],
    ]);
    // With a default toll, C->A is planned at it for 2axle (as a blank class toll is in the wide layout).
    const withDefault = importNetwork(DEPOTS, long, { plan: { vehicleClass: '2axle', settings: { defaultToll: '3.00' } } });
    expect(withDefault.report.errors).toEqual([]);
    expect(withDefault.plan.lanes.map((l) => [l.sourceRow, l.toll, l.vehicleClass])).toEqual([
      [2, 200, '2axle'],
      [4, 400, null],
      [5, 300, '2axle'],
    ]);
    expect(withDefault.plan.excluded).toBe(1);
  });

  it('fills a blank fuel from distance x consumption x price, and a blank distance from the great circle x detour', () => {
    const r = importNetwork(DEPOTS, 'from,to,toll,fuel,distance_km\nA,B,0,,100\nB,C,0,,\n', {
      plan: { settings: { fuelLitresPer100Km: 30, fuelPricePerLitre: '1.659', detourFactor: 1.2 } },
    });
    // 100 km x 30 l/100 km x 1.659 = 49.77.
    expect(r.network!.laneFuel[0]).toBe(4977);
    expect(r.plan.lanes[1].distanceEstimated).toBe(true);
    expect(r.plan.lanes[1].fuelEstimated).toBe(true);
    expect(r.network!.laneDistanceKm[1]).toBeGreaterThan(0);
  });
});

describe('importer extras', () => {
  it('names the header row as a spreadsheet shows it when blank lines come before it', () => {
    const r = importNetwork('\n\nid,name,lat,lon,lat\nA,a,50,8,1\nB,b,51,9,1\n', 'from,to\nA,B\n');
    expect(r.report.errors.map((e) => [e.row, e.column, e.code])).toEqual([[3, 'lat', 'duplicate-column']]);
    expect(r.report.files[0]).toMatchObject({ total: 2, accepted: 2, rejected: 0 });
  });

  it('rejects rows holding bytes that were not UTF-8 (U+FFFD from the decoder)', () => {
    const r = importNetwork('id,name,lat,lon\nA,K\ufffdln,50,6\nB,b,51,5\n', 'from,to\nB,B\n');
    expect(r.report.errors[0]).toMatchObject({ code: 'not-text', row: 2, column: 'name' });
    expect(r.report.files[0]).toMatchObject({ total: 2, accepted: 1, rejected: 1 });
  });

  it('importNetworkAsync reads async chunk sources like the synchronous form', async () => {
    const { importNetworkAsync } = await import('../../../engine/planning/import-network');
    async function* chunks(text: string) {
      for (let i = 0; i < text.length; i += 7) yield text.slice(i, i + 7);
    }
    const a = await importNetworkAsync(chunks(DEPOTS_MESSY), chunks(LANES_MESSY));
    expect(lanesOf(a)).toEqual(lanesOf(importNetwork(DEPOTS, LANES)));
  });

  it('keeps the lane table for the UI: every class, validity, reference and notes', async () => {
    const { laneRecordAt } = await import('../../../engine/import/lane-table');
    const r = importNetwork(DEPOTS, 'from,to,ref,toll,toll_2axle,valid_from,valid_to,notes\nA,B,R-1,9.00,2.00,2026-01-01,2026-06-30,"Backhaul, clause 4"\n', { plan: { date: '2027-01-01' } });
    // Not valid on the planned date, so not in the network, but still in the lane table.
    expect(r.network!.laneCount).toBe(0);
    expect(laneRecordAt(r.lanes, r.depots, r.exponent, 0)).toMatchObject({
      from: 'A', to: 'B', ref: 'R-1', toll: '9.00', classTolls: { '2axle': '2.00' }, validFrom: '2026-01-01', validTo: '2026-06-30', notes: 'Backhaul, clause 4', sourceRow: 2,
      clause: null,
    });
    expect(r.lanes.clause).toBeUndefined();
  });

  it('carries the clause column on lane rows; a blank cell is no clause', async () => {
    const { laneRecordAt } = await import('../../../engine/import/lane-table');
    const r = importNetwork(DEPOTS, 'from,to,ref,toll,rebate,Contract clause\nA,B,R-1,9.00,2.00,7.2\nB,A,R-2,9.00,0.00,\n');
    expect(r.report.warnings).toEqual([]);
    expect(r.lanes.clause).toEqual(['7.2', undefined]);
    expect(laneRecordAt(r.lanes, r.depots, r.exponent, 0).clause).toBe('7.2');
    expect(laneRecordAt(r.lanes, r.depots, r.exponent, 1).clause).toBeNull();
  });
});

describe('importNetworkAsync cancelling', () => {
  it('awaits pause between chunks, so a cancel that arrives meanwhile stops the import', async () => {
    const { importNetworkAsync } = await import('../../../engine/planning/import-network');
    const signal = { aborted: false };
    let pauses = 0;
    const big = 'from,to,toll\n' + 'A,B,1.00\n'.repeat(300_000);
    const run = importNetworkAsync(DEPOTS, big, {
      signal,
      pause: async () => {
        if (++pauses === 2) signal.aborted = true;
      },
    });
    await expect(run).rejects.toBeInstanceOf(ImportCancelledError);
  });
});

describe('report cap', () => {
  it('stores at most maxItems items of each kind and counts the rest as omitted', () => {
    const lanes = 'from,to,toll,fuel,rebate\n' + 'A,B,1,0,5\n'.repeat(30) + 'A,Z,1,0,0\n'.repeat(20);
    const r = importNetwork(DEPOTS, lanes, { maxItems: 10, skipInvalid: true });
    expect(r.report.errors).toHaveLength(10);
    expect(r.report.warnings).toHaveLength(10);
    // 20 unknown-depot errors, 29 duplicate lanes and 30 net-negative lanes: 10 + 10 kept.
    expect(r.report.omitted).toBe(20 - 10 + (29 + 30) - 10);
    expect(r.report.files[1]).toMatchObject({ total: 50, accepted: 30, rejected: 20 });
  });
});

describe('a plan whose estimate leaves the exact range; an import without a network', () => {
  // B>C has no fuel: 39,999 km at 9 x 10^10 per litre gives an estimated fuel far past 2^53 minor units.
  const lanes = 'from,to,toll,fuel,fees,rebate,distance_km,drive_minutes\nA,B,1.00,2.00,0,0,94.3,83\nB,C,1.00,,0,0,39999,120\n';
  const plan = { settings: { fuelPricePerLitre: '90000000000' } };

  it('names the row as an amount-overflow error (the network build never meets it)', () => {
    const r = importNetwork(DEPOTS, lanes, { plan });
    expect(r.network).toBeNull();
    expect(r.report.errors.map((e) => [e.row, e.column, e.code])).toEqual([[3, 'fuel', 'amount-overflow']]);
    expect(r.report.files[1]).toMatchObject({ total: 2, accepted: 1, rejected: 1 });
    const skipped = importNetwork(DEPOTS, lanes, { plan, skipInvalid: true });
    expect(skipped.network!.laneCount).toBe(1);
  });

  it('network: false reports the same problems and plan, and builds no network', () => {
    for (const text of [LANES, lanes]) {
      const full = importNetwork(DEPOTS, text, { plan });
      const bare = importNetwork(DEPOTS, text, { plan, network: false });
      expect(bare.network).toBeNull();
      expect(bare.report).toEqual(full.report);
      expect(Array.from(bare.plan.laneRecord)).toEqual(Array.from(full.plan.laneRecord));
    }
  });
});
