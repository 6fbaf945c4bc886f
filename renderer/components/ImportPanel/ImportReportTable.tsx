// The validation report of an import: counts per file (accepted + rejected = total) and one line
// per problem with file, row (as a spreadsheet numbers it), column, value and reason.

import { counted } from '../../../engine/index';
import type { ImportIssue, ImportReport } from '../../worker/protocol';
import { DataTable, type Column } from '../DataTable/DataTable';

const ISSUE_COLUMNS: Column<ImportIssue>[] = [
  { label: 'File', cell: (i) => i.file },
  { label: 'Row', numeric: true, cell: (i) => i.row ?? '—' },
  { label: 'Column', cell: (i) => i.column ?? '—' },
  { label: 'Value', cell: (i) => <code>{i.value ?? '—'}</code> },
  { label: 'Reason', cell: (i) => i.reason },
];

export function ImportReportTable({ report }: { report: ImportReport }) {
  return (
    <div className="lw-import-report" data-testid="import-report">
      <ul className="lw-counts">
        {report.files.map((f) => (
          <li key={`${f.kind}-${f.file}`}>
            <strong>{f.file}</strong> ({f.kind}): {counted(f.total, 'row')}, {f.accepted} accepted, {f.rejected} rejected
          </li>
        ))}
        {report.excluded > 0 && <li>{report.excluded} lane rows are not part of this plan (not valid on the dispatch date, or priced for another vehicle class).</li>}
        {report.omitted > 0 && <li>{report.omitted} further problems are not listed (the counts above are exact).</li>}
      </ul>
      {report.notes.length > 0 && (
        <ul className="lw-notes">
          {report.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      )}
      {report.issues.length === 0 ? (
        <p>Every row was accepted.</p>
      ) : (
        <DataTable className="lw-table" label="Rejected rows" columns={ISSUE_COLUMNS} rows={report.issues} rowKey={(_, i) => i} />
      )}
      {report.warnings.length > 0 && (
        <details>
          <summary>{counted(report.warnings.length, 'warning')} (rows kept)</summary>
          <ul>
            {report.warnings.map((w, i) => (
              <li key={i}>
                {w.file}
                {w.row !== null ? `, row ${w.row}` : ''}
                {w.column ? `, column ${w.column}` : ''}
                {w.value !== null ? `, value “${w.value}”` : ''}: {w.reason}
              </li>
            ))}
          </ul>
        </details>
      )}
    </div>
  );
}
