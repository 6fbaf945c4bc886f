import { describe, expect, it } from 'vitest';
import { parseScenarioDocument, scenarioFromJson, serializeScenarioDocument, SCENARIO_VERSION } from '../../../engine/scenario/document';
import type { Scenario } from '../../../engine/scenario/types';
import { withChange, withoutChange } from '../../../engine/scenario/edit';
import { ScenarioFormatError } from '../../../engine/errors';

const key = (from: string, to: string, ref: string | null = null, occurrence = 1) => ({ from, to, ref, occurrence });
const scenario: Scenario = {
  name: 'Backhaul credit cut',
  description: 'What if the LYS-PAR credit is halved and the new CGN-LUX lane opens in spring',
  changes: [
    { kind: 'set-amount', lane: key('LYS', 'PAR', 'BF-2024-07'), field: 'rebate', amountMinor: 2000, note: 'proposal to partner' },
    { kind: 'close-lane', lane: key('MUC', 'MIL', null, 2), note: null },
    { kind: 'set-validity', lane: key('FRA', 'SXB'), validFrom: '2025-03-01', validTo: '2025-12-31', note: null },
    {
      kind: 'add-lane',
      lane: { from: 'CGN', to: 'LUX', ref: 'NEW-1', tollMinor: 0, fuelMinor: 12450, feesMinor: 1200, rebateMinor: 0, validFrom: null, validTo: null, distanceKm: 212.5, driveMinutes: null },
      note: null,
    },
  ],
};

function formatError(fn: () => unknown): ScenarioFormatError {
  try {
    fn();
  } catch (error) {
    expect(error).toBeInstanceOf(ScenarioFormatError);
    return error as ScenarioFormatError;
  }
  throw new Error('expected a ScenarioFormatError');
}

describe('scenario document', () => {
  it('round-trips every kind of change through the file text', () => {
    const text = serializeScenarioDocument(scenario);
    expect(JSON.parse(text)).toMatchObject({ format: 'lanewright-scenario', version: SCENARIO_VERSION });
    expect(parseScenarioDocument(text)).toEqual(scenario);
    expect(serializeScenarioDocument(parseScenarioDocument(text))).toBe(text);
  });

  it('reads a file with a byte order mark and optional fields left out', () => {
    const text = '\ufeff' + JSON.stringify({ format: 'lanewright-scenario', version: 1, name: 'x', changes: [{ kind: 'close-lane', lane: { from: 'A', to: 'B', occurrence: 1 } }] });
    expect(parseScenarioDocument(text)).toEqual({ name: 'x', description: null, changes: [{ kind: 'close-lane', lane: key('A', 'B'), note: null }] });
  });

  it('names the field and value that are wrong', () => {
    const bad = (changes: unknown[]) => JSON.stringify({ format: 'lanewright-scenario', version: 1, name: 'x', changes });
    const e1 = formatError(() => parseScenarioDocument(bad([{ kind: 'set-amount', lane: key('A', 'B'), field: 'rebate', amountMinor: 12.5 }]), 'plan.json'));
    expect([e1.source, e1.path, e1.value]).toEqual(['plan.json', '/changes/0/amountMinor', '12.5']);
    const e2 = formatError(() => parseScenarioDocument(bad([{ kind: 'close-lane', lane: { from: 'A', to: 'B', ref: null, occurrence: 0 } }])));
    expect(e2.path).toBe('/changes/0/lane/occurrence');
    const e3 = formatError(() => parseScenarioDocument(bad([{ kind: 'set-validity', lane: key('A', 'B'), validFrom: '2025-02-30', validTo: null }])));
    expect(e3.path).toBe('/changes/0/validFrom');
    const e4 = formatError(() => parseScenarioDocument(bad([{ kind: 'set-validity', lane: key('A', 'B'), validFrom: '2025-05-01', validTo: '2025-04-01' }])));
    expect(e4.path).toBe('/changes/0/validTo');
    const e5 = formatError(() => parseScenarioDocument(bad([{ kind: 'rename-lane', lane: key('A', 'B') }])));
    expect(e5.path).toBe('/changes/0/kind');
    const e6 = formatError(() => parseScenarioDocument(bad([{ kind: 'set-amount', lane: key('A', 'B'), field: 'rebate', amountMinor: -5 }])));
    expect(e6.path).toBe('/changes/0/amountMinor');
    expect(formatError(() => parseScenarioDocument('{"format":')).path).toBe('');
    expect(formatError(() => parseScenarioDocument('{"format":"something-else","version":1}')).path).toBe('/format');
  });

  it('refuses a document from a newer version instead of half reading it', () => {
    const error = formatError(() => scenarioFromJson({ format: 'lanewright-scenario', version: SCENARIO_VERSION + 1, name: 'x', changes: [] }));
    expect(error.path).toBe('/version');
  });

  it('withChange replaces an earlier edit of the same lane and field, keeps others', () => {
    const base: Scenario = { name: 's', description: null, changes: [] };
    const a = withChange(base, { kind: 'set-amount', lane: key('A', 'B'), field: 'rebate', amountMinor: 100, note: null });
    const b = withChange(a, { kind: 'set-amount', lane: key('A', 'B'), field: 'toll', amountMinor: 50, note: null });
    const c = withChange(b, { kind: 'set-amount', lane: key('A', 'B'), field: 'rebate', amountMinor: 80, note: null });
    expect(c.changes.map((x) => (x.kind === 'set-amount' ? [x.field, x.amountMinor] : x.kind))).toEqual([['rebate', 80], ['toll', 50]]);
    expect(base.changes).toHaveLength(0); // the input is not modified
    expect(withoutChange(c, 0).changes).toHaveLength(1);
  });
});
