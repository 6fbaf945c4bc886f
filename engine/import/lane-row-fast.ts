// The lanes reader's fast path for plain rows: a line of printable ASCII with no quotes, every cell
// already trimmed, amounts as plain non-negative decimals, ISO dates, whole-minute drive times and
// known depots is read straight from the file's UTF-8 bytes in one pass, each cell parsed as it is
// cut, with no cell strings (only ref, notes, clause and unknown columns become strings, because
// they are kept). Text input is copied into bytes line by line, so there is one reader. Anything
// else, including every row with a problem to report, is refused and goes through the general
// reader, which owns the messages: the fast path may only ever accept what the general path would
// accept, with the same values (test/engine/import/lane-row-fast.test.ts checks both on random rows).

import { isoDateNumber } from '../text/iso-date';
import { withoutFormulaGuard } from '../io/csv-cell-safety';
import { byteDelimiter } from '../io/csv-byte-stream';
import { asciiText } from '../text/utf8';
import { FNV_OFFSET, FNV_PRIME, type DepotIdIndex } from './depot-id-index';
import type { HeaderMatch, LaneField } from './headers';
import { APOSTROPHE_BYTE, byteClasses, CELL_BYTE } from './plain-cells';
import { isMilesUnit, KM_PER_MILE, MAX_LANE_KM, MAX_LANE_MINUTES } from './lane-cells';
import type { LaneTableBuilder } from './lane-table';

/** Columns the fast path reads itself; a file with any other matched column uses the general path. */
const FAST_FIELDS = new Set<LaneField>(['from', 'to', 'ref', 'clause', 'distance', 'drive', 'toll', 'fuel', 'fees', 'rebate', 'valid_from', 'valid_to', 'notes']);

const REFUSED = -1;
const POW10 = [1, 10, 100, 1000, 10000, 100000, 1000000];

// How a column's cell is read: kept or looked up as text (bounds only), or parsed as it is cut.
const TEXT = 0;
const AMOUNT = 1;
const DISTANCE = 2;
const DRIVE = 3;
const DATE = 4;
const DEPOT = 5;

export interface FastLaneSetup {
  header: HeaderMatch<LaneField>;
  columnCount: number;
  exponent: number;
  decimalComma: boolean;
  /** Drive-time unit from the header ('h' = hours; the fast path reads minutes only). */
  driveUnit: string | null;
  depots: DepotIdIndex;
  table: LaneTableBuilder;
}

export class PlainLaneRows {
  private readonly starts: Int32Array;
  private readonly ends: Int32Array;
  /** Per column: its kind (TEXT, AMOUNT, ...). */
  private readonly kinds: Uint8Array;
  /** Per column: the value a parsed cell read (NaN or 0 for an empty one, as the general reader). */
  private readonly values: Float64Array;
  /** Per text column: 1 when the cell holds an apostrophe (the exporter's formula guard may be there). */
  private readonly apostrophes: Uint8Array;
  /** Per depot column: the FNV-1a hash of its cell, taken while cutting (depot-id-index.ts). */
  private readonly hashes: Int32Array;
  private readonly col: Partial<Record<LaneField, number>> = {};
  private readonly classColumns: number[];
  private readonly unknownColumns: number[];
  private readonly decimalCode: number;
  private readonly miles: boolean;
  private readonly hours: boolean;
  private readonly exponent: number;
  /** A text line copied as bytes (the text path). */
  private scratch = new Uint8Array(256);
  private classes = byteClasses(44);
  private classesOf = 44;

  private constructor(private readonly setup: FastLaneSetup) {
    const n = setup.columnCount;
    this.starts = new Int32Array(n);
    this.ends = new Int32Array(n);
    this.kinds = new Uint8Array(n);
    this.values = new Float64Array(n);
    this.apostrophes = new Uint8Array(n);
    this.hashes = new Int32Array(n);
    for (const [field, column] of setup.header.columns) this.col[field] = column.index;
    this.classColumns = setup.header.classTolls.map((c) => c.index);
    this.unknownColumns = setup.header.unknown.map((u) => u.index);
    this.decimalCode = setup.decimalComma ? 44 : 46;
    this.miles = isMilesUnit(setup.header.columns.get('distance')?.unit ?? null);
    this.hours = setup.driveUnit === 'h';
    this.exponent = setup.exponent;
    const kindOf: [LaneField, number][] = [['toll', AMOUNT], ['fuel', AMOUNT], ['fees', AMOUNT], ['rebate', AMOUNT], ['distance', DISTANCE], ['drive', DRIVE], ['valid_from', DATE], ['valid_to', DATE]];
    for (const [field, kind] of kindOf) if (this.col[field] !== undefined) this.kinds[this.col[field]] = kind;
    for (const c of this.classColumns) this.kinds[c] = AMOUNT;
    this.kinds[this.col.from!] = DEPOT;
    this.kinds[this.col.to!] = DEPOT;
  }

  /** The fast path for this file, or null when its columns need the general reader throughout. */
  static forFile(setup: FastLaneSetup): PlainLaneRows | null {
    const h = setup.header;
    if (h.duplicates.length > 0 || setup.table.limits || setup.table.vehicleClass || !h.columns.has('from') || !h.columns.has('to')) return null;
    for (const field of h.columns.keys()) if (!FAST_FIELDS.has(field)) return null;
    return new PlainLaneRows(setup);
  }

  /**
   * Reads the text line `text[start, end)` (no line break) into the lane table and returns true, or
   * returns false without touching anything when the row is not plain. The line is copied into
   * bytes and read by `readBytes`.
   */
  read(text: string, start: number, end: number, row: number, delimiter: string): boolean {
    const d = byteDelimiter(delimiter);
    if (d === -1) return false;
    const n = end - start;
    if (this.scratch.length <= n) this.scratch = new Uint8Array(2 * n + 1);
    const bytes = this.scratch;
    for (let k = 0; k < n; k++) {
      const c = text.charCodeAt(start + k);
      // Non-ASCII and line breaks (a CR-only file keeps LFs in its lines) go the general way.
      if (c > 126 || c === 10 || c === 13) return false;
      bytes[k] = c;
    }
    bytes[n] = 10;
    return this.readBytes(bytes, 0, n + 1, row, d) !== REFUSED;
  }

  /**
   * Reads a row already cut into cells (by the text stream) as the line they make joined by
   * `delimiter` (a comma or, in decimal-comma files, a semicolon); false when a cell holds the
   * delimiter, a line break or anything not ASCII, or the row is not plain.
   */
  readCells(cells: readonly string[], row: number, delimiter: number): boolean {
    let n = cells.length;
    for (const cell of cells) n += cell.length;
    if (this.scratch.length <= n) this.scratch = new Uint8Array(2 * n + 1);
    const bytes = this.scratch;
    let at = 0;
    for (let k = 0; k < cells.length; k++) {
      if (k > 0) bytes[at++] = delimiter;
      const cell = cells[k];
      for (let j = 0; j < cell.length; j++) {
        const c = cell.charCodeAt(j);
        if (c > 126 || c === delimiter || c === 10 || c === 13) return false;
        bytes[at++] = c;
      }
    }
    bytes[at++] = 10;
    return this.readBytes(bytes, 0, at, row, delimiter) !== REFUSED;
  }

  /**
   * Reads the line of UTF-8 bytes from `start` (ended by LF or CRLF; bytes[limit - 1] is an LF) into the lane
   * table and returns the offset of its LF, or returns -1 without touching anything when the row is
   * not plain. `delimiter` is a `byteDelimiter` code.
   */
  readBytes(bytes: Uint8Array, start: number, limit: number, row: number, delimiter: number): number {
    const lf = this.cut(bytes, start, limit, delimiter);
    if (lf === REFUSED) return REFUSED;
    const starts = this.starts;
    const ends = this.ends;
    const values = this.values;
    const col = this.col;
    const depots = this.setup.depots;
    const from = depots.findHashed(this.hashes[col.from!], bytes, starts[col.from!], ends[col.from!]);
    const to = depots.findHashed(this.hashes[col.to!], bytes, starts[col.to!], ends[col.to!]);
    if (from === -1 || to === -1 || from === to) return REFUSED;
    const toll = col.toll === undefined ? NaN : values[col.toll];
    const fuel = col.fuel === undefined ? NaN : values[col.fuel];
    const fees = col.fees === undefined ? NaN : values[col.fees];
    const rebate = col.rebate === undefined ? NaN : values[col.rebate];
    const validFrom = col.valid_from === undefined ? 0 : values[col.valid_from];
    const validTo = col.valid_to === undefined ? 0 : values[col.valid_to];
    if (validFrom > 0 && validTo > 0 && validFrom > validTo) return REFUSED;

    const t = this.setup.table;
    const i = t.add();
    t.from[i] = from;
    t.to[i] = to;
    t.sourceRow[i] = row;
    t.toll[i] = toll;
    const classTolls = this.classColumns;
    for (let k = 0; k < classTolls.length; k++) t.classTolls[k].toll[i] = values[classTolls[k]];
    t.fuel[i] = fuel;
    t.fees[i] = Number.isNaN(fees) ? 0 : fees;
    t.rebate[i] = Number.isNaN(rebate) ? 0 : rebate;
    t.distanceKm[i] = col.distance === undefined ? NaN : values[col.distance];
    t.driveMinutes[i] = col.drive === undefined ? NaN : values[col.drive];
    t.validFrom[i] = validFrom;
    t.validTo[i] = validTo;
    if (col.ref !== undefined) {
      // A plain ref stays bytes until the table's refs are read; one with an apostrophe (a formula
      // guard to take off) is made now.
      const r = col.ref;
      if (this.starts[r] === this.ends[r] || this.apostrophes[r] === 1) t.setRef(i, this.kept(bytes, r));
      else t.addRefBytes(i, bytes, this.starts[r], this.ends[r]);
    }
    if (col.notes !== undefined) t.notes.push(this.kept(bytes, col.notes));
    if (t.clause) t.clause.push(this.kept(bytes, col.clause));
    for (let k = 0; k < this.unknownColumns.length; k++) t.extra[k].values.push(this.kept(bytes, this.unknownColumns[k]));
    return lf;
  }

  // One pass over the line: each cell is cut and, by its column's kind, parsed into `values` or
  // bounded in `starts`/`ends` (text cells: printable ASCII, no quote, nothing to trim, no leading
  // apostrophe). Every byte is looked at once; any other byte ends a parsed cell, and a cell must end
  // at the delimiter (the last at LF or CRLF), so a quote, a control or non-ASCII byte, a stray space
  // or a wrong number of cells refuses the line. bytes[limit - 1] is an LF (every reader's contract),
  // which ends every cell, so the loops need no bound of their own. Returns the offset of the LF, or REFUSED.
  private cut(bytes: Uint8Array, start: number, limit: number, delimiter: number): number {
    const kinds = this.kinds;
    const values = this.values;
    const starts = this.starts;
    const ends = this.ends;
    if (delimiter !== this.classesOf) {
      this.classes = byteClasses(delimiter);
      this.classesOf = delimiter;
    }
    const classes = this.classes;
    const apostrophes = this.apostrophes;
    const markDigit = this.decimalCode - 48;
    const exponent = this.exponent;
    const last = kinds.length - 1;
    let i = start;
    for (let k = 0; ; k++) {
      const s = i;
      switch (kinds[k]) {
        case TEXT: {
          let apostrophe = 0;
          for (;;) {
            const kind = classes[bytes[i]];
            if (kind === CELL_BYTE) i++;
            else if (kind === APOSTROPHE_BYTE) {
              apostrophe = 1;
              i++;
            } else break;
          }
          if (i > s) {
            const first = bytes[s];
            if (first === 32 || first === 39 || bytes[i - 1] === 32) return REFUSED;
          }
          starts[k] = s;
          ends[k] = i;
          apostrophes[k] = apostrophe;
          break;
        }
        case DEPOT: {
          let hash = FNV_OFFSET;
          for (;;) {
            const c = bytes[i];
            const kind = classes[c];
            if (kind !== CELL_BYTE && kind !== APOSTROPHE_BYTE) break;
            hash = Math.imul(hash ^ c, FNV_PRIME);
            i++;
          }
          if (i > s) {
            const first = bytes[s];
            if (first === 32 || first === 39 || bytes[i - 1] === 32) return REFUSED;
          }
          starts[k] = s;
          ends[k] = i;
          this.hashes[k] = hash;
          break;
        }
        case AMOUNT:
        case DISTANCE: {
          // Digits with at most one decimal mark after the first digit; the counts come from positions.
          let value = 0;
          let mark = -1;
          for (;;) {
            const d = bytes[i] - 48;
            if (d >>> 0 <= 9) value = value * 10 + d;
            else if (d === markDigit && mark === -1 && i > s) mark = i;
            else break;
            i++;
          }
          const fraction = mark === -1 ? 0 : i - mark - 1;
          if (i === s) values[k] = NaN;
          else if (mark !== -1 && fraction === 0) return REFUSED;
          else if (kinds[k] === AMOUNT) {
            if (fraction > exponent) return REFUSED;
            const scale = exponent - fraction;
            // Fifteen digits in minor units stay exact and far inside the safe range; longer goes the general way.
            if (i - s - (mark === -1 ? 0 : 1) + scale > 15) return REFUSED;
            values[k] = value * POW10[scale];
          } else {
            if ((mark === -1 ? i : mark) - s > 5 || fraction > 6) return REFUSED;
            // An exact integer divided by an exact power of ten is the correctly rounded decimal: Number()'s value.
            const read = fraction > 0 ? value / POW10[fraction] : value;
            const km = this.miles ? read * KM_PER_MILE : read;
            // Past the plausible bound the general reader refuses it with its reason.
            if (km > MAX_LANE_KM) return REFUSED;
            values[k] = km;
          }
          break;
        }
        case DRIVE: {
          // Whole minutes within the plausible bound; hours per the header go the general way.
          let value = 0;
          for (;;) {
            const d = bytes[i] - 48;
            if (d >>> 0 > 9) break;
            value = value * 10 + d;
            i++;
          }
          if (i === s) values[k] = NaN;
          else {
            if (this.hours || i - s > 6 || value > MAX_LANE_MINUTES) return REFUSED;
            values[k] = value;
          }
          break;
        }
        default: {
          // DATE: yyyymmdd of an ISO 8601 date, 0 for an empty cell.
          const d0 = bytes[i] - 48;
          if (d0 < 0 || d0 > 9) {
            values[k] = 0;
            break;
          }
          if (i + 10 >= limit || bytes[i + 4] !== 45 || bytes[i + 7] !== 45) return REFUSED;
          const year = digitsAt(bytes, i, i + 4);
          const month = digitsAt(bytes, i + 5, i + 7);
          const day = digitsAt(bytes, i + 8, i + 10);
          if (year < 0 || month < 0 || day < 0) return REFUSED;
          const date = isoDateNumber(year, month, day);
          if (date === null) return REFUSED;
          values[k] = date;
          i += 10;
        }
      }
      if (i >= limit) return REFUSED;
      const c = bytes[i];
      if (k < last) {
        if (c !== delimiter) return REFUSED;
        i++;
        continue;
      }
      if (c === 10) return i;
      return c === 13 && i + 1 < limit && bytes[i + 1] === 10 ? i + 1 : REFUSED;
    }
  }

  private kept(bytes: Uint8Array, column: number | undefined): string | undefined {
    if (column === undefined || this.starts[column] === this.ends[column]) return undefined;
    const text = asciiText(bytes, this.starts[column], this.ends[column]);
    // The exporter's formula guard may also sit after a separator inside the cell ("a;'=b"): removed as cellText does.
    return this.apostrophes[column] === 1 ? withoutFormulaGuard(text) : text;
  }
}

// The whole number written by the digits bytes[from, to), or -1 when any is not a digit.
function digitsAt(bytes: Uint8Array, from: number, to: number): number {
  let v = 0;
  for (let i = from; i < to; i++) {
    const c = bytes[i] - 48;
    if (c < 0 || c > 9) return -1;
    v = v * 10 + c;
  }
  return v;
}
