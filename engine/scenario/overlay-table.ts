// Copy-on-write access to a lane table for the overlay: a column is copied the first time a change
// writes to it, and all columns are copied (with room for the scenario's rows) only when a row is
// added, so re-pricing a few lanes of a million-row table copies a few columns, not the table.

import type { LaneTable } from '../import/types';

type NumberColumn = 'from' | 'to' | 'sourceRow' | 'toll' | 'fuel' | 'fees' | 'rebate' | 'distanceKm' | 'driveMinutes' | 'validFrom' | 'validTo' | 'vehicleClass';
type Typed = Float64Array | Int32Array | Int16Array | Uint8Array;

const NUMBER_COLUMNS: readonly NumberColumn[] = ['from', 'to', 'sourceRow', 'toll', 'fuel', 'fees', 'rebate', 'distanceKm', 'driveMinutes', 'validFrom', 'validTo', 'vehicleClass'];

/** A new row's cells; every other column is blank (NaN amounts, no class, no limits). */
export interface NewRow {
  from: number;
  to: number;
  toll: number;
  fuel: number;
  fees: number;
  rebate: number;
  distanceKm: number;
  driveMinutes: number;
  validFrom: number;
  validTo: number;
  ref: string | undefined;
}

function sized<T extends Typed>(array: T, size: number, fill: number): T {
  const next = new (array.constructor as new (n: number) => T)(size);
  next.set(array.subarray(0, Math.min(array.length, size)));
  if (size > array.length) next.fill(fill, array.length);
  return next;
}

export class TableCopy {
  count: number;
  private capacity: number;
  private readonly own = new Map<NumberColumn, Typed>();
  private readonly ownClass = new Map<number, Float64Array>();
  private grown = false;
  private ref: (string | undefined)[];
  /** Clause and notes cells: copied with the rows, so a class copy keeps its clause (the review groups by it). */
  private clause: (string | undefined)[] | undefined;
  private notes: (string | undefined)[];
  private limits: LaneTable['limits'];
  private log: { array: Typed; index: number; value: number }[] | null = null;

  constructor(private readonly base: LaneTable, private readonly extraRows: number) {
    this.count = base.count;
    this.capacity = base.count;
    this.ref = base.ref;
    this.clause = base.clause;
    this.notes = base.notes;
    this.limits = base.limits;
  }

  private baseColumn(name: NumberColumn): Typed {
    if (name === 'vehicleClass') return this.base.vehicleClass ?? new Int16Array(this.base.count).fill(-1);
    return this.base[name];
  }

  /** The column, copied on first use; writes to it stay in this copy. */
  column(name: NumberColumn): Typed {
    let col = this.own.get(name);
    if (!col) this.own.set(name, (col = sized(this.baseColumn(name), this.capacity, name === 'vehicleClass' ? -1 : NaN)));
    return col;
  }

  get(name: NumberColumn, r: number): number {
    return (this.own.get(name) ?? this.baseColumn(name))[r];
  }

  classToll(k: number, r: number): number {
    return (this.ownClass.get(k) ?? this.base.classTolls[k].toll)[r];
  }

  set(name: NumberColumn, r: number, value: number): void {
    this.write(this.column(name), r, value);
  }

  setClassToll(k: number, r: number, value: number): void {
    let col = this.ownClass.get(k);
    if (!col) this.ownClass.set(k, (col = sized(this.base.classTolls[k].toll, this.capacity, NaN)));
    this.write(col, r, value);
  }

  private write(array: Typed, r: number, value: number): void {
    this.log?.push({ array, index: r, value: array[r] });
    array[r] = value;
  }

  /** Starts recording writes so a change that turns out invalid can be taken back. */
  startUndo(): number {
    this.log = [];
    return 0;
  }

  undo(_marker: number): void {
    const log = this.log ?? [];
    for (let i = log.length - 1; i >= 0; i--) log[i].array[log[i].index] = log[i].value;
    this.log = null;
  }

  endUndo(): void {
    this.log = null;
  }

  /** Every column copied with room for the scenario's rows (once). */
  private grow(): void {
    if (this.grown) return;
    this.grown = true;
    this.capacity = this.base.count + this.extraRows;
    for (const name of NUMBER_COLUMNS) {
      const current = this.own.get(name) ?? this.baseColumn(name);
      this.own.set(name, sized(current, this.capacity, name === 'vehicleClass' ? -1 : NaN));
    }
    this.base.classTolls.forEach((c, k) => this.ownClass.set(k, sized(this.ownClass.get(k) ?? c.toll, this.capacity, NaN)));
    this.ref = this.base.ref.slice();
    this.clause = this.base.clause?.slice();
    this.notes = this.base.notes.slice();
    const l = this.base.limits;
    if (l) {
      this.limits = {
        ...l,
        measures: l.measures.map((m) => ({ ...m, values: sized(m.values, this.capacity, NaN) })),
        tunnelCategory: l.tunnelCategory ? sized(l.tunnelCategory, this.capacity, 0) : null,
        noDangerousGoods: l.noDangerousGoods ? sized(l.noDangerousGoods, this.capacity, 0) : null,
      };
    }
  }

  /** Appends a row; returns its index. */
  addRow(row: NewRow): number {
    this.grow();
    const r = this.count++;
    const set = (name: NumberColumn, v: number) => (this.own.get(name)![r] = v);
    set('from', row.from);
    set('to', row.to);
    set('sourceRow', 0);
    set('toll', row.toll);
    set('fuel', row.fuel);
    set('fees', row.fees);
    set('rebate', row.rebate);
    set('distanceKm', row.distanceKm);
    set('driveMinutes', row.driveMinutes);
    set('validFrom', row.validFrom);
    set('validTo', row.validTo);
    set('vehicleClass', -1);
    this.ref[r] = row.ref;
    return r;
  }

  /** Appends a copy of row `from` (every cell, limits included); returns its index. */
  copyRow(from: number): number {
    this.grow();
    const r = this.count++;
    for (const col of this.own.values()) col[r] = col[from];
    for (const col of this.ownClass.values()) col[r] = col[from];
    this.ref[r] = this.ref[from];
    if (this.clause) this.clause[r] = this.clause[from];
    this.notes[r] = this.notes[from];
    const l = this.limits;
    if (l) {
      for (const m of l.measures) m.values[r] = m.values[from];
      if (l.tunnelCategory) l.tunnelCategory[r] = l.tunnelCategory[from];
      if (l.noDangerousGoods) l.noDangerousGoods[r] = l.noDangerousGoods[from];
    }
    return r;
  }

  /** The table as changed; columns never written are the base's own arrays. */
  build(): LaneTable {
    const n = this.count;
    const col = <T extends Typed>(name: NumberColumn): T => {
      const c = this.own.get(name);
      if (!c) return this.baseColumn(name) as T;
      return (c.length === n ? c : c.slice(0, n)) as T;
    };
    const trim = <T extends Typed>(c: T): T => (c.length === n ? c : (c.slice(0, n) as T));
    const b = this.base;
    const hasClassColumn = b.vehicleClass !== null || this.own.has('vehicleClass');
    return {
      ...b,
      count: n,
      from: col('from'),
      to: col('to'),
      sourceRow: col('sourceRow'),
      toll: col('toll'),
      fuel: col('fuel'),
      fees: col('fees'),
      rebate: col('rebate'),
      distanceKm: col('distanceKm'),
      driveMinutes: col('driveMinutes'),
      validFrom: col('validFrom'),
      validTo: col('validTo'),
      vehicleClass: hasClassColumn && b.vehicleClass !== null ? col('vehicleClass') : null,
      classTolls: b.classTolls.map((c, k) => ({ ...c, toll: this.ownClass.has(k) ? trim(this.ownClass.get(k)!) : c.toll })),
      ref: this.ref,
      clause: this.clause,
      notes: this.notes,
      limits: this.limits
        ? {
            ...this.limits,
            measures: this.limits.measures.map((m) => ({ ...m, values: trim(m.values) })),
            tunnelCategory: this.limits.tunnelCategory ? this.limits.tunnelCategory.slice(0, n) : null,
            noDangerousGoods: this.limits.noDangerousGoods ? this.limits.noDangerousGoods.slice(0, n) : null,
          }
        : this.limits,
    };
  }
}
