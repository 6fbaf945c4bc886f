// On-screen formats: money goes through exact integer formatting (no float rounding even at the
// edge of the exact range), drive times in hours and minutes.

import { describe, expect, it } from 'vitest';
import { formatDriveMinutes, formatMoney, formatMoneyWithCode } from '../../../renderer/model/format';

describe('formatMoney', () => {
  it('groups thousands and keeps the sign and exact cents', () => {
    expect(formatMoney(0)).toBe('0.00');
    expect(formatMoney(5)).toBe('0.05');
    expect(formatMoney(-140)).toBe('-1.40');
    expect(formatMoney(123456789)).toBe('1,234,567.89');
    // Number.MAX_SAFE_INTEGER minor units: a float division would print ...740991.0 or round.
    expect(formatMoney(Number.MAX_SAFE_INTEGER)).toBe('90,071,992,547,409.91');
    expect(formatMoney(1234, 0)).toBe('1,234');
    expect(formatMoney(1234567, 3)).toBe('1,234.567');
  });

  it('shows a dash for no figure and puts the ISO 4217 code first', () => {
    expect(formatMoney(NaN)).toBe('—');
    expect(formatMoneyWithCode(-3820, 'EUR')).toBe('EUR -38.20');
    expect(formatMoneyWithCode(NaN, 'EUR')).toBe('—');
  });
});

describe('formatDriveMinutes', () => {
  it('reads hours and zero-padded minutes', () => {
    expect(formatDriveMinutes(0)).toBe('0 min');
    expect(formatDriveMinutes(59)).toBe('59 min');
    expect(formatDriveMinutes(425)).toBe('7 h 05 min');
    expect(formatDriveMinutes(NaN)).toBe('—');
  });
});
