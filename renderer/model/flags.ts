// Caution flags the results table shows per depot. Bits are set by the worker and named here, so
// the table, its filter and the CSV of the table all read the same words.

export const FLAG_UNBOUNDED = 1;
export const FLAG_LIMIT_HIDES_LOOP = 2;
export const FLAG_LONG_DRIVE = 4;
export const FLAG_NEGATIVE_COST = 8;
export const FLAG_DRIVE_UNKNOWN = 16;

/** What "limit hides loop" means, for the help line under the results table and the flag's title. */
export const LIMIT_HIDES_LOOP_HELP =
  'the cost shown is finite only because of the Maximum legs limit; without the limit a rebate loop (a circuit whose rebates exceed its costs) makes this depot unbounded, so the contract still needs fixing.';

const NAMES: readonly [number, string, string][] = [
  [FLAG_UNBOUNDED, 'rebate loop', 'Cost unbounded: reachable through a rebate loop with negative net cost'],
  [FLAG_LIMIT_HIDES_LOOP, 'limit hides loop', `Limit hides loop: ${LIMIT_HIDES_LOOP_HELP}`],
  [FLAG_LONG_DRIVE, 'over daily driving limit', 'Drive time exceeds the daily driving limit of the planning settings; a rest or a second driver is needed'],
  [FLAG_NEGATIVE_COST, 'earns money', 'Net route cost below zero: rebates exceed costs; check the contract terms'],
  [FLAG_DRIVE_UNKNOWN, 'drive time unknown', 'At least one lane on the route has no drive time'],
];

// One shared list per combination of bits (32 of them): the results table asks for every depot's
// labels on each solve, and 50,000 fresh arrays per solve were garbage to collect on the UI thread.
const LABELS = new Map<number, readonly string[]>();

/** Short labels of the flags set in `bits`, in a fixed order (a shared list: do not change it). */
export function flagLabels(bits: number): readonly string[] {
  let labels = LABELS.get(bits);
  if (!labels) LABELS.set(bits, (labels = Object.freeze(NAMES.filter(([bit]) => (bits & bit) !== 0).map(([, label]) => label))));
  return labels;
}

/** Long explanation of the flags set in `bits` (tooltips and screen readers). */
export function flagExplanations(bits: number): string[] {
  return NAMES.filter(([bit]) => (bits & bit) !== 0).map(([, , text]) => text);
}

/** Every flag label, for the filter menu. */
export const ALL_FLAG_LABELS: readonly string[] = NAMES.map(([, label]) => label);
