// The printable dispatch sheet: one page per date (a new page starts at every date), the day's
// loads in a table whose footer holds the caution, so Chromium repeats it at the foot of every
// printed page of that date. Shown only when printing (styles in loads.css).

import type { DispatchReport } from '../../../engine/index';
import { counted } from '../../../engine/index';
import { formatDriveMinutes, formatMoney } from '../../model/format';
import { loadCautions, sheetPages } from '../../model/loads-table';

export interface DispatchSheetProps {
  report: DispatchReport;
  exponent: number;
  /** Who the sheet is for, as the header shows it. */
  title: string;
}

export function DispatchSheet({ report, exponent, title }: DispatchSheetProps) {
  return (
    <div className="lw-sheet" data-testid="dispatch-sheet">
      {sheetPages(report).map((page) => (
        <section key={page.date} className="lw-sheet-page" data-date={page.date}>
          <table className="lw-sheet-table">
            <thead>
              <tr>
                <th colSpan={9} className="lw-sheet-head">
                  {title} — dispatch sheet for {page.date} ({counted(page.loads.length, 'load')}, amounts in {report.currency})
                </th>
              </tr>
              <tr>
                <th scope="col">Load</th>
                <th scope="col">From → to</th>
                <th scope="col">Vehicle</th>
                <th scope="col">Status</th>
                <th scope="col">Cost</th>
                <th scope="col">Limits cost</th>
                <th scope="col">Drive</th>
                <th scope="col">Route</th>
                <th scope="col">Cautions / blocked by</th>
              </tr>
            </thead>
            <tfoot>
              <tr>
                <td colSpan={9} className="lw-sheet-caution">
                  {report.caution}
                  {report.drive_limit_caution ? ` ${report.drive_limit_caution}` : ''}
                </td>
              </tr>
            </tfoot>
            <tbody>
              {page.loads.map((r) => (
                <tr key={r.load}>
                  <td>{r.load}</td>
                  <td>
                    {r.from} → {r.to}
                  </td>
                  <td>{r.vehicle ?? `class ${r.vehicle_class ?? '(default)'}`}</td>
                  <td>{r.status}</td>
                  <td className="lw-num">{r.cost_minor === null ? '—' : formatMoney(r.cost_minor, exponent)}</td>
                  <td className="lw-num">{r.limits_extra_minor === null ? '—' : formatMoney(r.limits_extra_minor, exponent)}</td>
                  <td className="lw-num">{formatDriveMinutes(r.breakdown?.drive_minutes ?? NaN)}</td>
                  <td>{r.path.join(' › ')}</td>
                  <td>{[...r.blocked_by, ...loadCautions(r).filter((c) => c !== 'vehicle limits')].join('; ')}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      ))}
    </div>
  );
}
