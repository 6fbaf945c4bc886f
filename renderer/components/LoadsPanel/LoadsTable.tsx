// The loads table: one row per load, sortable and filterable, windowed so 10,000 loads scroll with
// a few dozen rows in the DOM (DataTable/use-row-window). One Tab stop; the arrow keys, Page Up/Down,
// Home and End move between rows by index (rows outside the window included), Enter or Space selects.

import { useEffect, useRef, useState } from 'react';
import type { DispatchLoadRow } from '../../../engine/index';
import { formatDriveMinutes, formatMoney } from '../../model/format';
import { loadCautions, toggleLoadSort, type LoadSortKey, type LoadsQuery } from '../../model/loads-table';
import { SpacerRow } from '../DataTable/SpacerRow';
import { useRowWindow } from '../DataTable/use-row-window';

const COLUMNS: { key: LoadSortKey; label: string; numeric?: boolean }[] = [
  { key: 'load', label: 'Load' },
  { key: 'from', label: 'From' },
  { key: 'to', label: 'To' },
  { key: 'date', label: 'Date' },
  { key: 'vehicle', label: 'Vehicle' },
  { key: 'status', label: 'Status' },
  { key: 'cost', label: 'Cost', numeric: true },
  { key: 'limits', label: 'Limits cost', numeric: true },
  { key: 'drive', label: 'Drive time', numeric: true },
];
const COLUMN_COUNT = COLUMNS.length + 1;
/** Rows a Page Up / Page Down moves. */
const PAGE_ROWS = 15;

export interface LoadsTableProps {
  rows: readonly DispatchLoadRow[];
  exponent: number;
  query: LoadsQuery;
  onQuery(query: LoadsQuery): void;
  selected: string | null;
  onSelect(load: string): void;
}

export function LoadsTable({ rows, exponent, query, onQuery, selected, onSelect }: LoadsTableProps) {
  const [active, setActive] = useState(0);
  const focusWanted = useRef<number | null>(null);
  const rowWindow = useRowWindow(rows.length);
  const last = rows.length - 1;
  const current = Math.max(0, Math.min(active, last));
  const tabStop = current >= rowWindow.start && current < rowWindow.end ? current : rowWindow.start;
  const money = (v: number | null) => (v === null ? '—' : formatMoney(v, exponent));

  // Focus follows the keys once the wanted row is rendered (after the window has scrolled to it).
  useEffect(() => {
    const wanted = focusWanted.current;
    if (wanted === null) return;
    const row = rowWindow.bodyRef.current?.querySelector<HTMLElement>(`tr[aria-rowindex="${wanted + 2}"]`);
    if (row) {
      focusWanted.current = null;
      row.focus();
    }
  });

  const onKey = (event: React.KeyboardEvent<HTMLTableRowElement>, i: number, load: string) => {
    const steps: Record<string, number> = { ArrowDown: 1, ArrowUp: -1, PageDown: PAGE_ROWS, PageUp: -PAGE_ROWS, Home: -Infinity, End: Infinity };
    if (event.key in steps) {
      event.preventDefault();
      const next = Math.max(0, Math.min(last, i + steps[event.key]));
      setActive(next);
      focusWanted.current = next;
      rowWindow.scrollToIndex(next);
    } else if (event.key === 'Enter' || event.key === ' ') {
      event.preventDefault();
      onSelect(load);
    }
  };

  return (
    <div className="lw-loads-scroll" data-testid="loads-scroll">
      <table className="lw-table" aria-label="Loads" aria-rowcount={rows.length + 1} data-testid="loads-table" data-windowed={rowWindow.windowed ? 'true' : 'false'}>
        <thead>
          <tr aria-rowindex={1}>
            {COLUMNS.map((c) => (
              <th key={c.key} scope="col" aria-sort={query.sortKey === c.key ? (query.descending ? 'descending' : 'ascending') : 'none'} className={c.numeric ? 'lw-num' : undefined}>
                <button type="button" className="lw-sort" onClick={() => onQuery(toggleLoadSort(query, c.key))}>
                  {c.label}
                  <span aria-hidden="true">{query.sortKey === c.key ? (query.descending ? ' ▼' : ' ▲') : ''}</span>
                </button>
              </th>
            ))}
            <th scope="col">Cautions</th>
          </tr>
        </thead>
        <tbody ref={rowWindow.bodyRef}>
          <SpacerRow heightPx={rowWindow.padTop} columns={COLUMN_COUNT} />
          {rows.slice(rowWindow.start, rowWindow.end).map((r, k) => {
            const i = rowWindow.start + k;
            return (
              <tr
                key={r.load}
                aria-rowindex={i + 2}
                tabIndex={i === tabStop ? 0 : -1}
                data-load={r.load}
                aria-current={r.load === selected ? 'true' : undefined}
                className={r.load === selected ? 'lw-selected' : undefined}
                onClick={() => (onSelect(r.load), setActive(i))}
                onFocus={() => setActive(i)}
                onKeyDown={(e) => onKey(e, i, r.load)}
              >
                <th scope="row">{r.load}</th>
                <td>{r.from}</td>
                <td>{r.to}</td>
                <td>{r.date}</td>
                <td>{r.vehicle ?? `class ${r.vehicle_class ?? '(default)'}`}</td>
                <td>
                  <span className={`lw-badge lw-badge-${r.status}`}>{r.status}</span>
                </td>
                <td className="lw-num">{money(r.cost_minor)}</td>
                <td className="lw-num">{money(r.limits_extra_minor)}</td>
                <td className="lw-num">{formatDriveMinutes(r.breakdown?.drive_minutes ?? NaN)}</td>
                <td>{loadCautions(r).join(', ')}</td>
              </tr>
            );
          })}
          <SpacerRow heightPx={rowWindow.padBottom} columns={COLUMN_COUNT} />
        </tbody>
      </table>
    </div>
  );
}
