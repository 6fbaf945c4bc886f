// The CSV dialect of every export: field separator (comma or semicolon), decimal mark (point or
// comma) and a UTF-8 byte-order mark, so a file opens as columns in the user's spreadsheet (a
// spreadsheet set to a decimal-comma locale splits on semicolons and needs the BOM to read UTF-8).
// Exporters write RFC 4180 rows; this module alone turns them into the chosen dialect.

import { withoutFormulaGuard } from '../io/csv-cell-safety';
import { formatCsvRows, parseCsvText } from '../io/csv-papaparse';

export interface CsvDialect {
  separator: ',' | ';';
  decimalMark: '.' | ',';
  /** Start the file with U+FEFF. */
  bom: boolean;
}

/** RFC 4180: comma, decimal point, no BOM (the CLI's default and the format the importer documents). */
export const RFC4180_DIALECT: CsvDialect = { separator: ',', decimalMark: '.', bom: false };
/** What a spreadsheet in a decimal-comma locale reads as columns: semicolon, decimal comma, BOM. */
export const DECIMAL_COMMA_DIALECT: CsvDialect = { separator: ';', decimalMark: ',', bom: true };

/** The dialect a spreadsheet in `locale` (BCP 47, e.g. "de-DE") expects: by its decimal mark. */
export function dialectForLocale(locale: string): CsvDialect {
  let mark = '.';
  try {
    mark = new Intl.NumberFormat(locale).formatToParts(1.5).find((p) => p.type === 'decimal')?.value ?? '.';
  } catch {
    // An unknown locale tag: the RFC 4180 default.
  }
  return mark === ',' ? { ...DECIMAL_COMMA_DIALECT } : { ...RFC4180_DIALECT };
}

/**
 * Reads a dialect named on the command line: "comma" (RFC 4180), "semicolon" (semicolon, decimal
 * comma, BOM), or three parts "SEPARATOR,DECIMAL,BOM" such as "semicolon,comma,bom" or
 * "comma,point,no-bom". Null when the text is none of these.
 */
export function parseCsvDialect(text: string): CsvDialect | null {
  const t = text.trim().toLowerCase();
  if (t === 'comma' || t === 'rfc4180') return { ...RFC4180_DIALECT };
  if (t === 'semicolon') return { ...DECIMAL_COMMA_DIALECT };
  const parts = t.split(',').map((p) => p.trim());
  if (parts.length !== 3) return null;
  const separator = parts[0] === 'comma' ? ',' : parts[0] === 'semicolon' ? ';' : null;
  const decimalMark = parts[1] === 'point' ? '.' : parts[1] === 'comma' ? ',' : null;
  const bom = parts[2] === 'bom' ? true : parts[2] === 'no-bom' ? false : null;
  if (separator === null || decimalMark === null || bom === null) return null;
  return { separator, decimalMark, bom };
}

/** The dialect in words, as export settings and the UI state it. */
export function csvDialectText(d: CsvDialect): string {
  return `${d.separator === ';' ? 'semicolon' : 'comma'}-separated, decimal ${d.decimalMark === ',' ? 'comma' : 'point'}, ${d.bom ? 'with' : 'no'} byte-order mark`;
}

// Columns of text that may look like numbers (a ref "2.1" stays "2.1").
const TEXT_COLUMNS = new Set(['id', 'name', 'from', 'to', 'ref', 'refs', 'notes', 'clause', 'path', 'depot', 'load', 'vehicle', 'lanes']);
const PLAIN_NUMBER = /^[-+]?\d+(\.\d+)?$/;

/** Indices of columns whose every non-blank data cell is a plain decimal number. */
function numericColumns(rows: readonly (readonly (string | number | null)[])[]): Set<number> {
  const header = rows[0] ?? [];
  const out = new Set<number>();
  for (let c = 0; c < header.length; c++) {
    if (TEXT_COLUMNS.has(String(header[c]).trim().toLowerCase())) continue;
    let numbers = 0;
    let other = false;
    for (let r = 1; r < rows.length && !other; r++) {
      const v = rows[r][c];
      if (v === null || v === undefined || v === '') continue;
      if (typeof v === 'number' ? Number.isFinite(v) : PLAIN_NUMBER.test(v)) numbers++;
      else other = true;
    }
    if (!other && numbers > 0) out.add(c);
  }
  return out;
}

/** Writes rows (header first) in `dialect`; formula-like text is neutralised as in RFC 4180 output. */
export function formatCsvDialect(rows: readonly (readonly (string | number | null)[])[], dialect: CsvDialect): string {
  let out = rows;
  if (dialect.decimalMark === ',') {
    const numeric = numericColumns(rows);
    out = rows.map((row, r) => (r === 0 ? row : row.map((v, c) => (numeric.has(c) && v !== null && v !== '' ? String(v).replace('.', ',') : v))));
  }
  const text = formatCsvRows(out, { delimiter: dialect.separator });
  return dialect.bom ? `\uFEFF${text}` : text;
}

/** Re-writes an exporter's RFC 4180 text in `dialect` (unchanged for the RFC 4180 dialect). */
export function applyCsvDialect(text: string, dialect: CsvDialect): string {
  if (dialect.separator === ',' && dialect.decimalMark === '.' && !dialect.bom) return text;
  // The exporter's cells are already guarded against formulas; take the guard off before writing them
  // again, or a cell would leave with two apostrophes and come back with one.
  return formatCsvDialect(parseCsvText(text).rows.map((row) => row.map(withoutFormulaGuard)), dialect);
}
