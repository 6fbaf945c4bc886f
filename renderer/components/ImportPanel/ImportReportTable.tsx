// The validation report of an import: counts per file (accepted + rejected = total) and one line
// per problem with file, row (as a spreadsheet numbers it), column, value and reason.

import type { ImportReport } from '../../worker/protocol';

export function ImportReportTable({ report }: { report: ImportReport }) {
  return (
    <div className="lw-import-report" data-testid="import-report">
      <ul className="lw-counts">
        {[report.depots, report.lanes].map((f) => (
          <li key={f.file}>
            <strong>{f.file}</strong>: {f.total} rows, {f.accepted} accepted, {f.rejected} rejected
          </li>
        ))}
      </ul>
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
    </div>
  );
}
