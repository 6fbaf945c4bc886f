// Fuzzing the engine's own entry points (fast-check, seeded): random bytes and CSV-shaped text as
// depots and lanes files through the streaming import and the plan (what `lanewright check` runs),
// and random JSON as scenario and workspace documents. The only accepted outcomes are a report or a
// named Lanewright error: never a TypeError, RangeError or any other exception.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { LanewrightError } from '../../engine/errors';
import { formatReport } from '../../engine/import/report-collector';
import { planNetwork, startImport } from '../../engine/planning/import-network';
import { parseScenarioDocument, serializeScenarioDocument } from '../../engine/scenario/document';
import { parseWorkspace, serializeWorkspace } from '../../engine/workspace/parse';
import { emptyWorkspace } from '../../engine/workspace/document';
import { PROTOTYPE_NAMES } from '../support/prototype-names';

const SEED = 20261203;

/** Runs `f`; a LanewrightError is an accepted outcome, anything else thrown fails the property. */
function reportOrNamedError(f: () => void): void {
  try {
    f();
  } catch (error) {
    if (!(error instanceof LanewrightError)) throw new Error(`not a named Lanewright error: ${String(error)}`, { cause: error });
  }
}

/** What `lanewright check` does with two texts: stream both in chunks, then print the report. */
function check(depots: string[], lanes: string[], plan: { date?: string; vehicleClass?: string } = {}): void {
  reportOrNamedError(() => {
    const session = startImport({ plan, skipInvalid: true });
    for (const chunk of depots) session.feedDepots(chunk);
    session.finishDepots();
    for (const chunk of lanes) session.feedLanes(chunk);
    session.finishLanes();
    const result = session.result();
    expect(result.report.accepted + result.report.rejected).toBe(result.report.total);
    expect(formatReport(result.report).every((line) => typeof line === 'string')).toBe(true);
    planNetwork(result, { date: '2026-06-01' }, { skipInvalid: true });
  });
}

/** Random bytes decoded as the CLI decodes a file (UTF-8, replacement characters), cut into chunks. */
const byteChunks = fc.array(fc.uint8Array({ maxLength: 200 }), { maxLength: 4 }).map((parts) => {
  const decoder = new TextDecoder('utf-8', { fatal: false, ignoreBOM: true });
  return [...parts.map((p) => decoder.decode(p, { stream: true })), decoder.decode()];
});

const cell = fc.oneof(
  fc.constantFrom('', 'A', 'B', 'RTM', '12.50', '-3,00', '1.234,56 €', 'EUR', 'USD', 'toString', '__proto__', '2026-06-01', '2026-02-30', '51.9', '-181', '1e400', '9'.repeat(30), '=cmd', '"', '""', 'PT4H', '4:30', 'max 48" trailer', '\u0000', '\u001b[2J'),
  fc.string({ maxLength: 8 }),
);
const header = fc.array(fc.oneof(fc.constantFrom('id', 'name', 'lat', 'lon', 'from', 'to', 'ref', 'toll', 'toll_2axle', 'fuel', 'fees', 'rebate', 'currency', 'distance_km', 'drive_minutes', 'valid_from', 'valid_to', 'vehicle_class', 'max_height_m', 'tunnel_category', 'notes'), fc.constantFrom(...PROTOTYPE_NAMES)), { minLength: 1, maxLength: 10 });
const separator = fc.constantFrom(',', ';', '\t');
const lineEnd = fc.constantFrom('\n', '\r\n', '\r');
/** CSV-shaped text: a header and rows of plausible and hostile cells, sometimes quoted. */
const csvText = fc.tuple(header, fc.array(fc.array(fc.tuple(cell, fc.boolean()), { maxLength: 12 }), { maxLength: 12 }), separator, lineEnd).map(([h, rows, sep, end]) =>
  [h.join(sep), ...rows.map((r) => r.map(([c, quoted]) => (quoted ? `"${c.replace(/"/g, '""')}"` : c)).join(sep))].join(end) + end,
);
const chunked = (text: fc.Arbitrary<string>) =>
  fc.tuple(text, fc.array(fc.nat(), { maxLength: 3 })).map(([t, cuts]) => {
    const points = [...new Set(cuts.map((c) => c % (t.length + 1)))].sort((a, b) => a - b);
    return [0, ...points].map((p, i, all) => t.slice(p, all[i + 1] ?? t.length));
  });

describe('fuzz: the import and check path', () => {
  it('random bytes as depots and lanes files', () => {
    fc.assert(fc.property(byteChunks, byteChunks, (d, l) => check(d, l)), { seed: SEED, numRuns: 300 });
  });
  it('CSV-shaped text with hostile cells, cut into chunks anywhere', () => {
    fc.assert(
      fc.property(chunked(csvText), chunked(csvText), fc.constantFrom(undefined, '2axle', 'constructor'), (d, l, vehicleClass) => check(d, l, { vehicleClass })),
      { seed: SEED, numRuns: 400 },
    );
  });
  it('a valid depots file with fuzzed lanes', () => {
    const depots = ['id,name,lat,lon\nA,a,51,4\nB,b,52,5\nRTM,r,51.9,4.1\n'];
    fc.assert(fc.property(chunked(csvText), (l) => check(depots, l)), { seed: SEED, numRuns: 400 });
  });
});

// JSON documents: anything at all, and objects shaped like the real documents with fuzzed fields.
const anyJson = fc.jsonValue({ maxDepth: 6 });
const nasty = fc.oneof(anyJson, fc.constantFrom(...PROTOTYPE_NAMES), fc.constant(null), fc.double(), fc.constantFrom(1e400, -0, 2 ** 53 + 1));
const scenarioShaped = fc.record({
  format: fc.constantFrom('lanewright-scenario', 'lanewright-workspace', 'x'),
  version: fc.oneof(fc.constantFrom(0, 1, 2, 1.5, -1, '1'), nasty),
  name: nasty,
  description: nasty,
  changes: fc.oneof(nasty, fc.array(fc.dictionary(fc.oneof(fc.constantFrom('kind', 'lane', 'field', 'amountMinor', 'note', 'from', 'to', 'ref', 'occurrence', 'validFrom', 'validTo'), fc.constantFrom(...PROTOTYPE_NAMES)), nasty), { maxLength: 4 })),
});
const workspaceShaped = fc.tuple(fc.constantFrom(...Object.keys(JSON.parse(serializeWorkspace(emptyWorkspace())))), nasty).map(([field, value]) => {
  const doc = JSON.parse(serializeWorkspace(emptyWorkspace()));
  doc[field] = value;
  return doc;
});
const documentText = fc.oneof(
  anyJson.map((v) => JSON.stringify(v)),
  scenarioShaped.map((v) => JSON.stringify(v)),
  workspaceShaped.map((v) => JSON.stringify(v)),
  fc.string({ maxLength: 200 }),
  fc.nat({ max: 100_000 }).map((n) => '['.repeat(n) + ']'.repeat(n)),
  fc.nat({ max: 100_000 }).map((n) => '{"a":'.repeat(n) + '1' + '}'.repeat(n)),
  fc.constantFrom('{"__proto__":{"polluted":1},"format":"lanewright-scenario","version":1,"name":"x","description":null,"changes":[]}', '\ufeff{}', ''),
);

describe('fuzz: scenario and workspace reading', () => {
  it('any text as a scenario document or a workspace file', () => {
    fc.assert(
      fc.property(documentText, (text) => {
        reportOrNamedError(() => {
          const scenario = parseScenarioDocument(text, 'fuzz.json');
          // What reads back must write and read again.
          parseScenarioDocument(serializeScenarioDocument(scenario), 'again.json');
        });
        reportOrNamedError(() => void parseWorkspace(text, 'fuzz.lwspace.json'));
        expect(({} as Record<string, unknown>).polluted).toBeUndefined();
      }),
      { seed: SEED, numRuns: 600 },
    );
  });
  it('a document nested 100,000 levels deep is a named format error, not a RangeError', () => {
    const deep = '['.repeat(100_000) + ']'.repeat(100_000);
    expect(() => parseScenarioDocument(deep, 'deep.json')).toThrow(LanewrightError);
    expect(() => parseWorkspace(deep, 'deep.lwspace.json')).toThrow(LanewrightError);
  });
});
