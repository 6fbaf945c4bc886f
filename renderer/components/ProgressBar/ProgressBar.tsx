// Progress of long imports and solves, with a cancel button (it stops the worker outright). It floats
// above everything; the import dialog renders it inside itself, so its Cancel stays in the modal's
// keyboard cycle and in what screen readers are shown of the page.

import type { Progress } from '../../app/use-engine';

export function ProgressBar({ progress, onCancel }: { progress: Progress | null; onCancel(): void }) {
  if (!progress) return null;
  return (
    <div className="lw-progress" role="group" aria-label="Work in progress">
      <label>
        {progress.phase}…
        <progress max={1} value={progress.fraction} aria-label={progress.phase} />
      </label>
      <button type="button" onClick={onCancel}>
        Cancel
      </button>
    </div>
  );
}
