// Checks a scenario embedded in a workspace against the documented scenario shape. Interim: once
// engine/scenario exports scenarioFromJson, the workspace reader calls that instead.

import type { LaneKey, NewLane, Scenario, ScenarioChange } from './scenario-shape';
import {
  checkArray,
  checkChoice,
  checkInteger,
  checkIsoDate,
  checkObject,
  checkOptionalText,
  checkText,
  FieldCheckFailure,
} from './check';

const MAX_MINOR = Number.MAX_SAFE_INTEGER;

function checkLaneKey(value: unknown, field: string): LaneKey {
  const o = checkObject(value, field, ['from', 'to', 'ref', 'occurrence']);
  return {
    from: checkText(o.from, `${field}/from`, 200),
    to: checkText(o.to, `${field}/to`, 200),
    ref: checkOptionalText(o.ref, `${field}/ref`, 200),
    occurrence: checkInteger(o.occurrence, `${field}/occurrence`, 1, 1_000_000),
  };
}

function checkOptionalDate(value: unknown, field: string): string | null {
  return value === null ? null : checkIsoDate(value, field);
}

function checkOptionalNumber(value: unknown, field: string): number | null {
  if (value === null) return null;
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0) {
    throw new FieldCheckFailure(field, JSON.stringify(value), 'must be a number from 0, or null');
  }
  return value;
}

function checkNewLane(value: unknown, field: string): NewLane {
  const keys = ['from', 'to', 'ref', 'tollMinor', 'feesMinor', 'fuelMinor', 'rebateMinor', 'validFrom', 'validTo', 'distanceKm', 'driveMinutes'];
  const o = checkObject(value, field, keys);
  return {
    from: checkText(o.from, `${field}/from`, 200),
    to: checkText(o.to, `${field}/to`, 200),
    ref: checkOptionalText(o.ref, `${field}/ref`, 200),
    tollMinor: checkInteger(o.tollMinor, `${field}/tollMinor`, -MAX_MINOR, MAX_MINOR),
    feesMinor: checkInteger(o.feesMinor, `${field}/feesMinor`, -MAX_MINOR, MAX_MINOR),
    fuelMinor: checkInteger(o.fuelMinor, `${field}/fuelMinor`, -MAX_MINOR, MAX_MINOR),
    rebateMinor: checkInteger(o.rebateMinor, `${field}/rebateMinor`, -MAX_MINOR, MAX_MINOR),
    validFrom: checkOptionalDate(o.validFrom, `${field}/validFrom`),
    validTo: checkOptionalDate(o.validTo, `${field}/validTo`),
    distanceKm: checkOptionalNumber(o.distanceKm, `${field}/distanceKm`),
    driveMinutes: checkOptionalNumber(o.driveMinutes, `${field}/driveMinutes`),
  };
}

function checkChange(value: unknown, field: string): ScenarioChange {
  const kind = checkChoice(
    (value as { kind?: unknown } | null)?.kind,
    `${field}/kind`,
    ['set-amount', 'close-lane', 'set-validity', 'add-lane'] as const,
  );
  switch (kind) {
    case 'set-amount': {
      const o = checkObject(value, field, ['kind', 'lane', 'field', 'amountMinor', 'note']);
      return {
        kind,
        lane: checkLaneKey(o.lane, `${field}/lane`),
        field: checkChoice(o.field, `${field}/field`, ['toll', 'fuel', 'fees', 'rebate'] as const),
        amountMinor: checkInteger(o.amountMinor, `${field}/amountMinor`, -MAX_MINOR, MAX_MINOR),
        note: checkOptionalText(o.note, `${field}/note`, 2000),
      };
    }
    case 'close-lane': {
      const o = checkObject(value, field, ['kind', 'lane', 'note']);
      return { kind, lane: checkLaneKey(o.lane, `${field}/lane`), note: checkOptionalText(o.note, `${field}/note`, 2000) };
    }
    case 'set-validity': {
      const o = checkObject(value, field, ['kind', 'lane', 'validFrom', 'validTo', 'note']);
      return {
        kind,
        lane: checkLaneKey(o.lane, `${field}/lane`),
        validFrom: checkOptionalDate(o.validFrom, `${field}/validFrom`),
        validTo: checkOptionalDate(o.validTo, `${field}/validTo`),
        note: checkOptionalText(o.note, `${field}/note`, 2000),
      };
    }
    case 'add-lane': {
      const o = checkObject(value, field, ['kind', 'lane', 'note']);
      return { kind, lane: checkNewLane(o.lane, `${field}/lane`), note: checkOptionalText(o.note, `${field}/note`, 2000) };
    }
  }
}

/** Checks one embedded scenario at JSON pointer `field`; throws FieldCheckFailure. */
export function checkScenario(value: unknown, field: string): Scenario {
  const o = checkObject(value, field, ['name', 'description', 'changes']);
  return {
    name: checkText(o.name, `${field}/name`, 200),
    description: checkOptionalText(o.description, `${field}/description`, 4000),
    changes: checkArray(o.changes, `${field}/changes`, 100_000).map((c, i) => checkChange(c, `${field}/changes/${i}`)),
  };
}
