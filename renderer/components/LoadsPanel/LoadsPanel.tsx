// The Loads panel: import a day's loads file (and a vehicles file), plan every load on its vehicle
// in the engine worker, and show the table (status, cost, limits cost, driving flag, cautions;
// sortable and filterable), the selected load's breakdown and why it is blocked, alternatives on
// request, totals, the dispatch sheet as CSV and a printable sheet (one page per date).

import { useEffect, useMemo, useRef, useState } from 'react';
import { createPortal } from 'react-dom';
import { WorkCancelledError, type Engine } from '../../app/use-engine';
import { csvDialect } from '../../app/csv-dialect-store';
import type { LanewrightHost } from '../../../main/ipc/contract';
import { formatDriveMinutes, formatMoney } from '../../model/format';
import { DEFAULT_LOADS_QUERY, queryLoads, type LoadStatusWord, type LoadsQuery } from '../../model/loads-table';
import type { DispatchView } from '../../worker/dispatch-loads';
import type { NamedText, NetworkView } from '../../worker/protocol';
import { hasChanges, type Scenario } from '../../model/scenario-edits';
import { sampleLoadFiles } from '../../sample/sample-loads';
import { DispatchSheet } from './DispatchSheet';
import { LoadsTable } from './LoadsTable';
import { applyCsvDialect, PRODUCT_NAME } from '../../../engine/index';
import type { LoadRouteDrawing } from '../../map/load-route-layer';
import type { LoadFiles } from '../../app/workspace-doc';
import './loads.css';
import { counted } from '../../../engine/index';

/** A component whose own sum is outside the exact range (engine RouteBreakdown); the cost stands. */
const OUT_OF_RANGE = 'out of range';

export interface LoadsPanelProps {
  engine: Engine;
  host: LanewrightHost;
  network: NetworkView;
  /** Date for loads without one (the plan's dispatch date). */
  date: string;
  /** The active what-if scenario; the loads are planned under it. */
  scenario: Scenario;
  /** The loads and vehicles files, kept with the workspace (null = none chosen). */
  files: LoadFiles | null;
  onFiles(files: LoadFiles | null): void;
  /** The routes to draw on the map for the selected load (null = none). */
  onDraw(routes: LoadRouteDrawing[] | null): void;
  onMessage(text: string): void;
}


const ALTERNATIVES = 3;

export function LoadsPanel({ engine, host, network, date, scenario, files, onFiles, onDraw, onMessage }: LoadsPanelProps) {
  const [view, setView] = useState<DispatchView | null>(null);
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const [query, setQuery] = useState<LoadsQuery>(DEFAULT_LOADS_QUERY);
  const [selected, setSelected] = useState<string | null>(null);
  const [showAlternatives, setShowAlternatives] = useState(false);

  // What the plan on screen was made from: files, network and scenario.
  const planned = useRef<{ files: LoadFiles; network: NetworkView; scenario: Scenario } | null>(null);
  const run = (next: LoadFiles, acceptPartial: boolean) => {
    planned.current = { files: next, network, scenario };
    setBusy(true);
    setProblem(null);
    engine
      .track((onProgress) => engine.client.request('dispatch', { request: { ...next, date, alternatives: ALTERNATIVES, acceptPartial, scenario: hasChanges(scenario) ? scenario : null } }, onProgress), 'Planning the loads')
      .then((answer) => {
        setView(answer.result);
        const t = answer.result.report?.totals.all;
        if (t) onMessage(`Planned ${counted(t.loads, 'load')}: ${t.planned} planned, ${t.blocked} blocked, ${t.unbounded} unbounded, ${t.no_route} without a route.`);
      })
      .catch((error: Error) => setProblem(error instanceof WorkCancelledError ? 'Planning the loads was stopped.' : error.message))
      .finally(() => setBusy(false));
  };
  // New files (picked, or reopened with a workspace) are planned as they are; a new network (import,
  // re-plan) or another what-if makes the plan stale: the same files are planned again.
  useEffect(() => {
    const last = planned.current;
    if (!files || files.loads.name === '') {
      planned.current = null;
      if (!files) setView(null);
      return;
    }
    if (last && last.files === files && last.network === network && last.scenario === scenario) return;
    run(files, last !== null && last.files === files);
  }, [files, network, scenario]);
  useEffect(() => () => onDraw(null), []);

  const pick = async (kind: 'loads' | 'vehicles') => {
    const picked = await host.pickFile(kind);
    if (!picked.ok) return setProblem(`${kind === 'loads' ? 'Loads' : 'Vehicles'} file not read: ${picked.failure.message}`);
    if (!picked.value) return;
    const text: NamedText = { name: picked.value.name, text: picked.value.text, path: picked.value.path };
    onFiles(kind === 'vehicles' ? { loads: files?.loads ?? { name: '', text: '' }, vehicles: text } : { loads: text, vehicles: files?.vehicles ?? null });
  };

  const report = view?.report ?? null;
  const rows = useMemo(() => (report ? queryLoads(report.loads, query) : []), [report, query]);
  const current = report?.loads.find((r) => r.load === selected) ?? null;
  useEffect(() => {
    if (!current || current.path.length < 2) return onDraw(null);
    const routes: LoadRouteDrawing[] = [{ path: current.path, label: null }];
    if (showAlternatives) current.alternatives.forEach((a, i) => routes.push({ path: a.path, label: `Alt ${i + 1} +${formatMoney(a.difference_minor, network.exponent)}` }));
    onDraw(routes);
  }, [current, showAlternatives, network]);

  const money = (v: number | null) => (v === null ? '—' : formatMoney(v, network.exponent));
  const exportCsv = async () => {
    if (!view?.csv) return;
    const saved = await host.saveExport(`dispatch-${date || 'loads'}.csv`, applyCsvDialect(view.csv, csvDialect()), 'csv');
    if (!saved.ok) onMessage(`Dispatch sheet not saved: ${saved.failure.message}`);
    else if (saved.value) onMessage(`Saved the dispatch sheet: ${saved.value.path}`);
  };
  const print = () => {
    document.body.classList.add('lw-printing-sheet');
    window.addEventListener('afterprint', () => document.body.classList.remove('lw-printing-sheet'), { once: true });
    window.print();
  };

  return (
    <div className="lw-loads" data-testid="loads-panel">
      <div className="lw-loads-tools" role="group" aria-label="Loads files">
        <button type="button" onClick={() => void pick('loads')} disabled={busy}>
          Import loads…
        </button>
        <button type="button" onClick={() => void pick('vehicles')} disabled={busy}>
          {files?.vehicles ? `Vehicles: ${files.vehicles.name}` : 'Import vehicles…'}
        </button>
        <button type="button" onClick={() => onFiles(sampleLoadFiles())} disabled={busy}>
          Sample loads
        </button>
        {view?.files.fatal && (
          <button type="button" onClick={() => files && run(files, true)}>
            Plan the accepted rows
          </button>
        )}
        {report && (
          <>
            <button type="button" onClick={() => void exportCsv()}>
              Export dispatch sheet CSV
            </button>
            <button type="button" onClick={print}>
              Print dispatch sheet
            </button>
          </>
        )}
      </div>
      {busy && <p aria-busy="true">Planning the loads…</p>}
      {problem && <p className="lw-warn">{problem}</p>}
      {!view && !busy && <p className="lw-muted">Import a day's loads file (load, from, to, optional date, vehicle, vehicle_class, tunnel_code) and, for vehicle limits, a vehicles file.</p>}
      {view && (view.files.issues.length > 0 || view.files.warnings.length > 0) && (
        <details className="lw-loads-report" open={view.files.fatal}>
          <summary>
            {view.files.files.map((f) => `${f.file}: ${counted(f.total, 'row')}, ${f.accepted} accepted, ${f.rejected} rejected`).join(' · ')}
          </summary>
          <ul>
            {[...view.files.issues.map((i) => ({ ...i, level: 'error' })), ...view.files.warnings.map((i) => ({ ...i, level: 'warning' }))].map((i, k) => (
              <li key={k}>
                {i.level}: {i.file}
                {i.row !== null ? `, row ${i.row}` : ''}
                {i.column !== null ? `, column "${i.column}"` : ''}
                {i.value !== null ? `, value "${i.value}"` : ''}: {i.reason}
              </li>
            ))}
          </ul>
        </details>
      )}
      {report && (
        <>
          {report.scenario !== null && (
            <p className="lw-warn" data-testid="loads-scenario">
              Planned under the what-if scenario “{report.scenario}”, not the lanes as the file has them.
            </p>
          )}
          <div className="lw-table-tools" role="group" aria-label="Filter loads">
            <input type="search" aria-label="Filter loads" placeholder="Filter by load, depot, vehicle or reason" value={query.text} onChange={(e) => setQuery({ ...query, text: e.target.value })} />
            <select aria-label="Load status filter" value={query.status} onChange={(e) => setQuery({ ...query, status: e.target.value as LoadStatusWord | 'all' })}>
              <option value="all">All statuses</option>
              <option value="planned">Planned</option>
              <option value="blocked">Blocked</option>
              <option value="unbounded">Unbounded</option>
              <option value="no-route">No route</option>
            </select>
            <span className="lw-muted" aria-live="polite">
              {rows.length} of {counted(report.loads.length, 'load')}
            </span>
          </div>
          <LoadsTable rows={rows} exponent={network.exponent} query={query} onQuery={setQuery} selected={selected} onSelect={setSelected} />
          {current && (
            <div className="lw-loads-detail" data-testid="load-detail" aria-live="polite">
              <h3>
                Load {current.load}: {current.from} → {current.to} on {current.date} ({current.vehicle ?? `class ${current.vehicle_class ?? '(default)'}`}) — {current.status}
              </h3>
              {current.status === 'blocked' && (
                <>
                  <p>Reachable only over lanes this vehicle may not use:</p>
                  <ul data-testid="blocked-by">
                    {current.blocked_by.map((b) => (
                      <li key={b}>{b}</li>
                    ))}
                  </ul>
                </>
              )}
              {current.status === 'no-route' && <p>No route from {current.from} to {current.to} on {current.date}, even without vehicle limits.</p>}
              {current.status === 'unbounded' && current.loop && (
                <p className="lw-warn">
                  A rebate loop reaches this depot ({current.loop.depots.join(' → ')} → {current.loop.depots[0]}, lane rows {current.loop.lanes.join(', ')}): its cost is unbounded; fix the contract terms.
                </p>
              )}
              {current.breakdown && (
                <p>
                  Cost {network.currency} {money(current.cost_minor)}: tolls {current.breakdown.toll ?? OUT_OF_RANGE}, fuel {current.breakdown.fuel ?? OUT_OF_RANGE}, fees {current.breakdown.fees ?? OUT_OF_RANGE}, rebates {current.breakdown.rebate ?? OUT_OF_RANGE}; {current.breakdown.distance_km ?? '—'} km,{' '}
                  {formatDriveMinutes(current.breakdown.drive_minutes ?? NaN)}{current.over_drive_limit ? ' (over the daily driving limit)' : ''}. Route {current.path.join(' › ')} (lane rows {current.lanes.join(', ')}).
                </p>
              )}
              {current.avoided.length > 0 && <p>The vehicle's limits cost {money(current.limits_extra_minor)}: it avoids {current.avoided.join('; ')}.</p>}
              {current.notes.map((n) => (
                <p key={n} className="lw-muted">
                  {n}
                </p>
              ))}
              {current.alternatives.length > 0 && (
                <label className="lw-check">
                  <input type="checkbox" checked={showAlternatives} onChange={(e) => setShowAlternatives(e.target.checked)} /> Show {counted(current.alternatives.length, 'alternative route')} on the map
                </label>
              )}
              {showAlternatives && (
                <ol>
                  {current.alternatives.map((a, i) => (
                    <li key={i}>
                      Alt {i + 1}: {money(a.cost_minor)} (+{money(a.difference_minor)}) via {a.path.join(' › ')}; leaves the best route at lane rows {a.departs.join(', ')}
                    </li>
                  ))}
                </ol>
              )}
            </div>
          )}
          <table className="lw-table" aria-label="Totals by date and vehicle" data-testid="loads-totals">
            <thead>
              <tr>
                <th scope="col">Date / vehicle</th>
                <th scope="col" className="lw-num">Loads</th>
                <th scope="col" className="lw-num">Planned</th>
                <th scope="col" className="lw-num">Blocked</th>
                <th scope="col" className="lw-num">Unbounded</th>
                <th scope="col" className="lw-num">Cost</th>
                <th scope="col" className="lw-num">km</th>
                <th scope="col" className="lw-num">Drive time</th>
              </tr>
            </thead>
            <tbody>
              {[...report.totals.by_date, ...report.totals.by_vehicle].map((t) => (
                <tr key={t.key}>
                  <th scope="row">{t.key}</th>
                  <td className="lw-num">{t.loads}</td>
                  <td className="lw-num">{t.planned}</td>
                  <td className="lw-num">{t.blocked}</td>
                  <td className="lw-num">{t.unbounded}</td>
                  <td className="lw-num">{money(t.cost_minor)}</td>
                  <td className="lw-num">{t.distance_km ?? '—'}</td>
                  <td className="lw-num">{formatDriveMinutes(t.drive_minutes ?? NaN)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="lw-caution" data-testid="loads-caution">
            {report.caution}
            {report.drive_limit_caution ? ` ${report.drive_limit_caution}` : ''} Amounts in {report.currency}.
          </p>
          {createPortal(
            <div className="lw-sheet-host">
              <DispatchSheet report={report} exponent={network.exponent} title={`${PRODUCT_NAME}: ${files?.loads.name ?? "loads"}`} />
            </div>,
            document.body,
          )}
        </>
      )}
    </div>
  );
}
