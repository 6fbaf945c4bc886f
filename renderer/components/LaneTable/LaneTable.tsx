// The lane table: the lanes of the contract with their amounts under the active scenario, as the
// engine's overlay computes them in the worker (this component computes no amount). Editing an
// amount or closing a lane adds a change to the scenario (never to the imported file). A toll edit
// is for the vehicle class being viewed; "every class" is a separate, explicit choice. Every row
// of the file can be shown, rows not planned for the date or class marked and still editable.
// Lanes the scenario adds are listed first. Filtered, and windowed (only rows near the view are in
// the DOM; 100 rows of four amount inputs each took a long layout on every show and solve). The
// row holding focus stays rendered while it is scrolled away, so a half-typed amount is kept.
// Pages of PAGE rows remain: Chromium caps an element's height near 33 million pixels, which a
// million rows of the file in one scrolling table would pass.

import { useMemo, useState, type FocusEvent } from 'react';
import { counted, netCost, withoutChange } from '../../../engine/index';
import { addedAmount, addedLaneName, setAddedLaneAmount, type AddedLane } from '../../model/added-lanes';
import { EDITABLE_FIELDS, setLaneAmount, setLaneClosed, type EditableField, type Scenario } from '../../model/scenario-edits';
import { formatMoney } from '../../model/format';
import type { NetworkView, OverlayView } from '../../worker/protocol';
import { TableHead } from '../DataTable/DataTable';
import { SpacerRow } from '../DataTable/SpacerRow';
import { useRowWindow } from '../DataTable/use-row-window';
import { windowParts } from '../DataTable/window-parts';
import { AmountCell } from './AmountCell';
import { rowClass, rowKey, rowRef, rowValidity } from '../../model/lane-names';

export interface LaneTableProps {
  network: NetworkView;
  amounts: OverlayView;
  /** Lanes only the scenario plans (added, or a file row a validity change brings in), from the solve. */
  added: readonly AddedLane[];
  scenario: Scenario;
  onScenario(next: Scenario): void;
}

const PAGE = 10_000;
const NUM = (label: string) => ({ label, numeric: true });
const LANE_TABLE_HEADS = ['Row', 'Lane', 'Ref', NUM('Tolls'), NUM('Fuel'), NUM('Fees'), NUM('Rebate'), NUM('Net'), 'Open'];

/** Why a row of the file is not in the plan on screen. */
function notPlannedReason(network: NetworkView, r: number): string {
  const date = network.plan.date;
  const { from, to } = rowValidity(network, r);
  if (date && ((from && date < from) || (to && date > to))) return `not valid on ${date} (valid ${from ?? '…'} to ${to ?? '…'})`;
  const cls = rowClass(network, r);
  if (cls !== null && cls !== network.plannedClass) return `for vehicle class ${cls}`;
  return 'not in the plan on screen';
}

// The unfiltered lists (rows of the plan; every row of the file), made once per network into typed
// arrays: the table is made again each time its tab is shown, and a pass over 500,000 rows pushing
// into a plain array was most of that.
const unfiltered = new WeakMap<NetworkView, { planned?: Int32Array; every?: Int32Array }>();

/** Rows of the file listed for a filter text (lower case, '' for none), with or without the rows not planned; in file order. */
function rowsMatching(network: NetworkView, needle: string, everyRow: boolean): Int32Array {
  const rows = network.rows;
  let cached = unfiltered.get(network);
  if (needle === '' && cached?.[everyRow ? 'every' : 'planned']) return cached[everyRow ? 'every' : 'planned']!;
  const out = new Int32Array(rows.lane.length);
  let n = 0;
  for (let r = 0; r < rows.lane.length; r++) {
    if (rows.lane[r] === -1 && !everyRow) continue;
    if (needle !== '') {
      const hay = `${network.depotIds[rows.from[r]]} ${network.depotIds[rows.to[r]]} ${rowRef(network, r) ?? ''}`.toLowerCase();
      if (!hay.includes(needle)) continue;
    }
    out[n++] = r;
  }
  const list = out.slice(0, n);
  if (needle === '') {
    if (!cached) unfiltered.set(network, (cached = {}));
    cached[everyRow ? 'every' : 'planned'] = list;
  }
  return list;
}

export function LaneTable({ network, amounts, added, scenario, onScenario }: LaneTableProps) {
  const [text, setText] = useState('');
  const [changedOnly, setChangedOnly] = useState(false);
  const [everyRow, setEveryRow] = useState(false);
  const [tollForEveryClass, setTollForEveryClass] = useState(false);
  const [page, setPage] = useState(0);
  const rows = network.rows;
  const viewedClass = network.plannedClass;
  // Without a class (no class tolls, or the toll column on screen) a toll edit is for every class.
  const tollClass = viewedClass === null || tollForEveryClass ? null : viewedClass;
  // Rows matching the text, made again only when the network or the filter changes; a solve only
  // re-filters them when "changed only" is on (500,000 rows per recompute held up the page).
  const matching = useMemo(() => rowsMatching(network, text.trim().toLowerCase(), everyRow), [network, text, everyRow]);
  const shown = useMemo(() => (changedOnly ? matching.filter((r) => (rows.lane[r] >= 0 ? amounts.changed[rows.lane[r]] : amounts.rows.changed[r])) : matching), [matching, rows, amounts, changedOnly]);
  const addedShown = useMemo(() => {
    const needle = text.trim().toLowerCase();
    return added.filter((a) => needle === '' || `${a.lane.from} ${a.lane.to} ${a.lane.ref ?? ''}`.toLowerCase().includes(needle));
  }, [added, text]);
  const pages = Math.max(1, Math.ceil(shown.length / PAGE));
  const current = Math.min(page, pages - 1);
  const id = (d: number) => network.depotIds[d];
  const base: Record<EditableField, Float64Array> = { toll: network.laneToll, fuel: network.laneFuel, fees: network.laneFees, rebate: network.laneRebate };
  const planned = useMemo(() => rowsMatching(network, '', false).length, [network]);
  // One list for the window: the scenario's lanes, then this page's rows of the file.
  const pageRows = useMemo(() => shown.slice(current * PAGE, current * PAGE + PAGE), [shown, current]);
  const count = addedShown.length + pageRows.length;
  const rowWindow = useRowWindow(count);
  const [focused, setFocused] = useState<number | null>(null);
  const onFocus = (event: FocusEvent<HTMLTableSectionElement>) => {
    const index = Number((event.target as HTMLElement).closest('tr[aria-rowindex]')?.getAttribute('aria-rowindex') ?? NaN) - 2;
    setFocused(Number.isInteger(index) ? index : null);
  };
  const onBlur = (event: FocusEvent<HTMLTableSectionElement>) => {
    if (!event.currentTarget.contains(event.relatedTarget as Node | null)) setFocused(null);
  };
  const parts = windowParts(count, rowWindow.start, rowWindow.end, rowWindow.rowPx, focused);
  return (
    <div className="lw-lanes">
      <div className="lw-table-tools" role="group" aria-label="Filter lanes">
        <input type="search" aria-label="Filter lanes by depot or contract ref" placeholder="Filter by depot or contract ref" value={text} onChange={(e) => (setText(e.target.value), setPage(0))} />
        <label className="lw-check">
          <input type="checkbox" checked={changedOnly} onChange={(e) => (setChangedOnly(e.target.checked), setPage(0))} /> Changed in scenario only
        </label>
        <label className="lw-check">
          <input type="checkbox" checked={everyRow} onChange={(e) => (setEveryRow(e.target.checked), setPage(0))} /> Every row of the file ({rows.lane.length - planned} not planned for {network.plan.date || 'this plan'}
          {viewedClass ? `, ${viewedClass}` : ''})
        </label>
        {viewedClass !== null && (
          <label className="lw-check">
            <input type="checkbox" checked={tollForEveryClass} onChange={(e) => setTollForEveryClass(e.target.checked)} /> Toll edits for every class (not only {viewedClass})
          </label>
        )}
        <span className="lw-muted" aria-live="polite">
          {counted(shown.length, 'lane')}{addedShown.length > 0 ? ` + ${addedShown.length} only in the scenario's plan` : ''} · page {current + 1} of {pages} · toll edits apply to {tollClass ?? 'every class'}
        </span>
        <button type="button" disabled={current === 0} onClick={() => setPage(current - 1)}>
          Previous page
        </button>
        <button type="button" disabled={current >= pages - 1} onClick={() => setPage(current + 1)}>
          Next page
        </button>
      </div>
      <table className="lw-table" aria-label={`Lanes under scenario “${scenario.name}”`} aria-rowcount={count + 1} data-testid="lane-table">
        <TableHead labels={LANE_TABLE_HEADS} />
        <tbody ref={rowWindow.bodyRef} onFocus={onFocus} onBlur={onBlur}>
          {parts.map((part, p) => ('spacer' in part ? <SpacerRow key={`spacer-${p}`} heightPx={part.spacer} columns={LANE_TABLE_HEADS.length} /> : rowsOf(part.from, part.to)))}
        </tbody>
      </table>
    </div>
  );

  function rowsOf(from: number, to: number) {
    const out = [];
    for (let i = from; i < to; i++) out.push(i < addedShown.length ? addedRow(addedShown[i], i) : fileRow(pageRows[i - addedShown.length], i));
    return out;
  }

  function addedRow(a: AddedLane, i: number) {
    const name = addedLaneName(a.lane);
    if (a.kind === 'row') {
      // A file row the scenario's validity change brings into the date: its amounts are edited
      // like any row of the file (under "Every row of the file"); Undo drops the validity change.
      return (
        <tr key={`row-${a.ref}`} aria-rowindex={i + 2} data-scenario-row={a.sourceRow ?? ''} className="lw-changed-row lw-added-row">
          <td>
            <span className="lw-badge lw-badge-added" title="This row of the lanes file is not valid on the date; the scenario's validity change puts it in the plan">
              row {a.sourceRow} valid by scenario
            </span>
          </td>
          <th scope="row">
            {a.lane.from} → {a.lane.to}
          </th>
          <td>{a.lane.ref ?? '—'}</td>
          {EDITABLE_FIELDS.map((field) => (
            <td key={field} className="lw-num">
              {formatMoney(addedAmount(a.lane, field), network.exponent)}
            </td>
          ))}
          <td className="lw-num">{formatMoney(a.netMinor, network.exponent)}</td>
          <td>
            {a.changeIndex >= 0 && (
              <button type="button" aria-label={`Undo the validity change of ${name}`} onClick={() => onScenario(withoutChange(scenario, a.changeIndex))}>
                Undo
              </button>
            )}
          </td>
        </tr>
      );
    }
    return (
      <tr key={`added-${a.changeIndex}`} aria-rowindex={i + 2} data-added-lane={a.changeIndex} className="lw-changed-row lw-added-row">
        <td>
          <span className="lw-badge lw-badge-added" title="This lane is not in the lanes file: the scenario adds it">
            + added by scenario
          </span>
        </td>
        <th scope="row">
          {a.lane.from} → {a.lane.to}
        </th>
        <td>{a.lane.ref ?? '—'}</td>
        {EDITABLE_FIELDS.map((field) => (
          <td key={field} className="lw-num">
            <AmountCell
              key={`added-${a.changeIndex}-${field}-${addedAmount(a.lane, field)}`}
              valueMinor={addedAmount(a.lane, field)}
              exponent={network.exponent}
              currency={network.currency}
              label={`${field} of added lane ${name}`}
              changed
              onCommit={(value) => onScenario(setAddedLaneAmount(scenario, a.changeIndex, field, value))}
            />
          </td>
        ))}
        <td className="lw-num">{formatMoney(a.netMinor, network.exponent)}</td>
        <td>
          <button type="button" aria-label={`Remove added lane ${name}`} onClick={() => onScenario(withoutChange(scenario, a.changeIndex))}>
            Remove
          </button>
        </td>
      </tr>
    );
  }

  function fileRow(r: number, i: number) {
    const e = rows.lane[r];
    const name = `${id(rows.from[r])} → ${id(rows.to[r])}`;
    const key = rowKey(network, r);
    const inPlan = e >= 0;
    const value = (field: EditableField) => (inPlan ? amounts[field][e] : amounts.rows[field][r]);
    const closed = inPlan ? amounts.closed[e] === 1 : amounts.rows.closed[r] === 1;
    const changed = inPlan ? amounts.changed[e] === 1 : amounts.rows.changed[r] === 1;
    const away = inPlan && amounts.notPlanned[e] === 1;
    const rowLabel = `lane ${name}, row ${rows.sourceRow[r]}`;
    const fieldLabel = (field: EditableField) => (field === 'toll' ? ` (${tollClass ?? 'every class'})` : '');
    return (
      <tr key={r} aria-rowindex={i + 2} data-lane-row={rows.sourceRow[r]} data-planned={inPlan ? 'yes' : 'no'} className={[changed ? 'lw-changed-row' : '', inPlan ? '' : 'lw-unplanned-row'].join(' ').trim() || undefined}>
        <td>
          {rows.sourceRow[r]}
          {!inPlan && (
            <span className="lw-badge" title="This row of the file is not part of the plan on screen; edits to it are kept in the scenario">
              {' '}
              {notPlannedReason(network, r)}
            </span>
          )}
        </td>
        <th scope="row">{name}</th>
        <td>{rowRef(network, r) ?? '—'}</td>
        {EDITABLE_FIELDS.map((field) => (
          <td key={field} className="lw-num">
            <AmountCell
              key={`${r}-${field}-${value(field)}-${tollClass ?? ''}`}
              valueMinor={value(field)}
              exponent={network.exponent}
              currency={network.currency}
              label={`${field} of ${rowLabel}${fieldLabel(field)}`}
              changed={inPlan ? value(field) !== base[field][e] : changed}
              onCommit={(next) => onScenario(setLaneAmount(scenario, key, field, next, inPlan && !(field === 'toll' && tollClass === null && network.vehicleClasses.length > 0) ? base[field][e] : NaN, field === 'toll' ? tollClass : null))}
            />
          </td>
        ))}
        <td className="lw-num">{closed ? (away ? 'not planned' : 'closed') : inPlan ? formatMoney(netCost(value('toll'), value('fuel'), value('fees'), value('rebate')), network.exponent) : '—'}</td>
        <td>
          <input type="checkbox" aria-label={`${rowLabel[0].toUpperCase()}${rowLabel.slice(1)} open`} checked={!(inPlan ? amounts.closed[e] && !away : amounts.rows.closed[r])} onChange={(ev) => onScenario(setLaneClosed(scenario, key, !ev.target.checked))} />
        </td>
      </tr>
    );
  }
}
