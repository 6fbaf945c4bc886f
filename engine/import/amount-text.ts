// Money cells as they come: "12.50", "12,50", "1.234,56 €", "EUR -12.50", "(3.00)". The currency
// mark is split off and named, the number goes through decimal-text and then parseMinor, so an
// amount is exact or refused with a reason; nothing passes through floating point.

import { LanewrightError, MoneyFormatError } from '../errors';
import { parseMinor } from '../money/minor';
import { lookupCurrency } from './currencies';
import { readDecimalText } from './decimal-text';
import type { IssueCode } from './types';

export type AmountRead =
  | { ok: true; minor: number; currency: string | null }
  | { ok: false; code: IssueCode; reason: string };

// A currency mark before or after the number: an ISO code or a run of symbol characters.
const LEADING_MARK = /^([A-Za-z]{3}(?![A-Za-z])|US\$|SFr\.|Fr\.|[^\d\s.,+\-\u2212()]+)\s*/u;
const TRAILING_MARK = /\s*([A-Za-z]{3}|SFr\.|Fr\.|kr\.|[^\d\s.,+\-\u2212()]+)$/u;

/**
 * Reads one amount in major units. `exponent` is the minor digits to read with (the currency of the
 * mark when there is one is returned, the caller checks it against the network's).
 */
export function readAmount(text: string, exponent: number, decimalComma: boolean, exponentOf: (code: string) => number = () => exponent): AmountRead {
  // Fast path: plain "-1234.5" style with at most `exponent` decimals.
  const fast = fastMinor(text, exponent);
  if (fast !== null) return { ok: true, minor: fast, currency: null };

  let body = text.trim();
  if (!/\d/.test(body)) {
    return /^[-+\u2212]?(inf|infinity|nan|∞)$/i.test(body)
      ? { ok: false, code: 'not-finite', reason: 'not a finite amount' }
      : { ok: false, code: 'not-a-number', reason: 'not a number' };
  }
  let currency: string | null = null;
  let sign = '';
  if (/^[-+\u2212]/.test(body)) {
    sign = body.charAt(0);
    body = body.slice(1).trim();
  }
  for (const pattern of [LEADING_MARK, TRAILING_MARK]) {
    const match = pattern.exec(body);
    if (!match || /^(inf|infinity|nan|e)$/i.test(match[1])) continue;
    const found = lookupCurrency(match[1]);
    if ('error' in found) {
      // Plain words are not amounts at all; say so rather than talk about currencies.
      if (found.error === 'unknown' && !/^[A-Za-z]{3}$/.test(match[1]) && /^[A-Za-z]+$/.test(match[1])) break;
      return { ok: false, code: found.error === 'ambiguous' ? 'ambiguous-number' : 'unknown-currency', reason: found.detail };
    }
    if (currency !== null && currency !== found.code) return { ok: false, code: 'bad-amount', reason: 'two different currencies in one amount' };
    currency = found.code;
    body = pattern === LEADING_MARK ? body.slice(match[0].length) : body.slice(0, body.length - match[0].length);
  }
  const decimal = readDecimalText(sign + body, { decimalComma, allowGrouping: true });
  if (!decimal.ok) return { ok: false, code: decimal.code, reason: decimal.reason };
  const digits = currency === null ? exponent : exponentOf(currency);
  try {
    const minor = parseMinor(`${decimal.negative ? '-' : ''}${decimal.whole || '0'}.${decimal.fraction}`, digits);
    return { ok: true, minor, currency };
  } catch (error) {
    if (error instanceof LanewrightError) {
      const reason = 'reason' in error ? String((error as { reason: unknown }).reason) : error.message.replace(/^money: /, '');
      return { ok: false, code: 'bad-amount', reason };
    }
    throw error;
  }
}

/** Digit-by-digit reading of the plain form, or null when the text is anything else. */
function fastMinor(text: string, exponent: number): number | null {
  const n = text.length;
  if (n === 0 || n > 17) return null;
  let i = 0;
  let negative = false;
  if (text.charCodeAt(0) === 45) {
    negative = true;
    i = 1;
  }
  let value = 0;
  let digits = 0;
  for (; i < n; i++) {
    const c = text.charCodeAt(i) - 48;
    if (c < 0 || c > 9) break;
    value = value * 10 + c;
    digits++;
  }
  if (digits === 0) return null;
  let fraction = 0;
  if (i < n) {
    if (text.charCodeAt(i) !== 46) return null;
    i++;
    if (n - i > exponent || n - i === 0) return null;
    for (; i < n; i++) {
      const c = text.charCodeAt(i) - 48;
      if (c < 0 || c > 9) return null;
      value = value * 10 + c;
      fraction++;
    }
  }
  for (; fraction < exponent; fraction++) value *= 10;
  if (!Number.isSafeInteger(value)) return null;
  return negative ? (value === 0 ? 0 : -value) : value;
}

/**
 * An amount a person types into the app's lane table, read by the importer's rules ("12.50",
 * "12,50", "1.234,56", "12,50 €"): exact minor units, or MoneyFormatError with the importer's
 * reason. A currency mark must be the network's own (`currency`); amounts are never converted here.
 */
export function readEnteredAmount(text: string, exponent: number, currency: string): number {
  // With no file to say which mark is decimal, a lone mark followed by two digits is decimal
  // either way; "1,234" is refused as ambiguous, as in a file.
  const read = readAmount(text, exponent, false);
  if (!read.ok) throw new MoneyFormatError(text, read.reason);
  if (read.currency !== null && read.currency !== currency) throw new MoneyFormatError(text, `amounts here are in ${currency}, not ${read.currency}`);
  return read.minor;
}
