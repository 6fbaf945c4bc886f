// Picks the network currency before the first lane row is read, so every amount is read with the
// right number of minor digits (JPY has none): the first currency the lanes file names, in a
// bracketed header unit ("Toll (CHF)"), a currency column, or a mark in an amount ("12,50 €").

import { readAmount } from './amount-text';
import { cellText } from './cells';
import { currencyExponent, lookupCurrency } from './currencies';
import type { HeaderMatch, LaneField } from './headers';

const MONEY: LaneField[] = ['toll', 'fuel', 'fees', 'rebate'];

/** The first supported currency the header or the rows from `start` name, or null. */
export function firstCurrencyNamed(records: readonly string[][], start: number, header: HeaderMatch<LaneField>, decimalComma: boolean): string | null {
  for (const field of MONEY) {
    const unit = header.columns.get(field)?.unit;
    if (unit && /^[a-z]{3}$/.test(unit) && currencyExponent(unit) !== undefined) return unit.toUpperCase();
  }
  const currencyColumn = header.columns.get('currency')?.index;
  for (let i = start; i < records.length; i++) {
    const code = cellText(records[i], currencyColumn);
    if (code !== '') {
      const c = lookupCurrency(code);
      if ('code' in c) return c.code;
      continue;
    }
    for (const field of MONEY) {
      const text = cellText(records[i], header.columns.get(field)?.index);
      if (text === '') continue;
      const r = readAmount(text, 2, decimalComma);
      if (r.ok && r.currency) return r.currency;
    }
  }
  return null;
}
