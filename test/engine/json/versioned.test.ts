import { describe, expect, it } from 'vitest';
import { NewerVersionFailure, upgradeDocument, type VersionedKind } from '../../../engine/json/versioned';
import { JsonCheckFailure } from '../../../engine/json/zod-checker';

describe('upgradeDocument', () => {
  // A made-up two-step history, to check the chain runs each step once, in order.
  const kind: VersionedKind = {
    format: 'test-doc',
    label: 'test document',
    current: 3,
    steps: {
      1: (raw) => ({ ...raw, trail: [...((raw.trail as string[]) ?? []), '1->2'] }),
      2: (raw) => ({ ...raw, trail: [...(raw.trail as string[]), '2->3'] }),
    },
  };

  it('runs every step from the file version up to the current one, in order', () => {
    const { raw, migratedFrom } = upgradeDocument({ format: 'test-doc', version: 1 }, kind);
    expect(migratedFrom).toBe(1);
    expect(raw).toEqual({ format: 'test-doc', version: 3, trail: ['1->2', '2->3'] });
    expect(upgradeDocument({ format: 'test-doc', version: 2, trail: [] }, kind).raw).toEqual({ format: 'test-doc', version: 3, trail: ['2->3'] });
  });

  it('leaves a current document untouched', () => {
    const input = { format: 'test-doc', version: 3, x: 1 };
    expect(upgradeDocument(input, kind)).toEqual({ raw: input, migratedFrom: 3 });
  });

  it('refuses newer documents with the versions named, and gaps in the chain', () => {
    const newer = (() => {
      try {
        upgradeDocument({ format: 'test-doc', version: 4 }, kind);
      } catch (error) {
        return error;
      }
    })();
    expect(newer).toBeInstanceOf(NewerVersionFailure);
    expect(newer).toMatchObject({ found: 4, supported: 3, pointer: '/version' });
    expect(() => upgradeDocument({ format: 'test-doc', version: 1 }, { ...kind, steps: { 2: kind.steps[2] } })).toThrow(JsonCheckFailure);
  });

  it('names the format marker and the version when they are wrong or missing', () => {
    const failure = (value: unknown) => {
      try {
        upgradeDocument(value, kind);
      } catch (error) {
        return error as JsonCheckFailure;
      }
      throw new Error('accepted');
    };
    expect(failure([1])).toMatchObject({ pointer: '' });
    expect(failure({ version: 1 })).toMatchObject({ pointer: '/format', value: null });
    expect(failure({ format: 'other', version: 1 })).toMatchObject({ pointer: '/format', value: '"other"' });
    expect(failure({ format: 'test-doc' })).toMatchObject({ pointer: '/version', value: null });
    for (const bad of [0, 1.5, '1', -2, null]) expect(failure({ format: 'test-doc', version: bad })).toMatchObject({ pointer: '/version' });
  });
});
