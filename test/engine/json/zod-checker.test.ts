import { describe, expect, it } from 'vitest';
import { checkJson, json, JsonCheckFailure, parseJsonText } from '../../../engine/json/zod-checker';

const failure = (run: () => unknown): JsonCheckFailure => {
  try {
    run();
  } catch (error) {
    if (error instanceof JsonCheckFailure) return error;
    throw error;
  }
  throw new Error('accepted');
};

const schema = json.object({
  name: json.text(10),
  count: json.integer(1, 5),
  when: json.nullable(json.isoDate()),
  tags: json.list(json.choice(['a', 'b']), 2),
  inner: json.object({ 'a/b~c': json.boolean() }),
});

const good = () => ({ name: 'x', count: 2, when: null, tags: ['a'], inner: { 'a/b~c': true } });

describe('checkJson', () => {
  it('returns a copy holding only the known fields', () => {
    const value = good();
    const checked = checkJson(schema, value);
    expect(checked).toEqual(value);
    expect(checked).not.toBe(value);
  });

  it('names missing and unknown fields by their JSON pointer (RFC 6901 escapes ~ and /)', () => {
    const { count: _count, ...noCount } = good();
    expect(failure(() => checkJson(schema, noCount))).toMatchObject({ pointer: '/count', value: null, reason: 'missing' });
    expect(failure(() => checkJson(schema, { ...good(), colour: 'red' }))).toMatchObject({ pointer: '/colour', value: '"red"', reason: 'unknown field' });
    expect(failure(() => checkJson(schema, { ...good(), inner: { 'a/b~c': 1 } }))).toMatchObject({ pointer: '/inner/a~1b~0c', value: '1' });
    expect(failure(() => checkJson(schema, { ...good(), tags: ['a', 'z'] }))).toMatchObject({ pointer: '/tags/1', reason: 'must be one of a, b' });
  });

  it('treats a "__proto__" member of parsed JSON as an unknown own field, not as the prototype', () => {
    const value = JSON.parse('{"name":"x","count":2,"when":null,"tags":[],"inner":{"a/b~c":false},"__proto__":{"count":9}}');
    expect(failure(() => checkJson(schema, value))).toMatchObject({ pointer: '/__proto__', reason: 'unknown field' });
  });

  it('refuses wrong types, ranges, empty and control-character text, and impossible dates', () => {
    expect(failure(() => checkJson(schema, { ...good(), count: 2.5 }))).toMatchObject({ pointer: '/count', value: '2.5' });
    expect(failure(() => checkJson(schema, { ...good(), count: 6 }))).toMatchObject({ pointer: '/count', reason: 'must be from 1 to 5' });
    expect(failure(() => checkJson(schema, { ...good(), count: '2' }))).toMatchObject({ pointer: '/count', reason: 'must be a whole number' });
    expect(failure(() => checkJson(schema, { ...good(), name: '' }))).toMatchObject({ pointer: '/name', reason: 'must not be empty' });
    expect(failure(() => checkJson(schema, { ...good(), name: 'a\u0007b' }))).toMatchObject({ pointer: '/name', reason: 'contains control characters' });
    expect(failure(() => checkJson(schema, { ...good(), name: 'x'.repeat(11) }))).toMatchObject({ pointer: '/name' });
    expect(failure(() => checkJson(schema, { ...good(), when: '2026-02-30' }))).toMatchObject({ pointer: '/when', reason: 'is not a calendar date' });
    expect(failure(() => checkJson(schema, { ...good(), when: '2026-2-3' }))).toMatchObject({ pointer: '/when' });
    expect(failure(() => checkJson(schema, { ...good(), tags: ['a', 'b', 'a'] }))).toMatchObject({ pointer: '/tags', reason: 'more than 2 entries' });
    expect(failure(() => checkJson(schema, 'text'))).toMatchObject({ pointer: '', reason: 'must be an object' });
  });

  it('reads leap days by the Gregorian rule', () => {
    expect(checkJson(json.isoDate(), '2024-02-29')).toBe('2024-02-29');
    expect(checkJson(json.isoDate(), '2000-02-29')).toBe('2000-02-29');
    expect(failure(() => checkJson(json.isoDate(), '2100-02-29')).reason).toBe('is not a calendar date');
  });

  it('accepts timestamps with a time zone only', () => {
    expect(checkJson(json.isoTimestamp(), '2026-03-01T08:30:00Z')).toBe('2026-03-01T08:30:00Z');
    expect(checkJson(json.isoTimestamp(), '2026-03-01T08:30:00.123+01:00')).toBe('2026-03-01T08:30:00.123+01:00');
    for (const bad of ['2026-03-01 08:30', '2026-03-01T08:30:00', '2026-02-30T08:30:00Z', '2026-03-01T24:00:00Z']) {
      expect(() => checkJson(json.isoTimestamp(), bad)).toThrow(JsonCheckFailure);
    }
  });
});

describe('parseJsonText', () => {
  it('allows a byte-order mark and names bad JSON as a failure of the whole document', () => {
    expect(parseJsonText('\ufeff{"a":1}')).toEqual({ a: 1 });
    expect(failure(() => parseJsonText('{"a":'))).toMatchObject({ pointer: '', value: null });
  });
});
