// Small field checkers for hand-validated JSON: each names the JSON pointer of what it refuses, so a
// broken workspace or IPC payload is reported as "field /settings/maxLegs value -1: reason".

import { readIsoDate } from '../import/cells';

/** Raised by the checkers; callers wrap it in their own named error with the file or channel. */
export class FieldCheckFailure extends Error {
  constructor(
    readonly field: string,
    readonly value: string | null,
    readonly reason: string,
  ) {
    super(`${field}: ${reason}`);
    this.name = 'FieldCheckFailure';
  }
}

/** Short printable form of a value for error messages (long strings and objects are cut). */
export function showValue(value: unknown): string {
  let text: string;
  try {
    text = JSON.stringify(value) ?? String(value);
  } catch {
    text = String(value);
  }
  return text.length > 60 ? `${text.slice(0, 57)}...` : text;
}

function fail(field: string, value: unknown, reason: string): never {
  throw new FieldCheckFailure(field, value === undefined ? null : showValue(value), reason);
}

/** A plain object whose keys are exactly `required` plus any of `optional`; anything else is refused. */
export function checkObject(
  value: unknown,
  field: string,
  required: readonly string[],
  optional: readonly string[] = [],
): Record<string, unknown> {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) fail(field, value, 'must be an object');
  const record = value as Record<string, unknown>;
  for (const key of Object.keys(record)) {
    if (!required.includes(key) && !optional.includes(key)) fail(`${field}/${key}`, record[key], 'unknown field');
  }
  for (const key of required) {
    if (!(key in record)) fail(`${field}/${key}`, undefined, 'missing');
  }
  return record;
}

/** A string of 1..maxLength characters with no control characters. */
export function checkText(value: unknown, field: string, maxLength: number): string {
  if (typeof value !== 'string') fail(field, value, 'must be text');
  if (value.length === 0) fail(field, value, 'must not be empty');
  if (value.length > maxLength) fail(field, value, `longer than ${maxLength} characters`);
  // eslint-disable-next-line no-control-regex -- control characters are exactly what this refuses
  if (/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/.test(value)) fail(field, value, 'contains control characters');
  return value;
}

/** Like checkText, but null is allowed. */
export function checkOptionalText(value: unknown, field: string, maxLength: number): string | null {
  return value === null ? null : checkText(value, field, maxLength);
}

/** A whole number in [min, max]. */
export function checkInteger(value: unknown, field: string, min: number, max: number): number {
  if (typeof value !== 'number' || !Number.isInteger(value)) fail(field, value, 'must be a whole number');
  if (value < min || value > max) fail(field, value, `must be from ${min} to ${max}`);
  return value;
}

/** A boolean. */
export function checkBoolean(value: unknown, field: string): boolean {
  if (typeof value !== 'boolean') fail(field, value, 'must be true or false');
  return value;
}

/** One of the listed strings. */
export function checkChoice<T extends string>(value: unknown, field: string, choices: readonly T[]): T {
  if (typeof value !== 'string' || !(choices as readonly string[]).includes(value)) {
    fail(field, value, `must be one of ${choices.join(', ')}`);
  }
  return value as T;
}

/** An array of at most maxItems entries. */
export function checkArray(value: unknown, field: string, maxItems: number): unknown[] {
  if (!Array.isArray(value)) fail(field, value, 'must be a list');
  if (value.length > maxItems) fail(field, `${value.length} entries`, `more than ${maxItems} entries`);
  return value;
}

const DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** An ISO 8601 calendar date (YYYY-MM-DD) that exists (no 2026-02-30). */
export function checkIsoDate(value: unknown, field: string): string {
  if (typeof value !== 'string' || !DATE.test(value)) fail(field, value, 'must be an ISO 8601 date, YYYY-MM-DD');
  if (readIsoDate(value) === null) fail(field, value, 'is not a calendar date');
  return value;
}

const TIMESTAMP = /^(\d{4}-\d{2}-\d{2})T([01]\d|2[0-3]):[0-5]\d:[0-5]\d(\.\d{1,9})?(Z|[+-]([01]\d|2[0-3]):[0-5]\d)$/;

/** An ISO 8601 timestamp with a time zone (what Date.prototype.toISOString writes). */
export function checkIsoTimestamp(value: unknown, field: string): string {
  const match = typeof value === 'string' ? TIMESTAMP.exec(value) : null;
  if (!match) fail(field, value, 'must be an ISO 8601 timestamp with a time zone, e.g. 2026-03-01T08:30:00Z');
  checkIsoDate(match[1], field);
  return value as string;
}
