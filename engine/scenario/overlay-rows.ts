// What the lane table and the change list show of an overlay: every row's amounts for the vehicle
// class being viewed (rows of other dates included), and each change as a dispatcher reads it
// ("toll 2axle 8.19 → 9.00"), with whether it applied and why not. Worked out here, in the engine,
// so the app shows what the CLI computes.

import { classKey } from '../import/headers';
import { isoDateText } from '../import/cells';
import { laneKeyId, laneKeyText, laneKeyWords, type LaneKey } from '../import/lane-key';
import { formatMinor, type Minor } from '../money/minor';
import type { LaneOverlay, OverlayBase, OverlayIndex } from './overlay';
import type { Scenario, ScenarioChange } from './types';

export interface RowAmounts {
  /** The class's toll (its column, else the toll column); NaN where the file leaves it blank. */
  toll: Float64Array;
  /** NaN where blank (planning estimates it). */
  fuel: Float64Array;
  fees: Float64Array;
  rebate: Float64Array;
}

/** Index of a vehicle class in the table's class list (toll columns or vehicle_class names), or -1. */
function classIndex(t: OverlayBase['lanes'], className: string | null): number {
  if (className === null || className === '') return -1;
  const key = classKey(className);
  return t.classTolls.length > 0 ? t.classTolls.findIndex((c) => c.key === key) : t.classNames.findIndex((n) => classKey(n) === key);
}

/** Every row's amounts under the overlay for `className` (null = the toll column). */
export function overlayRowAmounts(overlay: LaneOverlay, className: string | null): RowAmounts {
  const t = overlay.table;
  const k = t.classTolls.length > 0 ? classIndex(t, className) : -1;
  let toll: Float64Array;
  if (k === -1) toll = t.toll.slice();
  else {
    // A plain loop: Float64Array.from with a mapping function is several times slower on 500,000 rows.
    const own = t.classTolls[k].toll;
    toll = new Float64Array(own.length);
    for (let r = 0; r < own.length; r++) toll[r] = Number.isNaN(own[r]) ? t.toll[r] : own[r];
  }
  return { toll, fuel: t.fuel.slice(), fees: t.fees.slice(), rebate: t.rebate.slice() };
}

export interface ChangeView {
  /** Position in `scenario.changes`. */
  index: number;
  /** "LUX → SXB, ref BFH-L-014: toll 2axle 8.19 → 9.00" (lanes named in words, never by key text). */
  text: string;
  applied: boolean;
  /** Why it was not applied (it stays in the scenario), else null. */
  problem: string | null;
}

/**
 * Each change of `scenario` as text, against the base rows `base` (before) and the overlay's problems.
 * `index` (overlayIndex of the same base) saves keying every row again: at 500,000 rows that took
 * seconds per recompute in the app.
 */
export function describeChanges(base: OverlayBase, overlay: LaneOverlay, scenario: Scenario, exponent: number, index?: Pick<OverlayIndex, 'rowOfKey'>): ChangeView[] {
  const t = base.lanes;
  let rowOf: (key: LaneKey) => number | undefined;
  if (index) rowOf = (key) => index.rowOfKey(key);
  else {
    const own = new Map<string, number>();
    for (let r = 0; r < t.count; r++) own.set(laneKeyId(overlay.keys[r]), r);
    rowOf = (key) => own.get(laneKeyId(key));
  }
  const problems = new Map(overlay.problems.map((p) => [p.changeIndex, p.message]));
  const money = (v: number) => (Number.isNaN(v) ? 'blank' : formatMinor(v as Minor, exponent));
  const before = (change: Extract<ScenarioChange, { kind: 'set-amount' }>, r: number | undefined): string => {
    if (r === undefined) return '?';
    if (change.field !== 'toll') return change.field === 'fuel' && Number.isNaN(t.fuel[r]) ? 'estimated' : money(t[change.field][r]);
    const k = classIndex(t, change.vehicleClass ?? null);
    if (k >= 0 && t.classTolls.length > 0) return money(Number.isNaN(t.classTolls[k].toll[r]) ? t.toll[r] : t.classTolls[k].toll[r]);
    return money(t.toll[r]);
  };
  return scenario.changes.map((c, index) => {
    let text: string;
    if (c.kind === 'add-lane') {
      const l = c.lane;
      text = `new lane ${l.from} → ${l.to}${l.ref ? ` (${l.ref})` : ''}: toll ${money(l.tollMinor)}, fuel ${money(l.fuelMinor)}, fees ${money(l.feesMinor)}, rebate ${money(l.rebateMinor)}`;
    } else {
      const r = rowOf(c.lane);
      const lane = laneKeyWords(c.lane);
      if (c.kind === 'set-amount') {
        const field = c.field === 'toll' ? `toll ${c.vehicleClass ?? 'every class'}` : c.field;
        text = `${lane}: ${field} ${before(c, r)} → ${money(c.amountMinor)}`;
      } else if (c.kind === 'close-lane') text = `${lane}: closed`;
      else {
        const was = r === undefined ? '?' : `${isoDateText(t.validFrom[r]) ?? '…'} to ${isoDateText(t.validTo[r]) ?? '…'}`;
        text = `${lane}: valid ${was} → ${c.validFrom ?? '…'} to ${c.validTo ?? '…'}`;
      }
    }
    const problem = problems.get(index) ?? null;
    return { index, text, applied: problem === null, problem };
  });
}
