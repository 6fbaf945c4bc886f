// Exports: the lanes CSV re-imports to the same network and the same routes (round trip), formula-like
// text is neutralised while numbers stay numbers, and the GeoJSON has the RFC 7946 structure
// (FeatureCollection, Feature, Point/LineString, [longitude, latitude] positions).

import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { findDistinctLoops } from '../../../engine/audit/distinct-loops';
import { networkGeoJson } from '../../../engine/export/geojson';
import { geoJsonText } from '../../../engine/export/geojson-text';
import { lanesCsv } from '../../../engine/export/lanes-csv';
import { loopsCsvRows } from '../../../engine/export/loops-csv';
import { routesCsv } from '../../../engine/export/routes-csv';
import { importNetwork } from '../../../engine/planning/import-network';
import type { ImportResult } from '../../../engine/planning/import-types';
import { parseCsvText } from '../../../engine/io/csv-papaparse';
import { formatMinor, type Minor } from '../../../engine/money/minor';
import type { Network } from '../../../engine/network/types';
import { routesReport } from '../../../engine/report/routes-report';
import { cheapestRoutes } from '../../../engine/routes/cheapest-routes';

const sample = (name: string) => readFileSync(new URL(`../../../sample-data/${name}`, import.meta.url), 'utf8');

function laneTuples(n: Network) {
  return Array.from({ length: n.laneCount }, (_, e) => [n.laneFrom[e], n.laneTo[e], n.laneToll[e], n.laneFuel[e], n.laneFees[e], n.laneRebate[e], n.laneDistanceKm[e], n.laneDriveMinutes[e], n.laneRef[e]]);
}

function roundTrip(result: ImportResult, depots: string, plan = {}) {
  const text = lanesCsv(result, findDistinctLoops(result.network!).loops);
  const again = importNetwork(depots, text, { plan, skipInvalid: false });
  expect(again.report.errors).toEqual([]);
  return again;
}

describe('lanes CSV round trip', () => {
  it.each([
    ['lanes.csv', {}],
    ['lanes.csv', { vehicleClass: '2axle', date: '2026-08-15' }],
    ['lanes-rebate-loop.csv', { vehicleClass: '5axle' }],
  ])('%s %o re-imports to the same network and the same routes', (file, plan) => {
    const depots = sample('depots.csv');
    const first = importNetwork(depots, sample(file), { plan });
    // Every row and class is exported, so the same plan is asked of the re-import.
    const second = roundTrip(first, depots, plan);
    expect(laneTuples(second.network!)).toEqual(laneTuples(first.network!));
    const clauses = (r: ImportResult) => Array.from(r.plan.laneRecord, (i) => r.lanes.clause?.[i]);
    expect(clauses(second)).toEqual(clauses(first));
    const origin = first.network!.depotIndex.get('RTM')!;
    const a = routesReport(first.network!, cheapestRoutes(first.network!, origin));
    const b = routesReport(second.network!, cheapestRoutes(second.network!, origin));
    expect(b.depots.map((d) => [d.status, d.cost, d.path])).toEqual(a.depots.map((d) => [d.status, d.cost, d.path]));
    expect(b.loops.map((l) => l.net_per_lap_minor)).toEqual(a.loops.map((l) => l.net_per_lap_minor));
  });

  it('any amount survives export and re-import unchanged (fast-check)', () => {
    const depots = 'id,name,lat,lon\nA,a,50,4\nB,b,51,5\n';
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -1e12, max: 1e12 }), { minLength: 4, maxLength: 4 }), ([toll, fuel, fees, rebate]) => {
        const m = (v: number) => formatMinor(v as Minor);
        const first = importNetwork(depots, `from,to,toll,fuel,fees,rebate,distance_km\nA,B,${m(toll)},${m(fuel)},${m(fees)},${m(rebate)},10\n`);
        const second = roundTrip(first, depots);
        expect(laneTuples(second.network!)).toEqual(laneTuples(first.network!));
      }),
      { numRuns: 50 },
    );
  });

  it('neutralises formula-like text but keeps negative amounts as numbers', () => {
    const depots = 'id,name,lat,lon\nA,a,50,4\nB,b,51,5\n';
    const first = importNetwork(depots, 'from,to,ref,toll,rebate,fuel,notes\nA,B,=HYPERLINK("x"),1.00,20.00,0,@SUM(A1)\n');
    const text = lanesCsv(first);
    const [header, row] = parseCsvText(text).rows;
    const cell = (name: string) => row[header.indexOf(name)];
    expect(cell('ref')).toBe(`'=HYPERLINK("x")`);
    expect(cell('notes')).toBe(`'@SUM(A1)`);
    expect(cell('net')).toBe('-19.00');
    expect(cell('net_negative')).toBe('yes');
    // The importer removes the apostrophe again, so the reference round-trips.
    expect(roundTrip(first, depots).network!.laneRef[0]).toBe('=HYPERLINK("x")');
    // RFC 4180: CRLF line ends.
    expect(text.endsWith('\r\n')).toBe(true);
  });
});

describe('routes and loops CSV', () => {
  it('routes CSV carries the breakdown, which sums to the cost', () => {
    const r = importNetwork(sample('depots.csv'), sample('lanes.csv'));
    const report = routesReport(r.network!, cheapestRoutes(r.network!, r.network!.depotIndex.get('RTM')!), { driveLimitMinutes: 540 });
    const [header, ...rows] = parseCsvText(routesCsv(report)).rows;
    for (const c of ['id', 'status', 'cost', 'legs', 'path', 'toll', 'fuel', 'fees', 'rebate', 'distance_km', 'drive_minutes', 'over_drive_limit']) expect(header).toContain(c);
    for (const d of report.depots.filter((x) => x.breakdown)) {
      const b = d.breakdown!;
      expect(b.toll_minor! + b.fuel_minor! + b.fees_minor! - b.rebate_minor!).toBe(d.cost_minor);
      expect(b.over_drive_limit).toBe((b.drive_minutes ?? 0) > 540);
    }
    expect(rows).toHaveLength(report.depots.length);
    expect(report.over_drive_limit > 0 ? report.drive_limit_caution : 'none').toMatch(/estimate|none/);
    expect(report.caution).toMatch(/estimate/);
  });

  it('loops CSV lists each loop lane in order with the net per lap', () => {
    const r = importNetwork(sample('depots.csv'), sample('lanes-rebate-loop.csv'));
    const loops = findDistinctLoops(r.network!).loops;
    const [header, ...rows] = loopsCsvRows(r.network!, loops);
    expect(header.slice(0, 6)).toEqual(['loop', 'step', 'from', 'to', 'lane_row', 'ref']);
    const fra = rows.filter((x) => x[0] === 1);
    expect(fra.map((x) => [x[2], x[3], x[4]])).toEqual([
      ['FRA', 'SXB', 20],
      ['SXB', 'FRA', 24],
    ]);
    // 131.80 - 170.00 + 131.80 - 95.00 = -1.40 per lap.
    expect(fra[0][11]).toBe('-1.40');
  });
});

describe('GeoJSON', () => {
  it('is an RFC 7946 FeatureCollection with [lon, lat] positions and kinds depot, route, loop', () => {
    const r = importNetwork(sample('depots.csv'), sample('lanes-rebate-loop.csv'));
    const n = r.network!;
    const loops = findDistinctLoops(n).loops;
    const r2 = importNetwork(sample('depots.csv'), sample('lanes.csv'));
    const report = routesReport(r2.network!, cheapestRoutes(r2.network!, 0));
    for (const [net, options] of [[n, { loops }], [r2.network!, { report }]] as const) {
      const doc = JSON.parse(geoJsonText(networkGeoJson(net, options)));
      expect(doc.type).toBe('FeatureCollection');
      expect(Array.isArray(doc.features)).toBe(true);
      for (const f of doc.features) {
        expect(f.type).toBe('Feature');
        expect(typeof f.properties).toBe('object');
        const positions = f.geometry.type === 'Point' ? [f.geometry.coordinates] : f.geometry.coordinates;
        expect(['Point', 'LineString']).toContain(f.geometry.type);
        if (f.geometry.type === 'LineString') expect(positions.length).toBeGreaterThanOrEqual(2);
        for (const [lon, lat] of positions) {
          expect(Math.abs(lon)).toBeLessThanOrEqual(180);
          expect(Math.abs(lat)).toBeLessThanOrEqual(90);
        }
      }
    }
    const doc = networkGeoJson(n, { loops });
    const rtm = doc.features.find((f) => f.properties.id === 'RTM')!;
    // Rotterdam: longitude 4.142 first, latitude 51.949 second.
    expect(rtm.geometry.coordinates).toEqual([4.142, 51.949]);
    const loop = doc.features.find((f) => f.properties.kind === 'loop')!;
    const ring = loop.geometry.coordinates as number[][];
    expect(ring[0]).toEqual(ring[ring.length - 1]);
    expect(networkGeoJson(r2.network!, { report }).features.some((f) => f.properties.kind === 'route')).toBe(true);
  });
});
