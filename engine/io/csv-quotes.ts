// Where quoted fields begin and end, by RFC 4180 with its usual leniency: a quote opens a quoted
// field only at the start of a field (after a separator, a line break or at the start of the text);
// anywhere else in an unquoted field it is a literal character (an inch mark: `max 48" trailer`).
// Inside a quoted field `""` is an escaped quote and a lone quote closes it. papaparse reads
// records the same way; the record stream and the block splitter use this to find where records
// end, so one stray quote can no longer swallow the rest of a file (or two of them hide it).

const QUOTE = 34;
const LF = 10;
const CR = 13;

/** Separators that may precede an opening quote: the file's, or all three while it is not known. */
export type FieldSeparators = string;

function opensField(s: string, i: number, separators: FieldSeparators): boolean {
  if (i === 0) return true;
  const c = s.charCodeAt(i - 1);
  return c === LF || c === CR || separators.includes(s[i - 1]);
}

export interface QuoteScan {
  /** First offset not scanned: `to`, or the offset of a closing-or-escaped quote that needs the next character. */
  stop: number;
  inQuotes: boolean;
  /** Offset of the last `lineBreak` outside quotes in [from, stop), or -1. */
  lastBreak: number;
}

/**
 * Scans s[from, to) from the quote state `inQuotes`. Linear: each quote and each stretch between
 * quotes is looked at once (indexOf). When `final` is false and a quote inside a quoted field is the
 * last character available, scanning stops before it: the next character decides whether it closes
 * the field or is the first of `""`.
 */
export function scanQuotes(s: string, from: number, to: number, inQuotes: boolean, separators: FieldSeparators, lineBreak: number, final: boolean): QuoteScan {
  const breakChar = String.fromCharCode(lineBreak);
  let i = from;
  let q = inQuotes;
  let lastBreak = -1;
  while (i < to) {
    if (q) {
      const quote = s.indexOf('"', i);
      if (quote === -1 || quote >= to) {
        i = to;
        break;
      }
      if (quote + 1 >= to && !final) {
        i = quote;
        break;
      }
      if (s.charCodeAt(quote + 1) === QUOTE) {
        i = quote + 2;
        continue;
      }
      q = false;
      i = quote + 1;
      continue;
    }
    let quote = s.indexOf('"', i);
    while (quote !== -1 && quote < to && !opensField(s, quote, separators)) quote = s.indexOf('"', quote + 1);
    const end = quote === -1 || quote >= to ? to : quote;
    if (end > i) {
      const nl = s.lastIndexOf(breakChar, end - 1);
      if (nl >= i) lastBreak = nl;
    }
    if (end === to) {
      i = to;
      break;
    }
    q = true;
    i = quote + 1;
  }
  return { stop: i, inQuotes: q, lastBreak };
}

/**
 * Quotes that are literal characters inside unquoted fields, by record and field (0-based), in
 * s[from, to), which must start at the start of a record. For the report: RFC 4180 does not allow
 * them, so the row and column are named in a warning, and the value is read with the quote in it.
 */
export function strayQuotes(s: string, from: number, to: number, separator: string, lineBreak: number): { record: number; field: number }[] {
  const found: { record: number; field: number }[] = [];
  let record = 0;
  let field = 0;
  let q = false;
  let fieldStart = true;
  // A quote after a quoted field's closing quote is malformed quoting (papaparse flags that row), not a stray.
  let quotedField = false;
  const sep = separator.charCodeAt(0);
  for (let i = from; i < to; i++) {
    const c = s.charCodeAt(i);
    if (q) {
      if (c === QUOTE) {
        if (s.charCodeAt(i + 1) === QUOTE && i + 1 < to) i++;
        else q = false;
      }
      continue;
    }
    if (c === QUOTE) {
      if (fieldStart) q = quotedField = true;
      else if (!quotedField && (found.length === 0 || found[found.length - 1].record !== record || found[found.length - 1].field !== field)) found.push({ record, field });
      fieldStart = false;
    } else if (c === sep) {
      field++;
      fieldStart = true;
      quotedField = false;
    } else if (c === lineBreak) {
      record++;
      field = 0;
      fieldStart = true;
      quotedField = false;
    } else if (!(c === CR && lineBreak === LF)) fieldStart = false;
  }
  return found;
}
