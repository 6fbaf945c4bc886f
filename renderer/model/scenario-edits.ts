// The scenario edit model: a what-if is the engine's Scenario (changes keyed by LaneKey, see
// DEVELOPERS.md) over the imported contract. Edits are made here; what they mean (amounts, keys,
// problems) is the engine overlay's, computed in the worker and shipped with each solve.

import { withChange, withoutChange } from '../../engine/index';
import type { LaneKey, PlanAmounts } from '../../engine/index';
import type { Scenario, ScenarioChange } from '../../engine/index';

export type { Scenario, ScenarioChange } from '../../engine/index';
export type { LaneKey } from '../../engine/index';

/** The lane amounts a dispatcher may change in a scenario. */
export type EditableField = 'toll' | 'fuel' | 'fees' | 'rebate';

export const EDITABLE_FIELDS: readonly EditableField[] = ['toll', 'fuel', 'fees', 'rebate'];

/** A fresh scenario with no changes. */
export function emptyScenario(name = 'What-if 1'): Scenario {
  return { name, description: null, changes: [] };
}

/**
 * Puts a change in the scenario, replacing an earlier change of the same lane and field. A change
 * back to the contract's own value (`isOriginal`) removes the earlier change instead.
 */
export function withLaneChange(scenario: Scenario, change: ScenarioChange, isOriginal: boolean): Scenario {
  const next = withChange(scenario, change);
  return isOriginal ? withoutChange(next, next.changes.indexOf(change)) : next;
}

/**
 * Sets one amount of a lane (minor units). A toll names its vehicle class (`vehicleClass`, null =
 * every class, an explicit choice); other amounts belong to the lane whatever the class.
 */
export function setLaneAmount(scenario: Scenario, lane: LaneKey, field: EditableField, amountMinor: number, originalMinor: number, vehicleClass: string | null = null): Scenario {
  const change: ScenarioChange = field === 'toll' ? { kind: 'set-amount', lane, field, amountMinor, vehicleClass, note: null } : { kind: 'set-amount', lane, field, amountMinor, note: null };
  return withLaneChange(scenario, change, amountMinor === originalMinor);
}

/** Closes or reopens a lane. */
export function setLaneClosed(scenario: Scenario, lane: LaneKey, closed: boolean): Scenario {
  return withLaneChange(scenario, { kind: 'close-lane', lane, note: null }, !closed);
}

/** Lane amounts under the scenario, one entry per network lane, as the worker ships the overlay's. */
export type LaneAmounts = Pick<PlanAmounts, 'toll' | 'fuel' | 'fees' | 'rebate' | 'closed' | 'changed'>;

/**
 * The scenario plus one rebate change per fix-plan row (rows of the lanes file name the lanes);
 * `noteOf(row)` gives each change's note (which plan, which row and classes), null without one.
 */
export function fixPlanScenario(
  scenario: Scenario,
  network: { laneRow: Int32Array; laneRebate: Float64Array },
  keyOf: (lane: number) => LaneKey,
  rows: readonly { row: number; new_rebate_minor: number }[],
  noteOf: (row: number) => string | null = () => null,
): Scenario {
  const laneOfRow = new Map<number, number>();
  network.laneRow.forEach((row, e) => laneOfRow.set(row, e));
  let next = scenario;
  for (const r of rows) {
    const e = laneOfRow.get(r.row);
    if (e === undefined) continue;
    const change: ScenarioChange = { kind: 'set-amount', lane: keyOf(e), field: 'rebate', amountMinor: r.new_rebate_minor, note: noteOf(r.row) };
    next = withLaneChange(next, change, r.new_rebate_minor === network.laneRebate[e]);
  }
  return next;
}

/** The scenario with each change put in as withChange does (one on the same lane and field replaces the earlier). */
export function withChanges(scenario: Scenario, changes: readonly ScenarioChange[]): Scenario {
  return changes.reduce(withChange, scenario);
}

/** True when the scenario changes anything. */
export function hasChanges(scenario: Scenario | null): boolean {
  return !!scenario && scenario.changes.length > 0;
}
