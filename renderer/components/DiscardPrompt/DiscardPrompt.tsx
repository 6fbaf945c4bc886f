// Asked before a new, opened, sample or imported workspace replaces one with unsaved changes:
// Save first, Discard the changes, or Cancel (the default, so Enter or Escape never loses work).

import { useEffect, useRef } from 'react';
import type { DiscardAnswer } from '../../app/use-discard-guard';
import { Dialog } from '../Dialog/Dialog';

export interface DiscardPromptProps {
  /** What is about to replace the workspace, e.g. "Opening the sample carrier". */
  action: string;
  /** Save runs the normal save (which may ask where); the caller goes on only when it worked. */
  onAnswer(answer: DiscardAnswer): void;
  /**
   * Browser mode: the workspace is kept in the browser as it changes, but replacing it drops the
   * what-if edits for good; Save writes them to a scenario file (a download) first.
   */
  browser?: boolean;
}

const DISCARD_TITLE = 'Unsaved changes';

export function DiscardPrompt({ action, onAnswer, browser = false }: DiscardPromptProps) {
  const cancel = useRef<HTMLButtonElement>(null);
  // The Dialog focuses its first button; Cancel is the safe default, so it takes focus instead.
  useEffect(() => cancel.current?.focus(), []);
  return (
    <Dialog title={DISCARD_TITLE} onClose={() => onAnswer('cancel')} describedBy="lw-discard-text">
      <p id="lw-discard-text">
        {browser
          ? `${action} replaces the what-if edits on screen. They are kept in this browser but not in a scenario file, so they will be lost unless you save them first.`
          : `${action} replaces the workspace on screen. Your changes since it was last opened or saved will be lost unless you save them first.`}
      </p>
      <div className="lw-dialog-buttons">
        <button type="button" onClick={() => onAnswer('save')}>
          {browser ? 'Save scenario file' : 'Save'}
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
