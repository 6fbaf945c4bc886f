// Brings a workspace read from disk up to the current format version, one step per version, so a
// file saved by any earlier release still opens. Files from a newer release are refused, not guessed at.

import { WORKSPACE_VERSION } from './document';
import { WorkspaceFormatError, WorkspaceVersionError } from './errors';

/** One upgrade step: takes the raw JSON object of version n and returns version n + 1. */
export type MigrationStep = (raw: Record<string, unknown>) => Record<string, unknown>;

/**
 * Upgrade steps keyed by the version they upgrade from. Version 1 is the first released format, so
 * the table is empty; a format change adds `[n]: step` here and bumps WORKSPACE_VERSION.
 */
export const MIGRATIONS: Readonly<Record<number, MigrationStep>> = {};

/**
 * Reads `version` from a parsed workspace object and runs the upgrade steps up to `target`.
 * Returns the upgraded object and the version found.
 */
export function migrateWorkspace(
  raw: Record<string, unknown>,
  source: string,
  steps: Readonly<Record<number, MigrationStep>> = MIGRATIONS,
  target: number = WORKSPACE_VERSION,
): { raw: Record<string, unknown>; migratedFrom: number } {
  const version = raw.version;
  if (version === undefined) throw new WorkspaceFormatError(source, '/version', null, 'missing; every workspace names its format version');
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    throw new WorkspaceFormatError(source, '/version', JSON.stringify(version), 'must be a whole number from 1');
  }
  if (version > target) throw new WorkspaceVersionError(source, version, target);
  let current = raw;
  for (let v = version; v < target; v++) {
    const step = steps[v];
    if (!step) throw new WorkspaceFormatError(source, '/version', String(v), `no upgrade from version ${v} is known`);
    current = { ...step(current), version: v + 1 };
  }
  return { raw: current, migratedFrom: version };
}
