// Small pure edits of a scenario for front ends: one lane-table edit becomes one call, and a second
// edit of the same lane field replaces the first instead of piling up.

import { laneKeyId } from '../import/lane-key';
import type { Scenario, ScenarioChange } from './types';

/** The slot a change occupies: a later change in the same slot replaces the earlier one. */
function slotOf(change: ScenarioChange): string | null {
  switch (change.kind) {
    case 'set-amount':
      // A toll for one class and the toll for every class are separate edits, each replaced by its own next edit.
      return `amount:${change.field}:${change.field === 'toll' ? JSON.stringify(change.vehicleClass ?? null) : ''}:${laneKeyId(change.lane)}`;
    case 'close-lane':
      return `close:${laneKeyId(change.lane)}`;
    case 'set-validity':
      return `validity:${laneKeyId(change.lane)}`;
    case 'add-lane':
      return null; // every added lane is its own change
  }
}

/** A new scenario with `change` added, replacing an earlier change on the same lane and field. */
export function withChange(scenario: Scenario, change: ScenarioChange): Scenario {
  const slot = slotOf(change);
  const at = slot === null ? -1 : scenario.changes.findIndex((c) => slotOf(c) === slot);
  const changes = scenario.changes.slice();
  if (at === -1) changes.push(change);
  else changes[at] = change;
  return { ...scenario, changes };
}

/** A new scenario without the change at `index`. */
export function withoutChange(scenario: Scenario, index: number): Scenario {
  return { ...scenario, changes: scenario.changes.filter((_, i) => i !== index) };
}
