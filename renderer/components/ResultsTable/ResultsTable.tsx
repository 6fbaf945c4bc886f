// Results of the plan, one row per depot: status, cost, legs, drive time, caution flags and, with a
// scenario, the change against the base. Sortable by any column, filterable, keyboard-navigable
// (arrow keys, Page Up/Down, Home/End move between rows, Enter shows the route), exportable as CSV.
// Long tables are windowed: only rows near the view are in the DOM.

import { useEffect, useMemo, useRef, useState } from 'react';
import { counted } from '../../../engine/index';
import { CautionLine } from '../CautionLine/CautionLine';
import { SortHeader, sortOf } from '../DataTable/SortHeader';
import { SpacerRow } from '../DataTable/SpacerRow';
import { useRowWindow } from '../DataTable/use-row-window';
import { useRowKeys } from '../DataTable/use-row-keys';
import { ALL_FLAG_LABELS, FLAG_LIMIT_HIDES_LOOP, flagExplanations, LIMIT_HIDES_LOOP_HELP } from '../../model/flags';
import { formatDriveMinutes, formatMoney } from '../../model/format';
import { costText, DEFAULT_QUERY, queryDepots, resultRow, statusBadges, toggleSort, type SortKey, type StatusWord, type TableQuery } from '../../model/results-table';
import type { NetworkView, SolveView } from '../../worker/protocol';

export interface ResultsTableProps {
  network: NetworkView;
  solve: SolveView;
  selected: number | null;
  onSelect(depot: number): void;
  onExport(): void;
}

const COLUMNS: { key: SortKey; label: string; numeric?: boolean }[] = [
  { key: 'id', label: 'Depot' },
  { key: 'name', label: 'Name' },
  { key: 'status', label: 'Status' },
  { key: 'cost', label: 'Cost', numeric: true },
  { key: 'legs', label: 'Legs', numeric: true },
  { key: 'drive', label: 'Drive time', numeric: true },
  { key: 'flags', label: 'Cautions' },
];

export function ResultsTable({ network, solve, selected, onSelect, onExport }: ResultsTableProps) {
  const [query, setQuery] = useState<TableQuery>(DEFAULT_QUERY);
  // Depots in table order; a row is made only for what the window shows.
  const visible = useMemo(() => queryDepots(network, solve, query), [network, solve, query]);
  const rowWindow = useRowWindow(visible.length);
  // The table is one Tab stop; the keys move between rows by index (rows outside the window too).
  const keys = useRowKeys(rowWindow, visible.length, (i) => onSelect(visible[i]));
  const columns = solve.base ? [...COLUMNS, { key: 'delta' as SortKey, label: 'Change vs base', numeric: true }] : COLUMNS;
  return (
    <div className="lw-results">
      <div className="lw-table-tools" role="group" aria-label="Filter results">
        <input type="search" aria-label="Filter depots by id, name or caution" placeholder="Filter by id, name or caution" value={query.text} onChange={(e) => setQuery({ ...query, text: e.target.value })} />
        <select aria-label="Status filter" value={query.status} onChange={(e) => setQuery({ ...query, status: e.target.value as StatusWord | 'all' })}>
          <option value="all">All statuses</option>
          <option value="reachable">Reachable</option>
          <option value="unbounded">Unbounded</option>
          <option value="unreachable">Unreachable</option>
          <option value="origin">Origin</option>
        </select>
        <label className="lw-check">
          <input type="checkbox" checked={query.flaggedOnly} onChange={(e) => setQuery({ ...query, flaggedOnly: e.target.checked })} /> With cautions only
        </label>
        <span className="lw-muted" aria-live="polite">
          {visible.length} of {counted(network.depotIds.length, 'depot')}
        </span>
        <button type="button" onClick={onExport}>
          Export routes CSV
        </button>
      </div>
      <CautionLine testId="results-caution" />
      {solve.flags.some((f) => (f & FLAG_LIMIT_HIDES_LOOP) !== 0) && (
        <p className="lw-muted" data-testid="limit-hides-loop-help">
          “limit hides loop”: {LIMIT_HIDES_LOOP_HELP}
        </p>
      )}
      <table className="lw-table" aria-label={`Routes from ${network.depotIds[solve.origin]}`} aria-rowcount={visible.length + 1} data-testid="results-table">
        <thead>
          <tr aria-rowindex={1}>
            {columns.map((c) => (
              <SortHeader key={c.key} label={c.label} numeric={c.numeric} sort={sortOf(query, c.key)} onSort={() => setQuery(toggleSort(query, c.key))} />
            ))}
          </tr>
        </thead>
        <tbody ref={rowWindow.bodyRef}>
          <SpacerRow heightPx={rowWindow.padTop} columns={columns.length} />
          {Array.from(visible.subarray(rowWindow.start, rowWindow.end), (depot, k) => {
            const row = resultRow(network, solve, depot);
            const i = rowWindow.start + k;
            return (
            <tr
              key={row.depot}
              aria-rowindex={i + 2}
              tabIndex={i === keys.tabStop ? 0 : -1}
              data-depot={row.id}
              data-cost-minor={Number.isFinite(row.costMinor) ? row.costMinor : ''}
              aria-current={row.depot === selected ? 'true' : undefined}
              className={`lw-status-${row.status}${row.unbounded && row.status === 'origin' ? ' lw-status-unbounded' : ''}${row.depot === selected ? ' lw-selected' : ''}`}
              onClick={() => (onSelect(row.depot), keys.setActive(i))}
              onFocus={() => keys.setActive(i)}
              onKeyDown={(event) => keys.onKeyDown(event, i)}
            >
              <th scope="row">{row.id}</th>
              <td>{row.name}</td>
              <td>
                {statusBadges(row).map((b, k) => (
                  <span key={b.kind}>
                    {k > 0 ? ' · ' : ''}
                    <span className={`lw-badge lw-badge-${b.kind}`}>{b.text}</span>
                  </span>
                ))}
              </td>
              <td className="lw-num">{costText(row, network.exponent)}</td>
              <td className="lw-num">{row.legs >= 0 ? row.legs : '—'}</td>
              <td className="lw-num">{formatDriveMinutes(row.driveMinutes)}</td>
              <td title={flagExplanations(row.flags).join('\n')}>{row.flagText.join(', ')}</td>
              {solve.base && <td className="lw-num">{Number.isFinite(row.deltaMinor) ? (row.deltaMinor > 0 ? '+' : '') + formatMoney(row.deltaMinor, network.exponent) : '—'}</td>}
            </tr>
            );
          })}
          <SpacerRow heightPx={rowWindow.padBottom} columns={columns.length} />
        </tbody>
      </table>
      <p className="lw-muted">Cautions: {ALL_FLAG_LABELS.join(' · ')}. Amounts in {network.currency}.</p>
    </div>
  );
}
