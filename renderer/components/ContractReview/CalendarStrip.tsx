// The calendar strip of the contract review: the window drawn to scale, its periods as segments and
// each loop as a hatched bar over every date range it exists in, each bar carrying its loop number
// and dates as text, so the strip reads without colour. A segment or a bar is a button: it sets the
// dispatch date to the first day of its range, so the one-day review and the map show that date (a
// bar also names the classes its loop exists for, so the plan can switch to one of them).

import type { CalendarReport } from '../../../engine/index';

export interface CalendarStripProps {
  calendar: CalendarReport;
  /** Sets the dispatch date (ISO 8601); `classes`: the vehicle classes a chosen loop range holds for (null for a period). */
  onDate(date: string, classes: readonly (string | null)[] | null): void;
}

type Range = { from: string | null; to: string | null };

const DAY = 86_400_000;
const dayOf = (iso: string) => Date.parse(`${iso}T00:00:00Z`) / DAY;
/** "03-01" within the window's first year, else the full date: short enough for a narrow segment. */
const short = (iso: string, year: string) => (iso.startsWith(year) ? iso.slice(5) : iso);

export function CalendarStrip({ calendar, onDate }: CalendarStripProps) {
  const { window } = calendar;
  if (window.from === null || window.to === null) {
    return (
      <p className="lw-muted" data-testid="calendar-strip">
        The lanes file names no date: one undated period; every loop holds on every date.
      </p>
    );
  }
  const first = dayOf(window.from);
  const total = dayOf(window.to) - first + 1;
  const year = window.from.slice(0, 4);
  const place = (r: Range) => {
    const from = dayOf(r.from!);
    const to = dayOf(r.to!);
    return { left: `${((100 * (from - first)) / total).toFixed(3)}%`, width: `${((100 * (to - from + 1)) / total).toFixed(3)}%` };
  };
  const dates = (r: Range) => `${r.from} to ${r.to}`;
  return (
    <div className="lw-cal" role="group" aria-label={`Calendar ${dates(window)}: periods and when each loop exists`} data-testid="calendar-strip">
      <div className="lw-cal-row">
        <span className="lw-cal-label">Periods</span>
        <div className="lw-cal-track">
          {calendar.periods.map((p, k) => (
            <button
              key={k}
              type="button"
              className={p.loops.length > 0 ? 'lw-cal-period lw-cal-period-loops' : 'lw-cal-period'}
              style={place(p)}
              title={`Period ${dates(p)}: ${p.loops.length === 0 ? 'no loop' : `loop(s) ${p.loops.join(', ')}`}`}
              aria-label={`Period ${dates(p)}, ${p.loops.length === 0 ? 'no loop' : `loop(s) ${p.loops.join(', ')}`}: set the dispatch date to ${p.from}`}
              onClick={() => onDate(p.from!, null)}
            >
              {short(p.from!, year)}
              {p.loops.length > 0 ? ` ⚠${p.loops.length}` : ''}
            </button>
          ))}
        </div>
      </div>
      {calendar.loops.map((loop) => (
        <div key={loop.id} className="lw-cal-row">
          <span className="lw-cal-label">Loop {loop.id}</span>
          <div className="lw-cal-track">
            {loop.ranges.map((r, k) => (
              <button
                key={k}
                type="button"
                className="lw-cal-bar"
                style={place(r)}
                title={`Loop ${loop.id}: ${dates(r)}`}
                aria-label={`Loop ${loop.id}, ${dates(r)}: set the dispatch date to ${r.from}`}
                onClick={() => onDate(r.from!, r.by_class.map((c) => c.vehicle_class))}
              >
                <span>
                  {loop.id}: {short(r.from!, year)} – {short(r.to!, year)}
                </span>
              </button>
            ))}
          </div>
        </div>
      ))}
    </div>
  );
}
