import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { addMinor, formatMinor, parseMinor, sumMinor, sumMinorOrNull, type Minor } from '../../../engine/money/minor';
import { netCostOrNull } from '../../../engine/money/net-cost';
import { MoneyFormatError, MoneyOverflowError } from '../../../engine/errors';

describe('parseMinor', () => {
  it('reads decimal text exactly, never through floating point', () => {
    expect(parseMinor('0.10')).toBe(10);
    expect(parseMinor('0.1')).toBe(10);
    expect(parseMinor('12.5')).toBe(1250);
    expect(parseMinor('-0.05')).toBe(-5);
    expect(parseMinor('+3')).toBe(300);
    expect(parseMinor('.5')).toBe(50);
    expect(parseMinor('1.10')).toBe(110); // 1.1 * 100 is 110.00000000000001 in floating point
    expect(parseMinor('4.35')).toBe(435); // 4.35 * 100 is 434.99999999999994 in floating point
    expect(Object.is(parseMinor('-0'), 0)).toBe(true);
  });

  it('honours the currency exponent (ISO 4217 minor digits)', () => {
    expect(parseMinor('1500', 0)).toBe(1500);
    expect(parseMinor('1.234', 3)).toBe(1234);
    expect(() => parseMinor('1.5', 0)).toThrow(MoneyFormatError);
  });

  it('refuses text that is not a plain decimal, with the value in the error', () => {
    for (const bad of ['', 'abc', '1.2.3', '1e3', 'NaN', 'Infinity', '--1', '.', '12.505']) {
      const error = (() => {
        try {
          parseMinor(bad);
        } catch (e) {
          return e;
        }
      })();
      expect(error, bad).toBeInstanceOf(MoneyFormatError);
      expect((error as MoneyFormatError).value).toBe(bad);
    }
    expect(parseMinor('12.500')).toBe(1250); // trailing zeros beyond the exponent change nothing
  });

  it('refuses amounts beyond the exact integer range instead of rounding them', () => {
    expect(parseMinor('90071992547409.91')).toBe(Number.MAX_SAFE_INTEGER);
    expect(() => parseMinor('90071992547409.92')).toThrow(MoneyOverflowError);
    expect(() => parseMinor('1000000000000000000')).toThrow(MoneyOverflowError);
  });

  it('round-trips with formatMinor for every safe integer', () => {
    fc.assert(
      fc.property(fc.maxSafeInteger(), (n) => {
        expect(parseMinor(formatMinor(n as Minor))).toBe(n === 0 ? 0 : n);
      }),
    );
  });
});

describe('formatMinor', () => {
  it('writes minor units as plain decimals', () => {
    expect(formatMinor(0 as Minor)).toBe('0.00');
    expect(formatMinor(5 as Minor)).toBe('0.05');
    expect(formatMinor(-5 as Minor)).toBe('-0.05');
    expect(formatMinor(123456 as Minor)).toBe('1234.56');
    expect(formatMinor(1500 as Minor, 0)).toBe('1500');
    expect(formatMinor(Number.MAX_SAFE_INTEGER as Minor)).toBe('90071992547409.91');
  });
});

describe('sums', () => {
  it('+0.10 +0.20 -0.30 is exactly zero (in floating point it is 5.55e-17)', () => {
    const total = sumMinor([parseMinor('0.10'), parseMinor('0.20'), parseMinor('-0.30')]);
    expect(total).toBe(0);
    expect(0.1 + 0.2 - 0.3).not.toBe(0); // why exact integers: the float sum is not zero
  });

  it('refuses a sum beyond Number.MAX_SAFE_INTEGER minor units', () => {
    const big = Number.MAX_SAFE_INTEGER as Minor;
    expect(() => addMinor(big, 1 as Minor)).toThrow(MoneyOverflowError);
    expect(() => sumMinor([big, -1, 2])).toThrow(MoneyOverflowError);
    expect(addMinor(big, -1 as Minor)).toBe(Number.MAX_SAFE_INTEGER - 1);
  });
});

describe('netCostOrNull and sumMinorOrNull against BigInt', () => {
  const MAX = Number.MAX_SAFE_INTEGER;
  const amount = fc.oneof(fc.integer({ min: -1000, max: 1000 }), fc.constantFrom(MAX, -MAX, MAX - 1, MAX - 100), fc.maxSafeInteger().map((v) => v));
  const exact = (big: bigint) => (big > BigInt(MAX) || big < -BigInt(MAX) ? null : Number(big));
  it('the net is exact whenever it is in range, and null exactly when it is not', () => {
    fc.assert(
      fc.property(amount, amount, amount, amount, (toll, fuel, fees, rebate) => {
        expect(netCostOrNull(toll, fuel, fees, rebate)).toBe(exact(BigInt(toll) + BigInt(fuel) + BigInt(fees) - BigInt(rebate)));
      }),
      { numRuns: 3000 },
    );
  });
  it('a sum is null only when the whole sum is out of range, not a partial one', () => {
    fc.assert(
      fc.property(fc.array(amount, { maxLength: 8 }), (values) => {
        expect(sumMinorOrNull(values)).toBe(exact(values.reduce((s, v) => s + BigInt(v), 0n)));
      }),
      { numRuns: 3000 },
    );
    expect(sumMinorOrNull([MAX, MAX, -MAX])).toBe(MAX);
  });
});
