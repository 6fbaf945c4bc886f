// What the route breakdown shows about each lane beyond its amounts: validity window, notes, the
// contract clause, and which values the plan estimated (with the rules, engine/planning/estimate-rules).
// Made per route request, for that route's lanes only.

import { estimateRules, type ImportResult, type LaneTable } from '../../engine/index';
import type { LaneDetailView, RouteView } from './protocol';

// The clause text: the lanes file's `clause` column (null when the row or the file has none).
function clauseOf(table: LaneTable, row: number): string | null {
  return table.clause?.[row] ?? null;
}

/** Details of each lane of `lanes` (base network lane indices); null for a lane a scenario adds. */
export function laneDetailsOf(imported: ImportResult, lanes: readonly number[]): (LaneDetailView | null)[] {
  const planned = imported.plan.lanes;
  return lanes.map((e) => {
    const lane = e >= 0 ? planned[e] : undefined;
    if (!lane) return null;
    const row = imported.plan.laneRecord[e];
    return {
      validFrom: lane.validFrom,
      validTo: lane.validTo,
      distanceEstimated: lane.distanceEstimated,
      fuelEstimated: lane.fuelEstimated,
      driveEstimated: lane.driveEstimated,
      notes: imported.lanes.notes[row] ?? null,
      clause: clauseOf(imported.lanes, row),
    };
  });
}

/** The route with its lanes' details and the plan's estimate rules attached. */
export function withLaneDetails(imported: ImportResult | null, route: RouteView | null): RouteView | null {
  if (!imported || !route) return route;
  return { ...route, details: laneDetailsOf(imported, route.lanes), estimateRules: estimateRules(imported.plan.settings, imported.currency) };
}
