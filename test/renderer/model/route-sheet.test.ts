// The selected route as a route sheet: amounts come from the scenario's lane amounts (not the
// file's), details from the worker, the date and class from the solve; validity in words.

import { describe, expect, it } from 'vitest';
import { routeSheetOf, validityText } from '../../../renderer/model/route-sheet';
import type { NetworkView, RouteView, SolveView } from '../../../renderer/worker/protocol';

const network = {
  currency: 'EUR',
  exponent: 2,
  depotIds: ['A', 'B', 'C'],
  laneFrom: Int32Array.from([0, 1]),
  laneTo: Int32Array.from([1, 2]),
  laneRow: Int32Array.from([2, 3]),
  laneRecord: Int32Array.from([0, 1]),
  refNames: ['R1'],
  rows: { refIndex: Int32Array.from([0, -1]) },
  laneDistanceKm: Float64Array.from([10, NaN]),
  laneDriveMinutes: Float64Array.from([12, 30]),
  laneReverse: new Uint8Array(2),
} as unknown as NetworkView;
const solve = { origin: 0, settings: { origin: 'A', maxLegs: null, vehicleClass: '', dispatchDate: '2026-08-15' } } as unknown as SolveView;
const amounts = { toll: [100, 5], fuel: [200, 6], fees: [0, 7], rebate: [50, 0], changed: [true, false] } as never;
const detail = { validFrom: null, validTo: '2026-12-31', distanceEstimated: false, fuelEstimated: true, driveEstimated: false, notes: null, clause: 'net 30 days' };
const route: RouteView = { target: 2, depots: [0, 1, 2], lanes: [0, 1], details: [detail, null], estimateRules: { distance: 'd', fuel: 'f', driveTime: 't' } };

describe('routeSheetOf', () => {
  it('takes amounts from the scenario, details from the worker and the plan from the solve', () => {
    const sheet = routeSheetOf(network, solve, amounts, route, [], 'What-if 1');
    expect(sheet).toMatchObject({ origin: 'A', destination: 'C', date: '2026-08-15', vehicleClass: null, scenario: 'What-if 1', rules: { fuel: 'f' } });
    expect(sheet.legs[0]).toMatchObject({ from: 'A', to: 'B', ref: 'R1', row: 2, tollMinor: 100, rebateMinor: 50, validTo: '2026-12-31', clause: 'net 30 days', fuelEstimated: true });
    expect(sheet.legs[1]).toMatchObject({ ref: null, distanceKm: null, driveMinutes: 30, feesMinor: 7, clause: null, fuelEstimated: false });
  });
});

describe('validityText', () => {
  it('says each kind of window in words', () => {
    expect(validityText('2026-01-01', '2026-12-31')).toBe('valid 2026-01-01 to 2026-12-31');
    expect(validityText('2026-01-01', null)).toBe('valid from 2026-01-01');
    expect(validityText(null, '2026-12-31')).toBe('valid until 2026-12-31');
    expect(validityText(null, null)).toBe('no validity limits');
  });
});
