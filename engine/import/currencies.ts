// ISO 4217 currencies the importer accepts, with their minor-unit digits, and the symbols that name
// one of them without doubt. "kr" is shared by SEK, DKK and NOK, so it is refused as ambiguous.
// Null-prototype tables: a currency cell "toString" is an unknown currency, not a function.

import { lookupTable } from '../text/lookup-table';
import { shownText } from '../text/shown-text';

/** Minor digits per ISO 4217 (the "minor unit" column of the list). */
export const CURRENCY_EXPONENTS: Readonly<Record<string, number>> = lookupTable({
  EUR: 2,
  USD: 2,
  GBP: 2,
  CHF: 2,
  PLN: 2,
  CZK: 2,
  SEK: 2,
  DKK: 2,
  NOK: 2,
  HUF: 2,
  RON: 2,
  BGN: 2,
  CAD: 2,
  AUD: 2,
  JPY: 0,
  ISK: 0,
});

const SYMBOLS: Readonly<Record<string, string>> = lookupTable({
  '€': 'EUR',
  $: 'USD',
  US$: 'USD',
  '£': 'GBP',
  '¥': 'JPY',
  '円': 'JPY',
  'zł': 'PLN',
  'Kč': 'CZK',
  Ft: 'HUF',
  'Fr.': 'CHF',
  'SFr.': 'CHF',
  lei: 'RON',
});

const AMBIGUOUS: Readonly<Record<string, string>> = lookupTable({
  kr: 'SEK, DKK, NOK or ISK',
  'kr.': 'SEK, DKK, NOK or ISK',
  ',-': 'several currencies',
});

export type CurrencyLookup = { code: string } | { error: 'unknown' | 'ambiguous'; detail: string };

/** Reads an ISO 4217 code (any case) or a known symbol. */
export function lookupCurrency(token: string): CurrencyLookup {
  const t = token.trim();
  const upper = t.toUpperCase();
  if (/^[A-Z]{3}$/.test(upper)) {
    return upper in CURRENCY_EXPONENTS ? { code: upper } : { error: 'unknown', detail: `"${shownText(t)}" is not a supported ISO 4217 code (supported: ${Object.keys(CURRENCY_EXPONENTS).join(', ')})` };
  }
  if (t in SYMBOLS) return { code: SYMBOLS[t] };
  const lower = t.toLowerCase();
  if (lower in AMBIGUOUS) return { error: 'ambiguous', detail: `"${shownText(t)}" is used by ${AMBIGUOUS[lower]}; write the ISO 4217 code instead` };
  return { error: 'unknown', detail: `"${shownText(t)}" is not a currency this importer knows; write the ISO 4217 code` };
}

/** Minor digits of a supported code, or undefined. */
export function currencyExponent(code: string): number | undefined {
  return CURRENCY_EXPONENTS[code.toUpperCase()];
}
