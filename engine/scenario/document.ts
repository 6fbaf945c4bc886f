// The scenario file: a versioned JSON document. Reading checks every field and names the one that
// is wrong (e.g. "changes[2].lane.occurrence"); older versions are migrated on read, newer ones are
// refused rather than half understood. Writing always produces the current version.

import { ScenarioFormatError } from '../errors';
import { readIsoDate } from '../import/cells';
import type { LaneKey } from '../import/lane-key';
import { SCENARIO_AMOUNT_FIELDS, SCENARIO_CHANGE_KINDS, type NewLane, type Scenario, type ScenarioAmountField, type ScenarioChange } from './types';

export const SCENARIO_FORMAT = 'lanewright-scenario';
export const SCENARIO_VERSION = 2;

/** The document as stored: format tag, version, then the scenario's own fields. */
export interface ScenarioDocument extends Scenario {
  format: typeof SCENARIO_FORMAT;
  version: typeof SCENARIO_VERSION;
}

/**
 * Upgrades from version k to k + 1, indexed by k. Version 2 gave a toll change its vehicle class;
 * a version 1 toll change meant "the toll", which every class then got, so it reads as every class.
 */
const MIGRATIONS: Record<number, (doc: Record<string, unknown>) => Record<string, unknown>> = {
  1: (doc) => ({ ...doc, changes: withTollClasses(doc.changes) }),
};

/** Reads a scenario file's text. Throws ScenarioFormatError naming `source` and the field. */
export function parseScenarioDocument(text: string, source = 'scenario'): Scenario {
  let value: unknown;
  try {
    value = JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  } catch (error) {
    throw new ScenarioFormatError(source, '', null, `not valid JSON (${(error as Error).message})`);
  }
  return scenarioFromJson(value, source);
}

/** The file text for a scenario (current version, two-space indented, ending in a newline). */
export function serializeScenarioDocument(scenario: Scenario): string {
  return JSON.stringify(scenarioToJson(scenario), null, 2) + '\n';
}

/** The JSON object for a scenario embedded in another document; validates it first. */
export function scenarioToJson(scenario: Scenario): ScenarioDocument {
  const checked = readScenario({ format: SCENARIO_FORMAT, version: SCENARIO_VERSION, ...scenario, changes: withTollClasses(scenario.changes) }, 'scenario');
  return { format: SCENARIO_FORMAT, version: SCENARIO_VERSION, ...checked };
}

/**
 * In memory a toll change may leave its class out (= every class, as `Scenario` allows); a document
 * always says so. Anything that is not a list of such changes is returned as it is, for the reader to refuse.
 */
export function withTollClasses(changes: unknown): unknown {
  if (!Array.isArray(changes)) return changes;
  return changes.map((c: unknown) => (isObject(c) && c.kind === 'set-amount' && c.field === 'toll' && c.vehicleClass === undefined ? { ...c, vehicleClass: null } : c));
}

/** Reads a scenario from parsed JSON (a file or a workspace entry), migrating older versions. */
export function scenarioFromJson(value: unknown, source = 'scenario'): Scenario {
  if (!isObject(value)) throw new ScenarioFormatError(source, '', show(value), 'a scenario must be a JSON object');
  if (value.format !== SCENARIO_FORMAT) throw new ScenarioFormatError(source, 'format', show(value.format), `must be "${SCENARIO_FORMAT}"`);
  const version = value.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    throw new ScenarioFormatError(source, 'version', show(version), 'must be a whole number from 1');
  }
  if (version > SCENARIO_VERSION) {
    throw new ScenarioFormatError(source, 'version', show(version), `written by a newer Lanewright (this one reads up to version ${SCENARIO_VERSION})`);
  }
  let doc: Record<string, unknown> = value;
  for (let v = version; v < SCENARIO_VERSION; v++) doc = { ...MIGRATIONS[v](doc), version: v + 1 };
  return readScenario(doc, source);
}

function readScenario(doc: Record<string, unknown>, source: string): Scenario {
  const fail = (path: string, v: unknown, reason: string): never => {
    throw new ScenarioFormatError(source, path, show(v), reason);
  };
  const text = (v: unknown, path: string, nullable: boolean): string | null => {
    if (v === undefined || v === null) return nullable ? null : fail(path, v, 'is required');
    if (typeof v !== 'string') return fail(path, v, 'must be text');
    if (!nullable && v.trim() === '') return fail(path, v, 'must not be empty');
    return v;
  };
  const amount = (v: unknown, path: string): number => {
    if (typeof v !== 'number' || !Number.isSafeInteger(v)) return fail(path, v, 'must be a whole number of minor units');
    if (v < 0) return fail(path, v, 'must not be negative (a rebate is entered as a positive credit)');
    return v === 0 ? 0 : v;
  };
  const date = (v: unknown, path: string): string | null => {
    if (v === undefined || v === null) return null;
    if (typeof v !== 'string' || readIsoDate(v) === null) return fail(path, v, 'must be an ISO 8601 date YYYY-MM-DD or null');
    return v;
  };
  const measure = (v: unknown, path: string): number | null => {
    if (v === undefined || v === null) return null;
    if (typeof v !== 'number' || !Number.isFinite(v) || v < 0) return fail(path, v, 'must be a number >= 0 or null');
    return v;
  };
  const laneKey = (v: unknown, path: string): LaneKey => {
    if (!isObject(v)) return fail(path, v, 'must be an object {from, to, ref, occurrence}');
    const occurrence = v.occurrence;
    if (typeof occurrence !== 'number' || !Number.isSafeInteger(occurrence) || occurrence < 1) {
      fail(`${path}.occurrence`, occurrence, 'must be a whole number from 1');
    }
    const ref = text(v.ref, `${path}.ref`, true);
    return { from: text(v.from, `${path}.from`, false)!, to: text(v.to, `${path}.to`, false)!, ref: ref === '' ? null : ref, occurrence: occurrence as number };
  };
  const validity = (from: unknown, to: unknown, path: string) => {
    const validFrom = date(from, `${path}.validFrom`);
    const validTo = date(to, `${path}.validTo`);
    if (validFrom !== null && validTo !== null && validFrom > validTo) fail(`${path}.validTo`, validTo, `is before validFrom ${validFrom}`);
    return { validFrom, validTo };
  };

  const name = text(doc.name, 'name', false)!;
  const description = text(doc.description, 'description', true);
  if (!Array.isArray(doc.changes)) fail('changes', doc.changes, 'must be a list');
  const changes = (doc.changes as unknown[]).map((c, i): ScenarioChange => {
    const path = `changes[${i}]`;
    if (!isObject(c)) return fail(path, c, 'must be an object');
    const note = text(c.note, `${path}.note`, true);
    switch (c.kind) {
      case 'set-amount': {
        if (!SCENARIO_AMOUNT_FIELDS.includes(c.field as never)) fail(`${path}.field`, c.field, `must be one of ${SCENARIO_AMOUNT_FIELDS.join(', ')}`);
        const field = c.field as ScenarioAmountField;
        const lane = laneKey(c.lane, `${path}.lane`);
        const amountMinor = amount(c.amountMinor, `${path}.amountMinor`);
        if (field !== 'toll') {
          if (c.vehicleClass !== undefined && c.vehicleClass !== null) fail(`${path}.vehicleClass`, c.vehicleClass, 'only a toll change names a vehicle class');
          return { kind: 'set-amount', lane, field, amountMinor, note };
        }
        if (c.vehicleClass === undefined) fail(`${path}.vehicleClass`, c.vehicleClass, 'a toll change names its vehicle class, or null for every class');
        const vehicleClass = text(c.vehicleClass, `${path}.vehicleClass`, true);
        return { kind: 'set-amount', lane, field, amountMinor, vehicleClass: vehicleClass === '' ? null : vehicleClass, note };
      }
      case 'close-lane':
        return { kind: 'close-lane', lane: laneKey(c.lane, `${path}.lane`), note };
      case 'set-validity':
        return { kind: 'set-validity', lane: laneKey(c.lane, `${path}.lane`), ...validity(c.validFrom, c.validTo, path), note };
      case 'add-lane': {
        const l = c.lane;
        const p = `${path}.lane`;
        if (!isObject(l)) return fail(p, l, 'must be an object describing the new lane');
        const ref = text(l.ref, `${p}.ref`, true);
        const lane: NewLane = {
          from: text(l.from, `${p}.from`, false)!,
          to: text(l.to, `${p}.to`, false)!,
          ref: ref === '' ? null : ref,
          tollMinor: amount(l.tollMinor ?? 0, `${p}.tollMinor`),
          fuelMinor: amount(l.fuelMinor ?? 0, `${p}.fuelMinor`),
          feesMinor: amount(l.feesMinor ?? 0, `${p}.feesMinor`),
          rebateMinor: amount(l.rebateMinor ?? 0, `${p}.rebateMinor`),
          ...validity(l.validFrom, l.validTo, p),
          distanceKm: measure(l.distanceKm, `${p}.distanceKm`),
          driveMinutes: measure(l.driveMinutes, `${p}.driveMinutes`),
        };
        return { kind: 'add-lane', lane, note };
      }
      default:
        return fail(`${path}.kind`, c.kind, `must be one of ${SCENARIO_CHANGE_KINDS.join(', ')}`);
    }
  });
  return { name, description, changes };
}

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function show(v: unknown): string | null {
  if (v === undefined) return null;
  const s = JSON.stringify(v) ?? String(v);
  return s.length > 60 ? s.slice(0, 57) + '...' : s;
}
