// The selected depot's route: each lane with its tolls, fuel, fees, rebate and net (under the
// active scenario), the totals, a breakdown chart, and a button to plan from this depot instead.

import { formatDriveMinutes, formatMoney, formatMoneyWithCode, depotLabel } from '../../model/format';
import { flagExplanations } from '../../model/flags';
import type { LaneAmounts } from '../../model/scenario-edits';
import type { NetworkView, RouteView, SolveView } from '../../worker/protocol';
import { BreakdownChart } from '../BreakdownChart/BreakdownChart';
import { TableHead } from '../DataTable/DataTable';

export interface RouteDetailProps {
  network: NetworkView;
  solve: SolveView;
  amounts: LaneAmounts;
  depot: number;
  route: RouteView | null;
  onPlanFrom(depot: number): void;
}

export function RouteDetail({ network, solve, amounts, depot, route, onPlanFrom }: RouteDetailProps) {
  const status = solve.status[depot];
  const label = depotLabel(network.depotIds[depot], network.depotNames[depot]);
  // Lanes a scenario added (index -1) are not in the lane table; their amounts are in the total cost only.
  const known = route ? route.lanes.filter((e) => e >= 0) : [];
  const sum = (field: 'toll' | 'fuel' | 'fees' | 'rebate') => known.reduce((s, e) => s + amounts[field][e], 0);
  const totals = { toll: sum('toll'), fuel: sum('fuel'), fees: sum('fees'), rebate: sum('rebate') };
  const money = (v: number) => formatMoney(v, network.exponent);
  return (
    <section className="lw-route" aria-labelledby="lw-route-title">
      <h2 id="lw-route-title">Route to {label}</h2>
      {depot === solve.origin && status !== 2 && <p>This is the origin.</p>}
      {depot === solve.origin && status === 2 && (
        <p className="lw-warn" data-testid="origin-unbounded">
          <strong>This is the origin · ∞ unbounded.</strong> A rebate loop runs back through {network.depotIds[depot]}: each lap of it returns here for less than
          nothing, so no route from here has a finite cost. Fix the loop’s terms (see the warning and the contract review).
        </p>
      )}
      {status === 2 && depot !== solve.origin && (
        <p className="lw-warn">
          <strong>∞ No cheapest route.</strong> This depot is reachable through a rebate loop, so its cost is unbounded. Fix the loop’s terms (see the warning and the contract review).
        </p>
      )}
      {status === 0 && <p>Not reachable from {network.depotIds[solve.origin]}{solve.settings.maxLegs !== null ? ` within ${solve.settings.maxLegs} legs` : ''}.</p>}
      {status === 1 && route && route.lanes.length > 0 && (
        <>
          <p>
            <strong>{formatMoneyWithCode(solve.cost[depot], network.currency, network.exponent)}</strong> over {route.lanes.length} leg{route.lanes.length === 1 ? '' : 's'}, drive time {formatDriveMinutes(solve.driveMinutes[depot])}.
          </p>
          {flagExplanations(solve.flags[depot]).map((text) => (
            <p key={text} className="lw-warn">
              ⚑ {text}
            </p>
          ))}
          <table className="lw-compact" data-testid="route-breakdown">
            <caption className="lw-visually-hidden">Cost of each lane on the route</caption>
            <TableHead labels={['Lane', ...['Tolls', 'Fuel', 'Fees', 'Rebate', 'Net'].map((label) => ({ label, numeric: true }))]} />
            <tbody>
              {route.lanes.map((e, i) =>
                e < 0 ? (
                  <tr key={`added-${i}`}>
                    <td colSpan={6}>a lane the scenario adds</td>
                  </tr>
                ) : (
                <tr key={`${e}-${i}`}>
                  <th scope="row" title={`Lanes file row ${network.laneRow[e]}${network.laneRef[e] ? `, ref ${network.laneRef[e]}` : ''}`}>
                    {network.depotIds[network.laneFrom[e]]} → {network.depotIds[network.laneTo[e]]}
                    {amounts.changed[e] ? <span className="lw-edited" title="Changed in the scenario"> ✎</span> : null}
                  </th>
                  <td className="lw-num">{money(amounts.toll[e])}</td>
                  <td className="lw-num">{money(amounts.fuel[e])}</td>
                  <td className="lw-num">{money(amounts.fees[e])}</td>
                  <td className="lw-num">{amounts.rebate[e] ? `-${money(amounts.rebate[e])}` : money(0)}</td>
                  <td className="lw-num">{money(amounts.toll[e] + amounts.fuel[e] + amounts.fees[e] - amounts.rebate[e])}</td>
                </tr>
                ),
              )}
            </tbody>
            <tfoot>
              <tr>
                <th scope="row">Total</th>
                <td className="lw-num">{money(totals.toll)}</td>
                <td className="lw-num">{money(totals.fuel)}</td>
                <td className="lw-num">{money(totals.fees)}</td>
                <td className="lw-num">{totals.rebate ? `-${money(totals.rebate)}` : money(0)}</td>
                <td className="lw-num">{money(solve.cost[depot])}</td>
              </tr>
            </tfoot>
          </table>
          <BreakdownChart tollMinor={totals.toll} fuelMinor={totals.fuel} feesMinor={totals.fees} rebateMinor={totals.rebate} exponent={network.exponent} currency={network.currency} />
        </>
      )}
      {depot !== solve.origin && (
        <button type="button" onClick={() => onPlanFrom(depot)}>
          Plan from {network.depotIds[depot]}
        </button>
      )}
    </section>
  );
}
