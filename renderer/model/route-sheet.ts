// The selected route as the engine's RouteSheet (engine/report/route-sheet.ts): each lane with its
// amounts under the active scenario, distance, drive time, ref, clause, validity and estimate flags.
// The route export (CSV) and the printed route sheet are made from it.

import type { RouteSheet, RouteSheetLeg } from '../../engine/index';
import { addedLaneOf, type AddedLane } from './added-lanes';
import type { LaneAmounts } from './scenario-edits';
import type { NetworkView, RouteView, SolveView } from '../worker/protocol';
import { laneRef } from './lane-names';

const NO_RULES = { distance: '', fuel: '', driveTime: '' };

function num(v: number): number | null {
  return Number.isFinite(v) ? v : null;
}

export function routeSheetOf(network: NetworkView, solve: SolveView, amounts: LaneAmounts, route: RouteView, added: readonly AddedLane[], scenarioName: string | null): RouteSheet {
  const legs: RouteSheetLeg[] = [];
  route.lanes.forEach((e, i) => {
    const detail = route.details?.[i] ?? null;
    if (e < 0) {
      const a = addedLaneOf(added, e);
      if (!a) return;
      const l = a.lane;
      legs.push({
        from: l.from, to: l.to, ref: l.ref, row: a.sourceRow, distanceKm: l.distanceKm, driveMinutes: l.driveMinutes,
        tollMinor: l.tollMinor, fuelMinor: l.fuelMinor, feesMinor: l.feesMinor, rebateMinor: l.rebateMinor,
        validFrom: l.validFrom, validTo: l.validTo, clause: null, distanceEstimated: false, fuelEstimated: false, driveEstimated: false,
      });
      return;
    }
    legs.push({
      from: network.depotIds[network.laneFrom[e]],
      to: network.depotIds[network.laneTo[e]],
      ref: laneRef(network, e) ?? null,
      row: network.laneRow[e],
      distanceKm: num(network.laneDistanceKm[e]),
      driveMinutes: num(network.laneDriveMinutes[e]),
      tollMinor: amounts.toll[e],
      fuelMinor: amounts.fuel[e],
      feesMinor: amounts.fees[e],
      rebateMinor: amounts.rebate[e],
      validFrom: detail?.validFrom ?? null,
      validTo: detail?.validTo ?? null,
      clause: detail?.clause ?? null,
      distanceEstimated: detail?.distanceEstimated ?? false,
      fuelEstimated: detail?.fuelEstimated ?? false,
      driveEstimated: detail?.driveEstimated ?? false,
    });
  });
  return {
    origin: network.depotIds[solve.origin],
    destination: network.depotIds[route.target],
    date: solve.settings.dispatchDate,
    vehicleClass: solve.settings.vehicleClass || null,
    currency: network.currency,
    exponent: network.exponent,
    scenario: scenarioName,
    legs,
    rules: route.estimateRules ?? NO_RULES,
  };
}

/** "valid 2026-01-01 to 2026-12-31", "valid from …", "valid until …" or "no validity limits". */
export function validityText(from: string | null, to: string | null): string {
  if (from && to) return `valid ${from} to ${to}`;
  if (from) return `valid from ${from}`;
  if (to) return `valid until ${to}`;
  return 'no validity limits';
}
