// The import flow: pick a depots file and a lanes file (either may be kept from the current data),
// import, and when rows are rejected see the report and choose: fix the file (nothing changes) or
// continue with the accepted rows. The import's progress and Cancel sit inside the dialog, so they
// are in its keyboard cycle and not hidden from screen readers by the modal.

import { useState } from 'react';
import type { LanewrightHost } from '../../../main/ipc/contract';
import { counted, plural } from '../../../engine/index';
import type { DatasetFiles, PendingImport } from '../../app/use-dataset';
import type { Progress } from '../../app/use-engine';
import type { NamedText } from '../../worker/protocol';
import { Dialog } from '../Dialog/Dialog';
import { ProgressBar } from '../ProgressBar/ProgressBar';
import { ImportReportTable } from './ImportReportTable';

const BUSY_REASON = 'An import is running; wait for it or cancel it.';

export interface ImportDialogProps {
  host: LanewrightHost;
  current: DatasetFiles | null;
  pending: PendingImport | null;
  onImport(files: DatasetFiles): Promise<boolean>;
  onContinue(): Promise<boolean>;
  onFix(): void;
  onClose(): void;
  /** Work running while the dialog is open (the import), and how to stop it. */
  progress: Progress | null;
  onCancelWork(): void;
  /** True while an import runs: Import and Continue wait for it (a second press would start another). */
  importing: boolean;
}

export function ImportDialog({ host, current, pending, onImport, onContinue, onFix, onClose, progress, onCancelWork, importing }: ImportDialogProps) {
  const [depots, setDepots] = useState<NamedText | null>(current?.depots ?? null);
  const [lanes, setLanes] = useState<NamedText | null>(current?.lanes ?? null);
  const [problem, setProblem] = useState<string | null>(null);
  const pick = async (kind: 'depots' | 'lanes') => {
    const result = await host.pickFile(kind);
    if (!result.ok) setProblem(result.failure.message);
    else if (result.value) (kind === 'depots' ? setDepots : setLanes)({ name: result.value.name, path: result.value.path, text: result.value.text });
  };
  const run = async () => {
    if (!depots || !lanes || importing) return;
    if (await onImport({ depots, lanes })) onClose();
  };
  if (pending) {
    const rejected = pending.report.files.reduce((n, f) => n + f.rejected, 0);
    const acceptedText = pending.report.files.map((f) => `${f.accepted} ${f.kind}`).join(', ');
    return (
      <Dialog title="Import report" onClose={onFix} className="lw-wide">
        <p role="status">
          {counted(rejected, 'row')} {plural(rejected, 'was', 'were')} rejected ({counted(pending.report.issues.length, 'problem')} listed). Nothing has changed yet.
        </p>
        <ImportReportTable report={pending.report} />
        <div className="lw-dialog-buttons">
          <button type="button" onClick={onFix}>
            Fix the file first
          </button>
          {!pending.report.fatal && (
            <button type="button" className="lw-primary" aria-disabled={importing} title={importing ? BUSY_REASON : undefined} onClick={async () => !importing && (await onContinue()) && onClose()}>
              Continue with the accepted rows ({acceptedText})
            </button>
          )}
        </div>
        {pending.report.fatal && <p className="lw-warn">Nothing usable could be read; fix the file and import again.</p>}
        <ProgressBar progress={progress} onCancel={onCancelWork} />
      </Dialog>
    );
  }
  return (
    <Dialog title="Import depots and lanes" onClose={onClose}>
      <p>CSV files (RFC 4180). Depots: id, name, lat, lon. Lanes: from, to, toll, fuel, fees, rebate (amounts in major units, e.g. 12.50).</p>
      <div className="lw-file-row">
        <button type="button" onClick={() => pick('depots')}>
          Choose depots file…
        </button>
        <span data-testid="import-depots-name">{depots?.name ?? 'none chosen'}</span>
      </div>
      <div className="lw-file-row">
        <button type="button" onClick={() => pick('lanes')}>
          Choose lanes file…
        </button>
        <span data-testid="import-lanes-name">{lanes?.name ?? 'none chosen'}</span>
      </div>
      {problem && <p className="lw-warn">{problem}</p>}
      <div className="lw-dialog-buttons">
        <button type="button" onClick={onClose}>
          Cancel
        </button>
        <button type="button" className="lw-primary" disabled={!depots || !lanes} aria-disabled={importing} aria-describedby={importing ? 'lw-import-busy' : undefined} title={importing ? BUSY_REASON : undefined} onClick={run}>
          Import
        </button>
      </div>
      {importing && (
        <p id="lw-import-busy" className="lw-muted">
          {BUSY_REASON}
        </p>
      )}
      <ProgressBar progress={progress} onCancel={onCancelWork} />
    </Dialog>
  );
}
