// Each lane of the selected route in full: distance, drive time and amounts, the contract ref,
// clause and notes, the validity window; values the plan estimated are marked "est." with the
// rule that made them (listed under the lanes, and in each mark's title).

import type { RouteSheet } from '../../../engine/index';
import { legNetMinor } from '../../../engine/index';
import { formatDriveMinutes, formatMoney } from '../../model/format';
import { validityText } from '../../model/route-sheet';

function Est({ rule }: { rule: string }) {
  return (
    <abbr className="lw-est" title={`estimated: ${rule}`}>
      {' '}
      est.
    </abbr>
  );
}

export function RouteLanes({ sheet }: { sheet: RouteSheet }) {
  const money = (v: number) => formatMoney(v, sheet.exponent);
  const used = {
    distance: sheet.legs.some((l) => l.distanceEstimated),
    fuel: sheet.legs.some((l) => l.fuelEstimated),
    drive: sheet.legs.some((l) => l.driveEstimated),
  };
  return (
    <section aria-labelledby="lw-route-lanes-title" className="lw-route-lanes">
      <h3 id="lw-route-lanes-title">Lane by lane</h3>
      <ol data-testid="route-lanes">
        {sheet.legs.map((leg, i) => (
          <li key={i} data-lane-row={leg.row ?? ''}>
            <strong>
              {leg.from} → {leg.to}
            </strong>
            {leg.ref ? `, ref ${leg.ref}` : ', no contract ref'}
            {leg.row !== null ? `, lanes file row ${leg.row}` : ', added by the scenario'}
            <br />
            <span data-field="distance">{leg.distanceKm === null ? 'distance unknown' : `${leg.distanceKm} km`}</span>
            {leg.distanceEstimated && <Est rule={sheet.rules.distance} />} ·{' '}
            <span data-field="drive">{leg.driveMinutes === null ? 'drive time unknown' : formatDriveMinutes(leg.driveMinutes)}</span>
            {leg.driveEstimated && <Est rule={sheet.rules.driveTime} />}
            <br />
            toll {money(leg.tollMinor)} · fuel {money(leg.fuelMinor)}
            {leg.fuelEstimated && <Est rule={sheet.rules.fuel} />} · fees {money(leg.feesMinor)} · rebate {leg.rebateMinor ? `-${money(leg.rebateMinor)}` : money(0)} · net{' '}
            {money(legNetMinor(leg))} {sheet.currency}
            <br />
            <span data-field="validity">{validityText(leg.validFrom, leg.validTo)}</span>
            {leg.clause && (
              <>
                <br />
                <span data-field="clause">Clause: {leg.clause}</span>
              </>
            )}
          </li>
        ))}
      </ol>
      {(used.distance || used.fuel || used.drive) && (
        <p className="lw-muted" data-testid="estimate-rules">
          est. = estimated by the plan, not from the lanes file:
          {used.distance && ` distance = ${sheet.rules.distance};`}
          {used.fuel && ` fuel = ${sheet.rules.fuel};`}
          {used.drive && ` drive time = ${sheet.rules.driveTime};`} change the rules in the planning settings.
        </p>
      )}
    </section>
  );
}
