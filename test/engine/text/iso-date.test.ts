// Calendar dates against JavaScript's own proleptic Gregorian calendar (Date.UTC): every day 0-32 of
// every month 0-13 of years around both century rules gives a date exactly when Date.UTC's day
// falls in the same month.

import { describe, expect, it } from 'vitest';
import { isoDateNumber } from '../../../engine/text/iso-date';

describe('isoDateNumber', () => {
  it('accepts exactly the days the Gregorian calendar has', () => {
    for (const year of [1899, 1900, 1999, 2000, 2023, 2024, 2025, 2026, 2100, 2400]) {
      for (let month = 0; month <= 13; month++) {
        for (let day = 0; day <= 32; day++) {
          const d = new Date(Date.UTC(year, month - 1, day));
          const real = month >= 1 && month <= 12 && day >= 1 && d.getUTCMonth() === month - 1 && d.getUTCDate() === day;
          expect(isoDateNumber(year, month, day)).toBe(real ? year * 10000 + month * 100 + day : null);
        }
      }
    }
  });
});
