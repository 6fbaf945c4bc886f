// Small readers shared by the depots and lanes readers: cell text, ISO 8601 dates and drive times.
// Each returns a value or a reason; the row readers turn reasons into report items.

import { withoutFormulaGuard } from '../io/csv-cell-safety';

/** Trimmed cell text; the apostrophes our own exporter put before formula-like text are removed. */
export function cellText(cells: readonly string[], index: number | undefined): string {
  if (index === undefined) return '';
  const raw = cells[index];
  if (raw === undefined) return '';
  return withoutFormulaGuard(raw.trim());
}

export { readIsoDate, isoDateText } from '../text/iso-date';

/**
 * A copy of text that is kept (refs, notes): V8 keeps a substring pointing into its parent, so
 * copying lets each parsed block of the file go.
 */
export function ownText(text: string): string {
  return text.length > 12 ? (' ' + text).slice(1) : text;
}

/**
 * A drive time in minutes from "h:mm", an ISO 8601 duration ("PT4H35M") or a plain number in
 * `unit` ('min' or 'h'; a number without a unit counts as minutes). Null when it is none of these.
 */
export function readDriveMinutes(text: string, unit: string | null, toNumber: (t: string) => number | null): number | null {
  const clock = /^(\d+):([0-5]\d)$/.exec(text);
  if (clock) return Number(clock[1]) * 60 + Number(clock[2]);
  const iso = /^PT(?:(\d+(?:\.\d+)?)H)?(?:(\d+(?:\.\d+)?)M)?$/i.exec(text);
  if (iso && (iso[1] !== undefined || iso[2] !== undefined)) return Number(iso[1] ?? 0) * 60 + Number(iso[2] ?? 0);
  const value = toNumber(text);
  if (value === null) return null;
  return unit === 'h' || unit === 'hours' || unit === 'hour' ? value * 60 : value;
}
