// Splits the review window into periods: maximal date ranges over which the set of valid lane rows
// does not change. Every row's first day and the day after its last are the only dates where the
// set can change, so the periods are the gaps between those dates inside the window.

import { ReviewBudgetError } from '../../errors';
import { isoDateText } from '../../import/cells';
import type { LaneTable } from '../../import/types';
import { addDays } from './days';
import type { ReviewWindow } from './review-window';

/** Inclusive yyyymmdd dates; both 0 for the single period of an undated review. */
export interface ReviewPeriod {
  from: number;
  to: number;
}

/** The periods in date order; throws ReviewBudgetError past `maxPeriods` (default 1,000). Rows in `leaveOut` cut none. */
export function reviewPeriods(table: LaneTable, window: ReviewWindow | null, maxPeriods = 1000, leaveOut?: Uint8Array): ReviewPeriod[] {
  if (window === null) return [{ from: 0, to: 0 }];
  const starts = new Set<number>([window.from]);
  for (let i = 0; i < table.count; i++) {
    if (leaveOut?.[i]) continue;
    const from = table.validFrom[i];
    const to = table.validTo[i];
    if (from > window.from && from <= window.to) starts.add(from);
    if (to !== 0 && to >= window.from && to < window.to) starts.add(addDays(to, 1));
    if (starts.size > maxPeriods) {
      throw new ReviewBudgetError(
        `calendar review: the window ${isoDateText(window.from)} to ${isoDateText(window.to)} has more than ${maxPeriods} periods (validity changes); review a shorter window with --from-date and --to-date`,
      );
    }
  }
  const sorted = [...starts].sort((a, b) => a - b);
  return sorted.map((from, k) => ({ from, to: k + 1 < sorted.length ? addDays(sorted[k + 1], -1) : window.to }));
}

/** Index of the period holding a yyyymmdd date, or -1. */
export function periodOf(periods: readonly ReviewPeriod[], date: number): number {
  let lo = 0;
  let hi = periods.length - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (periods[mid].to < date) lo = mid + 1;
    else if (periods[mid].from > date) hi = mid - 1;
    else return mid;
  }
  return -1;
}
