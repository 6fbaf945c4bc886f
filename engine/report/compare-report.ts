// The scenario comparison as `lanewright compare --json` prints it, and its flat table (one row per
// depot) for spreadsheets. Lanes are shown by source row and by lane key ("FROM>TO|ref|n"); a lane
// the scenario added has row null.

import { ROUTE_CAUTION } from '../text/cautions';
import { formatMinor, type Minor } from '../money/minor';
import { laneKeyText, type LaneKey } from '../import/lane-key';
import type { ComparedLoop, ScenarioComparison } from '../scenario/compare';
import type { DepotStatus } from '../routes/cheapest-routes';

export interface CompareDepotRow {
  id: string;
  name: string;
  base_status: DepotStatus;
  scenario_status: DepotStatus;
  base_cost_minor: number | null;
  scenario_cost_minor: number | null;
  change_minor: number | null;
  route_changed: boolean;
  /** Lane keys of the cheapest route, empty when not reachable. */
  base_lanes: string[];
  scenario_lanes: string[];
}

export interface CompareLoopRow {
  depots: string[];
  lanes: string[];
  rows: (number | null)[];
  net_per_lap_minor: number;
  reached_from_origin: boolean;
}

export interface CompareReport {
  scenario: string;
  origin: string;
  currency: string;
  /** Changes that could not be applied; they stay in the scenario file. */
  problems: { change: number; code: string; lane: string; message: string }[];
  depots: CompareDepotRow[];
  loops_appeared: CompareLoopRow[];
  loops_disappeared: CompareLoopRow[];
  loop_cap_reached: boolean;
  /** Always the route caution: the compared costs are estimates. */
  caution: string;
}

const keysText = (keys: LaneKey[] | null) => (keys ?? []).map(laneKeyText);
const loopRow = (loop: ComparedLoop): CompareLoopRow => ({
  depots: loop.depots,
  lanes: loop.lanes.map(laneKeyText),
  rows: loop.rows.map((r) => (r === 0 ? null : r)),
  net_per_lap_minor: loop.netPerLap,
  reached_from_origin: loop.reachedFromOrigin,
});

/** Builds the report object. `change` numbers the scenario's changes from 1. */
export function compareReport(comparison: ScenarioComparison): CompareReport {
  return {
    scenario: comparison.scenario,
    origin: comparison.origin,
    currency: comparison.currency,
    problems: comparison.problems.map((p) => ({ change: p.changeIndex + 1, code: p.code, lane: laneKeyText(p.lane), message: p.message })),
    depots: comparison.depots.map((d) => ({
      id: d.depot,
      name: d.name,
      base_status: d.baseStatus,
      scenario_status: d.scenarioStatus,
      base_cost_minor: d.baseCost,
      scenario_cost_minor: d.scenarioCost,
      change_minor: d.change,
      route_changed: d.routeChanged,
      base_lanes: keysText(d.baseRoute),
      scenario_lanes: keysText(d.scenarioRoute),
    })),
    loops_appeared: comparison.loopsAppeared.map(loopRow),
    loops_disappeared: comparison.loopsDisappeared.map(loopRow),
    loop_cap_reached: comparison.loopCapReached,
    caution: ROUTE_CAUTION,
  };
}

/** One row per depot: statuses, both costs, the change and whether the route changed. */
export function compareReportRows(report: CompareReport, exponent: number): (string | number | null)[][] {
  const money = (v: number | null) => (v === null ? '' : formatMinor(v as Minor, exponent));
  return [
    ['id', 'name', 'base_status', 'scenario_status', 'base_cost', 'scenario_cost', 'change', 'route_changed', 'base_route', 'scenario_route'],
    ...report.depots.map((d) => [
      d.id,
      d.name,
      d.base_status,
      d.scenario_status,
      money(d.base_cost_minor),
      money(d.scenario_cost_minor),
      money(d.change_minor),
      d.route_changed ? 'yes' : 'no',
      d.base_lanes.join(' '),
      d.scenario_lanes.join(' '),
    ]),
  ];
}
