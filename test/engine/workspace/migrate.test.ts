import { describe, expect, it } from 'vitest';
import { migrateWorkspace, type MigrationStep } from '../../../engine/workspace/migrate';
import { WorkspaceFormatError, WorkspaceVersionError } from '../../../engine/workspace/errors';

describe('migrateWorkspace', () => {
  // A made-up two-step history, to check the chain runs each step once, in order.
  const steps: Record<number, MigrationStep> = {
    1: (raw) => ({ ...raw, trail: [...((raw.trail as string[]) ?? []), '1->2'] }),
    2: (raw) => ({ ...raw, trail: [...(raw.trail as string[]), '2->3'] }),
  };

  it('runs every step from the file version up to the target, in order', () => {
    const { raw, migratedFrom } = migrateWorkspace({ version: 1 }, 'f', steps, 3);
    expect(migratedFrom).toBe(1);
    expect(raw).toEqual({ version: 3, trail: ['1->2', '2->3'] });
    expect(migrateWorkspace({ version: 2, trail: [] }, 'f', steps, 3).raw).toEqual({ version: 3, trail: ['2->3'] });
  });

  it('leaves a current file untouched', () => {
    const input = { version: 3, x: 1 };
    expect(migrateWorkspace(input, 'f', steps, 3)).toEqual({ raw: input, migratedFrom: 3 });
  });

  it('refuses newer files and gaps in the chain', () => {
    expect(() => migrateWorkspace({ version: 4 }, 'f', steps, 3)).toThrow(WorkspaceVersionError);
    expect(() => migrateWorkspace({ version: 1 }, 'f', { 2: steps[2] }, 3)).toThrow(WorkspaceFormatError);
  });
});
