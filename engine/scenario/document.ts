// The scenario file: a versioned JSON document. Reading checks every field with the one JSON checker
// (engine/json) and names the one that is wrong by its JSON pointer ("/changes/2/lane/occurrence");
// unknown fields are refused as everywhere; older versions are upgraded on read (engine/json/versioned),
// newer ones are refused rather than half understood. Writing always produces the current version.

import { ScenarioFormatError } from '../errors';
import { checkJson, json, JsonCheckFailure, parseJsonText } from '../json/zod-checker';
import { upgradeDocument, type UpgradeStep, type VersionedKind } from '../json/versioned';
import { SCENARIO_CHANGE_KINDS, type Scenario, type ScenarioChange } from './types';

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
const SCENARIO_UPGRADES: Readonly<Record<number, UpgradeStep>> = {
  1: (doc) => ({ ...doc, changes: withTollClasses(doc.changes) }),
};

const SCENARIO_KIND: VersionedKind = { format: SCENARIO_FORMAT, label: 'scenario', current: SCENARIO_VERSION, steps: SCENARIO_UPGRADES };

/** Reads a scenario file's text. Throws ScenarioFormatError naming `source` and the field (a JSON pointer). */
export function parseScenarioDocument(text: string, source = 'scenario'): Scenario {
  let value: unknown;
  try {
    value = parseJsonText(text);
  } catch (error) {
    if (error instanceof JsonCheckFailure) throw new ScenarioFormatError(source, error.pointer, error.value, error.reason);
    throw error;
  }
  return scenarioFromJson(value, source);
}

/** The file text for a scenario (current version, two-space indented, ending in a newline). */
export function serializeScenarioDocument(scenario: Scenario): string {
  return JSON.stringify(scenarioToJson(scenario), null, 2) + '\n';
}

/** The JSON object for a scenario embedded in another document; validates it first. */
export function scenarioToJson(scenario: Scenario): ScenarioDocument {
  const checked = readScenarioOrThrow({ format: SCENARIO_FORMAT, version: SCENARIO_VERSION, ...scenario, changes: withTollClasses(scenario.changes) });
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
  try {
    const { raw } = upgradeDocument(value, SCENARIO_KIND);
    return readScenario(raw);
  } catch (error) {
    if (error instanceof JsonCheckFailure) throw new ScenarioFormatError(source, error.pointer, error.value, error.reason);
    throw error;
  }
}

// The pieces of a scenario, in the JSON checker's terms (engine/json/zod-checker.ts).
const requiredText = json.anyText(10_000).refine((s) => s.trim() !== '', { error: 'must not be empty' });
const optionalText = json.optional(json.nullable(json.anyText(10_000)), null);
const amount = json
  .integer(-Number.MAX_SAFE_INTEGER, Number.MAX_SAFE_INTEGER)
  .refine((v) => v >= 0, { error: 'must not be negative (a rebate is entered as a positive credit)' })
  .transform((v) => (v === 0 ? 0 : v));
const optionalDate = json.optional(json.nullable(json.isoDate()), null);
const measure = json.optional(json.nullable(json.number(0, Number.MAX_VALUE)), null);
const laneKey = json.object({
  from: requiredText,
  to: requiredText,
  ref: optionalText.transform((r) => (r === '' ? null : r)),
  occurrence: json.integer(1, Number.MAX_SAFE_INTEGER),
});
const note = optionalText;

// validTo on or after validFrom (ISO dates compare as text).
const validityInOrder = (v: { validFrom: string | null; validTo: string | null }) => v.validFrom === null || v.validTo === null || v.validFrom <= v.validTo;
const validityReason = 'is before validFrom';

const setAmount = json
  .object({ kind: json.exactly('set-amount', ''), lane: laneKey, field: json.choice(['toll', 'fuel', 'fees', 'rebate']), amountMinor: amount, vehicleClass: json.optional(json.nullable(json.anyText(200)), undefined), note })
  .superRefine((c, ctx) => {
    if (c.field !== 'toll' && c.vehicleClass !== undefined && c.vehicleClass !== null) ctx.addIssue({ code: 'custom', path: ['vehicleClass'], message: 'only a toll change names a vehicle class' });
    if (c.field === 'toll' && c.vehicleClass === undefined) ctx.addIssue({ code: 'custom', path: ['vehicleClass'], message: 'a toll change names its vehicle class, or null for every class' });
  });
const closeLane = json.object({ kind: json.exactly('close-lane', ''), lane: laneKey, note });
const setValidity = json
  .object({ kind: json.exactly('set-validity', ''), lane: laneKey, validFrom: optionalDate, validTo: optionalDate, note })
  .refine(validityInOrder, { error: validityReason, path: ['validTo'] });
const addLane = json.object({
  kind: json.exactly('add-lane', ''),
  lane: json
    .object({
      from: requiredText,
      to: requiredText,
      ref: optionalText.transform((r) => (r === '' ? null : r)),
      tollMinor: json.optional(amount, 0),
      fuelMinor: json.optional(amount, 0),
      feesMinor: json.optional(amount, 0),
      rebateMinor: json.optional(amount, 0),
      validFrom: optionalDate,
      validTo: optionalDate,
      distanceKm: measure,
      driveMinutes: measure,
    })
    .refine(validityInOrder, { error: validityReason, path: ['validTo'] }),
  note,
});

const scenarioSchema = json.object({
  format: json.exactly(SCENARIO_FORMAT, `must be "${SCENARIO_FORMAT}"`),
  version: json.exactly(SCENARIO_VERSION, `must be ${SCENARIO_VERSION}`),
  name: requiredText,
  description: optionalText,
  changes: json.list(json.oneOf('kind', [setAmount, closeLane, setValidity, addLane], `must be one of ${SCENARIO_CHANGE_KINDS.join(', ')}`), 100_000),
});

function readScenario(doc: Record<string, unknown>): Scenario {
  const checked = checkJson(scenarioSchema, doc);
  const changes = checked.changes.map((c): ScenarioChange => {
    if (c.kind !== 'set-amount') return c;
    const { vehicleClass, ...rest } = c;
    if (c.field !== 'toll') return rest;
    return { ...rest, vehicleClass: vehicleClass === '' ? null : (vehicleClass ?? null) };
  });
  return { name: checked.name, description: checked.description, changes };
}

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

// scenarioToJson checks what it writes: a scenario made in memory that breaks the rules is refused.
function readScenarioOrThrow(doc: Record<string, unknown>): Scenario {
  try {
    return readScenario(doc);
  } catch (error) {
    if (error instanceof JsonCheckFailure) throw new ScenarioFormatError('scenario', error.pointer, error.value, error.reason);
    throw error;
  }
}
