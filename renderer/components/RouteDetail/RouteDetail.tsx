// The selected depot's route: each lane with its tolls, fuel, fees, rebate and net (under the
// active scenario), the totals, a breakdown chart, each lane in full (RouteLanes), the route on its
// own as CSV or as a printed sheet, and a button to plan from this depot instead.

import type { LanewrightHost } from '../../../main/ipc/contract';
import { applyCsvDialect, counted, exportFileName, netCost, ROUTE_CAUTION, routeSheetCsv } from '../../../engine/index';
import { csvDialect } from '../../app/csv-dialect-store';
import { formatDriveMinutes, formatMoney, formatMoneyWithCode, depotLabel } from '../../model/format';
import { flagExplanations } from '../../model/flags';
import { addedLaneOf, type AddedLane } from '../../model/added-lanes';
import type { LaneAmounts } from '../../model/scenario-edits';
import type { NetworkView, RouteView, SolveView } from '../../worker/protocol';
import { routeSheetOf } from '../../model/route-sheet';
import { BreakdownChart } from '../BreakdownChart/BreakdownChart';
import { RouteSheet, printRouteSheet } from '../RouteSheet/RouteSheet';
import { RouteLanes } from './RouteLanes';
import { TableHead } from '../DataTable/DataTable';
import { laneRef } from '../../model/lane-names';

export interface RouteDetailProps {
  network: NetworkView;
  solve: SolveView;
  amounts: LaneAmounts;
  depot: number;
  route: RouteView | null;
  /** Lanes the scenario adds (a route may use them). */
  added: readonly AddedLane[];
  onPlanFrom(depot: number): void;
  /** Name of the active what-if scenario, or null when it changes nothing. */
  scenarioName: string | null;
  /** Saves the route's CSV (save dialog or download). */
  host: Pick<LanewrightHost, 'saveExport'>;
  onMessage(text: string): void;
}

interface Leg {
  name: string;
  title: string;
  mark: string | null;
  toll: number;
  fuel: number;
  fees: number;
  rebate: number;
}

// One lane of the route with its amounts under the scenario; a lane only the scenario plans (added,
// or a file row its validity change brings in) reads them from the solve's list. Null for a lane that
// could not be traced (cost in the total only).
function legOf(network: NetworkView, amounts: LaneAmounts, added: readonly AddedLane[], e: number): Leg | null {
  if (e < 0) {
    const a = addedLaneOf(added, e);
    if (!a) return null;
    const l = a.lane;
    const title = a.kind === 'added' ? `Added by the scenario (change ${a.changeIndex + 1})` : `Lanes file row ${a.sourceRow}, valid on the date only by the scenario (change ${a.changeIndex + 1})`;
    return { name: `${l.from} → ${l.to}`, title: `${title}${l.ref ? `, ref ${l.ref}` : ''}`, mark: a.kind === 'added' ? ' + added' : ' + valid by scenario', toll: l.tollMinor, fuel: l.fuelMinor, fees: l.feesMinor, rebate: l.rebateMinor };
  }
  return {
    name: `${network.depotIds[network.laneFrom[e]]} → ${network.depotIds[network.laneTo[e]]}`,
    title: `Lanes file row ${network.laneRow[e]}${laneRef(network, e) ? `, ref ${laneRef(network, e)}` : ''}`,
    mark: amounts.changed[e] ? ' ✎' : null,
    toll: amounts.toll[e],
    fuel: amounts.fuel[e],
    fees: amounts.fees[e],
    rebate: amounts.rebate[e],
  };
}

export function RouteDetail({ network, solve, amounts, depot, route, added, onPlanFrom, scenarioName, host, onMessage }: RouteDetailProps) {
  const status = solve.status[depot];
  const label = depotLabel(network.depotIds[depot], network.depotNames[depot]);
  const legs = route ? route.lanes.map((e) => legOf(network, amounts, added, e)) : [];
  const sum = (field: 'toll' | 'fuel' | 'fees' | 'rebate') => legs.reduce((s, leg) => s + (leg ? leg[field] : 0), 0);
  const totals = { toll: sum('toll'), fuel: sum('fuel'), fees: sum('fees'), rebate: sum('rebate') };
  const money = (v: number) => formatMoney(v, network.exponent);
  const sheet = status === 1 && route && route.lanes.length > 0 ? routeSheetOf(network, solve, amounts, route, added, scenarioName) : null;
  const exportRoute = async () => {
    if (!sheet) return;
    const name = exportFileName({ kind: `route-${sheet.origin}-${sheet.destination}`, date: sheet.date, vehicleClass: sheet.vehicleClass, scenario: sheet.scenario }, 'csv');
    const result = await host.saveExport(name, applyCsvDialect(routeSheetCsv(sheet), csvDialect()), 'csv');
    if (!result.ok) onMessage(`Export failed: ${result.failure.message}`);
    else if (result.value) onMessage(`Exported ${result.value.path}.`);
  };
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
            <strong>{formatMoneyWithCode(solve.cost[depot], network.currency, network.exponent)}</strong> over {counted(route.lanes.length, 'leg')}, drive time {formatDriveMinutes(solve.driveMinutes[depot])}.
          </p>
          <p className="lw-muted" data-testid="route-caution">
            {ROUTE_CAUTION}
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
              {legs.map((leg, i) =>
                leg === null ? (
                  <tr key={`untraced-${i}`}>
                    <td colSpan={6}>a lane the scenario adds</td>
                  </tr>
                ) : (
                  <tr key={`${route.lanes[i]}-${i}`}>
                    <th scope="row" title={leg.title}>
                      {leg.name}
                      {leg.mark ? <span className="lw-edited" title={leg.mark === ' ✎' ? 'Changed in the scenario' : 'Added by the scenario'}>{leg.mark}</span> : null}
                    </th>
                    <td className="lw-num">{money(leg.toll)}</td>
                    <td className="lw-num">{money(leg.fuel)}</td>
                    <td className="lw-num">{money(leg.fees)}</td>
                    <td className="lw-num">{leg.rebate ? `-${money(leg.rebate)}` : money(0)}</td>
                    <td className="lw-num">{money(netCost(leg.toll, leg.fuel, leg.fees, leg.rebate))}</td>
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
          {sheet && (
            <>
              <RouteLanes sheet={sheet} />
              <p className="lw-route-actions">
                <button type="button" onClick={() => void exportRoute()}>
                  Export this route (CSV)
                </button>
                <button type="button" onClick={printRouteSheet}>
                  Print route sheet
                </button>
              </p>
              <RouteSheet sheet={sheet} total={solve.cost[depot]} />
            </>
          )}
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
