// Picks the network currency before the first lane row is read, so every amount is read with the
// right number of minor digits (JPY has none): the first currency the lanes file names, in a
// bracketed header unit ("Toll (CHF)"), a currency column, or a mark in an amount ("12,50 €").

import { readAmount } from './amount-text';
import { cellText } from './cells';
import { currencyExponent, lookupCurrency } from './currencies';
import type { HeaderMatch, LaneField } from './headers';

const MONEY: LaneField[] = ['toll', 'fuel', 'fees', 'rebate'];

// Anything but digits, separators, signs and parentheses: the cell may carry a currency mark.
const MAY_HAVE_MARK = /[^\d\s.,'()+\-\u2212]/;

/** The currency the first marked amount among `columns` names ("12,50 €" -> EUR), or null. */
export function currencyMarkIn(cells: readonly string[], columns: readonly number[], decimalComma: boolean): string | null {
  for (const index of columns) {
    const text = cellText(cells, index);
    if (text === '' || !MAY_HAVE_MARK.test(text)) continue;
    const r = readAmount(text, 2, decimalComma);
    if (r.ok && r.currency) return r.currency;
  }
  return null;
}

/** The first supported currency the header or the rows from `start` name, or null. */
export function firstCurrencyNamed(records: readonly string[][], start: number, header: HeaderMatch<LaneField>, decimalComma: boolean): string | null {
  for (const field of MONEY) {
    const unit = header.columns.get(field)?.unit;
    if (unit && /^[a-z]{3}$/.test(unit) && currencyExponent(unit) !== undefined) return unit.toUpperCase();
  }
  const currencyColumn = header.columns.get('currency')?.index;
  const money = MONEY.flatMap((field) => header.columns.get(field)?.index ?? []);
  for (let i = start; i < records.length; i++) {
    const code = cellText(records[i], currencyColumn);
    if (code !== '') {
      const c = lookupCurrency(code);
      if ('code' in c) return c.code;
      continue;
    }
    const marked = currencyMarkIn(records[i], money, decimalComma);
    if (marked !== null) return marked;
  }
  return null;
}
