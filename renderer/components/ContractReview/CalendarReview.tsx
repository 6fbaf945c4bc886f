// The contract review across the whole calendar, under the active what-if when there is one: how
// many loops the contract has on any date (so a day without a loop never reads as a contract without
// one), the calendar strip (CalendarStrip), each loop's date ranges and clauses, the clause table
// beside the lane table (ClauseLanes) and the calendar-wide fix plan, by lane or by clause, which can
// be applied as scenario changes; the review saves as a printable report.

import type { CalendarReport } from '../../../engine/index';
import { formatMoney } from '../../model/format';
import { DataTable, type Column } from '../DataTable/DataTable';
import { CalendarStrip } from './CalendarStrip';
import { ClauseLanes } from './ClauseLanes';
import { counted } from '../../../engine/index';

type Fix = CalendarReport['fix_plan'][number];

export interface CalendarReviewProps {
  calendar: CalendarReport;
  exponent: number;
  fixBy: 'lane' | 'clause';
  onFixBy(next: 'lane' | 'clause'): void;
  onSaveReport(): void;
  /** A range of the strip was chosen: its first day, and the classes its loop holds for (null for a period). */
  onDate(date: string, classes: readonly (string | null)[] | null): void;
  /** Applies the verified fix plan as scenario changes; null when there is none to apply. */
  onApplyFix: (() => void) | null;
}

const range = (r: { from: string | null; to: string | null }) => (r.from === null ? 'every date' : `${r.from} to ${r.to}`);
const className = (c: string | null) => c ?? 'default toll';

export function CalendarReview({ calendar, exponent, fixBy, onFixBy, onSaveReport, onDate, onApplyFix }: CalendarReviewProps) {
  const money = (v: number) => formatMoney(v, exponent);
  const what = calendar.scenario;
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
        Rebate loops in the whole contract, {range(calendar.window)}
        {what ? ` (scenario “${what.name}”)` : ''}: {calendar.loops.length}
        {calendar.loop_cap_reached ? ' (list capped)' : ''}
      </h3>
      <p className="lw-muted">
        {counted(calendar.periods.length, 'period')} in which the valid lane rows do not change, every vehicle class ({calendar.classes.map(className).join(', ')}),{' '}
        {what ? `the contract as the scenario “${what.name}” changes it (${what.changes.filter((c) => c.applied).length} of ${counted(what.changes.length, 'change')} applied)` : 'the files as loaded'}. Choose a period or a loop's dates to plan that day.{' '}
        <button type="button" onClick={onSaveReport}>
          Save review report (HTML)
        </button>
      </p>
      {what && what.plan_problems.length > 0 && <p className="lw-warn">Rows left out under the scenario: {what.plan_problems.join('; ')}</p>}
      <CalendarStrip calendar={calendar} onDate={onDate} />
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
              <select aria-label="Fix plan by lane or by clause" value={fixBy} onChange={(e) => onFixBy(e.currentTarget.value === 'clause' ? 'clause' : 'lane')}>
                <option value="lane">lane</option>
                <option value="clause">clause</option>
              </select>
            </label>
          </h3>
          {calendar.fix_plan_method && <p className="lw-muted">Method: {calendar.fix_plan_method}.</p>}
          <DataTable columns={fixColumns} rows={calendar.fix_plan} rowKey={(f) => f.row} label="Calendar fix plan" />
          {onApplyFix && (
            <button type="button" onClick={onApplyFix}>
              Apply this fix plan (by {fixBy}) as a scenario
            </button>
          )}
        </section>
      )}
      <ClauseLanes calendar={calendar} exponent={exponent} />
    </section>
  );
}
