// Named errors for workspace files. A workspace is the dispatcher's saved work, so every refusal
// says which file, which field (as a JSON pointer) and why, and nothing is silently dropped.

import { LanewrightError } from '../errors';

/** A workspace file that is not valid JSON or breaks the document's rules. */
export class WorkspaceFormatError extends LanewrightError {
  constructor(
    readonly source: string,
    /** JSON pointer of the offending field ('' = the whole document). */
    readonly field: string,
    /** The offending value as short text, or null when the field is missing. */
    readonly value: string | null,
    readonly reason: string,
  ) {
    super(`workspace ${source}: ${field === '' ? 'document' : `field ${field}`}${value === null ? '' : ` value ${value}`}: ${reason}`);
  }
}

/** A workspace written by a newer Lanewright than this one. */
export class WorkspaceVersionError extends LanewrightError {
  constructor(
    readonly source: string,
    readonly found: number,
    readonly supported: number,
  ) {
    super(`workspace ${source}: written by a newer Lanewright (format version ${found}; this build reads up to ${supported}); update Lanewright to open it`);
  }
}
