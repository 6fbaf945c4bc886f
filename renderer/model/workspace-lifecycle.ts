// The workspace's lifecycle as one state machine: starting, clean, dirty, saving, importing,
// replacing. One reducer owns what "unsaved" means (the document's fingerprint against the one last
// opened or saved, which the opener states), so no ref mirrors a state and no sentinel string
// stands for "the next document will be the clean one".
// The store lets callbacks read the current state without a copy kept beside React's.

/** Named states; `starting` until the first show has opened a workspace or the sample. */
export type WorkspacePhase = 'starting' | 'clean' | 'dirty' | 'saving' | 'importing' | 'replacing';

export interface WorkspaceLifecycle {
  phase: WorkspacePhase;
  /** Fingerprint of the document on screen; null before the first one. */
  docKey: string | null;
  /** Fingerprint of the document as last opened or saved; null before the first open. */
  cleanKey: string | null;
  /** Where the workspace was opened from or saved to; null = Save must ask. */
  savedPath: string | null;
}

export type LifecycleEvent =
  /** The first show starts reopening the last workspace (or the sample). */
  | { type: 'restore-started' }
  /** A workspace (a file or a sample) replaced the one on screen; `key` is its document's fingerprint. */
  | { type: 'opened'; savedPath: string | null; key: string }
  /** The document on screen now has this fingerprint. */
  | { type: 'document'; key: string }
  | { type: 'save-started' }
  | { type: 'saved'; path: string; key: string }
  | { type: 'save-failed' }
  | { type: 'import-started' }
  | { type: 'import-ended' }
  /** Something that replaces the workspace is being asked about or run (New, Open, a sample, Import). */
  | { type: 'replace-started' }
  | { type: 'replace-ended' };

export const INITIAL_LIFECYCLE: WorkspaceLifecycle = { phase: 'starting', docKey: null, cleanKey: null, savedPath: null };

/** Clean or dirty, from the fingerprints. */
function settled(state: WorkspaceLifecycle): WorkspaceLifecycle {
  return { ...state, phase: isDirty(state) ? 'dirty' : 'clean' };
}

const busy = (phase: WorkspacePhase) => phase === 'saving' || phase === 'importing' || phase === 'replacing';

export function lifecycleReducer(state: WorkspaceLifecycle, event: LifecycleEvent): WorkspaceLifecycle {
  switch (event.type) {
    case 'restore-started':
      return state.phase === 'starting' ? { ...state, phase: 'replacing' } : state;
    case 'opened': {
      // The opener knows the document it put on screen; a render of the old one in between does
      // not report a new fingerprint, so it cannot be taken for the clean one.
      const next = { ...state, docKey: event.key, cleanKey: event.key, savedPath: event.savedPath };
      return busy(state.phase) ? next : settled(next);
    }
    case 'document': {
      const next = { ...state, docKey: event.key };
      return busy(state.phase) ? next : settled(next);
    }
    case 'save-started':
      return state.phase === 'clean' || state.phase === 'dirty' ? { ...state, phase: 'saving' } : state;
    case 'saved':
      return settled({ ...state, savedPath: event.path, cleanKey: event.key });
    case 'save-failed':
      return state.phase === 'saving' ? settled(state) : state;
    case 'import-started':
      return state.phase === 'importing' ? state : { ...state, phase: 'importing' };
    case 'import-ended':
    case 'replace-ended':
      return state.phase === 'importing' || state.phase === 'replacing' ? settled(state) : state;
    case 'replace-started':
      return state.phase === 'clean' || state.phase === 'dirty' ? { ...state, phase: 'replacing' } : state;
  }
}

/** True when the document on screen differs from the one last opened or saved. */
export function isDirty(state: WorkspaceLifecycle): boolean {
  return state.cleanKey !== null && state.docKey !== null && state.docKey !== state.cleanKey;
}

/** The lifecycle held outside React: callbacks read `state` directly, React subscribes to changes. */
export class LifecycleStore {
  private current: WorkspaceLifecycle = INITIAL_LIFECYCLE;
  private readonly listeners = new Set<() => void>();

  get state(): WorkspaceLifecycle {
    return this.current;
  }

  dispatch = (event: LifecycleEvent): void => {
    const next = lifecycleReducer(this.current, event);
    if (next === this.current) return;
    this.current = next;
    for (const listener of this.listeners) listener();
  };

  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  snapshot = (): WorkspaceLifecycle => this.current;
}
