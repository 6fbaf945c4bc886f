// Exact money: every amount is an integer count of minor units (cents) held in a branded number.
// Decimal text is parsed digit by digit, never through floating point, so "0.10" is exactly 10
// and a loop of +0.10, +0.20 and -0.30 sums to exactly 0.

import { MoneyFormatError, MoneyOverflowError } from '../errors';

/** An integer number of minor units of the network's currency. */
export type Minor = number & { readonly __unit: 'minor' };

const MAX = Number.MAX_SAFE_INTEGER;

/** Wraps a safe integer as Minor; anything else is refused. */
export function minor(value: number, context = 'amount'): Minor {
  if (!Number.isSafeInteger(value)) {
    if (Number.isInteger(value) || !Number.isFinite(value)) throw new MoneyOverflowError(context);
    throw new MoneyFormatError(String(value), 'not a whole number of minor units');
  }
  return (value === 0 ? 0 : value) as Minor; // normalise -0
}

export const ZERO = 0 as Minor;

/**
 * Parses a plain decimal amount in major units ("12.50", "-0.1", "+3", ".5") into minor units.
 * `exponent` is the currency's number of minor digits (ISO 4217; 2 for most currencies).
 * More fraction digits than the currency has is an error, not a rounding.
 */
export function parseMinor(text: string, exponent = 2): Minor {
  const trimmed = text.trim();
  const match = /^([+-]?)(\d*)(?:\.(\d*))?$/.exec(trimmed);
  if (!match || (match[2] === '' && (match[3] === undefined || match[3] === ''))) {
    throw new MoneyFormatError(text, 'not a decimal number');
  }
  const [, sign, whole, fraction = ''] = match;
  if (fraction.length > exponent) {
    const extra = fraction.slice(exponent);
    if (!/^0*$/.test(extra)) {
      throw new MoneyFormatError(text, `more than ${exponent} decimal places; amounts are exact and never rounded`);
    }
  }
  const digits = (whole.replace(/^0+/, '') + fraction.slice(0, exponent).padEnd(exponent, '0')).replace(/^0+/, '');
  if (digits.length > 16 || (digits.length === 16 && digits > String(MAX))) {
    throw new MoneyOverflowError(`amount "${text}"`);
  }
  const magnitude = digits === '' ? 0 : Number(digits);
  return minor(sign === '-' ? -magnitude : magnitude, `amount "${text}"`);
}

/** Formats minor units back to a plain decimal string ("-0.05", "12.50"); exact for every safe integer. */
export function formatMinor(value: Minor, exponent = 2): string {
  const negative = value < 0;
  const digits = String(Math.abs(value));
  if (exponent === 0) return (negative ? '-' : '') + digits;
  const padded = digits.padStart(exponent + 1, '0');
  const whole = padded.slice(0, padded.length - exponent);
  const fraction = padded.slice(padded.length - exponent);
  return `${negative ? '-' : ''}${whole}.${fraction}`;
}

/** a + b, refusing a result outside the exact range. */
export function addMinor(a: Minor, b: Minor, context = 'sum'): Minor {
  const sum = a + b;
  if (sum > MAX || sum < -MAX) throw new MoneyOverflowError(context);
  return sum as Minor;
}

/** a - b, refusing a result outside the exact range. */
export function subMinor(a: Minor, b: Minor, context = 'difference'): Minor {
  const diff = a - b;
  if (diff > MAX || diff < -MAX) throw new MoneyOverflowError(context);
  return (diff === 0 ? 0 : diff) as Minor;
}

/** Sum of many amounts with the same overflow check at every step. */
export function sumMinor(values: Iterable<number>, context = 'sum'): Minor {
  let total = ZERO;
  for (const v of values) total = addMinor(total, v as Minor, context);
  return total;
}

/** True when |value| is within the exact range (the solvers inline the same test on their hot path). */
export function isExact(value: number): boolean {
  return value <= MAX && value >= -MAX;
}

/** Sum of many amounts, or null when the sum (not just a partial sum) is outside the exact range. */
export function sumMinorOrNull(values: Iterable<number>): Minor | null {
  let total = 0;
  let exact: bigint | null = null;
  for (const v of values) {
    if (exact !== null) exact += BigInt(v);
    else if (Math.abs(total + v) <= MAX) total += v;
    else exact = BigInt(total) + BigInt(v);
  }
  if (exact === null) return (total === 0 ? 0 : total) as Minor;
  return exact > BigInt(MAX) || exact < -BigInt(MAX) ? null : (Number(exact) as Minor);
}
