// The header: product name, what is loaded, and the commands (the sample carrier, import, save,
// exports, about). In the desktop app the same commands are also in the application menu.

import { EXPORT_MENU } from '../../../engine/index';
import type { ExportChoice } from '../../model/export-file';
import { CsvDialectPicker } from '../CsvDialectPicker/CsvDialectPicker';

const BUSY_REASON = 'Waits for the import that is running (cancel it or let it finish)';

export interface TopBarProps {
  datasetName: string;
  desktop: boolean;
  dirty: boolean;
  /** True while an import runs: the commands that replace the workspace wait, and say why. */
  importing: boolean;
  onSample(loop: boolean): void;
  onImport(): void;
  onSave(): void;
  onExport(kind: ExportChoice): void;
  onAbout(): void;
}

export function TopBar({ datasetName, desktop, dirty, importing, onSample, onImport, onSave, onExport, onAbout }: TopBarProps) {
  // aria-disabled rather than disabled: the buttons stay focusable and keep their reason in reach.
  const busy = importing ? { 'aria-disabled': true, title: BUSY_REASON, 'aria-describedby': 'lw-busy-reason' } : {};
  return (
    <header className="lw-topbar">
      <div className="lw-brand">
        <span className="lw-logo" aria-hidden="true">
          ◆
        </span>
        <h1>Lanewright</h1>
        <span className="lw-dataset" title="Loaded files">
          {datasetName}
          {dirty ? ' • unsaved' : ''}
        </span>
      </div>
      <nav className="lw-commands" aria-label="Commands">
        <button type="button" {...busy} onClick={() => !importing && onSample(false)}>
          Sample carrier
        </button>
        <button type="button" {...busy} onClick={() => !importing && onSample(true)}>
          Sample carrier with rebate loop
        </button>
        <button type="button" {...busy} onClick={() => !importing && onImport()}>
          Import CSV…
        </button>
        {importing && (
          <span id="lw-busy-reason" className="lw-busy-reason">
            Import running: samples and Import wait
          </span>
        )}
        <button type="button" onClick={onSave}>
          {desktop ? 'Save workspace' : 'Keep workspace in browser'}
        </button>
        <label className="lw-export">
          <span className="lw-visually-hidden">Export</span>
          <select
            aria-label="Export"
            value=""
            onChange={(e) => {
              if (e.target.value) onExport(e.target.value as ExportChoice);
              e.target.value = '';
            }}
          >
            <option value="">Export…</option>
            {EXPORT_MENU.map((entry) => (
              <option key={entry.what} value={entry.what}>
                {entry.label}
              </option>
            ))}
          </select>
        </label>
        <CsvDialectPicker />
        <button type="button" onClick={onAbout}>
          About &amp; cautions
        </button>
      </nav>
    </header>
  );
}
