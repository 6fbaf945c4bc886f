// The growable columnar store behind LaneTable: typed arrays that double when full, so a million
// lane rows cost about a hundred bytes each instead of an object per row.

import { formatMinor, type Minor } from '../money/minor';
import { textKeyedRecord } from '../text/lookup-table';
import { isoDateText } from './cells';
import { ByteRefs, textRefHash } from './byte-refs';
import type { LaneLimitsBuilder } from './lane-limits';
import type { DepotRecord, LaneRecord, LaneTable } from './types';

// The rows of a column: a view when the column is at least three quarters full (no copy of a
// million-row column at the end of a read: a copy holds both at once, a higher peak than the unused
// quarter; the size estimated from the first chunk runs about 20% high when ids grow longer down the
// file), a trimmed copy otherwise.
function rowsOf<T extends Float64Array | Int32Array | Int16Array>(array: T, n: number): T {
  return (n >= array.length * 0.75 ? array.subarray(0, n) : array.slice(0, n)) as T;
}

function grow<T extends Float64Array | Int32Array | Int16Array>(array: T, size: number): T {
  const next = new (array.constructor as new (n: number) => T)(size);
  next.set(array);
  return next;
}

export class LaneTableBuilder {
  count = 0;
  private capacity = 1024;
  from = new Int32Array(this.capacity);
  to = new Int32Array(this.capacity);
  sourceRow = new Int32Array(this.capacity);
  toll = new Float64Array(this.capacity);
  fuel = new Float64Array(this.capacity);
  fees = new Float64Array(this.capacity);
  rebate = new Float64Array(this.capacity);
  distanceKm = new Float64Array(this.capacity);
  driveMinutes = new Float64Array(this.capacity);
  validFrom = new Int32Array(this.capacity);
  validTo = new Int32Array(this.capacity);
  vehicleClass: Int16Array | null = null;
  classTolls: { name: string; key: string; toll: Float64Array; header?: string }[] = [];
  classNames: string[] = [];
  /** Refs of the rows before the first the byte reader kept as bytes (all of them without one); set with `setRef`. */
  ref: (string | undefined)[] = [];
  /** Refs from the first the byte reader kept as bytes on: made strings when the table's `ref` is read. */
  private byteRefs: ByteRefs | null = null;
  /** Null until the header has a clause column. */
  clause: (string | undefined)[] | null = null;
  notes: (string | undefined)[] = [];
  extra: { column: string; values: (string | undefined)[] }[] = [];
  columnHeaders: NonNullable<LaneTable['columnHeaders']> = {};
  /** Set by the lanes reader when the header has limit columns. */
  limits: LaneLimitsBuilder | null = null;

  /** Most rows `reserve` will make room for at once (an estimate past this is not trusted). */
  static readonly MAX_RESERVE = 50_000_000;

  /** Makes room for about `rows` rows in one step (an estimate from the file's size; rows past it still fit). */
  reserve(rows: number): void {
    const size = Math.min(Math.ceil(rows), LaneTableBuilder.MAX_RESERVE);
    if (size > this.capacity) this.resize(size);
  }

  /** Makes room for one more row and returns its index; the caller fills every column. */
  add(): number {
    if (this.count === this.capacity) this.resize(this.capacity * 2);
    return this.count++;
  }

  private resize(size: number): void {
    this.from = grow(this.from, size);
    this.to = grow(this.to, size);
    this.sourceRow = grow(this.sourceRow, size);
    this.toll = grow(this.toll, size);
    this.fuel = grow(this.fuel, size);
    this.fees = grow(this.fees, size);
    this.rebate = grow(this.rebate, size);
    this.distanceKm = grow(this.distanceKm, size);
    this.driveMinutes = grow(this.driveMinutes, size);
    this.validFrom = grow(this.validFrom, size);
    this.validTo = grow(this.validTo, size);
    if (this.vehicleClass) this.vehicleClass = grow(this.vehicleClass, size);
    for (const c of this.classTolls) c.toll = grow(c.toll, size);
    this.byteRefs?.resize(size);
    this.capacity = size;
  }

  /** Row `row`'s ref (the row just added; undefined when blank). */
  setRef(row: number, ref: string | undefined): void {
    if (this.byteRefs === null) this.ref.push(ref);
    else this.byteRefs.addText(row, ref);
  }

  /** Row `row`'s ref (the row just added) as ASCII bytes (not blank, no formula guard), made a string only when read. */
  addRefBytes(row: number, bytes: Uint8Array, start: number, end: number): void {
    this.byteRefs ??= new ByteRefs(this.ref, this.capacity);
    this.byteRefs.add(row, bytes, start, end);
  }

  /** The finished table, trimmed to its rows. */
  build(): LaneTable {
    const n = this.count;
    const columns: Omit<LaneTable, 'ref'> = {
      count: n,
      from: rowsOf(this.from, n),
      to: rowsOf(this.to, n),
      sourceRow: rowsOf(this.sourceRow, n),
      toll: rowsOf(this.toll, n),
      classTolls: this.classTolls.map((c) => ({ name: c.name, key: c.key, toll: rowsOf(c.toll, n), header: c.header })),
      vehicleClass: this.vehicleClass ? rowsOf(this.vehicleClass, n) : null,
      classNames: this.classNames.slice(),
      fuel: rowsOf(this.fuel, n),
      fees: rowsOf(this.fees, n),
      rebate: rowsOf(this.rebate, n),
      distanceKm: rowsOf(this.distanceKm, n),
      driveMinutes: rowsOf(this.driveMinutes, n),
      validFrom: rowsOf(this.validFrom, n),
      validTo: rowsOf(this.validTo, n),
      ...(this.clause ? { clause: this.clause } : {}),
      notes: this.notes,
      extra: this.extra,
      columnHeaders: this.columnHeaders,
      limits: this.limits ? this.limits.build() : null,
    };
    const kept = this.byteRefs;
    if (kept === null) return { ...columns, ref: this.ref };
    // The ref strings are made on the first read of `ref` (an accessor from the start, so the
    // table keeps one shape); the duplicate check compares the bytes where they lie.
    let column: (string | undefined)[] | null = null;
    const lazy: LaneTable = {
      ...columns,
      get ref() {
        column ??= kept.column(n);
        return column;
      },
      set ref(value) {
        column = value;
        byteRefTables.delete(lazy);
      },
    };
    byteRefTables.set(lazy, kept);
    return lazy;
  }
}

const byteRefTables = new WeakMap<LaneTable, ByteRefs>();

/** Whether rows a and b of `table` have the same ref, without making ref strings the table has not made yet. */
export function sameRefOf(table: LaneTable): (a: number, b: number) => boolean {
  const kept = byteRefTables.get(table);
  if (kept !== undefined) return (a, b) => kept.same(a, b);
  const ref = table.ref;
  return (a, b) => ref[a] === ref[b];
}

/** A hash of each row's ref (equal refs, equal hashes), without making ref strings. */
export function refHashOf(table: LaneTable): (row: number) => number {
  const kept = byteRefTables.get(table);
  if (kept !== undefined) return (row) => kept.refHash(row);
  const ref = table.ref;
  return (row) => textRefHash(ref[row]);
}

/** Row `i` of a lane table as an object, amounts formatted in the network currency. */
export function laneRecordAt(table: LaneTable, depots: readonly DepotRecord[], exponent: number, i: number): LaneRecord {
  const money = (v: number) => (Number.isNaN(v) ? null : formatMinor(v as Minor, exponent));
  const num = (v: number) => (Number.isNaN(v) ? null : v);
  const classTolls = textKeyedRecord<string | null>();
  for (const c of table.classTolls) classTolls[c.name] = money(c.toll[i]);
  const extra = textKeyedRecord<string>();
  for (const e of table.extra) if (e.values[i] !== undefined) extra[e.column] = e.values[i]!;
  const cls = table.vehicleClass ? table.vehicleClass[i] : -1;
  return {
    index: i,
    sourceRow: table.sourceRow[i],
    from: depots[table.from[i]].id,
    to: depots[table.to[i]].id,
    ref: table.ref[i] ?? null,
    clause: table.clause?.[i] ?? null,
    vehicleClass: cls >= 0 ? table.classNames[cls] : null,
    toll: money(table.toll[i]),
    classTolls,
    fuel: money(table.fuel[i]),
    fees: money(table.fees[i]),
    rebate: money(table.rebate[i]),
    distanceKm: num(table.distanceKm[i]),
    driveMinutes: num(table.driveMinutes[i]),
    validFrom: isoDateText(table.validFrom[i]),
    validTo: isoDateText(table.validTo[i]),
    notes: table.notes[i] ?? null,
    extra,
  };
}
