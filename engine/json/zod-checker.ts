// The one JSON checker: workspace files, scenario files, the recent-files list and IPC payloads are
// all checked by schemas built here, so every refusal names its place the same way (a JSON pointer,
// RFC 6901), shows the value the same way, and treats unknown fields the same way (refused).
// zod is the library (chosen over ajv and valibot: schemas are TypeScript values whose output types
// are inferred, so a document's type and its check cannot drift apart); only this file imports it.

import { z } from 'zod';
import { readIsoDate } from '../text/iso-date';

/** A schema for a value of type T (what the builders below return). */
export type JsonSchema<T> = z.ZodType<T>;
/** The checked type of a schema. */
export type Checked<S extends z.ZodType> = z.output<S>;

/** Raised by checkJson; callers wrap it in their own named error naming the file or channel. */
export class JsonCheckFailure extends Error {
  constructor(
    /** JSON pointer of the offending value ('' = the whole document). */
    readonly pointer: string,
    /** The offending value as short text, or null when it is missing. */
    readonly value: string | null,
    readonly reason: string,
  ) {
    super(`${pointer === '' ? 'document' : pointer}: ${reason}`);
    this.name = 'JsonCheckFailure';
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

// RFC 6901: "~" and "/" inside a member name are escaped.
const pointerOf = (path: readonly PropertyKey[]): string =>
  path.map((key) => `/${String(key).replace(/~/g, '~0').replace(/\//g, '~1')}`).join('');

/** The value at `path` in `root`, and whether it is there (own properties only). */
function valueAt(root: unknown, path: readonly PropertyKey[]): { present: boolean; value: unknown } {
  let current: unknown = root;
  for (const key of path) {
    if (typeof current !== 'object' || current === null || !Object.prototype.hasOwnProperty.call(current, key)) return { present: false, value: undefined };
    current = (current as Record<PropertyKey, unknown>)[key];
  }
  return { present: true, value: current };
}

/** The first problem zod found, in the project's words. */
function failureOf(issue: z.core.$ZodIssue, root: unknown): JsonCheckFailure {
  if (issue.code === 'unrecognized_keys') {
    const path = [...issue.path, issue.keys[0]];
    return new JsonCheckFailure(pointerOf(path), showValue(valueAt(root, path).value), 'unknown field');
  }
  const { present, value } = valueAt(root, issue.path);
  if (!present) return new JsonCheckFailure(pointerOf(issue.path), null, 'missing');
  return new JsonCheckFailure(pointerOf(issue.path), showValue(value), issue.message);
}

/**
 * Checks `value` against `schema`; returns the checked copy (only known fields survive) or throws a
 * JsonCheckFailure for the first problem, named by its JSON pointer.
 */
export function checkJson<T>(schema: JsonSchema<T>, value: unknown): T {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  throw failureOf(result.error.issues[0], value);
}

/**
 * Deepest nesting of arrays and objects a document may have. Lanewright's documents nest about six
 * levels; checking a value nested 100,000 levels deep overflowed the stack (a RangeError).
 */
export const MAX_JSON_DEPTH = 64;

/** Throws a SyntaxError when `text` nests arrays/objects deeper than MAX_JSON_DEPTH (strings skipped). */
export function checkJsonDepth(text: string): void {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 92) i++; // backslash: skip the escaped character
      else if (c === 34) inString = false;
    } else if (c === 34) inString = true;
    else if (c === 91 || c === 123) {
      if (++depth > MAX_JSON_DEPTH) throw new SyntaxError(`nested deeper than ${MAX_JSON_DEPTH} levels at character ${i + 1}`);
    } else if (c === 93 || c === 125) depth--;
  }
}

/** Parses JSON text (a leading byte-order mark is allowed); bad JSON is a JsonCheckFailure on ''. */
export function parseJsonText(text: string): unknown {
  try {
    checkJsonDepth(text);
    return JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  } catch (error) {
    throw new JsonCheckFailure('', null, `not valid JSON (${(error as Error).message})`);
  }
}

// eslint-disable-next-line no-control-regex -- control characters are exactly what text fields refuse
const CONTROL = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/;
const DATE = /^\d{4}-\d{2}-\d{2}$/;
const TIMESTAMP = /^(\d{4}-\d{2}-\d{2})T([01]\d|2[0-3]):[0-5]\d:[0-5]\d(\.\d{1,9})?(Z|[+-]([01]\d|2[0-3]):[0-5]\d)$/;

/** The building blocks of every schema; their messages are the reasons users read. */
export const json = {
  /** An object with exactly these fields (missing ones are "missing", extra ones "unknown field"). */
  object<S extends z.ZodRawShape>(shape: S) {
    return z.strictObject(shape, { error: 'must be an object' });
  },
  /** Text of 1..maxLength characters without control characters. */
  text(maxLength: number) {
    return z
      .string({ error: 'must be text' })
      .min(1, { error: 'must not be empty' })
      .max(maxLength, { error: `longer than ${maxLength} characters` })
      .refine((s) => !CONTROL.test(s), { error: 'contains control characters' });
  },
  /** Text of up to maxLength characters, possibly empty (notes, descriptions). */
  anyText(maxLength: number) {
    return z.string({ error: 'must be text' }).max(maxLength, { error: `longer than ${maxLength} characters` });
  },
  /** A whole number in [min, max]. */
  integer(min: number, max: number) {
    return z
      .number({ error: 'must be a whole number' })
      .refine((n) => Number.isSafeInteger(n), { error: 'must be a whole number' })
      .refine((n) => n >= min && n <= max, { error: `must be from ${min} to ${max}` });
  },
  /** A finite number in [min, max]. */
  number(min: number, max: number) {
    return z
      .number({ error: 'must be a number' })
      .refine((n) => Number.isFinite(n) && n >= min && n <= max, { error: `must be a number from ${min} to ${max}` });
  },
  boolean() {
    return z.boolean({ error: 'must be true or false' });
  },
  /** One of the listed strings. */
  choice<const T extends readonly [string, ...string[]]>(choices: T) {
    return z.enum(choices, { error: `must be one of ${choices.join(', ')}` });
  },
  /** Exactly this value. */
  exactly<const T extends string | number>(value: T, reason: string) {
    return z.literal(value, { error: reason });
  },
  /** A list of at most maxItems entries. */
  list<S extends z.ZodType>(item: S, maxItems: number) {
    return z.array(item, { error: 'must be a list' }).max(maxItems, { error: `more than ${maxItems} entries` });
  },
  /** An ISO 8601 calendar date that exists (no 2026-02-30). */
  isoDate() {
    return z
      .string({ error: 'must be an ISO 8601 date, YYYY-MM-DD' })
      .refine((s) => DATE.test(s), { error: 'must be an ISO 8601 date, YYYY-MM-DD' })
      .refine((s) => readIsoDate(s) !== null, { error: 'is not a calendar date' });
  },
  /** An ISO 8601 timestamp with a time zone (what Date.prototype.toISOString writes). */
  isoTimestamp() {
    const reason = 'must be an ISO 8601 timestamp with a time zone, e.g. 2026-03-01T08:30:00Z';
    return z
      .string({ error: reason })
      .refine((s) => {
        const m = TIMESTAMP.exec(s);
        return m !== null && readIsoDate(m[1]) !== null;
      }, { error: reason });
  },
  /** Any JSON value, checked later by its own reader (e.g. an embedded scenario). */
  anything() {
    return z.unknown();
  },
  /** The schema, or `fallback` when the field is absent. */
  optional<S extends z.ZodType, F extends z.output<S> | undefined>(schema: S, fallback: F) {
    return schema.optional().transform((v) => (v === undefined ? fallback : v));
  },
  /** The schema, or null. */
  nullable<S extends z.ZodType>(schema: S) {
    return schema.nullable();
  },
  /**
   * The schema, null, or missing: a field added to a document version after files of that version
   * were written (older files stay valid; the checked copy leaves it out when the file does).
   */
  optionalNullable<S extends z.ZodType>(schema: S) {
    return schema.nullable().optional();
  },
  /** One of several object shapes chosen by the value of `key` (e.g. a change's `kind`). */
  oneOf<K extends string, const O extends readonly [z.core.$ZodTypeDiscriminable, ...z.core.$ZodTypeDiscriminable[]]>(key: K, options: O, reason: string) {
    return z.discriminatedUnion(key, options, { error: reason });
  },
};
