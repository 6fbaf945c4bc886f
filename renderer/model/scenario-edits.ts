// The scenario edit model: a what-if is the engine's Scenario (changes keyed by LaneKey, see
// DEVELOPERS.md) over the imported contract. The lane table, the worker and the workspace all go
// through this module, so the engine's scenario functions can take over here without touching components.

import { withChange, withoutChange } from '../../engine/index';
import { laneKeyId, laneKeyIndex, type LaneKey } from '../../engine/index';
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

/** Sets one amount of a lane (minor units). */
export function setLaneAmount(scenario: Scenario, lane: LaneKey, field: EditableField, amountMinor: number, originalMinor: number): Scenario {
  return withLaneChange(scenario, { kind: 'set-amount', lane, field, amountMinor, note: null }, amountMinor === originalMinor);
}

/** Closes or reopens a lane. */
export function setLaneClosed(scenario: Scenario, lane: LaneKey, closed: boolean): Scenario {
  return withLaneChange(scenario, { kind: 'close-lane', lane, note: null }, !closed);
}

/** Lane amounts after the scenario. */
export interface LaneAmounts {
  toll: Float64Array;
  fuel: Float64Array;
  fees: Float64Array;
  rebate: Float64Array;
  closed: Uint8Array;
  /** Lanes some change touches. */
  changed: Uint8Array;
  /** Changes whose lane is not in the network (kept in the scenario, listed as problems). */
  unresolved: number[];
}

export interface BaseAmounts {
  toll: Float64Array;
  fuel: Float64Array;
  fees: Float64Array;
  rebate: Float64Array;
}

/** Net cost of lane `e` in minor units: tolls + fuel + fees - rebate. */
export function laneNetMinor(amounts: BaseAmounts, e: number): number {
  return amounts.toll[e] + amounts.fuel[e] + amounts.fees[e] - amounts.rebate[e];
}

/** Applies the scenario's amount and closure changes to the base amounts, lanes found by key. */
export function applyScenarioAmounts(base: BaseAmounts, keys: readonly LaneKey[], scenario: Scenario | null, keyIndex?: ReadonlyMap<string, number>): LaneAmounts {
  const n = base.toll.length;
  const out: LaneAmounts = {
    toll: base.toll.slice(),
    fuel: base.fuel.slice(),
    fees: base.fees.slice(),
    rebate: base.rebate.slice(),
    closed: new Uint8Array(n),
    changed: new Uint8Array(n),
    unresolved: [],
  };
  if (!scenario || scenario.changes.length === 0) return out;
  // Building the index costs one string per lane; callers that apply many scenarios pass it in.
  const index = keyIndex ?? laneKeyIndex(keys);
  scenario.changes.forEach((change, i) => {
    if (change.kind === 'add-lane' || change.kind === 'set-validity') return;
    const e = index.get(laneKeyId(change.lane));
    if (e === undefined) {
      out.unresolved.push(i);
      return;
    }
    out.changed[e] = 1;
    if (change.kind === 'close-lane') out.closed[e] = 1;
    else out[change.field][e] = change.amountMinor;
  });
  return out;
}

/** The scenario plus one rebate change per fix-plan row (rows of the lanes file name the lanes). */
export function fixPlanScenario(
  scenario: Scenario,
  network: { laneRow: Int32Array; laneRebate: Float64Array },
  keys: readonly LaneKey[],
  rows: readonly { row: number; new_rebate_minor: number }[],
): Scenario {
  const laneOfRow = new Map<number, number>();
  network.laneRow.forEach((row, e) => laneOfRow.set(row, e));
  let next = scenario;
  for (const r of rows) {
    const e = laneOfRow.get(r.row);
    if (e !== undefined) next = setLaneAmount(next, keys[e], 'rebate', r.new_rebate_minor, network.laneRebate[e]);
  }
  return next;
}

/** True when the scenario adds lanes or changes validity, so the lane set itself changes. */
export function needsRebuild(scenario: Scenario | null): boolean {
  return !!scenario && scenario.changes.some((c) => c.kind === 'add-lane' || c.kind === 'set-validity');
}

/** True when the scenario changes anything. */
export function hasChanges(scenario: Scenario | null): boolean {
  return !!scenario && scenario.changes.length > 0;
}
