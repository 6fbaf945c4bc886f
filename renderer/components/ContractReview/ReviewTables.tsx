// The three parts of the contract review as tables: the lanes of each rebate loop (with how much
// dearer each would have to be to stop the loop paying), the fix plan, and rebate headroom per lane.

import { useMemo, useState } from 'react';
import type { AuditLoopRow, FixPlanRow, HeadroomRow } from '../../../engine/index';
import { formatMoney } from '../../model/format';
import { DataTable, laneColumns, type Column } from '../DataTable/DataTable';

type Money = (v: number) => string;
type LoopLane = AuditLoopRow['lane_details'][number];

export function LoopLanes({ loop, money }: { loop: AuditLoopRow; money: Money }) {
  const columns: Column<LoopLane>[] = [
    ...laneColumns<LoopLane>(),
    { label: 'Rebate', numeric: true, cell: (l) => money(l.rebate_minor) },
    { label: 'Net', numeric: true, cell: (l) => money(l.net_minor) },
    { label: 'Raise net by', numeric: true, cell: (l) => money(l.neutralise_minor) },
    { label: 'Rebate cut alone fixes it', cell: (l) => (l.rebate_cut_suffices ? 'yes' : 'no') },
  ];
  return <DataTable columns={columns} rows={loop.lane_details} rowKey={(l) => l.row} />;
}

export function FixPlanTable({ rows, money }: { rows: FixPlanRow[]; money: Money }) {
  const columns: Column<FixPlanRow>[] = [
    ...laneColumns<FixPlanRow>(),
    { label: 'Rebate now', numeric: true, cell: (r) => money(r.rebate_minor) },
    { label: 'Rebate at most', numeric: true, cell: (r) => money(r.new_rebate_minor) },
    { label: 'Net now → after', numeric: true, cell: (r) => `${money(r.net_minor)} → ${money(r.new_net_minor)}` },
    { label: 'Negotiable', cell: (r) => (r.negotiable ? 'yes' : 'no') },
  ];
  return <DataTable columns={columns} rows={rows} rowKey={(r) => r.row} label="Fix plan" />;
}

const SHOWN = 100;

export function HeadroomTable({ rows, exponent }: { rows: HeadroomRow[]; exponent: number }) {
  const [text, setText] = useState('');
  const sorted = useMemo(() => {
    const needle = text.trim().toLowerCase();
    const kept = rows.filter((r) => needle === '' || `${r.from} ${r.to} ${r.ref ?? ''}`.toLowerCase().includes(needle));
    // Tightest lanes first: they are the ones a new rebate would turn into a loop.
    return kept.sort((a, b) => (a.headroom_minor ?? Infinity) - (b.headroom_minor ?? Infinity) || a.row - b.row);
  }, [rows, text]);
  const money = (v: number | null) => (v === null ? 'no limit' : formatMoney(v, exponent));
  const columns: Column<HeadroomRow>[] = [
    ...laneColumns<HeadroomRow>(),
    { label: 'Net', numeric: true, cell: (r) => money(r.net_minor) },
    // The same names as the CSV columns (floor, headroom) and the JSON fields (floor_minor, headroom_minor).
    { label: 'Floor', numeric: true, cell: (r) => money(r.floor_minor) },
    { label: 'Headroom', numeric: true, cell: (r) => money(r.headroom_minor) },
  ];
  return (
    <>
      <input type="search" aria-label="Filter headroom by depot or ref" placeholder="Filter by depot or ref" value={text} onChange={(e) => setText(e.target.value)} />
      <DataTable columns={columns} rows={sorted.slice(0, SHOWN)} rowKey={(r) => r.row} label="Rebate headroom per lane" />
      {sorted.length > SHOWN && <p className="lw-muted">Showing the {SHOWN} tightest of {sorted.length} lanes; filter to find others.</p>}
    </>
  );
}

/** The review's CSV exports (the tables `lanewright audit` writes), in the chosen CSV format. */
export function ReviewExports({ calendar, onExport }: { calendar: boolean; onExport(kind: 'review-csv' | 'calendar-review-csv'): void }) {
  return (
    <p className="lw-review-exports">
      <button type="button" onClick={() => onExport('review-csv')}>
        Export one-day review (CSV)
      </button>
      {calendar && (
        <>
          {' '}
          <button type="button" onClick={() => onExport('calendar-review-csv')}>
            Export calendar review (CSV)
          </button>
        </>
      )}
    </p>
  );
}
