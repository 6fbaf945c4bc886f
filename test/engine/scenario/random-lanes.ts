// Random lane files and scenarios for the overlay's property tests: wide (toll_<class> columns),
// long (a vehicle_class column) or no classes; validity windows; blank distances and class tolls.
// Invented test data: four depots at real city coordinates.

import fc from 'fast-check';
import { seededRandom } from '../../support/seeded-random';
import { formatMinor, type Minor } from '../../../engine/money/minor';
import { overlayKeys } from '../../../engine/scenario/overlay';
import type { ImportResult } from '../../../engine/planning/import-types';
import type { Scenario, ScenarioChange } from '../../../engine/scenario/types';

export const DEPOTS_CSV = 'id,name,lat,lon\nA,Antwerp,51.22,4.40\nB,Brussels,50.85,4.35\nC,Cologne,50.94,6.96\nD,Dortmund,51.51,7.47\n';
export const DEPOT_IDS = ['A', 'B', 'C', 'D'];
export const DATES = ['2026-03-01', '2026-09-01'];
const CLASSES = ['2axle', '5axle'];
const WINDOWS: [string, string][] = [['', ''], ['2026-01-01', '2026-06-30'], ['2026-07-01', '2026-12-31']];

const m = (v: number) => formatMinor(v as Minor);

const rowArb = fc.record({
  from: fc.integer({ min: 0, max: 3 }),
  step: fc.integer({ min: 1, max: 3 }),
  ref: fc.constantFrom('R1', 'R2', ''),
  toll: fc.option(fc.integer({ min: 0, max: 4000 }), { freq: 6 }),
  classTolls: fc.tuple(fc.option(fc.integer({ min: 0, max: 4000 }), { freq: 3 }), fc.option(fc.integer({ min: 0, max: 4000 }), { freq: 3 })),
  vehicleClass: fc.constantFrom('', '2axle', '5axle'),
  fuel: fc.integer({ min: 0, max: 3000 }),
  fees: fc.integer({ min: 0, max: 500 }),
  rebate: fc.oneof(fc.constant(0), fc.integer({ min: 0, max: 2500 })),
  distance: fc.option(fc.integer({ min: 1, max: 400 }), { freq: 3 }),
  window: fc.integer({ min: 0, max: 2 }),
});

/** A lanes file: header and 1..10 rows in one of the three layouts. */
export function randomLaneFile(): fc.Arbitrary<string> {
  return fc.tuple(fc.constantFrom('none', 'wide', 'long'), fc.array(rowArb, { minLength: 1, maxLength: 10 })).map(([layout, rows]) => {
    const header = ['from', 'to', 'ref', ...(layout === 'long' ? ['vehicle_class'] : []), 'toll', ...(layout === 'wide' ? CLASSES.map((c) => `toll_${c}`) : []), 'fuel', 'fees', 'rebate', 'distance_km', 'valid_from', 'valid_to'];
    const lines = rows.map((r) => {
      const [from, to] = [DEPOT_IDS[r.from], DEPOT_IDS[(r.from + r.step) % 4]];
      const [validFrom, validTo] = WINDOWS[r.window];
      return [
        from, to, r.ref,
        ...(layout === 'long' ? [r.vehicleClass] : []),
        r.toll === null ? '' : m(r.toll),
        ...(layout === 'wide' ? r.classTolls.map((t) => (t === null ? '' : m(t))) : []),
        m(r.fuel), m(r.fees), m(r.rebate), r.distance === null ? '' : String(r.distance), validFrom, validTo,
      ].join(',');
    });
    return [header.join(','), ...lines].join('\n') + '\n';
  });
}

/** 0..5 changes over the import's rows: amounts (tolls by class or for every class), closures, validity, added lanes, a missing lane. */
export function randomScenario(imported: ImportResult, seed: number): Scenario {
  const rand = seededRandom(seed);
  const pick = <T,>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)];
  const int = (max: number) => Math.floor(rand() * (max + 1));
  const keys = overlayKeys(imported);
  const classes = imported.vehicleClasses;
  const changes: ScenarioChange[] = [];
  const count = int(5);
  for (let i = 0; i < count; i++) {
    const lane = keys.length > 0 && rand() < 0.9 ? pick(keys) : { from: 'A', to: 'B', ref: 'GONE', occurrence: 1 };
    const kind = pick(['toll', 'toll', 'amount', 'close', 'validity', 'add'] as const);
    if (kind === 'toll') changes.push({ kind: 'set-amount', lane, field: 'toll', amountMinor: int(4000), vehicleClass: rand() < 0.4 ? null : pick([...classes, '9axle']), note: null });
    else if (kind === 'amount') changes.push({ kind: 'set-amount', lane, field: pick(['fuel', 'fees', 'rebate'] as const), amountMinor: int(3000), note: null });
    else if (kind === 'close') changes.push({ kind: 'close-lane', lane, note: null });
    else if (kind === 'validity') {
      const [validFrom, validTo] = pick(WINDOWS);
      changes.push({ kind: 'set-validity', lane, validFrom: validFrom || null, validTo: validTo || null, note: null });
    } else {
      const from = int(3);
      const [validFrom, validTo] = pick(WINDOWS);
      changes.push({
        kind: 'add-lane',
        lane: { from: DEPOT_IDS[from], to: DEPOT_IDS[(from + 1 + int(2)) % 4], ref: pick(['R1', 'N1', null]), tollMinor: int(4000), fuelMinor: int(3000), feesMinor: int(500), rebateMinor: int(2000), validFrom: validFrom || null, validTo: validTo || null, distanceKm: rand() < 0.5 ? null : 1 + int(300), driveMinutes: null },
        note: null,
      });
    }
  }
  return { name: `random ${seed}`, description: null, changes };
}
