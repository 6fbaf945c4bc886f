// The lanes reader's fast path for plain rows: a line with no quotes, every cell already trimmed,
// amounts as plain non-negative decimals, ISO dates, whole-minute drive times and known depots is
// read straight from the file's text by character codes, with no cell strings (only ref, notes and
// unknown columns become strings, because they are kept). Anything else, including every row with a
// problem to report, returns false and goes through the general reader, which owns the messages:
// the fast path may only ever accept what the general path would accept, with the same values
// (test/engine/import/lane-row-fast.test.ts checks both on random rows).

import { isoDateNumber } from '../text/iso-date';
import { withoutFormulaGuard } from '../io/csv-cell-safety';
import { ownText } from './cells';
import type { DepotIdIndex } from './depot-id-index';
import type { HeaderMatch, LaneField } from './headers';
import { cutCells } from './plain-cells';
import { isMilesUnit, KM_PER_MILE, MAX_LANE_KM, MAX_LANE_MINUTES } from './lane-cells';
import type { LaneTableBuilder } from './lane-table';

/** Columns the fast path reads itself; a file with any other matched column uses the general path. */
const FAST_FIELDS = new Set<LaneField>(['from', 'to', 'ref', 'clause', 'distance', 'drive', 'toll', 'fuel', 'fees', 'rebate', 'valid_from', 'valid_to', 'notes']);

const SLOW = -1;
const POW10 = [1, 10, 100, 1000, 10000, 100000, 1000000];

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
  private readonly col: Partial<Record<LaneField, number>> = {};
  private readonly classColumns: number[];
  private readonly unknownColumns: number[];
  private readonly decimalCode: number;
  private readonly miles: boolean;

  private constructor(private readonly setup: FastLaneSetup) {
    this.starts = new Int32Array(setup.columnCount);
    this.ends = new Int32Array(setup.columnCount);
    for (const [field, column] of setup.header.columns) this.col[field] = column.index;
    this.classColumns = setup.header.classTolls.map((c) => c.index);
    this.unknownColumns = setup.header.unknown.map((u) => u.index);
    this.decimalCode = setup.decimalComma ? 44 : 46;
    this.miles = isMilesUnit(setup.header.columns.get('distance')?.unit ?? null);
  }

  /** The fast path for this file, or null when its columns need the general reader throughout. */
  static forFile(setup: FastLaneSetup): PlainLaneRows | null {
    const h = setup.header;
    if (h.duplicates.length > 0 || setup.table.limits || setup.table.vehicleClass) return null;
    for (const field of h.columns.keys()) if (!FAST_FIELDS.has(field)) return null;
    return new PlainLaneRows(setup);
  }

  /**
   * Reads the row `text[start, end)` into the lane table and returns true, or returns false without
   * touching anything when the row is not plain.
   */
  read(text: string, start: number, end: number, row: number, delimiter: string): boolean {
    const starts = this.starts;
    const ends = this.ends;
    if (!cutCells(text, start, end, delimiter.charCodeAt(0), starts, ends)) return false;

    const col = this.col;
    const depots = this.setup.depots;
    const from = depots.find(text, starts[col.from!], ends[col.from!]);
    const to = depots.find(text, starts[col.to!], ends[col.to!]);
    if (from === -1 || to === -1 || from === to) return false;
    const toll = this.amount(text, col.toll);
    const fuel = this.amount(text, col.fuel);
    const fees = this.amount(text, col.fees);
    const rebate = this.amount(text, col.rebate);
    if (toll === SLOW || fuel === SLOW || fees === SLOW || rebate === SLOW) return false;
    const classTolls = this.classColumns;
    for (let k = 0; k < classTolls.length; k++) if (this.amount(text, classTolls[k]) === SLOW) return false;
    const distanceKm = this.distance(text, col.distance);
    const driveMinutes = this.drive(text, col.drive);
    const validFrom = this.date(text, col.valid_from);
    const validTo = this.date(text, col.valid_to);
    if (distanceKm === SLOW || driveMinutes === SLOW || validFrom === SLOW || validTo === SLOW) return false;
    if (validFrom > 0 && validTo > 0 && validFrom > validTo) return false;

    const t = this.setup.table;
    const i = t.add();
    t.from[i] = from;
    t.to[i] = to;
    t.sourceRow[i] = row;
    t.toll[i] = toll;
    for (let k = 0; k < classTolls.length; k++) t.classTolls[k].toll[i] = this.amount(text, classTolls[k]);
    t.fuel[i] = fuel;
    t.fees[i] = Number.isNaN(fees) ? 0 : fees;
    t.rebate[i] = Number.isNaN(rebate) ? 0 : rebate;
    t.distanceKm[i] = distanceKm;
    t.driveMinutes[i] = driveMinutes;
    t.validFrom[i] = validFrom;
    t.validTo[i] = validTo;
    if (col.ref !== undefined) t.ref.push(this.kept(text, col.ref));
    if (col.notes !== undefined) t.notes.push(this.kept(text, col.notes));
    if (t.clause) t.clause.push(this.kept(text, col.clause));
    for (let k = 0; k < this.unknownColumns.length; k++) t.extra[k].values.push(this.kept(text, this.unknownColumns[k]));
    return true;
  }


  private kept(text: string, column: number | undefined): string | undefined {
    if (column === undefined || this.starts[column] === this.ends[column]) return undefined;
    // The exporter's formula guard may also sit after a separator inside the cell ("a;'=b"): removed as cellText does.
    return ownText(withoutFormulaGuard(text.slice(this.starts[column], this.ends[column])));
  }

  // Minor units of a plain non-negative amount ("1234", "12.5", "12.50"; decimal comma in semicolon
  // files), NaN for an empty cell, SLOW for anything else.
  private amount(text: string, column: number | undefined): number {
    if (column === undefined) return NaN;
    const s = this.starts[column];
    const e = this.ends[column];
    if (s === e) return NaN;
    const exponent = this.setup.exponent;
    let value = 0;
    let digits = 0;
    let fraction = -1;
    for (let i = s; i < e; i++) {
      const c = text.charCodeAt(i);
      if (c >= 48 && c <= 57) {
        value = value * 10 + (c - 48);
        digits++;
        if (fraction >= 0) fraction++;
      } else if (c === this.decimalCode && fraction === -1 && digits > 0) fraction = 0;
      else return SLOW;
    }
    if (digits === 0 || fraction === 0 || fraction > exponent) return SLOW;
    const scale = exponent - Math.max(fraction, 0);
    // Fifteen digits in minor units stay exact and far inside the safe range; longer goes the general way.
    if (digits + scale > 15) return SLOW;
    return value * POW10[scale];
  }

  // km of a plain decimal distance within the plausible bound (miles converted as the general reader does).
  private distance(text: string, column: number | undefined): number {
    if (column === undefined) return NaN;
    const s = this.starts[column];
    const e = this.ends[column];
    if (s === e) return NaN;
    let value = 0;
    let whole = 0;
    let fraction = -1;
    for (let i = s; i < e; i++) {
      const c = text.charCodeAt(i);
      if (c >= 48 && c <= 57) {
        value = value * 10 + (c - 48);
        if (fraction >= 0) fraction++;
        else whole++;
      } else if (c === this.decimalCode && fraction === -1 && whole > 0) fraction = 0;
      else return SLOW;
    }
    if (whole === 0 || whole > 5 || fraction === 0 || fraction > 6) return SLOW;
    // An exact integer divided by an exact power of ten is the correctly rounded decimal: Number()'s value.
    const read = fraction > 0 ? value / POW10[fraction] : value;
    const km = this.miles ? read * KM_PER_MILE : read;
    // Past the plausible bound the general reader refuses it with its reason.
    return km > MAX_LANE_KM ? SLOW : km;
  }

  // Whole minutes within the plausible bound; hours per the header go the general way.
  private drive(text: string, column: number | undefined): number {
    if (column === undefined) return NaN;
    const s = this.starts[column];
    const e = this.ends[column];
    if (s === e) return NaN;
    if (this.setup.driveUnit === 'h' || e - s > 6) return SLOW;
    let value = 0;
    for (let i = s; i < e; i++) {
      const c = text.charCodeAt(i) - 48;
      if (c < 0 || c > 9) return SLOW;
      value = value * 10 + c;
    }
    return value > MAX_LANE_MINUTES ? SLOW : value;
  }

  // yyyymmdd of an ISO 8601 date, 0 for an empty cell.
  private date(text: string, column: number | undefined): number {
    if (column === undefined) return 0;
    const s = this.starts[column];
    const e = this.ends[column];
    if (s === e) return 0;
    if (e - s !== 10 || text.charCodeAt(s + 4) !== 45 || text.charCodeAt(s + 7) !== 45) return SLOW;
    const year = digitsAt(text, s, s + 4);
    const month = digitsAt(text, s + 5, s + 7);
    const day = digitsAt(text, s + 8, s + 10);
    if (year < 0 || month < 0 || day < 0) return SLOW;
    return isoDateNumber(year, month, day) ?? SLOW;
  }
}

// The whole number written by the digits text[from, to), or -1 when any is not a digit.
function digitsAt(text: string, from: number, to: number): number {
  let v = 0;
  for (let i = from; i < to; i++) {
    const c = text.charCodeAt(i) - 48;
    if (c < 0 || c > 9) return -1;
    v = v * 10 + c;
  }
  return v;
}
