// The day's loads, each on its own vehicle: loads are grouped by (origin, date, toll class, fuel
// consumption, restriction profile) so one restricted solve serves a group, and one solve without
// limits per (origin, date, class) tells what the limits cost and whether a load is blocked.
// Statuses: planned, no-route, blocked (naming the limits), unbounded (naming the loop).
// Under a what-if scenario every day is priced from the scenario's overlay (day-pricing.ts).

import type { ImportResult } from '../planning/import-types';
import type { LoadRecord } from '../import/loads-reader';
import type { VehicleRecord } from '../import/vehicles-reader';
import type { RebateLoop } from '../routes/rebate-loop';
import type { Network } from '../network/types';
import { routeBreakdown, type RouteBreakdown } from '../planning/route-breakdown';
import type { PlanningSettings } from '../planning/types';
import { cheapestRoutes, STATUS_REACHABLE, STATUS_UNBOUNDED, type RouteTree } from '../routes/cheapest-routes';
import { routePath } from '../routes/route-path';
import { buildOverlay, type OverlayIndex } from '../scenario/overlay';
import type { Scenario } from '../scenario/types';
import { priceDay, pricingKeyText, sameDayAs, shareKeyText, validitySpans, type PricedDay, type PricingKey } from './day-pricing';
import { canRepair, repairTree } from './restricted-repair';
import { fewestClosedPath, fewestClosedTree, type FewestClosedTree } from './fewest-closed';
import { closedLanes, closureReasons, profileKey, restrictedWeights, restrictionProfile, type RestrictionProfile } from './vehicle-limits';
import { departingLanes, prepareYen, yenAlternatives, type YenContext } from './yen-alternatives';

export type LoadStatus = 'planned' | 'no-route' | 'blocked' | 'unbounded';

export interface AlternativeRoute {
  costMinor: number;
  /** Cost minus the best route's (>= 0). */
  differenceMinor: number;
  path: string[];
  /** Lane rows (lanes file) in travel order. */
  lanes: number[];
  /** Lane rows this route uses that the best does not. */
  departs: number[];
}

export interface LoadPlan {
  load: LoadRecord;
  /** The toll class the load was priced for (the plan's default when the load names none). */
  vehicleClass: string | null;
  status: LoadStatus;
  costMinor: number | null;
  breakdown: RouteBreakdown | null;
  path: string[];
  /** Lane rows in travel order. */
  lanes: number[];
  /** Planned cost minus the cheapest cost with no limits; null unless both are known. */
  limitsExtraMinor: number | null;
  /** Lanes of the route without limits that this vehicle may not use, with the limit each breaks. */
  avoided: string[];
  /** For a blocked load: the limits on the route that needs the fewest closed lanes. */
  blockedBy: string[];
  /** For an unbounded load: a rebate loop that reaches it. */
  loop: { depots: string[]; lanes: number[]; netPerLapMinor: number } | null;
  alternatives: AlternativeRoute[];
  /** Why the alternatives stop (null when none were asked for or the load is not planned). */
  alternativesStoppedBy: 'k' | 'exhausted' | 'budget' | null;
  notes: string[];
}

export interface DispatchOptions {
  /** The plan's date (ISO 8601); loads without a date are planned for it. */
  date: string;
  vehicles: ReadonlyMap<string, VehicleRecord>;
  /** Planning options of the user (the same as the import's). */
  settings?: Partial<PlanningSettings>;
  skipInvalid?: boolean;
  /** Next-cheapest loopless routes per planned load (0 = none). */
  alternatives?: number;
  /** Spur searches allowed per load for alternatives. */
  maxSearches?: number;
  /** The what-if the loads are planned under (null = the lanes as the file has them). */
  scenario?: Scenario | null;
  /** The import's key index (overlayIndex), when the caller keeps one; saves counting keys again. */
  overlayIndex?: OverlayIndex;
  /** Called after each group with loads done so far. */
  onProgress?: (done: number, total: number) => void;
}

export interface DispatchPlan {
  date: string;
  /** The scenario's name, null when planned on the lanes as the file has them. */
  scenario: string | null;
  currency: string;
  exponent: number;
  driveLimitMinutes: number | null;
  loads: LoadPlan[];
  /** Problems of planning a day/class (lane rows left out with --skip-invalid), as report lines. */
  warnings: string[];
  notes: string[];
  stats: { groups: number; restrictedSolves: number; plainSolves: number; pricedDays: number };
}

interface GroupWork {
  origin: string;
  key: PricingKey;
  profile: RestrictionProfile;
  loads: number[];
}

/** Plans every load. Loads keep their file order in the result. */
export function planLoads(imported: ImportResult, loads: readonly LoadRecord[], options: DispatchOptions): DispatchPlan {
  const settings = options.settings ?? {};
  const k = options.alternatives ?? 0;
  const scenario = options.scenario ?? null;
  const overlay = buildOverlay(imported, scenario, options.overlayIndex);
  // Limits by overlay row: base rows at their own index, a class copy keeps its row's limits.
  const limits = overlay.table.limits ?? null;
  const days = new Map<string, PricedDay>();
  const plain = new Map<string, RouteTree>();
  const masks = new Map<string, Uint8Array | null>();
  const maskWeights = new Map<string, Float64Array>();
  const repairable = new Map<RouteTree, boolean>();
  const restricted = new Map<string, RouteTree>();
  const warnings: string[] = [];
  const notes: string[] = [];
  for (const p of overlay.problems) warnings.push(`scenario "${scenario?.name ?? ''}", change ${p.changeIndex + 1}: ${p.message}; not applied`);
  const stats = { groups: 0, restrictedSolves: 0, plainSolves: 0, pricedDays: 0 };

  // A vehicle's consumption only prices lanes whose fuel is blank (estimated); without such lanes it
  // must not split groups.
  let fuelEstimated = false;
  for (let r = 0; r < overlay.table.count && !fuelEstimated; r++) if (Number.isNaN(overlay.table.fuel[r])) fuelEstimated = true;

  const groups = new Map<string, GroupWork>();
  loads.forEach((load, i) => {
    const vehicle = load.vehicle === null ? null : (options.vehicles.get(load.vehicle) ?? null);
    const key: PricingKey = { date: load.date, vehicleClass: load.vehicleClass, fuelLitresPer100Km: fuelEstimated ? (vehicle?.fuelLitresPer100Km ?? null) : null };
    const profile = restrictionProfile(load, vehicle);
    const g = `${load.from}\u0000${pricingKeyText(key)}\u0000${profileKey(profile)}`;
    let group = groups.get(g);
    if (!group) groups.set(g, (group = { origin: load.from, key, profile, loads: [] }));
    group.loads.push(i);
  });

  // Dates whose valid rows are the same share one priced network, so its solves are shared too.
  const spanOf = validitySpans(overlay.table);
  const shared = new Map<string, { day: PricedDay; date: string }>();
  const dayOf = (key: PricingKey): PricedDay => {
    const text = pricingKeyText(key);
    let day = days.get(text);
    if (!day) {
      const shareKey = shareKeyText(key, spanOf(key.date));
      const twin = shared.get(shareKey);
      if (twin) day = sameDayAs(twin.day, twin.date, key.date);
      else {
        day = priceDay(imported, overlay, key, settings, options.skipInvalid ?? false, shareKey);
        shared.set(shareKey, { day, date: key.date });
        stats.pricedDays++;
      }
      days.set(text, day);
      for (const p of day.problems) warnings.push(`${key.date}, class ${day.vehicleClass ?? '(default)'}: ${p.file}, row ${p.row}, column "${p.column}": ${p.message} (lane left out)`);
      for (const n of day.notes) if (!notes.includes(n)) notes.push(n);
    }
    return day;
  };

  const results: LoadPlan[] = new Array(loads.length);
  let done = 0;
  for (const group of groups.values()) {
    stats.groups++;
    const day = dayOf(group.key);
    const { network } = day;
    const dayKey = day.shareKey;
    const maskKey = `${dayKey}\u0000${profileKey(group.profile)}`;
    let closed = masks.get(maskKey);
    if (closed === undefined) masks.set(maskKey, (closed = closedLanes(network, day.laneRecord, limits, group.profile)));
    const origin = network.depotIndex.get(group.origin)!;
    const plainKey = `${dayKey}\u0000${group.origin}`;
    let free = plain.get(plainKey);
    if (!free) {
      free = cheapestRoutes(network, origin);
      plain.set(plainKey, free);
      stats.plainSolves++;
    }
    // Solver weights with the closed lanes shut, made once per mask and only when a solve needs them.
    const weightsOf = (): Float64Array | undefined => {
      if (!closed) return undefined;
      let w = maskWeights.get(maskKey);
      if (!w) maskWeights.set(maskKey, (w = restrictedWeights(network, closed)));
      return w;
    };
    let tree = free;
    if (closed) {
      // Groups of one origin and profile on dates that share the network share the restricted tree.
      const restrictedKey = `${maskKey}\u0000${group.origin}`;
      const known = restricted.get(restrictedKey);
      if (known) tree = known;
      else {
        let ok = repairable.get(free);
        if (ok === undefined) repairable.set(free, (ok = canRepair(free)));
        tree = ok ? repairTree(network, free, closed) : cheapestRoutes(network, origin, weightsOf());
        restricted.set(restrictedKey, tree);
        stats.restrictedSolves++;
      }
    }
    let blockedTree: FewestClosedTree | null = null;
    let yen: YenContext | null = null;
    let loopReach: Uint8Array[] | null = null;
    const reasonsOf = (lanes: readonly number[]) => lanes.flatMap((e) => closureReasons(limits, day.laneRecord[e], network.laneRow[e], group.profile));

    for (const i of group.loads) {
      const load = loads[i];
      const target = network.depotIndex.get(load.to)!;
      const plan = emptyPlan(load, day.vehicleClass);
      if (group.profile.sizes === null && limits && limits.measures.length > 0) plan.notes.push('no vehicle named: the lanes\' size and weight limits were not checked');
      if (group.profile.assumedStricter) plan.notes.push('carriage (tank / bulk) or explosive mass unknown: the stricter row of ADR 8.6.4 was applied');
      const status = tree.status[target];
      if (status === STATUS_REACHABLE) {
        const path = routePath(network, tree, target)!;
        plan.status = 'planned';
        plan.costMinor = tree.cost[target];
        plan.breakdown = routeBreakdown(network, path.lanes, imported.plan.settings.drivingLimit.dailyDrivingMinutes);
        plan.path = path.depots.map((d) => network.depotIds[d]);
        plan.lanes = path.lanes.map((e) => network.laneRow[e]);
        // A lane the what-if adds has no row in the file (its row reads 0): say which it is.
        const added = path.lanes.filter((e) => overlay.sourceOf[day.laneRecord[e]] === -1);
        if (added.length > 0) {
          const named = added.map((e) => `${network.depotIds[network.laneFrom[e]]} → ${network.depotIds[network.laneTo[e]]}${network.laneRef[e] ? ` (${network.laneRef[e]})` : ''}`);
          plan.notes.push(`the route uses ${added.length === 1 ? 'a lane' : 'lanes'} the what-if scenario adds, not in the lanes file (lane row 0): ${named.join(', ')}`);
        }
        if (!closed) plan.limitsExtraMinor = 0;
        else if (free.status[target] === STATUS_REACHABLE) {
          plan.limitsExtraMinor = tree.cost[target] - free.cost[target];
          plan.avoided = reasonsOf(routePath(network, free, target)!.lanes);
        } else if (free.status[target] === STATUS_UNBOUNDED) plan.notes.push('without the vehicle\'s limits a rebate loop reaches this depot, so what the limits cost is not a number');
        if (k > 0) {
          yen ??= prepareYen(network, tree, weightsOf());
          const found = yenAlternatives(yen, target, { lanes: path.lanes, costMinor: tree.cost[target] }, k, options.maxSearches);
          plan.alternativesStoppedBy = found.stoppedBy;
          plan.alternatives = found.alternatives.map((a) => ({
            costMinor: a.costMinor,
            differenceMinor: a.costMinor - tree.cost[target],
            path: [load.from, ...a.lanes.map((e) => network.depotIds[network.laneTo[e]])],
            lanes: a.lanes.map((e) => network.laneRow[e]),
            departs: departingLanes(path.lanes, a.lanes).map((e) => network.laneRow[e]),
          }));
        }
      } else if (status === STATUS_UNBOUNDED) {
        plan.status = 'unbounded';
        loopReach ??= loopReachSets(network, tree, weightsOf());
        const at = loopReach.findIndex((seen) => seen[target] === 1);
        const loop = at === -1 ? null : tree.loops[at];
        if (!loop) plan.notes.push('a rebate loop reaches this depot; the solve did not name which');
        if (loop) plan.loop = { depots: loop.depots.map((d) => network.depotIds[d]), lanes: loop.lanes.map((e) => network.laneRow[e]), netPerLapMinor: loop.netPerLap };
      } else if (closed) {
        blockedTree ??= fewestClosedTree(network, origin, closed);
        const lanes = fewestClosedPath(network, blockedTree, target);
        if (lanes) {
          plan.status = 'blocked';
          plan.blockedBy = reasonsOf(lanes.filter((e) => closed[e] === 1));
        }
      }
      results[i] = plan;
    }
    done += group.loads.length;
    options.onProgress?.(done, loads.length);
  }

  const network0 = days.values().next().value?.network ?? imported.network;
  return {
    date: options.date,
    scenario: scenario?.name ?? null,
    currency: network0?.currency ?? imported.currency,
    exponent: network0?.exponent ?? imported.exponent,
    driveLimitMinutes: imported.plan.settings.drivingLimit.dailyDrivingMinutes,
    loads: results,
    warnings,
    notes,
    stats,
  };
}

function emptyPlan(load: LoadRecord, vehicleClass: string | null): LoadPlan {
  return {
    load,
    vehicleClass,
    status: 'no-route',
    costMinor: null,
    breakdown: null,
    path: [],
    lanes: [],
    limitsExtraMinor: null,
    avoided: [],
    blockedBy: [],
    loop: null,
    alternatives: [],
    alternativesStoppedBy: null,
    notes: [],
  };
}

// Per loop of the solve, the depots reachable from it over open lanes: an unbounded load is named
// the first loop whose set holds it (the solve reports one loop per unbounded part).
function loopReachSets(network: Network, tree: RouteTree, weights?: Float64Array): Uint8Array[] {
  const w = weights ?? network.outNet;
  return tree.loops.map((loop: RebateLoop) => {
    const seen = new Uint8Array(network.depotCount);
    const stack = loop.depots.slice();
    for (const d of stack) seen[d] = 1;
    while (stack.length > 0) {
      const u = stack.pop()!;
      for (let p = network.outStart[u], end = network.outStart[u + 1]; p < end; p++) {
        const v = network.outTo[p];
        if (!seen[v] && w[p] !== Infinity) {
          seen[v] = 1;
          stack.push(v);
        }
      }
    }
    return seen;
  });
}
