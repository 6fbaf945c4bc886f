// The date range a calendar review covers: what the user asks for, else every date the lanes file
// names (earliest to latest of valid_from and valid_to). Open-ended rows count from and to the
// window's ends. A file that names no date at all has no window: one undated review.

import { PlanRequestError } from '../../import/import-errors';
import { isoDateText, readIsoDate } from '../../import/cells';
import type { LaneTable } from '../../import/types';

/** Inclusive yyyymmdd dates; null when the file names no date and none was asked for. */
export interface ReviewWindow {
  from: number;
  to: number;
}

export interface ReviewWindowRequest {
  /** ISO 8601 dates, inclusive. */
  fromDate?: string;
  toDate?: string;
}

function read(option: string, text: string | undefined): number | null {
  if (text === undefined || text.trim() === '') return null;
  const value = readIsoDate(text.trim());
  if (value === null) throw new PlanRequestError(option, text, 'not an ISO 8601 calendar date (YYYY-MM-DD)');
  return value;
}

/** The window; throws PlanRequestError for a bad date or a window that ends before it starts. */
/** Rows marked in `leaveOut` (a what-if closes them) name no date. */
export function reviewWindow(table: LaneTable, request: ReviewWindowRequest = {}, leaveOut?: Uint8Array): ReviewWindow | null {
  let first = Infinity;
  let last = -Infinity;
  for (let i = 0; i < table.count; i++) {
    if (leaveOut?.[i]) continue;
    for (const d of [table.validFrom[i], table.validTo[i]]) {
      if (d === 0) continue;
      if (d < first) first = d;
      if (d > last) last = d;
    }
  }
  const asked = { from: read('from date', request.fromDate), to: read('to date', request.toDate) };
  const from = asked.from ?? (first === Infinity ? asked.to : first);
  const to = asked.to ?? (last === -Infinity ? asked.from : last);
  if (from === null || to === null) return null;
  if (from > to) {
    const option = asked.to !== null ? 'to date' : 'from date';
    throw new PlanRequestError(option, isoDateText(option === 'to date' ? to : from)!, `the review window would end (${isoDateText(to)}) before it starts (${isoDateText(from)})`);
  }
  return { from, to };
}
