// The validation report of an import: counts per file (accepted + rejected = total) and one line
// per problem with file, row (as a spreadsheet numbers it), column, value and reason.

import type { ImportReport } from '../../worker/protocol';

export function ImportReportTable({ report }: { report: ImportReport }) {
  return (
    <div className="lw-import-report" data-testid="import-report">
      <ul className="lw-counts">
        {report.files.map((f) => (
          <li key={`${f.kind}-${f.file}`}>
            <strong>{f.file}</strong> ({f.kind}): {f.total} rows, {f.accepted} accepted, {f.rejected} rejected
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
        <table className="lw-table" aria-label="Rejected rows">
          <thead>
            <tr>
              <th scope="col">File</th>
              <th scope="col">Row</th>
              <th scope="col">Column</th>
              <th scope="col">Value</th>
              <th scope="col">Reason</th>
            </tr>
          </thead>
          <tbody>
            {report.issues.map((issue, i) => (
              <tr key={i}>
                <td>{issue.file}</td>
                <td className="lw-num">{issue.row ?? '—'}</td>
                <td>{issue.column ?? '—'}</td>
                <td>
                  <code>{issue.value ?? '—'}</code>
                </td>
                <td>{issue.reason}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {report.warnings.length > 0 && (
        <details>
          <summary>{report.warnings.length} warnings (rows kept)</summary>
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
