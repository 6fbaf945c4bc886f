// ISO 8601 calendar dates (YYYY-MM-DD) as yyyymmdd numbers, which compare and sort as dates do. One
// owner for the calendar rules: the importer, the planner and the JSON checker all read dates here.

/** An ISO 8601 calendar date (YYYY-MM-DD) as the number yyyymmdd, or null when it is not a real date. */
export function readIsoDate(text: string): number | null {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text);
  if (!m) return null;
  return isoDateNumber(Number(m[1]), Number(m[2]), Number(m[3]));
}

// Days per month (February's leap day added below); one table, not an array made per date.
const MONTH_DAYS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

/** The date year-month-day as yyyymmdd, or null when no such day exists (Gregorian calendar). */
export function isoDateNumber(year: number, month: number, day: number): number | null {
  if (month < 1 || month > 12 || day < 1) return null;
  const leap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
  const days = MONTH_DAYS[month - 1] + (month === 2 && leap ? 1 : 0);
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

