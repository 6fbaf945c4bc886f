// Numbers in the lanes and depots files: a negative amount is named with what it does to the cost;
// distances, drive times and coordinates must be finite and plausible; a lane whose net cost leaves
// the exact range is a row error (never an abort); a huge toll cancelled by an equal rebate is
// costed by its net. Exact sums are checked against BigInt arithmetic.

import { describe, expect, it } from 'vitest';
import { MAX_LANE_KM, MAX_LANE_MINUTES } from '../../../engine/import/lane-cells';
import { importNetwork } from '../../../engine/planning/import-network';
import { routesReport } from '../../../engine/report/routes-report';
import { cheapestRoutes } from '../../../engine/routes/cheapest-routes';

const DEPOTS = 'id,name,lat,lon\nA,a,51,4\nB,b,52,4\nC,c,53,4\n';
const HEADER = 'from,to,toll,fuel,fees,rebate,distance_km,drive_minutes';
const DIGITS_400 = '9'.repeat(400);
const NEAR_MAX = '90071992547409.91'; // Number.MAX_SAFE_INTEGER minor units, in major units

function read(lanes: string, depots = DEPOTS, skipInvalid = false) {
  const r = importNetwork(depots, lanes, { plan: { date: '2026-06-01' }, skipInvalid });
  expect(r.report.accepted + r.report.rejected).toBe(r.report.total);
  return r;
}

describe('negative amounts', () => {
  it('each is a warning naming row, column, value and what it does to the cost; the row is kept', () => {
    const r = read(`${HEADER}\nA,B,-1.00,2.00,0,0,10,10\nB,C,1.00,-2.00,-0.50,-3.00,10,10\n`);
    expect(r.report.errors).toEqual([]);
    expect(r.report.accepted).toBe(5);
    const negative = r.report.warnings.filter((w) => w.code === 'negative-amount');
    expect(negative.map((w) => [w.row, w.column, w.value])).toEqual([
      [2, 'toll', '-1.00'],
      [3, 'fuel', '-2.00'],
      [3, 'fees', '-0.50'],
      [3, 'rebate', '-3.00'],
    ]);
    expect(negative[3].message).toMatch(/raises the lane's cost by 3\.00/);
    expect(negative[0].message).toMatch(/lowers the lane's cost by 1\.00/);
  });
  it('in a decimal-comma file and in a class toll column too', () => {
    const r = read('from;to;toll_2axle;fuel;rebate\nA;B;-1,00;2,00;-3,00\n');
    expect(r.report.warnings.filter((w) => w.code === 'negative-amount').map((w) => [w.column, w.value])).toEqual([
      ['toll_2axle', '-1,00'],
      ['rebate', '-3,00'],
    ]);
  });
});

describe('distances, drive times and coordinates', () => {
  it('a 400-digit or 21-digit distance, a 400-digit drive time and out-of-range values are row errors', () => {
    const r = read(
      [
        HEADER,
        `A,B,1,2,0,0,${DIGITS_400},10`,
        'A,B,1,2,0,0,123456789012345678901,10',
        `A,B,1,2,0,0,10,${DIGITS_400}`,
        `A,B,1,2,0,0,${MAX_LANE_KM + 1},10`,
        `A,B,1,2,0,0,10,${MAX_LANE_MINUTES + 1}`,
        `A,B,1,2,0,0,${MAX_LANE_KM},${MAX_LANE_MINUTES}`,
      ].join('\n'),
    );
    expect(r.report.errors.map((e) => [e.row, e.column])).toEqual([
      [2, 'distance_km'],
      [3, 'distance_km'],
      [4, 'drive_minutes'],
      [5, 'distance_km'],
      [6, 'drive_minutes'],
    ]);
    expect(r.report.accepted).toBe(3 + 1);
  });
  it('a distance in miles is bounded after conversion', () => {
    const r = read('from,to,toll,fuel,distance (mi)\nA,B,1,2,24856\nA,C,1,2,24854\n');
    expect(r.report.errors.map((e) => e.row)).toEqual([2]);
  });
  it('a 400-digit coordinate is a row error, not Infinity', () => {
    const r = read(`${HEADER}\n`, `id,name,lat,lon\nA,a,${DIGITS_400},4\nB,b,52,-${DIGITS_400}\n`);
    expect(r.report.errors.map((e) => [e.row, e.column])).toEqual([
      [2, 'lat'],
      [3, 'lon'],
    ]);
  });
});

describe('exact range of a lane and a route', () => {
  it('a lane whose net cost leaves the range is a row error; with skipInvalid the rest is planned', () => {
    const lanes = `${HEADER}\nA,B,${NEAR_MAX},${NEAR_MAX},0,0,10,10\nB,C,1.00,2.00,0,0,10,10\n`;
    const refused = read(lanes);
    expect(refused.network).toBeNull();
    expect(refused.report.errors.map((e) => [e.row, e.code])).toEqual([[2, 'amount-overflow']]);
    const skipped = read(lanes, DEPOTS, true);
    expect(skipped.network!.laneCount).toBe(1);
  });
  it('a class toll that overflows only with its class is caught too', () => {
    const r = read(`from,to,toll_2axle,toll_5axle,fuel\nA,B,1.00,${NEAR_MAX},0.50\n`);
    expect(r.report.errors.map((e) => [e.column, e.code])).toEqual([['toll_5axle', 'amount-overflow']]);
  });
  it('huge tolls and rebates that cancel are costed by their nets; only the out-of-range sums are null', () => {
    const r = read(`${HEADER}\nA,B,${NEAR_MAX},0,0,90071992547409.00,10,10\nB,C,${NEAR_MAX},0,0,90071992547409.00,10,10\n`);
    expect(r.report.errors).toEqual([]);
    const network = r.network!;
    const report = routesReport(network, cheapestRoutes(network, 0));
    const [, b, c] = report.depots;
    expect(b).toMatchObject({ cost_minor: 91, breakdown: { toll_minor: 9007199254740991, rebate_minor: 9007199254740900, fuel_minor: 0 } });
    // Two lanes: the cost is 2 x 91 (BigInt: 2 x 9007199254740991 - 2 x 9007199254740900 = 182); the
    // toll and rebate sums themselves pass the range, so those two figures alone are null.
    expect(2n * 9007199254740991n - 2n * 9007199254740900n).toBe(182n);
    expect(c).toMatchObject({ cost_minor: 182, cost: '1.82', breakdown: { toll_minor: null, toll: null, rebate_minor: null, fuel_minor: 0 } });
  });
});
