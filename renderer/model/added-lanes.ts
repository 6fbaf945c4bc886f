// Lanes the active scenario adds ("add-lane" changes). They are not in the imported network, so the
// map and the lane table read them from the scenario itself; an edit rewrites the change in place.

import { netCostOrNull, type NewLane } from '../../engine/index';
import type { EditableField, Scenario } from './scenario-edits';

/** One lane the scenario adds, as the map and the lane table show it. */
export interface AddedLane {
  /** Position of its change in `scenario.changes` (what an edit or removal names). */
  changeIndex: number;
  lane: NewLane;
  /** Depot indices in the network; -1 when the file has no such depot (the change is a problem). */
  from: number;
  to: number;
  netMinor: number;
}

const FIELD_OF: Record<EditableField, 'tollMinor' | 'fuelMinor' | 'feesMinor' | 'rebateMinor'> = {
  toll: 'tollMinor',
  fuel: 'fuelMinor',
  fees: 'feesMinor',
  rebate: 'rebateMinor',
};

/** The scenario's added lanes in change order, located on the network's depots. */
export function addedLanes(depotIds: readonly string[], scenario: Scenario | null): AddedLane[] {
  if (!scenario || !scenario.changes.some((c) => c.kind === 'add-lane')) return [];
  // Made only when the scenario adds a lane: a map of 50,000 depot ids on every edit froze the page.
  const index = new Map(depotIds.map((id, d) => [id, d]));
  const out: AddedLane[] = [];
  scenario.changes.forEach((change, changeIndex) => {
    if (change.kind !== 'add-lane') return;
    const l = change.lane;
    out.push({ changeIndex, lane: l, from: index.get(l.from) ?? -1, to: index.get(l.to) ?? -1, netMinor: netCostOrNull(l.tollMinor, l.fuelMinor, l.feesMinor, l.rebateMinor) ?? NaN });
  });
  return out;
}

/** True when both lists name the same changes with the same lanes (so map layers built on them stay). */
export function sameAddedLanes(a: readonly AddedLane[], b: readonly AddedLane[]): boolean {
  return a.length === b.length && a.every((x, i) => x.changeIndex === b[i].changeIndex && x.lane === b[i].lane && x.from === b[i].from && x.to === b[i].to);
}

/** One amount of an added lane (minor units). */
export function addedAmount(lane: NewLane, field: EditableField): number {
  return lane[FIELD_OF[field]];
}

/** The scenario with one amount of the added lane at `changeIndex` replaced; the change keeps its place. */
export function setAddedLaneAmount(scenario: Scenario, changeIndex: number, field: EditableField, amountMinor: number): Scenario {
  const change = scenario.changes[changeIndex];
  if (!change || change.kind !== 'add-lane') throw new RangeError(`scenario: change ${changeIndex + 1} does not add a lane`);
  const changes = scenario.changes.slice();
  changes[changeIndex] = { ...change, lane: { ...change.lane, [FIELD_OF[field]]: amountMinor } };
  return { ...scenario, changes };
}

/**
 * How solve results (route lanes, tree lanes, loop lanes) name a lane the scenario adds: -2 minus the
 * index of its change. -1 stays "an added lane not traced to its change"; 0 and up are network lanes.
 */
export function addedLaneRef(changeIndex: number): number {
  return -2 - changeIndex;
}

/** The added lane a result lane names, or undefined for a network lane or an untraced one. */
export function addedLaneOf(added: readonly AddedLane[], lane: number): AddedLane | undefined {
  return lane <= -2 ? added.find((a) => a.changeIndex === -2 - lane) : undefined;
}

/** "RTM → MIL (WHATIF-1)": how the map label and the table name an added lane. */
export function addedLaneName(lane: NewLane): string {
  return `${lane.from} → ${lane.to}${lane.ref ? ` (${lane.ref})` : ''}`;
}
