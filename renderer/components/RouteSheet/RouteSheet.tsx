// The printable route sheet: one page with the route, the date, class and scenario it was planned
// for, every lane (distance, drive time, amounts, ref, clause, validity, estimates marked), the
// total and the caution. Hidden on screen; printed alone (route-sheet.css).

import { createPortal } from 'react-dom';
import { legNetMinor, PRODUCT_NAME, ROUTE_CAUTION, type RouteSheet as Sheet } from '../../../engine/index';
import { formatDriveMinutes, formatMoney } from '../../model/format';
import { validityText } from '../../model/route-sheet';
import './route-sheet.css';

/** Shows only the route sheet while the print dialog is open. */
export function printRouteSheet(): void {
  document.body.classList.add('lw-printing-route');
  window.addEventListener('afterprint', () => document.body.classList.remove('lw-printing-route'), { once: true });
  window.print();
}

export function RouteSheet({ sheet, total }: { sheet: Sheet; total: number }) {
  const money = (v: number) => formatMoney(v, sheet.exponent);
  const est = (on: boolean) => (on ? ' (est.)' : '');
  return createPortal(
    <div className="lw-route-sheet-host">
      <article className="lw-route-sheet" data-testid="route-sheet">
        <h1>
          {PRODUCT_NAME} route sheet: {sheet.origin} → {sheet.destination}
        </h1>
        <p>
          Planned for {sheet.date}, vehicle class {sheet.vehicleClass ?? 'as priced in the lanes file'}
          {sheet.scenario ? `, scenario “${sheet.scenario}”` : ''}. Amounts in {sheet.currency}. Total {money(total)} {sheet.currency}.
        </p>
        <table>
          <thead>
            <tr>
              <th scope="col">#</th>
              <th scope="col">Lane</th>
              <th scope="col">Ref / clause</th>
              <th scope="col">km</th>
              <th scope="col">Drive</th>
              <th scope="col">Toll</th>
              <th scope="col">Fuel</th>
              <th scope="col">Fees</th>
              <th scope="col">Rebate</th>
              <th scope="col">Net</th>
              <th scope="col">Validity</th>
            </tr>
          </thead>
          <tbody>
            {sheet.legs.map((leg, i) => (
              <tr key={i}>
                <td>{i + 1}</td>
                <td>
                  {leg.from} → {leg.to}
                  {leg.row !== null ? ` (row ${leg.row})` : ' (added)'}
                </td>
                <td>
                  {leg.ref ?? '—'}
                  {leg.clause ? `: ${leg.clause}` : ''}
                </td>
                <td className="lw-num">{(leg.distanceKm ?? '—') + est(leg.distanceEstimated)}</td>
                <td className="lw-num">{(leg.driveMinutes === null ? '—' : formatDriveMinutes(leg.driveMinutes)) + est(leg.driveEstimated)}</td>
                <td className="lw-num">{money(leg.tollMinor)}</td>
                <td className="lw-num">{money(leg.fuelMinor) + est(leg.fuelEstimated)}</td>
                <td className="lw-num">{money(leg.feesMinor)}</td>
                <td className="lw-num">{leg.rebateMinor ? `-${money(leg.rebateMinor)}` : money(0)}</td>
                <td className="lw-num">{money(legNetMinor(leg))}</td>
                <td>{validityText(leg.validFrom, leg.validTo)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <p className="lw-route-sheet-rules">
          (est.) = estimated: distance = {sheet.rules.distance}; fuel = {sheet.rules.fuel}; drive time = {sheet.rules.driveTime}.
        </p>
        <p className="lw-route-sheet-caution">{ROUTE_CAUTION}</p>
      </article>
    </div>,
    document.body,
  );
}
