// Readers for the lane cells that carry a unit: distance (km or mi, from the header or a unit column)
// and drive time (minutes, hours, h:mm or an ISO 8601 duration). Each returns the value or the
// reason it cannot, and the lanes reader turns the reason into a report item.

import { readDriveMinutes } from './cells';
import { readNumber } from './decimal-text';
import type { IssueCode } from './types';

/** International mile in km, exact by definition (1959 international yard and pound agreement). */
export const KM_PER_MILE = 1.609344;

export interface CellFailure {
  code: IssueCode;
  reason: string;
}

/**
 * Plausible bounds of one lane (common practice, no source): no road lane is longer than the
 * Earth's circumference (40,075 km, rounded down), and none takes longer than 1,000 hours, which is
 * that distance at 40 km/h. Anything beyond is a typo or a unit mix-up, refused as a row error.
 */
export const MAX_LANE_KM = 40_000;
export const MAX_LANE_MINUTES = 60_000;

const KM = ['km', 'kilometre', 'kilometres', 'kilometer', 'kilometers'];
const MILES = ['mi', 'mile', 'miles'];

/** True when a distance unit names miles (the header's unit, lower case). */
export function isMilesUnit(unit: string | null): boolean {
  return unit !== null && MILES.includes(unit);
}

/** A distance in km; `headerUnit` from "Distance (mi)", `unitText` from a unit column (wins when set). */
export function readDistanceKm(text: string, headerUnit: string | null, unitText: string, decimalComma: boolean): number | CellFailure {
  let unit = headerUnit ?? 'km';
  const given = unitText.trim().toLowerCase();
  if (given !== '') {
    if (!KM.includes(given) && !MILES.includes(given)) return { code: 'bad-unit', reason: 'distance unit must be km or mi' };
    unit = given;
  }
  const r = readNumber(text, { decimalComma, allowGrouping: true });
  if (!r.ok) return { code: r.code, reason: r.reason };
  if (r.value < 0) return { code: 'negative-value', reason: 'distance cannot be negative' };
  const km = MILES.includes(unit) ? r.value * KM_PER_MILE : r.value;
  if (km > MAX_LANE_KM) return { code: 'out-of-range', reason: `distance over ${MAX_LANE_KM.toLocaleString('en')} km, longer than any road lane` };
  return km;
}

/** A drive time in minutes; `unit` 'h' when the header says hours. */
export function readDriveTime(text: string, unit: string | null, decimalComma: boolean): number | CellFailure {
  if (/^[-\u2212]/.test(text)) return { code: 'negative-value', reason: 'drive time cannot be negative' };
  const minutes = readDriveMinutes(text, unit, (t) => {
    const r = readNumber(t, { decimalComma, allowGrouping: false });
    return r.ok ? r.value : null;
  });
  if (minutes === null || !Number.isFinite(minutes)) {
    return { code: 'bad-duration', reason: 'drive time must be minutes, hours per the header, h:mm or an ISO 8601 duration (PT4H30M)' };
  }
  return checkDriveMinutes(minutes);
}

/** A drive time within the plausible bound, or the reason it is not. */
export function checkDriveMinutes(minutes: number): number | CellFailure {
  if (!(minutes <= MAX_LANE_MINUTES)) return { code: 'out-of-range', reason: `drive time over ${MAX_LANE_MINUTES / 60} hours (${MAX_LANE_MINUTES.toLocaleString('en')} minutes), longer than any road lane` };
  return minutes;
}
