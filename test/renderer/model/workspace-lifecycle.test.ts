// The workspace lifecycle reducer: named states in place of refs and a 'pending' sentinel. Each
// case is a sequence a user can cause; "dirty" means the document differs from the one opened or saved.

import { describe, expect, it } from 'vitest';
import { INITIAL_LIFECYCLE, isDirty, lifecycleReducer, LifecycleStore, type LifecycleEvent, type WorkspaceLifecycle } from '../../../renderer/model/workspace-lifecycle';

const run = (...events: LifecycleEvent[]): WorkspaceLifecycle => events.reduce(lifecycleReducer, INITIAL_LIFECYCLE);

describe('workspace lifecycle', () => {
  it('the opened document is the clean one; an edit makes it dirty, undoing it clean again', () => {
    const opened = run({ type: 'restore-started' }, { type: 'opened', savedPath: null, key: 'a' }, { type: 'replace-ended' }, { type: 'document', key: 'a' });
    expect(opened.phase).toBe('clean');
    const edited = lifecycleReducer(opened, { type: 'document', key: 'b' });
    expect([edited.phase, isDirty(edited)]).toEqual(['dirty', true]);
    expect(lifecycleReducer(edited, { type: 'document', key: 'a' }).phase).toBe('clean');
  });

  it('reopening a workspace whose document equals the one on screen is clean, and its next edit is dirty', () => {
    const before = run({ type: 'opened', savedPath: null, key: 'same' }, { type: 'document', key: 'edited' });
    const s = run({ type: 'opened', savedPath: null, key: 'same' }, { type: 'document', key: 'edited' }, { type: 'opened', savedPath: 'x.json', key: 'same' }, { type: 'document', key: 'edited' });
    expect(before.phase).toBe('dirty');
    expect([s.phase, s.cleanKey, s.savedPath]).toEqual(['dirty', 'same', 'x.json']);
  });

  it('saving: an edit during the save stays unsaved; a failed save keeps the changes', () => {
    const dirty = run({ type: 'opened', savedPath: null, key: 'a' }, { type: 'document', key: 'b' });
    const saving = lifecycleReducer(dirty, { type: 'save-started' });
    expect(saving.phase).toBe('saving');
    const editedMeanwhile = lifecycleReducer(saving, { type: 'document', key: 'c' });
    expect(editedMeanwhile.phase).toBe('saving');
    const saved = lifecycleReducer(editedMeanwhile, { type: 'saved', path: 'w.json', key: 'b' });
    expect([saved.phase, saved.savedPath]).toEqual(['dirty', 'w.json']);
    expect(lifecycleReducer(lifecycleReducer(dirty, { type: 'save-started' }), { type: 'save-failed' }).phase).toBe('dirty');
  });

  it('importing and replacing are states of their own and end where the document says', () => {
    const clean = run({ type: 'opened', savedPath: null, key: 'a' });
    const importing = lifecycleReducer(clean, { type: 'import-started' });
    expect(importing.phase).toBe('importing');
    expect(lifecycleReducer(importing, { type: 'replace-started' }).phase).toBe('importing');
    expect(lifecycleReducer(importing, { type: 'import-ended' }).phase).toBe('clean');
    const replacing = lifecycleReducer(clean, { type: 'replace-started' });
    expect(lifecycleReducer(replacing, { type: 'replace-ended' }).phase).toBe('clean');
  });

  it('the store hands callbacks the current state and tells subscribers of changes only', () => {
    const store = new LifecycleStore();
    let calls = 0;
    store.subscribe(() => calls++);
    store.dispatch({ type: 'save-started' }); // nothing to save while starting
    expect(calls).toBe(0);
    store.dispatch({ type: 'opened', savedPath: null, key: 'k' });
    expect([store.state.phase, calls]).toEqual(['clean', 1]);
  });
});
