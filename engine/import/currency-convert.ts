// Converts an exact amount between currencies with a decimal rate, in integers (BigInt), rounding
// half away from zero to the target's minor unit: the one place an import may round, and only when
// the user gave an exchange rate.

import { minor, type Minor } from '../money/minor';

/** Parses "0.92" into numerator/denominator; null when it is not a positive decimal. */
export function readRate(text: string): { num: bigint; den: bigint } | null {
  const m = /^(\d+)(?:\.(\d+))?$/.exec(text.trim());
  if (!m) return null;
  const fraction = m[2] ?? '';
  const num = BigInt(m[1] + fraction);
  if (num === 0n) return null;
  return { num, den: 10n ** BigInt(fraction.length) };
}

/** amount (minor units, `fromExponent`) x rate, in minor units of `toExponent`. */
export function convertMinor(amount: number, fromExponent: number, toExponent: number, rate: { num: bigint; den: bigint }): Minor {
  const top = BigInt(amount) * rate.num * 10n ** BigInt(toExponent);
  const bottom = rate.den * 10n ** BigInt(fromExponent);
  const negative = top < 0n;
  const abs = negative ? -top : top;
  let q = abs / bottom;
  if ((abs % bottom) * 2n >= bottom) q += 1n;
  return minor(Number(negative ? -q : q), 'converted amount');
}
