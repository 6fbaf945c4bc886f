// Money cells as spreadsheets write them. Expected values are worked out by hand from the text
// (common practice, no source: European "1.234,56" and Anglo "1,234.56" grouping, ISO 4217 codes).

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readAmount } from '../../../engine/import/amount-text';

const ok = (text: string, decimalComma = false, exponent = 2) => {
  const r = readAmount(text, exponent, decimalComma);
  if (!r.ok) throw new Error(`${text}: ${r.reason}`);
  return [r.minor, r.currency];
};
const code = (text: string, decimalComma = false) => {
  const r = readAmount(text, 2, decimalComma);
  return r.ok ? 'ok' : r.code;
};

describe('readAmount', () => {
  it('reads plain, decimal-comma, grouped and marked amounts exactly', () => {
    expect(ok('12.50')).toEqual([1250, null]);
    expect(ok('-0.05')).toEqual([-5, null]);
    expect(ok('12,50', true)).toEqual([1250, null]);
    expect(ok('1.234,56', true)).toEqual([123456, null]);
    expect(ok('1,234.56')).toEqual([123456, null]);
    expect(ok('1 234,56 €', true)).toEqual([123456, 'EUR']);
    expect(ok("CHF 1'234.50")).toEqual([123450, 'CHF']);
    expect(ok('EUR -12.50')).toEqual([-1250, 'EUR']);
    expect(ok('-€12.50')).toEqual([-1250, 'EUR']);
    expect(ok('(3.00)')).toEqual([-300, null]);
    expect(ok('£7')).toEqual([700, 'GBP']);
    expect(ok('12.50 usd')).toEqual([1250, 'USD']);
    expect(ok('1.234.567', true)).toEqual([123456700, null]);
    // 0.10 + 0.20 - 0.30 is exactly zero in minor units.
    expect(ok('0.10')[0] as number + (ok('0.20')[0] as number) - (ok('0.30')[0] as number)).toBe(0);
  });

  it('refuses what it cannot read without guessing', () => {
    expect(code('abc')).toBe('not-a-number');
    expect(code('Infinity')).toBe('not-finite');
    expect(code('-inf')).toBe('not-finite');
    expect(code('NaN')).toBe('not-finite');
    expect(code('1e5')).toBe('not-a-number');
    expect(code('1,234')).toBe('ambiguous-number');
    expect(code('1.234', true)).toBe('ambiguous-number');
    expect(code('12.345')).toBe('bad-amount'); // more decimals than EUR has; never rounded
    expect(code('12 kr')).toBe('ambiguous-number'); // SEK, DKK, NOK or ISK
    expect(code('12 XYZ')).toBe('unknown-currency');
    expect(code('1,23,456')).toBe('not-a-number');
    expect(code('€12 $')).toBe('bad-amount');
  });

  it('any amount formatted plainly or with a decimal comma reads back unchanged', () => {
    fc.assert(
      fc.property(fc.integer({ min: -9e15, max: 9e15 }), (m) => {
        const text = (m < 0 ? '-' : '') + String(Math.abs(m)).padStart(3, '0').replace(/(\d{2})$/, '.$1');
        expect(ok(text)[0]).toBe(m);
        expect(ok(text.replace('.', ','), true)[0]).toBe(m);
      }),
    );
  });
});
