// The routes report written as a stream: JSON chunks parse to the same object as the whole report,
// CSV chunks read back through papaparse to the same table, chunks stay near their size whatever the
// paths add up to, and --no-paths / --to rows carry what they should.

import { describe, expect, it } from 'vitest';
import { formatCsvRows, parseCsvText } from '../../../engine/io/csv-papaparse';
import { routesCsv, routesCsvChunks } from '../../../engine/export/routes-csv';
import { routesJsonChunks } from '../../../engine/export/routes-json';
import { routesReport, routesReportHeader, routesReportStream } from '../../../engine/report/routes-report';
import { cheapestRoutes } from '../../../engine/routes/cheapest-routes';
import { legLimitedRoutes } from '../../../engine/routes/leg-limited';
import { routePath } from '../../../engine/routes/route-path';
import { randomPricedNetwork } from '../report/random-priced-network';

const CHUNK = 2_000;

describe('routes report stream', () => {
  it('JSON chunks join to the whole report as JSON.stringify writes it, with and without loops', () => {
    for (const seed of [3, 4, 9]) {
      const net = randomPricedNetwork(seed, 200, 700, seed === 9);
      const tree = cheapestRoutes(net, 0);
      const whole = routesReport(net, tree, { driveLimitMinutes: 540 });
      const chunks = [...routesJsonChunks(routesReportStream(net, tree, { driveLimitMinutes: 540 }), CHUNK)];
      expect(chunks.join('')).toBe(JSON.stringify(whole) + '\n');
      expect(JSON.parse(chunks.join(''))).toEqual(whole);
      if (seed === 9) expect(whole.loops.length).toBeGreaterThan(0);
    }
  });

  it('CSV chunks read back through papaparse to the whole table; no chunk is far past its size', () => {
    const net = randomPricedNetwork(5, 400, 900, false);
    const tree = cheapestRoutes(net, 0);
    const stream = routesReportStream(net, tree, { driveLimitMinutes: 540 });
    const chunks = [...routesCsvChunks(stream, CHUNK)];
    expect(chunks.length).toBeGreaterThan(10);
    // A chunk closes at the row that passes the size, so it is at most one row over it.
    let longestRow = 0;
    for (const line of routesCsv(routesReport(net, tree, { driveLimitMinutes: 540 })).split('\r\n')) longestRow = Math.max(longestRow, line.length + 2);
    for (const chunk of chunks) expect(chunk.length).toBeLessThanOrEqual(CHUNK + longestRow);
    const streamed = parseCsvText(chunks.join('')).rows;
    expect(streamed).toEqual(parseCsvText(routesCsv(routesReport(net, tree, { driveLimitMinutes: 540 }))).rows);
    const [header, ...rows] = streamed;
    expect(rows).toHaveLength(net.depotCount);
    // The same on a network with rebate loops (unbounded rows), with and without paths, and leg-limited.
    const looped = randomPricedNetwork(9, 200, 700, true);
    for (const solved of [cheapestRoutes(looped, 0), legLimitedRoutes(looped, 0, 5)]) {
      const whole = parseCsvText(routesCsv(routesReport(looped, solved, { driveLimitMinutes: 540 }))).rows;
      expect(parseCsvText([...routesCsvChunks(routesReportStream(looped, solved, { driveLimitMinutes: 540 }), CHUNK)].join('')).rows).toEqual(whole);
      const withoutPaths = parseCsvText([...routesCsvChunks(routesReportStream(looped, solved, { driveLimitMinutes: 540, paths: false }), CHUNK)].join('')).rows;
      const keep = whole[0].map((name, c) => (['path', 'lane_rows', 'lane_refs'].includes(name) ? -1 : c)).filter((c) => c !== -1);
      expect(withoutPaths).toEqual(whole.map((row) => keep.map((c) => row[c])));
    }
    // Every row names the depot before it and that lane's row: following them rebuilds each path.
    const column = (name: string) => header.indexOf(name);
    const byId = new Map(rows.map((r) => [r[column('id')], r]));
    for (const row of rows) {
      if (row[column('status')] !== 'reachable') continue;
      const walked: string[] = [];
      for (let at: string[] | undefined = row; at && at[column('via')] !== ''; at = byId.get(at[column('via')])) walked.unshift(at[column('via_lane')]);
      expect(walked.join('>')).toBe(row[column('lane_rows')]);
    }
  });

  it('without paths the rows carry no path, lanes or refs, and --to picks depots in the order given', () => {
    const net = randomPricedNetwork(6, 120, 400, true);
    const tree = cheapestRoutes(net, 0);
    const stream = routesReportStream(net, tree, { paths: false, depots: [7, 2, 90] });
    const report = JSON.parse([...routesJsonChunks(stream)].join(''));
    expect(report.depots.map((d: { id: string }) => d.id)).toEqual(['D7', 'D2', 'D90']);
    for (const row of report.depots) {
      expect(Object.keys(row)).not.toContain('path');
      expect(Object.keys(row)).not.toContain('lanes');
      expect(Object.keys(row)).not.toContain('refs');
    }
    const [header, ...rows] = parseCsvText([...routesCsvChunks(stream)].join('')).rows;
    expect(header).not.toContain('path');
    expect(header).not.toContain('lane_rows');
    expect(header).toContain('via_lane');
    expect(rows.map((r) => r[0])).toEqual(['D7', 'D2', 'D90']);
  });

  it('unbounded depots get no path and no via; reachable ones get the lane that ends their route', () => {
    const net = randomPricedNetwork(9, 200, 700, true);
    const tree = cheapestRoutes(net, 0);
    const report = routesReport(net, tree);
    let unbounded = 0;
    report.depots.forEach((row, d) => {
      if (row.status === 'unbounded') {
        unbounded++;
        expect(row).toMatchObject({ path: [], lanes: [], via: null, via_lane: null, breakdown: null });
      } else if (row.status === 'reachable' && d !== 0) {
        const lanes = routePath(net, tree, d)!.lanes;
        expect(row.via_lane).toBe(net.laneRow[lanes[lanes.length - 1]]);
        expect(row.via).toBe(row.path[row.path.length - 2]);
      }
    });
    expect(unbounded).toBeGreaterThan(0);
  });

  it('a leg-limited report sums each walk and names its last lane', () => {
    const net = randomPricedNetwork(12, 80, 300, true);
    const limited = legLimitedRoutes(net, 0, 4);
    const report = routesReport(net, limited);
    for (const row of report.depots.filter((r) => r.status === 'reachable' && r.legs! > 0)) {
      const b = row.breakdown!;
      expect(b.toll_minor! + b.fuel_minor! + b.fees_minor! - b.rebate_minor!).toBe(row.cost_minor);
      expect(row.via_lane).toBe(row.lanes[row.lanes.length - 1]);
      expect(row.lanes.length).toBe(row.legs);
    }
  });

  it('writes the same text as the generic writer checking every cell, whatever ids, names and refs hold', () => {
    // Columns the stream vouches plain skip the per-cell check; a vouch that is wrong would let a
    // formula or a separator through, so hostile texts are mixed in at random.
    const hostile = ['-3', '+1', '=cmd', '@x', ' lead', 'trail ', 'a,b', 'a;b', 'q"q', "'x", '12', '-0.5', 'D\u00e9p\u00f4t', 'x>y', ''];
    for (const seed of [1, 2, 6, 7]) {
      const base = randomPricedNetwork(seed, 60, 240, seed === 7);
      const pick = (i: number, plain: string) => ((i * 7 + seed) % 5 === 0 ? hostile[(i + seed) % hostile.length] + i : plain);
      const net = {
        ...base,
        // Seed 6: the origin, which starts every path, is a signed number: plain alone, a formula start in a path.
        depotIds: base.depotIds.map((id, i) => (seed === 1 ? id : seed === 6 ? (i === 0 ? '-35' : id) : pick(i, id))),
        depotNames: base.depotNames.map((n, i) => (seed === 2 ? n : pick(i + 1, n))),
        laneRef: base.laneRef.map((_, e) => (e % 3 === 0 ? undefined : seed === 6 ? `R${e}` : pick(e, `R${e}`))),
      };
      const tree = cheapestRoutes(net, 0);
      for (const paths of [true, false]) {
        const stream = routesReportStream(net, tree, { driveLimitMinutes: 540, paths });
        const generic = formatCsvRows([routesReportHeader(paths), ...Array.from(stream.depots, (d) => stream.cells(d))]);
        expect([...routesCsvChunks(stream, CHUNK)].join('')).toBe(generic);
      }
      const plain = routesReportStream(net, tree, { driveLimitMinutes: 540 }).plainColumns();
      expect(plain[0]).toBe(seed === 1);
    }
  });
});
