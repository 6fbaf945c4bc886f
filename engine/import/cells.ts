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

/** An ISO 8601 calendar date (YYYY-MM-DD) as the number yyyymmdd, or null when it is not a real date. */
export function readIsoDate(text: string): number | null {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text);
  if (!m) return null;
  const year = Number(m[1]);
  const month = Number(m[2]);
  const day = Number(m[3]);
  if (month < 1 || month > 12 || day < 1) return null;
  const leap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
  const days = [31, leap ? 29 : 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31][month - 1];
  if (day > days) return null;
  return year * 10000 + month * 100 + day;
}

/** yyyymmdd back to "YYYY-MM-DD"; 0 (open) gives null. */
export function isoDateText(value: number): string | null {
  if (value === 0) return null;
  const y = Math.floor(value / 10000);
  const m = Math.floor(value / 100) % 100;
  const d = value % 100;
  return `${String(y).padStart(4, '0')}-${String(m).padStart(2, '0')}-${String(d).padStart(2, '0')}`;
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
