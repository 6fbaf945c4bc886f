// The three parts of the contract review as tables: the lanes of each rebate loop (with how much
// dearer each would have to be to stop the loop paying), the fix plan, and rebate headroom per lane.

import { useMemo, useState } from 'react';
import type { AuditLoopRow, FixPlanRow, HeadroomRow } from '../../../engine/report/audit-report';
import { formatMoney } from '../../model/format';

type Money = (v: number) => string;

export function LoopLanes({ loop, money }: { loop: AuditLoopRow; money: Money }) {
  return (
    <table className="lw-compact">
      <thead>
        <tr>
          <th scope="col">Row</th>
          <th scope="col">Lane</th>
          <th scope="col">Ref</th>
          <th scope="col" className="lw-num">Rebate</th>
          <th scope="col" className="lw-num">Net</th>
          <th scope="col" className="lw-num">Raise net by</th>
          <th scope="col">Rebate cut alone fixes it</th>
        </tr>
      </thead>
      <tbody>
        {loop.lane_details.map((l) => (
          <tr key={l.row}>
            <td>{l.row}</td>
            <th scope="row">
              {l.from} → {l.to}
            </th>
            <td>{l.ref ?? '—'}</td>
            <td className="lw-num">{money(l.rebate_minor)}</td>
            <td className="lw-num">{money(l.net_minor)}</td>
            <td className="lw-num">{money(l.neutralise_minor)}</td>
            <td>{l.rebate_cut_suffices ? 'yes' : 'no'}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function FixPlanTable({ rows, money }: { rows: FixPlanRow[]; money: Money }) {
  return (
    <table className="lw-compact" aria-label="Fix plan">
      <thead>
        <tr>
          <th scope="col">Row</th>
          <th scope="col">Lane</th>
          <th scope="col">Ref</th>
          <th scope="col" className="lw-num">Rebate now</th>
          <th scope="col" className="lw-num">Rebate at most</th>
          <th scope="col" className="lw-num">Net now → after</th>
          <th scope="col">Negotiable</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.row}>
            <td>{r.row}</td>
            <th scope="row">
              {r.from} → {r.to}
            </th>
            <td>{r.ref ?? '—'}</td>
            <td className="lw-num">{money(r.rebate_minor)}</td>
            <td className="lw-num">{money(r.new_rebate_minor)}</td>
            <td className="lw-num">
              {money(r.net_minor)} → {money(r.new_net_minor)}
            </td>
            <td>{r.negotiable ? 'yes' : 'no'}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
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
  return (
    <>
      <input type="search" aria-label="Filter headroom by depot or ref" placeholder="Filter by depot or ref" value={text} onChange={(e) => setText(e.target.value)} />
      <table className="lw-compact" aria-label="Rebate headroom per lane">
        <thead>
          <tr>
            <th scope="col">Row</th>
            <th scope="col">Lane</th>
            <th scope="col">Ref</th>
            <th scope="col" className="lw-num">Net</th>
            <th scope="col" className="lw-num">Lowest safe net</th>
            <th scope="col" className="lw-num">Extra rebate possible</th>
          </tr>
        </thead>
        <tbody>
          {sorted.slice(0, SHOWN).map((r) => (
            <tr key={r.row}>
              <td>{r.row}</td>
              <th scope="row">
                {r.from} → {r.to}
              </th>
              <td>{r.ref ?? '—'}</td>
              <td className="lw-num">{money(r.net_minor)}</td>
              <td className="lw-num">{money(r.floor_minor)}</td>
              <td className="lw-num">{money(r.headroom_minor)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {sorted.length > SHOWN && <p className="lw-muted">Showing the {SHOWN} tightest of {sorted.length} lanes; filter to find others.</p>}
    </>
  );
}
