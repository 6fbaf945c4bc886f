// The loads table: one row per load, sortable and filterable, windowed so 10,000 loads scroll with
// a few dozen rows in the DOM (DataTable/use-row-window), and the results table's keyboard
// (DataTable/use-row-keys): one Tab stop, arrows, Page Up/Down, Home and End, Enter or Space selects.

import type { DispatchLoadRow } from '../../../engine/index';
import { formatDriveMinutes, formatMoney } from '../../model/format';
import { loadCautions, toggleLoadSort, type LoadSortKey, type LoadsQuery } from '../../model/loads-table';
import { SortHeader, sortOf } from '../DataTable/SortHeader';
import { SpacerRow } from '../DataTable/SpacerRow';
import { useRowWindow } from '../DataTable/use-row-window';
import { useRowKeys } from '../DataTable/use-row-keys';

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

export interface LoadsTableProps {
  rows: readonly DispatchLoadRow[];
  exponent: number;
  query: LoadsQuery;
  onQuery(query: LoadsQuery): void;
  selected: string | null;
  onSelect(load: string): void;
}

export function LoadsTable({ rows, exponent, query, onQuery, selected, onSelect }: LoadsTableProps) {
  const rowWindow = useRowWindow(rows.length);
  const keys = useRowKeys(rowWindow, rows.length, (i) => onSelect(rows[i].load));
  const money = (v: number | null) => (v === null ? '—' : formatMoney(v, exponent));

  return (
    <div className="lw-loads-scroll" data-testid="loads-scroll">
      <table className="lw-table" aria-label="Loads" aria-rowcount={rows.length + 1} data-testid="loads-table" data-windowed={rowWindow.windowed ? 'true' : 'false'}>
        <thead>
          <tr aria-rowindex={1}>
            {COLUMNS.map((c) => (
              <SortHeader key={c.key} label={c.label} numeric={c.numeric} sort={sortOf(query, c.key)} onSort={() => onQuery(toggleLoadSort(query, c.key))} />
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
                tabIndex={i === keys.tabStop ? 0 : -1}
                data-load={r.load}
                aria-current={r.load === selected ? 'true' : undefined}
                className={r.load === selected ? 'lw-selected' : undefined}
                onClick={() => (onSelect(r.load), keys.setActive(i))}
                onFocus={() => keys.setActive(i)}
                onKeyDown={(e) => keys.onKeyDown(e, i)}
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
