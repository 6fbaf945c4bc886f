// What a windowed table body renders, in order: spacer heights and ranges of rows. A kept row (the
// one holding focus, e.g. an amount being typed in the lane table) stays rendered in its place when
// the window scrolls away from it, so a half-typed cell is never unmounted with its text.

/** A spacer row of `spacer` pixels, or the rows [from, to). */
export type WindowPart = { spacer: number } | { from: number; to: number };

/**
 * Parts for `count` rows of `rowPx` pixels with rows [start, end) in the window and `keep` (or null)
 * kept. Spacers of zero height are left out; the heights and rows always add up to the whole table.
 */
export function windowParts(count: number, start: number, end: number, rowPx: number, keep: number | null): WindowPart[] {
  const parts: WindowPart[] = [];
  const spacer = (rows: number) => rows > 0 && parts.push({ spacer: rows * rowPx });
  const range = (from: number, to: number) => to > from && parts.push({ from, to });
  const k = keep !== null && keep >= 0 && keep < count && (keep < start || keep >= end) ? keep : null;
  if (k !== null && k < start) {
    spacer(k);
    range(k, k + 1);
    spacer(start - k - 1);
    range(start, end);
    spacer(count - end);
  } else if (k !== null) {
    spacer(start);
    range(start, end);
    spacer(k - end);
    range(k, k + 1);
    spacer(count - k - 1);
  } else {
    spacer(start);
    range(start, end);
    spacer(count - end);
  }
  return parts;
}
