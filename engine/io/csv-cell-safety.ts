// CSV injection (OWASP "CSV Injection"): a cell a spreadsheet would run as a formula is written with
// an apostrophe before it, and so is every part of a cell that a spreadsheet splitting on another
// separator (`;`, a tab, a quote, a line break) would see as a cell of its own. Leading spaces do not
// hide a formula (some spreadsheets trim them). Plain numbers such as -3.00 or +5 are data, not
// formulas, and stay as they are. The importer undoes exactly this (`withoutFormulaGuard`).

/** Characters a spreadsheet may treat as the end of a cell: the field separators and line breaks. */
const SEPARATOR = /[,;\t\r\n"]/;

/** What starts a formula at the start of a cell: OWASP's =, +, -, @, tab and carriage return. */
const FORMULA_START = /[=+\-@\t\r]/;
/** After a separator a tab or CR is itself a separator, so only these start a formula there. */
const FORMULA_START_INSIDE = /[=+\-@]/;

const PLAIN_NUMBER = /^[-+]?(?:\d+(?:\.\d*)?|\.\d+)$/;

function isSeparator(c: string | undefined): boolean {
  return c !== undefined && SEPARATOR.test(c);
}

/**
 * Whether the part of `text` starting at `start` (up to the next separator) could run as a formula
 * after spaces, or is an apostrophe before such a part (so a literal leading apostrophe survives the
 * round trip: it gets one more, and the importer removes one).
 */
function needsGuard(text: string, start: number, atCellStart: boolean): boolean {
  let i = start;
  // Spaces, and apostrophes already there (a loop, not recursion: a cell may hold thousands).
  while (i < text.length && (text[i] === ' ' || text[i] === '\u00a0' || text[i] === "'")) i++;
  if (i >= text.length) return false;
  if (!(atCellStart ? FORMULA_START : FORMULA_START_INSIDE).test(text[i])) return false;
  let end = i + 1;
  while (end < text.length && !isSeparator(text[end])) end++;
  return !PLAIN_NUMBER.test(text.slice(i, end).trim());
}

/**
 * The cell as it may be written to a CSV: an apostrophe before the start and after every separator
 * when what follows (after spaces) could run as a formula, unless that part is a plain number.
 */
export function guardFormulaCell(text: string): string {
  let out = needsGuard(text, 0, true) ? "'" : '';
  let from = 0;
  for (let i = 0; i < text.length - 1; i++) {
    if (isSeparator(text[i]) && needsGuard(text, i + 1, false)) {
      out += text.slice(from, i + 1) + "'";
      from = i + 1;
    }
  }
  return out + text.slice(from);
}

/** Whether the cell must be quoted: it holds a separator of any common CSV dialect, or edge spaces. */
export function needsCsvQuotes(text: string): boolean {
  return SEPARATOR.test(text) || /^\s|\s$/.test(text);
}

/** Undoes `guardFormulaCell` on a cell read back: removes each apostrophe it would have added. */
export function withoutFormulaGuard(text: string): string {
  if (!text.includes("'")) return text;
  let out = '';
  let from = 0;
  for (let i = 0; i < text.length; i++) {
    if (text[i] !== "'" || !(i === 0 || isSeparator(text[i - 1]))) continue;
    if (needsGuard(text, i + 1, i === 0)) {
      out += text.slice(from, i);
      from = i + 1;
    }
  }
  return out + text.slice(from);
}
