// The one check every workspace-replacing action (new, open, the samples, import) passes first:
// with unsaved changes it asks Save / Discard / Cancel, and Save goes on only when the save worked.

import { useCallback, useRef, useState } from 'react';

/** What the user answered in the unsaved-changes prompt. */
export type DiscardAnswer = 'save' | 'discard' | 'cancel';

/** The open prompt: what the user was about to do, for the dialog's text. */
export interface DiscardPrompt {
  action: string;
}

/**
 * `confirmDiscard(action)` resolves true when the workspace may be replaced: nothing unsaved, the
 * user chose Discard, or chose Save and the save succeeded. `save` is read when answered, not when asked.
 */
export function useDiscardGuard(dirty: boolean, save: () => Promise<boolean>) {
  const [prompt, setPrompt] = useState<DiscardPrompt | null>(null);
  const waiting = useRef<((answer: DiscardAnswer) => void) | null>(null);
  const dirtyRef = useRef(dirty);
  dirtyRef.current = dirty;
  const saveRef = useRef(save);
  saveRef.current = save;

  const confirmDiscard = useCallback(async (action: string): Promise<boolean> => {
    if (!dirtyRef.current) return true;
    // A second request (say a menu command while the prompt is up) cancels the first one.
    waiting.current?.('cancel');
    const answer = await new Promise<DiscardAnswer>((resolve) => {
      waiting.current = resolve;
      setPrompt({ action });
    });
    if (answer === 'cancel') return false;
    if (answer === 'discard') return true;
    return saveRef.current();
  }, []);

  const answerDiscard = useCallback((answer: DiscardAnswer) => {
    const resolve = waiting.current;
    waiting.current = null;
    setPrompt(null);
    resolve?.(answer);
  }, []);

  return { discardPrompt: prompt, confirmDiscard, answerDiscard };
}
