// Reads decimal numbers as people type them in spreadsheets: decimal point or comma, thousands
// grouped by point, comma, space or apostrophe, a leading sign or accounting parentheses. The result
// is digit text, never a float, so money can be made exact from it; ambiguous forms are refused.

export type DecimalText =
  | { ok: true; negative: boolean; whole: string; fraction: string }
  | { ok: false; code: 'not-a-number' | 'not-finite' | 'ambiguous-number'; reason: string };

export interface DecimalStyle {
  /** The file uses a decimal comma (semicolon-delimited files). */
  decimalComma: boolean;
  /** Thousands grouping is plausible (money, distances); not for coordinates. */
  allowGrouping: boolean;
}

const GROUPING_ONLY = new Set([' ', '\u00a0', '\u202f', "'"]);

function fail(code: 'not-a-number' | 'not-finite' | 'ambiguous-number', reason: string): DecimalText {
  return { ok: false, code, reason };
}

/** Splits a decimal text into sign, whole digits and fraction digits. */
export function readDecimalText(text: string, style: DecimalStyle): DecimalText {
  let body = text.trim();
  let negative = false;
  const parens = /^\((.*)\)$/.exec(body);
  if (parens) {
    negative = true;
    body = parens[1].trim();
  }
  const first = body.charAt(0);
  if (first === '-' || first === '+' || first === '\u2212') {
    if (parens) return fail('not-a-number', 'a sign inside accounting parentheses');
    negative = first !== '+';
    body = body.slice(1).trim();
  }
  if (/^(inf|infinity|nan|∞)$/i.test(body)) return fail('not-finite', 'not a finite number');
  if (/^\d*[.,]?\d*e[+-]?\d+$/i.test(body) && /\d/.test(body)) return fail('not-a-number', 'scientific notation is not accepted; write the number in full');
  if (!/^[0-9.,'\u00a0\u202f ]+$/.test(body) || !/\d/.test(body)) return fail('not-a-number', 'not a number');

  const groups: string[] = [];
  const seps: string[] = [];
  let current = '';
  for (const ch of body) {
    if (ch >= '0' && ch <= '9') current += ch;
    else {
      groups.push(current);
      seps.push(ch);
      current = '';
    }
  }
  groups.push(current);
  if (seps.length === 0) return { ok: true, negative, whole: body, fraction: '' };

  const marks = seps.filter((s) => s === '.' || s === ',');
  const kinds = new Set(marks);
  const spaced = seps.some((s) => GROUPING_ONLY.has(s));
  let decimalAt = -1; // index into seps of the decimal separator
  const last = seps.length - 1;
  if (kinds.size === 2) {
    if (seps[last] !== '.' && seps[last] !== ',') return fail('not-a-number', 'separators in an order that is not a number');
    decimalAt = last;
  } else if (kinds.size === 1) {
    const mark = marks[0];
    const count = marks.length;
    const markAt = seps.lastIndexOf(mark);
    const digitsAfter = groups[markAt + 1].length;
    if (count > 1) {
      decimalAt = -1; // repeated point or comma: thousands grouping
    } else if (spaced || !style.allowGrouping) {
      decimalAt = markAt;
    } else {
      const isDecimalMark = (mark === ',') === style.decimalComma;
      if (!isDecimalMark && digitsAfter === 3) {
        return fail('ambiguous-number', `"${text.trim()}" could mean ${groups.join('')} or ${groups[0]}.${groups[1]}; write it without a thousands separator or with all decimals`);
      }
      decimalAt = markAt;
    }
  }

  const wholeGroups = decimalAt === -1 ? groups : groups.slice(0, decimalAt + 1);
  const wholeSeps = decimalAt === -1 ? seps : seps.slice(0, decimalAt);
  const fraction = decimalAt === -1 ? '' : groups.slice(decimalAt + 1).join('');
  if (decimalAt !== -1 && decimalAt !== last) return fail('not-a-number', 'digits grouped after the decimal separator');
  if (wholeSeps.length > 0) {
    if (!style.allowGrouping) return fail('not-a-number', 'thousands separators are not accepted here');
    if (new Set(wholeSeps).size > 1) return fail('not-a-number', 'mixed thousands separators');
    const bad = wholeGroups[0].length < 1 || wholeGroups[0].length > 3 || wholeGroups.slice(1).some((g) => g.length !== 3);
    if (bad) return fail('not-a-number', 'thousands separators not in groups of three digits');
  }
  const whole = wholeGroups.join('');
  if (whole === '' && fraction === '') return fail('not-a-number', 'not a number');
  return { ok: true, negative, whole, fraction };
}

/** A plain (non-money) number from decimal text, or the failure. */
export function readNumber(text: string, style: DecimalStyle): { ok: true; value: number } | Extract<DecimalText, { ok: false }> {
  // Fast path for the plain form most files use. Not for "1.234" in a decimal-comma file where
  // grouping is allowed: that may mean 1234, and readDecimalText refuses it as ambiguous.
  const plain = style.decimalComma && style.allowGrouping ? /^-?\d+$/ : /^-?\d+(\.\d+)?$/;
  if (plain.test(text)) {
    // 400 digits read as Infinity: refused like "inf", never passed on.
    const value = Number(text);
    return Number.isFinite(value) ? { ok: true, value } : { ok: false, code: 'not-finite', reason: 'not a finite number' };
  }
  const parsed = readDecimalText(text, style);
  if (!parsed.ok) return parsed;
  const value = Number(`${parsed.negative ? '-' : ''}${parsed.whole || '0'}.${parsed.fraction || '0'}`);
  if (!Number.isFinite(value)) return { ok: false, code: 'not-finite', reason: 'not a finite number' };
  return { ok: true, value };
}
