import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { emptyWorkspace, WORKSPACE_VERSION, type WorkspaceDocument } from '../../../engine/workspace/document';
import { parseWorkspace, serializeWorkspace, checkWorkspace, upgradeWorkspace } from '../../../engine/workspace/parse';
import { WorkspaceFormatError, WorkspaceVersionError } from '../../../engine/workspace/errors';
import { SCENARIO_VERSION } from '../../../engine/scenario/document';

function sampleWorkspace(): WorkspaceDocument {
  return {
    ...emptyWorkspace(),
    savedAt: '2026-03-02T07:45:00.000Z',
    files: { depots: '/srv/plans/depots.csv', lanes: 'lanes.csv' },
    settings: { origin: 'RTM', dispatchDate: '2026-03-02', vehicleClass: '4-axle', maxLegs: 6 },
    scenarios: [
      {
        name: 'Cap the backhaul credit',
        description: null,
        changes: [
          { kind: 'set-amount', lane: { from: 'RTM', to: 'ANR', ref: 'BF-17', occurrence: 1 }, field: 'rebate', amountMinor: 4500, note: 'clause 4.2' },
          { kind: 'close-lane', lane: { from: 'ANR', to: 'RTM', ref: null, occurrence: 2 }, note: null },
          { kind: 'set-validity', lane: { from: 'ANR', to: 'LIL', ref: null, occurrence: 1 }, validFrom: '2026-01-01', validTo: null, note: null },
          {
            kind: 'add-lane',
            lane: { from: 'LIL', to: 'RTM', ref: 'NEW-1', tollMinor: 1200, feesMinor: 0, fuelMinor: 9050, rebateMinor: 0, validFrom: null, validTo: null, distanceKm: 262.5, driveMinutes: 190 },
            note: null,
          },
        ],
      },
    ],
    activeScenario: 'Cap the backhaul credit',
  };
}

function failure(text: string): WorkspaceFormatError {
  try {
    parseWorkspace(text, 'plan.lwspace.json');
  } catch (error) {
    expect(error).toBeInstanceOf(WorkspaceFormatError);
    return error as WorkspaceFormatError;
  }
  throw new Error('expected a WorkspaceFormatError');
}

// Mutates the file form of the sample (scenarios stored as scenario documents) and returns its text.
function withField(mutate: (doc: Record<string, any>) => void): string {
  const doc = JSON.parse(serializeWorkspace(sampleWorkspace()));
  mutate(doc);
  return JSON.stringify(doc);
}

describe('version 3: panel sizes', () => {
  it('keeps the panel sizes, and null for a size never set', () => {
    const doc = { ...sampleWorkspace(), layout: { lowerPx: 312, sidePx: null } };
    expect(parseWorkspace(serializeWorkspace(doc), 'p.json').document.layout).toEqual({ lowerPx: 312, sidePx: null });
  });

  it('upgrades a version 2 file: everything kept, no panel size set', () => {
    const v2 = JSON.parse(serializeWorkspace({ ...sampleWorkspace(), planning: { ...sampleWorkspace().planning, fuelPrice: '1.719' } })) as Record<string, unknown>;
    delete v2.layout;
    v2.version = 2;
    const { document, migratedFrom } = parseWorkspace(JSON.stringify(v2), 'old.json');
    expect(migratedFrom).toBe(2);
    expect(document.version).toBe(3);
    expect(document.layout).toEqual({ lowerPx: null, sidePx: null });
    expect(document.planning.fuelPrice).toBe('1.719');
    expect(document.scenarios).toEqual(sampleWorkspace().scenarios);
  });

  it('upgrades a version 2 workspace kept in memory form (browser storage written by the previous build)', () => {
    const { layout: _layout, ...kept } = { ...sampleWorkspace(), version: 2 };
    const document = upgradeWorkspace(JSON.parse(JSON.stringify(kept)), 'browser storage');
    expect(document).toEqual({ ...sampleWorkspace(), layout: { lowerPx: null, sidePx: null } });
    expect(() => upgradeWorkspace({ ...sampleWorkspace(), version: WORKSPACE_VERSION + 1 }, 'browser storage')).toThrow(WorkspaceVersionError);
    expect(() => upgradeWorkspace({ ...sampleWorkspace(), layout: { lowerPx: 'tall', sidePx: null } }, 'browser storage')).toThrow(WorkspaceFormatError);
  });

  it('refuses a missing layout, an unknown field, or a size that is not a whole number of pixels', () => {
    expect(failure(withField((d) => delete d.layout)).field).toBe('/layout');
    expect(failure(withField((d) => (d.layout.mapPx = 300))).field).toBe('/layout/mapPx');
    for (const bad of [-1, 12.5, '300', 1e9]) expect(failure(withField((d) => (d.layout.lowerPx = bad))).field).toBe('/layout/lowerPx');
  });
});

describe('version 2: planning settings', () => {
  it('keeps the planning settings as typed', () => {
    const doc = { ...sampleWorkspace(), planning: { ...sampleWorkspace().planning, fuelPrice: '1.719', drivingLimit: 'us', exchangeRates: 'USD=0.92,CHF=1.05' } };
    expect(parseWorkspace(serializeWorkspace(doc), 'p.json').document.planning).toEqual(doc.planning);
  });

  it('upgrades a version 1 file: same files, settings and scenarios, every planning setting at its default', () => {
    const v1 = JSON.parse(serializeWorkspace(sampleWorkspace())) as Record<string, unknown>;
    delete v1.planning;
    v1.version = 1;
    const { document, migratedFrom } = parseWorkspace(JSON.stringify(v1), 'old.json');
    expect(migratedFrom).toBe(1);
    expect(document.version).toBe(WORKSPACE_VERSION);
    expect(document.planning).toEqual({ fuelPrice: null, fuelConsumption: null, drivingLimit: null, detourFactor: null, averageSpeed: null, defaultToll: null, currency: null, exchangeRates: null });
    const { planning: _planning, ...rest } = document;
    const { planning: _expected, ...expected } = sampleWorkspace();
    expect(rest).toEqual(expected);
  });

  it('refuses a version 2 file without planning, or with an unknown planning field, naming the pointer', () => {
    expect(failure(withField((d) => delete d.planning)).field).toBe('/planning');
    expect(failure(withField((d) => (d.planning.fuelColour = 'red'))).field).toBe('/planning/fuelColour');
    expect(failure(withField((d) => (d.planning.fuelPrice = 1.7))).field).toBe('/planning/fuelPrice');
  });
});

describe('parseWorkspace', () => {
  it('reads back exactly what serializeWorkspace wrote', () => {
    const doc = sampleWorkspace();
    const { document, migratedFrom } = parseWorkspace(serializeWorkspace(doc), 'plan.lwspace.json');
    expect(document).toEqual(doc);
    expect(migratedFrom).toBe(WORKSPACE_VERSION);
  });

  it('keeps the loads and vehicles files; a version 1 file without them opens, and is written without them', () => {
    const doc = { ...sampleWorkspace(), files: { depots: 'depots.csv', lanes: 'lanes.csv', loads: '/srv/plans/loads-0815.csv', vehicles: null } };
    const text = serializeWorkspace(doc);
    expect(JSON.parse(text).files).toEqual({ depots: 'depots.csv', lanes: 'lanes.csv', loads: '/srv/plans/loads-0815.csv', vehicles: null });
    expect(parseWorkspace(text, 'x').document.files).toEqual(doc.files);
    // Written before the fields existed: nothing to reopen, and saving it again adds nothing.
    const older = sampleWorkspace();
    expect(JSON.parse(serializeWorkspace(older)).files).toEqual({ depots: '/srv/plans/depots.csv', lanes: 'lanes.csv' });
    expect(parseWorkspace(serializeWorkspace(older), 'x').document.files.loads ?? null).toBeNull();
    expect(failure(withField((d) => (d.files.loads = 7)))).toMatchObject({ field: '/files/loads', reason: 'must be text' });
    expect(failure(withField((d) => (d.files.vehicles = '')))).toMatchObject({ field: '/files/vehicles', reason: 'must not be empty' });
  });

  it('accepts a UTF-8 byte-order mark before the JSON (RFC 8259 section 8.1 lets parsers ignore it)', () => {
    expect(parseWorkspace(`\ufeff${serializeWorkspace(emptyWorkspace())}`, 'x').document).toEqual(emptyWorkspace());
  });

  it('refuses text that is not JSON, naming the file', () => {
    const error = failure('{"format": ');
    expect(error.source).toBe('plan.lwspace.json');
    expect(error.field).toBe('');
  });

  it('refuses a JSON file that is not a workspace', () => {
    expect(failure('[1,2]').field).toBe('');
    const error = failure('{"format":"something-else","version":1}');
    expect([error.field, error.value]).toEqual(['/format', '"something-else"']);
    expect(failure('{"version":1}').field).toBe('/format');
  });

  it('refuses a file from a newer release with WorkspaceVersionError', () => {
    const text = withField((d) => (d.version = WORKSPACE_VERSION + 1));
    expect(() => parseWorkspace(text, 'new.json')).toThrow(WorkspaceVersionError);
    try {
      parseWorkspace(text, 'new.json');
    } catch (error) {
      expect(error).toMatchObject({ source: 'new.json', found: WORKSPACE_VERSION + 1, supported: WORKSPACE_VERSION });
    }
  });

  it('refuses a version that is not a whole number from 1', () => {
    for (const version of [0, -1, 1.5, '1', null]) {
      expect(failure(withField((d) => (d.version = version))).field).toBe('/version');
    }
    expect(failure(withField((d) => delete d.version))).toMatchObject({ field: '/version', value: null });
  });

  it('names the JSON pointer of an unknown or missing field', () => {
    expect(failure(withField((d) => (d.colour = 'red')))).toMatchObject({ field: '/colour', reason: 'unknown field' });
    expect(failure(withField((d) => (d.settings.speed = 3)))).toMatchObject({ field: '/settings/speed' });
    expect(failure(withField((d) => delete d.files.lanes))).toMatchObject({ field: '/files/lanes', value: null, reason: 'missing' });
    expect(failure(withField((d) => delete d.scenarios[0].changes[1].lane.occurrence))).toMatchObject({ field: '/scenarios/0/changes/1/lane/occurrence' });
  });

  it('checks every planning setting', () => {
    expect(failure(withField((d) => (d.settings.maxLegs = 0)))).toMatchObject({ field: '/settings/maxLegs', value: '0' });
    expect(failure(withField((d) => (d.settings.maxLegs = 2.5)))).toMatchObject({ field: '/settings/maxLegs' });
    expect(failure(withField((d) => (d.settings.origin = '')))).toMatchObject({ field: '/settings/origin' });
    expect(failure(withField((d) => (d.settings.vehicleClass = 7)))).toMatchObject({ field: '/settings/vehicleClass' });
    expect(failure(withField((d) => (d.files.depots = 'a\u0000b')))).toMatchObject({ field: '/files/depots' });
  });

  it('accepts only real calendar dates (Gregorian leap-year rule, ISO 8601 YYYY-MM-DD)', () => {
    // Common practice, no source: 2024 and 2000 are leap years, 1900 and 2100 are not.
    for (const ok of ['2024-02-29', '2000-02-29', '2026-12-31']) {
      expect(checkWorkspace({ ...sampleWorkspace(), settings: { ...sampleWorkspace().settings, dispatchDate: ok } }, 'x').settings.dispatchDate).toBe(ok);
    }
    for (const bad of ['2100-02-29', '1900-02-29', '2026-04-31', '2026-13-01', '2026-3-2', '02/03/2026', '2026-03-02T00:00:00Z']) {
      expect(failure(withField((d) => (d.settings.dispatchDate = bad)))).toMatchObject({ field: '/settings/dispatchDate' });
    }
  });

  it('checks the save timestamp is ISO 8601 with a zone', () => {
    expect(failure(withField((d) => (d.savedAt = '2026-03-02 07:45')))).toMatchObject({ field: '/savedAt' });
    expect(checkWorkspace({ ...sampleWorkspace(), savedAt: '2026-03-02T07:45:00+01:00' }, 'x').savedAt).toBe('2026-03-02T07:45:00+01:00');
  });

  it('stores each scenario as a scenario document with its own format and version', () => {
    const stored = JSON.parse(serializeWorkspace(sampleWorkspace()));
    expect(stored.scenarios[0]).toMatchObject({ format: 'lanewright-scenario', version: SCENARIO_VERSION, name: 'Cap the backhaul credit' });
    expect(failure(withField((d) => (d.scenarios[0].version = 99)))).toMatchObject({ field: '/scenarios/0/version' });
  });

  it('an in-memory toll change without a class reads as every class (the file then says null)', () => {
    const doc = sampleWorkspace() as any;
    doc.scenarios[0].changes.push({ kind: 'set-amount', lane: { from: 'A', to: 'B', ref: null, occurrence: 1 }, field: 'toll', amountMinor: 5, note: null });
    const checked = checkWorkspace(doc, 'ipc');
    expect(checked.scenarios[0].changes.at(-1)).toMatchObject({ field: 'toll', vehicleClass: null });
    expect(JSON.parse(serializeWorkspace(checked)).scenarios[0].changes.at(-1)).toMatchObject({ vehicleClass: null });
  });

  it('refuses unknown fields inside a scenario as everywhere else, naming them', () => {
    expect(failure(withField((d) => (d.scenarios[0].changes[1].extra = 1)))).toMatchObject({ field: '/scenarios/0/changes/1/extra', reason: 'unknown field' });
    expect(failure(withField((d) => (d.scenarios[0].colour = 'red')))).toMatchObject({ field: '/scenarios/0/colour', reason: 'unknown field' });
  });

  it('checks scenarios: change kinds, lane keys, whole minor units, unique names, active scenario', () => {
    expect(failure(withField((d) => (d.scenarios[0].changes[0].kind = 'raise')))).toMatchObject({ field: '/scenarios/0/changes/0/kind' });
    expect(failure(withField((d) => (d.scenarios[0].changes[0].amountMinor = 45.5)))).toMatchObject({ field: '/scenarios/0/changes/0/amountMinor' });
    expect(failure(withField((d) => (d.scenarios[0].changes[0].amountMinor = -1)))).toMatchObject({ field: '/scenarios/0/changes/0/amountMinor' });
    expect(failure(withField((d) => (d.scenarios[0].changes[0].lane.occurrence = 0)))).toMatchObject({ field: '/scenarios/0/changes/0/lane/occurrence' });
    expect(failure(withField((d) => d.scenarios.push(d.scenarios[0])))).toMatchObject({ field: '/scenarios/1/name' });
    expect(failure(withField((d) => (d.activeScenario = 'Nope')))).toMatchObject({ field: '/activeScenario' });
  });

  it('never writes an invalid document', () => {
    const doc = sampleWorkspace();
    doc.settings.maxLegs = -3;
    expect(() => serializeWorkspace(doc, 'plan.json')).toThrow(WorkspaceFormatError);
  });

  it('round-trips any valid settings (property)', () => {
    const text = fc.string({ minLength: 1, maxLength: 30 }).filter((s) => !/[\u0000-\u001f\u007f]/.test(s));
    const date = fc.date({ min: new Date('1970-01-01T00:00:00Z'), max: new Date('2199-12-31T00:00:00Z'), noInvalidDate: true }).map((d) => d.toISOString().slice(0, 10));
    fc.assert(
      fc.property(fc.option(text), fc.option(date), fc.option(text), fc.option(fc.integer({ min: 1, max: 1000 })), fc.option(text), (origin, dispatchDate, vehicleClass, maxLegs, lanes) => {
        const doc: WorkspaceDocument = { ...emptyWorkspace(), files: { depots: null, lanes }, settings: { origin, dispatchDate, vehicleClass, maxLegs } };
        expect(parseWorkspace(serializeWorkspace(doc), 'p').document).toEqual(doc);
      }),
    );
  });
});
