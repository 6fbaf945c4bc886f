// The one net-cost formula: exact, and refusing only a figure that is itself out of range.

import { describe, expect, it } from 'vitest';
import { netCost } from '../../../engine/money/net-cost';
import { MoneyOverflowError } from '../../../engine/errors';

describe('netCost: the one net-cost formula', () => {
  it('is toll + fuel + fees - rebate', () => {
    expect(netCost(819, 12240, 1000, 500)).toBe(13559);
    expect(netCost(0, 0, 0, 0)).toBe(0);
    expect(Object.is(netCost(5, 0, 0, 5), 0)).toBe(true);
  });

  it('gives the exact net when a partial sum passes the exact range but the net does not', () => {
    const max = Number.MAX_SAFE_INTEGER;
    // max + 10 is not a safe integer, but max + 10 - 10 is the lane's true net.
    expect(netCost(max, 10, 0, 10)).toBe(max);
    expect(netCost(max - 1, 1, 1, 2)).toBe(max - 1);
  });

  it('refuses a net out of the exact range, and a component that is not exact', () => {
    const max = Number.MAX_SAFE_INTEGER;
    expect(() => netCost(max, 1, 0, 0)).toThrow(MoneyOverflowError);
    expect(() => netCost(max + 2, 0, 0, 10)).toThrow(MoneyOverflowError);
  });
});
