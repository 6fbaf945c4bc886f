// Unsaved-changes tracking: a workspace is dirty when its content differs from what was last saved
// or opened. Compared by content, not by "was anything touched", so undoing an edit clears the flag.

import type { WorkspaceDocument } from './document';

/**
 * Stable text of a document's content; key order, the save timestamp and the panel sizes do not count
 * (dragging a splitter is saved with the next save, but it is no change to ask Save / Discard about).
 */
export function workspaceFingerprint(document: WorkspaceDocument): string {
  return canonical({ ...document, savedAt: null, layout: null });
}

function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const record = value as Record<string, unknown>;
    const keys = Object.keys(record).filter((k) => record[k] !== undefined).sort();
    return `{${keys.map((k) => `${JSON.stringify(k)}:${canonical(record[k])}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

/** Remembers the last saved content and answers whether the current document differs from it. */
export class DirtyTracker {
  private savedFingerprint: string;

  constructor(saved: WorkspaceDocument) {
    this.savedFingerprint = workspaceFingerprint(saved);
  }

  /** Call after a successful save or open. */
  markSaved(document: WorkspaceDocument): void {
    this.savedFingerprint = workspaceFingerprint(document);
  }

  /** True when `current` has changes not yet saved. */
  isDirty(current: WorkspaceDocument): boolean {
    return workspaceFingerprint(current) !== this.savedFingerprint;
  }
}
