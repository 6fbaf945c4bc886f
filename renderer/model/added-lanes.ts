// Lanes the active scenario puts into the plan that the base plan does not have: lanes it adds
// ("add-lane") and lanes-file rows a validity change brings into the date. They are not in the
// drawn network, so the worker lists them with each solve from the engine's overlay (the network it
// rebuilt), like every other row's amounts; the map draws them and the lane table lists them. An
// added lane's edit rewrites its change in place.

import type { NewLane } from '../../engine/index';
import type { EditableField, Scenario } from './scenario-edits';

/** One lane in the plan only because of the scenario, as the map and the lane table show it. */
export interface AddedLane {
  /** How solve results (tree, route, loop lanes) name it: `addedLaneRef(index in the solve's list)`. */
  ref: number;
  /** 'added': an add-lane change; 'row': a lanes-file row a validity change brings into the date. */
  kind: 'added' | 'row';
  /** Position of the change that brings it in `scenario.changes` (what an edit or removal names); -1 when none is found. */
  changeIndex: number;
  /** Lanes-file row as a spreadsheet numbers it, for kind 'row'; null for an added lane. */
  sourceRow: number | null;
  /** Its values under the scenario, as the overlay planned them (amounts for the class on screen). */
  lane: NewLane;
  /** Depot indices in the network. */
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

/** True when both lists name the same lanes with the same values (so map layers built on them stay). */
export function sameAddedLanes(a: readonly AddedLane[], b: readonly AddedLane[]): boolean {
  return a.length === b.length && a.every((x, i) => x.ref === b[i].ref && x.changeIndex === b[i].changeIndex && x.from === b[i].from && x.to === b[i].to && x.netMinor === b[i].netMinor && JSON.stringify(x.lane) === JSON.stringify(b[i].lane));
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
 * How solve results name the k-th lane of the solve's `extraLanes`: -2 - k. -1 stays "a lane not
 * traced"; 0 and up are network lanes.
 */
export function addedLaneRef(index: number): number {
  return -2 - index;
}

/** The added lane a result lane names, or undefined for a network lane or an untraced one. */
export function addedLaneOf(added: readonly AddedLane[], lane: number): AddedLane | undefined {
  return lane <= -2 ? added.find((a) => a.ref === lane) : undefined;
}

/** "RTM → MIL (WHATIF-1)": how the map label and the table name such a lane. */
export function addedLaneName(lane: NewLane): string {
  return `${lane.from} → ${lane.to}${lane.ref ? ` (${lane.ref})` : ''}`;
}

/** The map's label: "Added: RTM → MIL (WHATIF-1)", or "Valid by scenario: ..." for a file row. */
export function addedLaneLabel(a: AddedLane): string {
  return `${a.kind === 'added' ? 'Added' : 'Valid by scenario'}: ${addedLaneName(a.lane)}`;
}
