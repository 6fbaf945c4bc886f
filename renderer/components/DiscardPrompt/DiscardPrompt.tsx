// Asked before a new, opened, sample or imported workspace replaces one with unsaved changes:
// Save first, Discard the changes, or Cancel (the default, so Enter or Escape never loses work).

import { useEffect, useRef } from 'react';
import type { DiscardAnswer } from '../../app/use-discard-guard';
import { Dialog } from '../Dialog/Dialog';

export interface DiscardPromptProps {
  /** What is about to replace the workspace, e.g. "Opening the sample plan". */
  action: string;
  /** Save runs the normal save (which may ask where); the caller goes on only when it worked. */
  onAnswer(answer: DiscardAnswer): void;
}

const DISCARD_TITLE = 'Unsaved changes';

export function DiscardPrompt({ action, onAnswer }: DiscardPromptProps) {
  const cancel = useRef<HTMLButtonElement>(null);
  // The Dialog focuses its first button; Cancel is the safe default, so it takes focus instead.
  useEffect(() => cancel.current?.focus(), []);
  return (
    <Dialog title={DISCARD_TITLE} onClose={() => onAnswer('cancel')} describedBy="lw-discard-text">
      <p id="lw-discard-text">{action} replaces the workspace on screen. Your changes since it was last opened or saved will be lost unless you save them first.</p>
      <div className="lw-dialog-buttons">
        <button type="button" onClick={() => onAnswer('save')}>
          Save
        </button>
        <button type="button" onClick={() => onAnswer('discard')}>
          Discard
        </button>
        <button type="button" ref={cancel} className="lw-primary" onClick={() => onAnswer('cancel')}>
          Cancel
        </button>
      </div>
    </Dialog>
  );
}
