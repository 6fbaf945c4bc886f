import { describe, expect, it } from 'vitest';
import { DirtyTracker, workspaceFingerprint } from '../../../engine/workspace/dirty';
import { emptyWorkspace } from '../../../engine/workspace/document';

describe('DirtyTracker', () => {
  it('is clean right after open, dirty after an edit, clean again when the edit is undone', () => {
    const opened = emptyWorkspace();
    const tracker = new DirtyTracker(opened);
    expect(tracker.isDirty(opened)).toBe(false);
    const edited = { ...opened, settings: { ...opened.settings, maxLegs: 4 } };
    expect(tracker.isDirty(edited)).toBe(true);
    expect(tracker.isDirty({ ...edited, settings: { ...edited.settings, maxLegs: null } })).toBe(false);
    tracker.markSaved(edited);
    expect(tracker.isDirty(edited)).toBe(false);
  });

  it('ignores key order and the save timestamp', () => {
    const a = emptyWorkspace();
    const b = { activeScenario: null, scenarios: [], layout: { sidePx: null, lowerPx: null }, planning: { ...a.planning }, settings: { ...a.settings }, files: { lanes: null, depots: null }, savedAt: '2026-01-01T00:00:00Z', version: a.version, format: a.format } as typeof a;
    expect(workspaceFingerprint(a)).toBe(workspaceFingerprint(b));
  });

  it('does not count the panel sizes: a dragged splitter is saved with the next save, not asked about', () => {
    const opened = emptyWorkspace();
    const tracker = new DirtyTracker(opened);
    expect(tracker.isDirty({ ...opened, layout: { lowerPx: 320, sidePx: 400 } })).toBe(false);
  });
});
