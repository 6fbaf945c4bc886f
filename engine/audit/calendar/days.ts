// Calendar days for the review: the importer stores dates as yyyymmdd numbers; the review counts
// and steps days, which needs a day number. UTC day numbers avoid any local-time shift.

/** yyyymmdd -> days since 1970-01-01. */
export function dayNumber(yyyymmdd: number): number {
  const y = Math.floor(yyyymmdd / 10000);
  const m = Math.floor(yyyymmdd / 100) % 100;
  const d = yyyymmdd % 100;
  return Math.round(Date.UTC(y, m - 1, d) / 86_400_000);
}

/** Days since 1970-01-01 -> yyyymmdd. */
export function fromDayNumber(day: number): number {
  const date = new Date(day * 86_400_000);
  return date.getUTCFullYear() * 10000 + (date.getUTCMonth() + 1) * 100 + date.getUTCDate();
}

/** The day after (or `n` days after) a yyyymmdd date. */
export function addDays(yyyymmdd: number, n: number): number {
  return fromDayNumber(dayNumber(yyyymmdd) + n);
}

/** Days from `from` to `to`, both included. */
export function daysInRange(from: number, to: number): number {
  return dayNumber(to) - dayNumber(from) + 1;
}
