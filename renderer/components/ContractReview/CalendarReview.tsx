// The contract review across the whole calendar: how many loops the contract has on any date (so a
// day without a loop never reads as a contract without one), a strip of periods with a bar per loop
// (hatched and numbered, readable without colour), each loop's date ranges and clauses, the clause
// table and the calendar-wide fix plan, by lane or by clause; the review saves as a printable report.

import type { CalendarReport } from '../../../engine/index';
import { formatMoney } from '../../model/format';
import { DataTable, type Column } from '../DataTable/DataTable';
import { counted } from '../../../engine/index';

type Clause = CalendarReport['clauses'][number];
type Fix = CalendarReport['fix_plan'][number];

export interface CalendarReviewProps {
  calendar: CalendarReport;
  exponent: number;
  fixBy: 'lane' | 'clause';
  onFixBy(next: 'lane' | 'clause'): void;
  onSaveReport(): void;
}

const range = (r: { from: string | null; to: string | null }) => (r.from === null ? 'every date' : `${r.from} to ${r.to}`);
const className = (c: string | null) => c ?? 'default toll';

export function CalendarReview({ calendar, exponent, fixBy, onFixBy, onSaveReport }: CalendarReviewProps) {
  const money = (v: number) => formatMoney(v, exponent);
  const clauseColumns: Column<Clause>[] = [
    { label: 'Clause', cell: (c) => (c.source === 'clause' ? c.clause : `${c.clause} (${c.source})`) },
    { label: 'Lane rows', cell: (c) => c.lanes.join(' ') },
    { label: 'Total rebate', numeric: true, cell: (c) => money(c.rebate_minor) },
    { label: 'Loops', cell: (c) => c.loops.join(' ') },
    { label: 'On a loop', cell: (c) => c.ranges.map(range).join('; ') },
  ];
  const fixColumns: Column<Fix>[] = [
    { label: 'Row', numeric: true, cell: (f) => String(f.row) },
    { label: 'Lane', cell: (f) => `${f.from} → ${f.to}` },
    { label: 'Ref', cell: (f) => f.ref ?? '—' },
    { label: 'Clause', cell: (f) => f.clause },
    { label: 'Cut %', numeric: true, cell: (f) => (f.clause_percent === null ? '' : `${f.clause_percent} %`) },
    { label: 'Rebate now → at most', numeric: true, cell: (f) => `${money(f.rebate_minor)} → ${money(f.new_rebate_minor)}` },
  ];
  return (
    <section className="lw-calendar" aria-label="Whole contract" data-testid="calendar-review">
      <h3>
        Rebate loops in the whole contract, {range(calendar.window)}: {calendar.loops.length}
        {calendar.loop_cap_reached ? ' (list capped)' : ''}
      </h3>
      <p className="lw-muted">
        {counted(calendar.periods.length, 'period')} in which the valid lane rows do not change, every vehicle class ({calendar.classes.map(className).join(', ')}), the files as loaded
        (a scenario applies to the one-day review below).{' '}
        <button type="button" onClick={onSaveReport}>
          Save review report (HTML)
        </button>
      </p>
      {calendar.loops.length > 0 && <CalendarStrip calendar={calendar} />}
      {calendar.loops.map((loop) => (
        <p key={loop.id} className="lw-warn">
          ⚠ Loop {loop.id}: {[...loop.depots, loop.depots[0]].join(' → ')} · clauses {loop.clauses.join(', ') || 'none'} ·{' '}
          {loop.ranges.map((r) => `${range(r)}: ${r.by_class.map((c) => `${money(c.net_per_lap_minor)} per lap (${className(c.vehicle_class)})`).join(', ')}`).join('; ')}
        </p>
      ))}
      {calendar.loops.length > 0 && (
        <section aria-label="Calendar fix plan">
          <h3>
            Fix plan for every date: cut {counted(calendar.fix_plan.length, 'rebate')}{calendar.fix_plan_verified ? ' (checked in every period: no loop remains)' : ' (not verified)'}{' '}
            <label>
              by{' '}
              <select value={fixBy} onChange={(e) => onFixBy(e.currentTarget.value === 'clause' ? 'clause' : 'lane')}>
                <option value="lane">lane</option>
                <option value="clause">clause</option>
              </select>
            </label>
          </h3>
          {calendar.fix_plan_method && <p className="lw-muted">Method: {calendar.fix_plan_method}.</p>}
          <DataTable columns={fixColumns} rows={calendar.fix_plan} rowKey={(f) => f.row} label="Calendar fix plan" />
        </section>
      )}
      <section aria-label="Clauses">
        <h3>Clauses</h3>
        <DataTable columns={clauseColumns} rows={calendar.clauses} rowKey={(c) => `${c.source}:${c.clause}`} label="Clauses" />
      </section>
    </section>
  );
}

/** Periods as columns (width by days), a row per loop with a hatched, numbered cell where it exists. */
function CalendarStrip({ calendar }: { calendar: CalendarReport }) {
  const days = calendar.periods.map((p) => (p.from === null ? 1 : Math.max(1, (Date.parse(p.to!) - Date.parse(p.from)) / 86_400_000 + 1)));
  const total = days.reduce((a, b) => a + b, 0);
  return (
    <table className="lw-strip" aria-label="When each loop exists">
      <colgroup>
        <col style={{ width: '8%' }} />
        {days.map((d, k) => (
          <col key={k} style={{ width: `${((92 * d) / total).toFixed(3)}%` }} />
        ))}
      </colgroup>
      <thead>
        <tr>
          <th scope="col">Period</th>
          {calendar.periods.map((p, k) => (
            <th key={k} scope="col" title={range(p)}>
              {p.from === null ? 'undated' : k === 0 || calendar.periods[k - 1].from!.slice(0, 4) !== p.from.slice(0, 4) ? p.from : p.from.slice(5)}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {calendar.loops.map((loop) => (
          <tr key={loop.id}>
            <th scope="row">Loop {loop.id}</th>
            {calendar.periods.map((p, k) =>
              p.loops.includes(loop.id) ? (
                <td key={k} className="lw-strip-on" title={`Loop ${loop.id}: ${range(p)}`}>
                  <span>{loop.id}</span>
                </td>
              ) : (
                <td key={k} />
              ),
            )}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
