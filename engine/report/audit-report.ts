// The network audit as `lanewright audit --json` prints it (the keys the contract review asks for,
// plus lane details), and its two flat tables for spreadsheets: one row per lane, one row per lane
// of each loop. Rows are source rows of the lanes file (header = row 1).

import { REVIEW_CAUTION } from '../text/cautions';
import type { NetworkAudit } from '../audit/network-audit';
import type { LoopSearchStop } from '../audit/distinct-loops';
import { formatMinor, type Minor } from '../money/minor';
import type { Network } from '../network/types';
import { LANE_AMOUNT_COLUMNS, laneAmountCells } from './lane-amount-cells';
import { counted } from '../text/plural';

export interface AuditLoopLane {
  row: number;
  from: string;
  to: string;
  ref: string | null;
  toll_minor: number;
  fuel_minor: number;
  fees_minor: number;
  rebate_minor: number;
  net_minor: number;
  /** The lap nets -X: this lane X dearer stops the loop paying. */
  neutralise_minor: number;
  rebate_cut_suffices: boolean;
}

export interface AuditLoopRow {
  depots: string[];
  lanes: number[];
  net_per_lap_minor: number;
  unbounded_depots: string[];
  lane_details: AuditLoopLane[];
}

export interface FixPlanRow {
  row: number;
  from: string;
  to: string;
  net_minor: number;
  new_net_minor: number;
  ref: string | null;
  rebate_minor: number;
  new_rebate_minor: number;
  negotiable: boolean;
}

export interface HeadroomRow {
  row: number;
  from: string;
  to: string;
  /** The net the floor applies to: after the fix plan when headroom_after_fix_plan is true. */
  net_minor: number;
  /** Lowest net the lane can carry without a loop; null for no limit. */
  floor_minor: number | null;
  /** net - floor; null for no limit. */
  headroom_minor: number | null;
  ref: string | null;
}

export interface AuditReport {
  currency: string;
  loops: AuditLoopRow[];
  fix_plan: FixPlanRow[];
  /** True when a final solve of the changed network found no loop. */
  fix_plan_verified: boolean;
  /** True when the plan stopped at its step limit with loops left. */
  fix_plan_incomplete: boolean;
  /** Loops that no rebate cut can fix (no lane on them has a rebate); headroom is then empty. */
  unfixable_loops: { depots: string[]; lanes: number[]; net_per_lap_minor: number }[];
  headroom: HeadroomRow[];
  headroom_after_fix_plan: boolean;
  loop_cap_reached: boolean;
  /** What ended the loop search ('complete', 'cap', 'cap-unsettled', 'work-budget', 'memory-bound') and its figures. */
  loop_search: { stopped_by: LoopSearchStop; cap: number; searches: number; work: number; work_budget: number; memory_bound: number };
  /** One sentence saying truthfully what stopped the loop search; null when it was complete. */
  loop_search_note: string | null;
  /** Always REVIEW_CAUTION: the review's figures are estimates. */
  caution: string;
}

/**
 * The sentence every front end shows about an incomplete loop search. "More loops exist" only when
 * one more was found past the cap; when a budget ran out first, the count was not reached and more
 * loops may or may not exist.
 */
export function loopSearchNote(found: number, search: NetworkAudit['loopSearch']): string | null {
  const figures = `${search.searches} searches, ${search.work.toLocaleString('en')} depots and lanes examined`;
  switch (search.stoppedBy) {
    case 'complete':
      return null;
    case 'cap':
      return `more loops exist than the ${found} reported (the loop cap is ${search.cap}; raise it to see them)`;
    case 'cap-unsettled':
      return `${found} loops reported, the loop cap; the search for one more stopped at its budget (${figures}), so more may exist`;
    case 'work-budget':
      return `the loop search stopped at its work budget of ${search.workBudget.toLocaleString('en')} (${figures}) with ${counted(found, 'loop')} found, before the loop cap of ${search.cap}; more loops may exist`;
    case 'memory-bound':
      return `the loop search stopped at its memory bound of ${search.memoryBound.toLocaleString('en')} kept lane positions (${figures}) with ${counted(found, 'loop')} found, before the loop cap of ${search.cap}; more loops may exist`;
  }
}

/** Builds the report object. */
export function auditReport(network: Network, audit: NetworkAudit): AuditReport {
  const ids = (ds: readonly number[]) => ds.map((d) => network.depotIds[d]);
  const rows = (ls: readonly number[]) => ls.map((e) => network.laneRow[e]);
  const ref = (e: number) => network.laneRef[e] ?? null;
  const end = (e: number) => ({ row: network.laneRow[e], from: network.depotIds[network.laneFrom[e]], to: network.depotIds[network.laneTo[e]] });
  const plan = audit.fixPlan;
  return {
    currency: network.currency,
    loops: audit.loops.map(({ loop, unboundedDepots, neutralisers }) => ({
      depots: ids(loop.depots),
      lanes: rows(loop.lanes),
      net_per_lap_minor: loop.netPerLap,
      unbounded_depots: ids(unboundedDepots),
      lane_details: neutralisers.map(({ lane: e, amount, rebateCutSuffices }) => ({
        ...end(e),
        ref: ref(e),
        toll_minor: network.laneToll[e],
        fuel_minor: network.laneFuel[e],
        fees_minor: network.laneFees[e],
        rebate_minor: network.laneRebate[e],
        net_minor: network.laneNet[e],
        neutralise_minor: amount,
        rebate_cut_suffices: rebateCutSuffices,
      })),
    })),
    fix_plan: (plan?.changes ?? []).map((c) => ({
      ...end(c.lane),
      net_minor: c.oldNet,
      new_net_minor: c.newNet,
      ref: ref(c.lane),
      rebate_minor: c.oldRebate,
      new_rebate_minor: c.newRebate,
      negotiable: c.negotiable,
    })),
    fix_plan_verified: plan ? plan.verified : true,
    fix_plan_incomplete: plan ? plan.stepLimitReached : false,
    unfixable_loops: (plan?.unfixable ?? []).map((loop) => ({ depots: ids(loop.depots), lanes: rows(loop.lanes), net_per_lap_minor: loop.netPerLap })),
    headroom: audit.headroom ? headroomRows(network, audit.headroom.floor, audit.headroom.net, end, ref) : [],
    headroom_after_fix_plan: audit.headroomAfterFixPlan,
    loop_cap_reached: audit.loopCapReached,
    loop_search: {
      stopped_by: audit.loopSearch.stoppedBy,
      cap: audit.loopSearch.cap,
      searches: audit.loopSearch.searches,
      work: audit.loopSearch.work,
      work_budget: audit.loopSearch.workBudget,
      memory_bound: audit.loopSearch.memoryBound,
    },
    loop_search_note: loopSearchNote(audit.loops.length, audit.loopSearch),
    caution: REVIEW_CAUTION,
  };
}

function headroomRows(
  network: Network,
  floor: Float64Array,
  net: Float64Array,
  end: (e: number) => { row: number; from: string; to: string },
  ref: (e: number) => string | null,
): HeadroomRow[] {
  const out: HeadroomRow[] = [];
  for (let e = 0; e < network.laneCount; e++) {
    if (net[e] === Infinity) continue;
    const f = Number.isNaN(floor[e]) ? null : floor[e];
    out.push({ ...end(e), net_minor: net[e], floor_minor: f, headroom_minor: f === null ? null : net[e] - f, ref: ref(e) });
  }
  return out;
}

type Cell = string | number | null;

/** One row per lane: amounts, the loops it is on, the fix plan's new net and the headroom. */
export function auditLaneRows(network: Network, report: AuditReport): Cell[][] {
  const money = (v: number | null) => (v === null ? '' : formatMinor(v as Minor, network.exponent));
  const onLoops = new Map<number, number[]>();
  report.loops.forEach((loop, i) => loop.lanes.forEach((row) => onLoops.set(row, [...(onLoops.get(row) ?? []), i + 1])));
  const fix = new Map(report.fix_plan.map((f) => [f.row, f]));
  const head = new Map(report.headroom.map((h) => [h.row, h]));
  const rows: Cell[][] = [['row', 'from', 'to', 'ref', ...LANE_AMOUNT_COLUMNS, 'on_loops', 'new_rebate', 'new_net', 'floor', 'headroom']];
  for (let e = 0; e < network.laneCount; e++) {
    const row = network.laneRow[e];
    const f = fix.get(row);
    const h = head.get(row);
    rows.push([
      row,
      network.depotIds[network.laneFrom[e]],
      network.depotIds[network.laneTo[e]],
      network.laneRef[e] ?? '',
      ...laneAmountCells(network, e),
      (onLoops.get(row) ?? []).join(' '),
      f ? money(f.new_rebate_minor) : '',
      f ? money(f.new_net_minor) : '',
      h ? (h.floor_minor === null ? 'no limit' : money(h.floor_minor)) : '',
      h ? (h.headroom_minor === null ? 'no limit' : money(h.headroom_minor)) : '',
    ]);
  }
  return rows;
}

/** One row per lane of each loop, loops numbered from 1 as in the lane table's on_loops column. */
export function auditLoopRows(network: Network, report: AuditReport): Cell[][] {
  const money = (v: number) => formatMinor(v as Minor, network.exponent);
  const rows: Cell[][] = [['loop', 'step', 'row', 'from', 'to', 'ref', 'toll', 'fuel', 'fees', 'rebate', 'net', 'net_per_lap', 'neutralise', 'unbounded_depots']];
  report.loops.forEach((loop, i) =>
    loop.lane_details.forEach((lane, step) =>
      rows.push([
        i + 1,
        step + 1,
        lane.row,
        lane.from,
        lane.to,
        lane.ref ?? '',
        money(lane.toll_minor),
        money(lane.fuel_minor),
        money(lane.fees_minor),
        money(lane.rebate_minor),
        money(lane.net_minor),
        money(loop.net_per_lap_minor),
        money(lane.neutralise_minor),
        loop.unbounded_depots.length,
      ]),
    ),
  );
  return rows;
}
