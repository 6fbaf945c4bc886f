// The growable columnar store behind LaneTable: typed arrays that double when full, so a million
// lane rows cost about a hundred bytes each instead of an object per row.

import { formatMinor, type Minor } from '../money/minor';
import { isoDateText } from './cells';
import type { LaneLimitsBuilder } from './lane-limits';
import type { DepotRecord, LaneRecord, LaneTable } from './types';

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
  ref: (string | undefined)[] = [];
  /** Null until the header has a clause column. */
  clause: (string | undefined)[] | null = null;
  notes: (string | undefined)[] = [];
  extra: { column: string; values: (string | undefined)[] }[] = [];
  columnHeaders: NonNullable<LaneTable['columnHeaders']> = {};
  /** Set by the lanes reader when the header has limit columns. */
  limits: LaneLimitsBuilder | null = null;

  /** Makes room for one more row and returns its index; the caller fills every column. */
  add(): number {
    if (this.count === this.capacity) {
      const size = this.capacity * 2;
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
      this.capacity = size;
    }
    return this.count++;
  }

  /** The finished table, trimmed to its rows. */
  build(): LaneTable {
    const n = this.count;
    return {
      count: n,
      from: this.from.slice(0, n),
      to: this.to.slice(0, n),
      sourceRow: this.sourceRow.slice(0, n),
      toll: this.toll.slice(0, n),
      classTolls: this.classTolls.map((c) => ({ name: c.name, key: c.key, toll: c.toll.slice(0, n), header: c.header })),
      vehicleClass: this.vehicleClass ? this.vehicleClass.slice(0, n) : null,
      classNames: this.classNames.slice(),
      fuel: this.fuel.slice(0, n),
      fees: this.fees.slice(0, n),
      rebate: this.rebate.slice(0, n),
      distanceKm: this.distanceKm.slice(0, n),
      driveMinutes: this.driveMinutes.slice(0, n),
      validFrom: this.validFrom.slice(0, n),
      validTo: this.validTo.slice(0, n),
      ref: this.ref,
      ...(this.clause ? { clause: this.clause } : {}),
      notes: this.notes,
      extra: this.extra,
      columnHeaders: this.columnHeaders,
      limits: this.limits ? this.limits.build() : null,
    };
  }
}

/** Row `i` of a lane table as an object, amounts formatted in the network currency. */
export function laneRecordAt(table: LaneTable, depots: readonly DepotRecord[], exponent: number, i: number): LaneRecord {
  const money = (v: number) => (Number.isNaN(v) ? null : formatMinor(v as Minor, exponent));
  const num = (v: number) => (Number.isNaN(v) ? null : v);
  const classTolls: Record<string, string | null> = {};
  for (const c of table.classTolls) classTolls[c.name] = money(c.toll[i]);
  const extra: Record<string, string> = {};
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
