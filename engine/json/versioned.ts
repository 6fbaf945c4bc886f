// Versioned JSON documents (workspaces, scenarios): a `format` marker, a whole-number `version`, and
// one upgrade step per version, so a file saved by any earlier release still opens. A file from a
// newer release is refused, never half understood. One table of steps per document kind.

import { JsonCheckFailure, showValue } from './zod-checker';

/** One upgrade step: the raw JSON object of version n in, version n + 1 out. */
export type UpgradeStep = (raw: Record<string, unknown>) => Record<string, unknown>;

export interface VersionedKind {
  /** The `format` value that marks this kind of document. */
  format: string;
  /** What users call it, for messages ("workspace", "scenario"). */
  label: string;
  /** The version this build writes. */
  current: number;
  /** Upgrade steps keyed by the version they upgrade from. */
  steps: Readonly<Record<number, UpgradeStep>>;
}

/** A document written by a newer release than this one. */
export class NewerVersionFailure extends JsonCheckFailure {
  constructor(
    readonly found: number,
    readonly supported: number,
  ) {
    super('/version', String(found), `written by a newer Lanewright (format version ${found}; this build reads up to ${supported})`);
  }
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/**
 * Checks the format marker and version of a parsed document and runs the upgrade steps up to the
 * current version. Returns the upgraded raw object (still to be checked by the kind's schema).
 */
export function upgradeDocument(value: unknown, kind: VersionedKind): { raw: Record<string, unknown>; migratedFrom: number } {
  if (!isObject(value)) throw new JsonCheckFailure('', showValue(value), `a ${kind.label} must be a JSON object`);
  if (value.format !== kind.format) {
    throw new JsonCheckFailure('/format', value.format === undefined ? null : showValue(value.format), `must be "${kind.format}"; this is not a Lanewright ${kind.label}`);
  }
  const version = value.version;
  if (version === undefined) throw new JsonCheckFailure('/version', null, `missing; every ${kind.label} names its format version`);
  if (typeof version !== 'number' || !Number.isSafeInteger(version) || version < 1) {
    throw new JsonCheckFailure('/version', showValue(version), 'must be a whole number from 1');
  }
  if (version > kind.current) throw new NewerVersionFailure(version, kind.current);
  let raw = value;
  for (let v = version; v < kind.current; v++) {
    const step = kind.steps[v];
    if (!step) throw new JsonCheckFailure('/version', String(v), `no upgrade from version ${v} is known`);
    raw = { ...step(raw), version: v + 1 };
  }
  return { raw, migratedFrom: version };
}
