// What the active scenario moved: its changes lane by lane (as the engine's overlay words them,
// "toll 2axle 8.19 → 9.00"; a change that could not be applied is marked with the reason and kept),
// then every depot whose status or cost differs from the base contract, largest change first. Each
// change can be undone on its own.

import { CautionLine } from '../CautionLine/CautionLine';
import { useMemo } from 'react';
import { withoutChange } from '../../../engine/index';
import { laneKeyWords } from '../../../engine/index';
import { SpacerRow } from '../DataTable/SpacerRow';
import { useRowWindow } from '../DataTable/use-row-window';
import { formatMoney } from '../../model/format';
import type { Scenario } from '../../model/scenario-edits';
import type { NetworkView, SolveView } from '../../worker/protocol';

export interface ScenarioCompareProps {
  network: NetworkView;
  solve: SolveView;
  scenario: Scenario;
  onScenario(next: Scenario): void;
  /** Replaces the scenario with one read from a scenario file (lanewright-scenario JSON). */
  onLoadFile(): void;
  /** Saves the scenario as a scenario file (for `lanewright compare --scenario`). */
  onSaveFile(): void;
  /** Exports the comparison (one row per depot, as `lanewright compare` writes it) as CSV. */
  onExport(): void;
}

const STATUS = ['unreachable', 'reachable', 'unbounded'];

/**
 * Depots whose status, cost or route differs from the base, largest change first (status changes on
 * top, then cost changes, then depots whose route changed at the same cost). The words are made per
 * row on screen (`movedText`): formatting 50,000 moved depots per edit held up the page.
 */
function movedDepots(network: NetworkView, solve: SolveView): { d: number; delta: number; routeChanged: boolean }[] {
  const base = solve.base;
  if (!base) return [];
  const moved: { d: number; delta: number; routeChanged: boolean }[] = [];
  for (let d = 0; d < network.depotIds.length; d++) {
    // Whether the cheapest route changed: the worker decides it as `lanewright compare` does.
    const routeChanged = base.routeChanged[d] === 1;
    if (base.status[d] !== solve.status[d]) moved.push({ d, delta: Infinity, routeChanged });
    else if (solve.status[d] === 1 && base.cost[d] !== solve.cost[d]) moved.push({ d, delta: Math.abs(solve.cost[d] - base.cost[d]), routeChanged });
    else if (routeChanged) moved.push({ d, delta: 0, routeChanged });
  }
  return moved.sort((a, b) => b.delta - a.delta || a.d - b.d);
}

/** "12.00 → 14.50 (+2.50)", or "reachable → unreachable" when the status changed. */
function movedText(network: NetworkView, solve: SolveView, d: number): string {
  const base = solve.base!;
  if (base.status[d] !== solve.status[d]) return `${STATUS[base.status[d]]} → ${STATUS[solve.status[d]]}`;
  const money = (v: number) => formatMoney(v, network.exponent);
  const delta = solve.cost[d] - base.cost[d];
  if (delta === 0) return `${money(solve.cost[d])}, same cost`;
  return `${money(base.cost[d])} → ${money(solve.cost[d])} (${delta > 0 ? '+' : ''}${money(delta)})`;
}

export function ScenarioCompare({ network, solve, scenario, onScenario, onLoadFile, onSaveFile, onExport }: ScenarioCompareProps) {
  const money = (v: number) => formatMoney(v, network.exponent);
  const moved = useMemo(() => movedDepots(network, solve), [network, solve]);
  const rowWindow = useRowWindow(moved.length);
  if (scenario.changes.length === 0) {
    return (
      <div className="lw-compare" data-testid="scenario-compare">
        <p className="lw-muted">The scenario “{scenario.name}” has no changes yet. Edit an amount in the lane table or close a lane; the comparison with the base contract appears here.</p>
        <button type="button" onClick={onLoadFile}>
          Load a scenario file…
        </button>
      </div>
    );
  }
  // The worker's words for the changes of the scenario it solved; while a newer edit is being
  // solved the list can be shorter, and those changes are named plainly until the answer comes.
  const views = solve.overlay.changes;
  const describe = (c: Scenario['changes'][number], i: number) => {
    if (views.length === scenario.changes.length && views[i]) return views[i].text;
    if (c.kind === 'set-amount') return `${laneKeyWords(c.lane)}: ${c.field === 'toll' ? `toll ${c.vehicleClass ?? 'every class'}` : c.field} → ${money(c.amountMinor)}`;
    if (c.kind === 'close-lane') return `${laneKeyWords(c.lane)}: closed`;
    if (c.kind === 'set-validity') return `${laneKeyWords(c.lane)}: valid ${c.validFrom ?? '…'} to ${c.validTo ?? '…'}`;
    return `new lane ${c.lane.from} → ${c.lane.to}`;
  };
  return (
    <div className="lw-compare" data-testid="scenario-compare">
      <CautionLine testId="compare-caution" />
      <h3>Changes in “{scenario.name}”</h3>
      <ul>
        {scenario.changes.map((c, i) => {
          const view = views.length === scenario.changes.length ? views[i] : undefined;
          return (
            <li key={i} data-change-applied={view ? (view.applied ? 'yes' : 'no') : undefined}>
              {describe(c, i)}
              {c.note && <span className="lw-muted"> — {c.note}</span>}{' '}
              {view && !view.applied && (
                <span className="lw-badge lw-badge-problem" role="note">
                  not applied: {view.problem}
                </span>
              )}{' '}
              <button type="button" aria-label={`Undo change ${i + 1}: ${describe(c, i)}`} onClick={() => onScenario(withoutChange(scenario, i))}>
                Undo
              </button>
            </li>
          );
        })}
      </ul>
      <button type="button" onClick={() => onScenario({ ...scenario, changes: [] })}>
        Back to the base contract
      </button>{' '}
      <button type="button" onClick={onLoadFile}>
        Load a scenario file…
      </button>{' '}
      <button type="button" onClick={onSaveFile}>
        Save as scenario file…
      </button>{' '}
      <button type="button" onClick={onExport}>
        Export comparison (CSV)
      </button>
      {scenario.changes.some((c) => c.kind === 'add-lane') && <p className="lw-muted">Lanes the scenario adds are listed first in the lane table and drawn dotted, labelled “Added”, on the map.</p>}
      <h3>What moved from {network.depotIds[solve.origin]}</h3>
      {moved.length === 0 ? (
        <p>No depot’s status, cost or route changed.</p>
      ) : (
        <table className="lw-compact" aria-label={`Depots whose cost, status or route changed (${moved.length})`} aria-rowcount={moved.length + 1}>
          <thead>
            <tr aria-rowindex={1}>
              <th scope="col">Depot</th>
              <th scope="col">Base → scenario</th>
              <th scope="col">Route</th>
            </tr>
          </thead>
          <tbody ref={rowWindow.bodyRef}>
            <SpacerRow heightPx={rowWindow.padTop} columns={3} />
            {moved.slice(rowWindow.start, rowWindow.end).map((m, k) => (
              <tr key={m.d} aria-rowindex={rowWindow.start + k + 2} data-moved-depot={network.depotIds[m.d]} data-route-changed={m.routeChanged ? 'yes' : 'no'}>
                <th scope="row">{network.depotIds[m.d]}</th>
                <td>{movedText(network, solve, m.d)}</td>
                <td>{m.routeChanged ? 'changed' : 'same'}</td>
              </tr>
            ))}
            <SpacerRow heightPx={rowWindow.padBottom} columns={3} />
          </tbody>
        </table>
      )}
    </div>
  );
}
