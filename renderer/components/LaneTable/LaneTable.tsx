// The lane table: every lane of the contract with its amounts under the active scenario. Editing an
// amount or closing a lane adds a change to the scenario (never to the imported file); the plan
// recomputes at once. Lanes the scenario adds are listed first, marked as such, editable and
// removable. Filtered and paged so 50,000 lanes stay responsive.

import { useMemo, useState } from 'react';
import { addedAmount, addedLaneName, setAddedLaneAmount, type AddedLane } from '../../model/added-lanes';
import { EDITABLE_FIELDS, laneNetMinor, setLaneAmount, setLaneClosed, type LaneAmounts, type LaneKey, type Scenario } from '../../model/scenario-edits';
import { formatMoney } from '../../model/format';
import { withoutChange } from '../../../engine/index';
import type { NetworkView } from '../../worker/protocol';
import { TableHead } from '../DataTable/DataTable';
import { AmountCell } from './AmountCell';

export interface LaneTableProps {
  network: NetworkView;
  keys: readonly LaneKey[];
  amounts: LaneAmounts;
  /** Lanes the scenario adds (not in the network). */
  added: readonly AddedLane[];
  scenario: Scenario;
  onScenario(next: Scenario): void;
}

const PAGE = 100;
const NUM = (label: string) => ({ label, numeric: true });
const LANE_TABLE_HEADS = ['Row', 'Lane', 'Ref', NUM('Tolls'), NUM('Fuel'), NUM('Fees'), NUM('Rebate'), NUM('Net'), 'Open'];

export function LaneTable({ network, keys, amounts, added, scenario, onScenario }: LaneTableProps) {
  const [text, setText] = useState('');
  const [changedOnly, setChangedOnly] = useState(false);
  const [page, setPage] = useState(0);
  const lanes = useMemo(() => {
    const needle = text.trim().toLowerCase();
    const out: number[] = [];
    for (let e = 0; e < network.laneFrom.length; e++) {
      if (changedOnly && !amounts.changed[e]) continue;
      if (needle !== '') {
        const hay = `${network.depotIds[network.laneFrom[e]]} ${network.depotIds[network.laneTo[e]]} ${network.laneRef[e] ?? ''}`.toLowerCase();
        if (!hay.includes(needle)) continue;
      }
      out.push(e);
    }
    return out;
  }, [network, amounts, text, changedOnly]);
  const addedShown = useMemo(() => {
    const needle = text.trim().toLowerCase();
    return added.filter((a) => needle === '' || `${a.lane.from} ${a.lane.to} ${a.lane.ref ?? ''}`.toLowerCase().includes(needle));
  }, [added, text]);
  const pages = Math.max(1, Math.ceil(lanes.length / PAGE));
  const current = Math.min(page, pages - 1);
  const id = (d: number) => network.depotIds[d];
  const base = { toll: network.laneToll, fuel: network.laneFuel, fees: network.laneFees, rebate: network.laneRebate };
  return (
    <div className="lw-lanes">
      <div className="lw-table-tools" role="group" aria-label="Filter lanes">
        <input type="search" aria-label="Filter lanes by depot or contract ref" placeholder="Filter by depot or contract ref" value={text} onChange={(e) => (setText(e.target.value), setPage(0))} />
        <label className="lw-check">
          <input type="checkbox" checked={changedOnly} onChange={(e) => (setChangedOnly(e.target.checked), setPage(0))} /> Changed in scenario only
        </label>
        <span className="lw-muted" aria-live="polite">
          {lanes.length} lanes{addedShown.length > 0 ? ` + ${addedShown.length} added by the scenario` : ''} · page {current + 1} of {pages}
        </span>
        <button type="button" disabled={current === 0} onClick={() => setPage(current - 1)}>
          Previous page
        </button>
        <button type="button" disabled={current >= pages - 1} onClick={() => setPage(current + 1)}>
          Next page
        </button>
      </div>
      <table className="lw-table" aria-label={`Lanes under scenario “${scenario.name}”`} data-testid="lane-table">
        <TableHead labels={LANE_TABLE_HEADS} />
        <tbody>
          {addedShown.map((a) => {
            const name = addedLaneName(a.lane);
            return (
              <tr key={`added-${a.changeIndex}`} data-added-lane={a.changeIndex} className="lw-changed-row lw-added-row">
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
          })}
          {lanes.slice(current * PAGE, current * PAGE + PAGE).map((e) => {
            const name = `${id(network.laneFrom[e])} → ${id(network.laneTo[e])}`;
            const net = laneNetMinor(amounts, e);
            return (
              <tr key={e} data-lane-row={network.laneRow[e]} className={amounts.changed[e] ? 'lw-changed-row' : undefined}>
                <td>{network.laneRow[e]}</td>
                <th scope="row">{name}</th>
                <td>{network.laneRef[e] ?? '—'}</td>
                {EDITABLE_FIELDS.map((field) => (
                  <td key={field} className="lw-num">
                    <AmountCell
                      key={`${e}-${field}-${amounts[field][e]}`}
                      valueMinor={amounts[field][e]}
                      exponent={network.exponent}
                      label={`${field} of lane ${name}, row ${network.laneRow[e]}`}
                      changed={amounts[field][e] !== base[field][e]}
                      onCommit={(value) => onScenario(setLaneAmount(scenario, keys[e], field, value, base[field][e]))}
                    />
                  </td>
                ))}
                <td className="lw-num">{amounts.closed[e] ? 'closed' : formatMoney(net, network.exponent)}</td>
                <td>
                  <input type="checkbox" aria-label={`Lane ${name}, row ${network.laneRow[e]} open`} checked={!amounts.closed[e]} onChange={(ev) => onScenario(setLaneClosed(scenario, keys[e], !ev.target.checked))} />
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
