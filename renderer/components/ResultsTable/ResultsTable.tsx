// Results of the plan, one row per depot: status, cost, legs, drive time, caution flags and, with a
// scenario, the change against the base. Sortable by any column, filterable, keyboard-navigable
// (arrow keys move between rows, Enter shows the route), exportable as CSV.

import { useMemo, useState } from 'react';
import { ALL_FLAG_LABELS, flagExplanations } from '../../model/flags';
import { formatDriveMinutes, formatMoney } from '../../model/format';
import { costText, DEFAULT_QUERY, queryRows, resultRows, statusBadges, toggleSort, type SortKey, type StatusWord, type TableQuery } from '../../model/results-table';
import type { NetworkView, SolveView } from '../../worker/protocol';

export interface ResultsTableProps {
  network: NetworkView;
  solve: SolveView;
  selected: number | null;
  onSelect(depot: number): void;
  onExport(): void;
}

const PAGE = 200;

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
  const [shown, setShown] = useState(PAGE);
  // Roving tab stop: the table is one Tab stop; arrow keys move between rows.
  const [active, setActive] = useState(0);
  const rows = useMemo(() => resultRows(network, solve), [network, solve]);
  const visible = useMemo(() => queryRows(rows, query), [rows, query]);
  const columns = solve.base ? [...COLUMNS, { key: 'delta' as SortKey, label: 'Change vs base', numeric: true }] : COLUMNS;
  const moveFocus = (event: React.KeyboardEvent<HTMLTableRowElement>, depot: number) => {
    const row = event.currentTarget;
    const target = event.key === 'ArrowDown' ? row.nextElementSibling : event.key === 'ArrowUp' ? row.previousElementSibling : null;
    if (target instanceof HTMLElement) {
      event.preventDefault();
      setActive((i) => i + (event.key === 'ArrowDown' ? 1 : -1));
      target.focus();
    } else if (event.key === 'Enter' || event.key === ' ') {
      event.preventDefault();
      onSelect(depot);
    }
  };
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
          {visible.length} of {rows.length} depots
        </span>
        <button type="button" onClick={onExport}>
          Export routes CSV
        </button>
      </div>
      <table className="lw-table" aria-label={`Routes from ${network.depotIds[solve.origin]}`} data-testid="results-table">
        <thead>
          <tr>
            {columns.map((c) => (
              <th key={c.key} scope="col" aria-sort={query.sortKey === c.key ? (query.descending ? 'descending' : 'ascending') : 'none'} className={c.numeric ? 'lw-num' : undefined}>
                <button type="button" className="lw-sort" onClick={() => setQuery(toggleSort(query, c.key))}>
                  {c.label}
                  <span aria-hidden="true">{query.sortKey === c.key ? (query.descending ? ' ▼' : ' ▲') : ''}</span>
                </button>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {visible.slice(0, shown).map((row, i) => (
            <tr
              key={row.depot}
              tabIndex={i === Math.min(active, visible.length - 1) ? 0 : -1}
              data-depot={row.id}
              data-cost-minor={Number.isFinite(row.costMinor) ? row.costMinor : ''}
              aria-current={row.depot === selected ? 'true' : undefined}
              className={`lw-status-${row.status}${row.unbounded && row.status === 'origin' ? ' lw-status-unbounded' : ''}${row.depot === selected ? ' lw-selected' : ''}`}
              onClick={() => (onSelect(row.depot), setActive(i))}
              onKeyDown={(event) => moveFocus(event, row.depot)}
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
          ))}
        </tbody>
      </table>
      {visible.length > shown && (
        <button type="button" onClick={() => setShown(shown + PAGE)}>
          Show {Math.min(PAGE, visible.length - shown)} more
        </button>
      )}
      <p className="lw-muted">Cautions: {ALL_FLAG_LABELS.join(' · ')}. Amounts in {network.currency}.</p>
    </div>
  );
}
