// The clause table beside the lane table of the calendar review: analysts negotiate clauses, so each
// clause lists its lanes, total rebate, loops and when it is on one; choosing a clause shows its lanes
// on the right with the loops they are on, the fix plan's cut and their headroom over the calendar.

import { useMemo, useState } from 'react';
import type { CalendarReport } from '../../../engine/index';
import { formatMoney } from '../../model/format';
import { DataTable, type Column } from '../DataTable/DataTable';

type Clause = CalendarReport['clauses'][number];

/** One lane row (and vehicle class) as the lane table shows it. */
interface LaneLine {
  key: string;
  row: number;
  from: string;
  to: string;
  ref: string | null;
  clause: string;
  vehicleClass: string | null;
  net: number | null;
  floor: number | null;
  setBy: { from: string | null; to: string | null } | null;
  loops: number[];
  cut: number | null;
}

const SHOWN = 100;
const range = (r: { from: string | null; to: string | null }) => (r.from === null ? 'every date' : `${r.from} to ${r.to}`);

/** Lane lines from the headroom rows (every planned row and class); without headroom, from the loops' lanes. */
function laneLines(calendar: CalendarReport): LaneLine[] {
  const loopsOf = new Map<number, number[]>();
  for (const loop of calendar.loops) for (const r of loop.lanes) loopsOf.set(r, [...new Set([...(loopsOf.get(r) ?? []), loop.id])]);
  const cutOf = new Map(calendar.fix_plan.map((f) => [f.row, f.cut_minor]));
  if (calendar.headroom.length > 0) {
    return calendar.headroom.map((h) => ({
      key: `${h.row}|${h.vehicle_class ?? ''}`,
      row: h.row,
      from: h.from,
      to: h.to,
      ref: h.ref,
      clause: h.clause,
      vehicleClass: h.vehicle_class,
      net: h.net_minor,
      floor: h.floor_minor,
      setBy: h.set_by,
      loops: loopsOf.get(h.row) ?? [],
      cut: cutOf.get(h.row) ?? null,
    }));
  }
  const seen = new Map<number, LaneLine>();
  for (const loop of calendar.loops) {
    for (const l of loop.lane_details) {
      if (!seen.has(l.row)) seen.set(l.row, { key: String(l.row), row: l.row, from: l.from, to: l.to, ref: l.ref, clause: l.clause, vehicleClass: null, net: null, floor: null, setBy: null, loops: loopsOf.get(l.row) ?? [], cut: cutOf.get(l.row) ?? null });
    }
  }
  return [...seen.values()];
}

export function ClauseLanes({ calendar, exponent }: { calendar: CalendarReport; exponent: number }) {
  const [chosen, setChosen] = useState<string | null>(null);
  const money = (v: number | null) => (v === null ? '—' : formatMoney(v, exponent));
  const lines = useMemo(() => laneLines(calendar), [calendar]);
  const shown = useMemo(() => {
    const kept = chosen === null ? lines : lines.filter((l) => l.clause === chosen);
    // Lanes on loops first, then the tightest headroom: the ones a negotiation is about.
    const room = (l: LaneLine) => (l.floor === null || l.net === null ? Infinity : l.net - l.floor);
    return kept.slice().sort((a, b) => (b.loops.length > 0 ? 1 : 0) - (a.loops.length > 0 ? 1 : 0) || room(a) - room(b) || a.row - b.row);
  }, [lines, chosen]);
  const clauseColumns: Column<Clause>[] = [
    {
      label: 'Clause',
      rowHeader: true,
      cell: (c) => (
        <button type="button" aria-pressed={chosen === c.clause} onClick={() => setChosen(chosen === c.clause ? null : c.clause)} title={`Show the lanes of ${c.clause}`}>
          {c.source === 'clause' ? c.clause : `${c.clause} (${c.source})`}
        </button>
      ),
    },
    { label: 'Lane rows', cell: (c) => c.lanes.join(' ') },
    { label: 'Total rebate', numeric: true, cell: (c) => money(c.rebate_minor) },
    { label: 'Loops', cell: (c) => (c.loops.length === 0 ? 'none' : c.loops.join(' ')) },
    { label: 'On a loop', cell: (c) => c.ranges.map(range).join('; ') },
  ];
  const laneCols: Column<LaneLine>[] = [
    { label: 'Row', cell: (l) => l.row },
    { label: 'Lane', rowHeader: true, cell: (l) => `${l.from} → ${l.to}` },
    { label: 'Ref', cell: (l) => l.ref ?? '—' },
    { label: 'Clause', cell: (l) => l.clause },
    { label: 'Class', cell: (l) => l.vehicleClass ?? '—' },
    { label: 'Net', numeric: true, cell: (l) => money(l.net) },
    { label: 'Loops', cell: (l) => (l.loops.length === 0 ? '' : l.loops.join(' ')) },
    { label: 'Fix plan cut', numeric: true, cell: (l) => (l.cut === null ? '' : money(l.cut)) },
    { label: 'Floor', numeric: true, cell: (l) => (l.floor === null ? (l.net === null ? '—' : 'no limit') : money(l.floor)) },
    { label: 'Set by', cell: (l) => (l.setBy ? range(l.setBy) : '') },
  ];
  return (
    <div className="lw-clause-lanes">
      <section aria-label="Clauses">
        <h3>Clauses</h3>
        <DataTable columns={clauseColumns} rows={calendar.clauses} rowKey={(c) => `${c.source}:${c.clause}`} label="Clauses" />
      </section>
      <section aria-label="Lanes over the calendar">
        <h3>
          {chosen === null ? 'Lanes over the calendar' : `Lanes of clause ${chosen}`} ({shown.length}){' '}
          {chosen !== null && (
            <button type="button" onClick={() => setChosen(null)}>
              Every lane
            </button>
          )}
        </h3>
        <DataTable columns={laneCols} rows={shown.slice(0, SHOWN)} rowKey={(l) => l.key} label={chosen === null ? 'Lanes over the calendar' : `Lanes of clause ${chosen}`} />
        {shown.length > SHOWN && <p className="lw-muted">Showing the first {SHOWN} of {shown.length}: lanes on loops, then the tightest headroom. Choose a clause to see its lanes.</p>}
      </section>
    </div>
  );
}
