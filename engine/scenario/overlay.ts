// The what-if overlay: a scenario laid over the importer's whole lane table (every row, every class,
// every validity window), before any date or class is chosen. It is the one owner of "which amount
// does this lane row have under the scenario, for this class"; the CLI, the worker, the exports and
// the contract review all read amounts, keys, closures and problems from here.

import { classKey } from '../import/headers';
import { readIsoDate } from '../import/cells';
import { laneGroupText, laneKeyId, laneKeysOfTable, laneKeyWords, type LaneKey } from '../import/lane-key';
import type { LaneTable } from '../import/types';
import { netCostOrNull } from '../money/net-cost';
import { TableCopy } from './overlay-table';
import type { Scenario, ScenarioChange } from './types';

export type ScenarioProblemCode = 'lane-missing' | 'unknown-depot' | 'unknown-class' | 'amount-overflow';

export interface ScenarioProblem {
  /** Position of the change in `scenario.changes`. */
  changeIndex: number;
  code: ScenarioProblemCode;
  /** The lane the change names (for an added lane: its from/to/ref with occurrence 0). */
  lane: LaneKey;
  message: string;
}

/** What the overlay is laid over: the accepted depots (ids) and lane rows of one import. */
export interface OverlayBase {
  depots: readonly { id: string }[];
  lanes: LaneTable;
}

export interface LaneOverlay {
  /** The lane table with the scenario applied: the base rows at their own indices, then the rows it adds. */
  table: LaneTable;
  /** Rows of the base table; rows from here on were added by the scenario. */
  baseCount: number;
  /** Key of every row, occurrences counted over the file's rows (added lanes continue their group). */
  keys: readonly LaneKey[];
  /** Base row each row stands for: itself for a base row, the row it splits for a class copy, -1 for an added lane. */
  sourceOf: Int32Array;
  /** Index of the add-lane change that made a row, else -1. */
  changeOf: Int32Array;
  /** 1 for a row a close-lane change closed. */
  closed: Uint8Array;
  /** 1 for a row an applied change touches. */
  changed: Uint8Array;
  /** Changes that could not be applied; they stay in the scenario. */
  problems: ScenarioProblem[];
  /**
   * True when the scenario may change which rows a date and class plan (added lanes, validity,
   * class copies): such a network is rebuilt; otherwise amounts and closures are a weights update.
   */
  reshaped: boolean;
}

/** The keys of the base rows, for callers that only need to name lanes. */
export function overlayKeys(base: OverlayBase): LaneKey[] {
  return laneKeysOfTable(base.lanes, base.depots);
}

/** The base rows' keys and their lookups, made once per import and shared by every overlay of it. */
export interface OverlayIndex {
  keys: readonly LaneKey[];
  /** The base row `key` names, or undefined. */
  rowOfKey(key: LaneKey): number | undefined;
  /** Rows of the file with this from, to and ref (the last occurrence); 0 when none. */
  groupSize(from: string, to: string, ref: string | null): number;
}

/**
 * The group of a from / to / ref as one string, for a lookup table: each id is length-prefixed, so
 * no two groups give the same text whatever characters the ids hold. Concatenation, not
 * JSON.stringify of an array: at 500,000 rows the index took seconds that way.
 */
function groupId(from: string, to: string, ref: string | null): string {
  return `${from.length}:${from}${to.length}:${to}${ref === null ? '-' : `+${ref}`}`;
}

export function overlayIndex(base: OverlayBase): OverlayIndex {
  const t = base.lanes;
  const depotIds = base.depots.map((d) => d.id);
  const keys: LaneKey[] = new Array(t.count);
  // Group -> its one row, or its rows in file order (most groups have one row).
  const groups = new Map<string, number | number[]>();
  for (let i = 0; i < t.count; i++) {
    const from = depotIds[t.from[i]];
    const to = depotIds[t.to[i]];
    // As laneKeysOfTable: an empty ref is no ref.
    const ref = t.ref[i] || null;
    const id = groupId(from, to, ref);
    const rows = groups.get(id);
    let occurrence = 1;
    if (rows === undefined) groups.set(id, i);
    else if (typeof rows === 'number') {
      groups.set(id, [rows, i]);
      occurrence = 2;
    } else occurrence = rows.push(i);
    keys[i] = { from, to, ref, occurrence };
  }
  return {
    keys,
    rowOfKey(key) {
      const rows = groups.get(groupId(key.from, key.to, key.ref ?? null));
      if (rows === undefined || !Number.isInteger(key.occurrence)) return undefined;
      if (typeof rows === 'number') return key.occurrence === 1 ? rows : undefined;
      return key.occurrence >= 1 && key.occurrence <= rows.length ? rows[key.occurrence - 1] : undefined;
    },
    groupSize(from, to, ref) {
      const rows = groups.get(groupId(from, to, ref));
      return rows === undefined ? 0 : typeof rows === 'number' ? 1 : rows.length;
    },
  };
}

/**
 * Lays `scenario` over `base`; see the file header. A scenario without changes costs no copy.
 * `index` (overlayIndex of the same base) saves recounting the keys for every scenario of one import.
 */
export function buildOverlay(base: OverlayBase, scenario: Scenario | null, index?: OverlayIndex): LaneOverlay {
  const t = base.lanes;
  const changes = scenario?.changes ?? [];
  if (changes.length === 0) {
    let keys = index?.keys ?? null;
    return {
      table: t,
      baseCount: t.count,
      // Counted on first use: a caller that plans without naming lanes (dispatch) never pays for them.
      get keys() {
        return (keys ??= overlayKeys(base));
      },
      sourceOf: Int32Array.from({ length: t.count }, (_, i) => i),
      changeOf: new Int32Array(t.count).fill(-1),
      closed: new Uint8Array(t.count),
      changed: new Uint8Array(t.count),
      problems: [],
      reshaped: false,
    };
  }
  return new OverlayBuilder(base, index ?? overlayIndex(base), changes).run();
}

class OverlayBuilder {
  private readonly copy: TableCopy;
  /** Keys of the rows this scenario adds (base rows are looked up in the shared index). */
  private readonly addedIndex = new Map<string, number>();
  private readonly groupCount = new Map<string, number>();
  private readonly depotIndex = new Map<string, number>();
  /** Keys of the rows, copied from the shared list only when the scenario adds a row. */
  private keys: LaneKey[] | null = null;
  /** Base row of each added row (class copies); -1 for an added lane. Base rows stand for themselves. */
  private readonly sourceOfAdded: number[] = [];
  private readonly changeOfAdded: number[] = [];
  private readonly closed: number[] = [];
  private readonly changed: number[] = [];
  /** Class copies of each base row, by class index. */
  private readonly splits = new Map<number, Map<number, number>>();
  private readonly problems: ScenarioProblem[] = [];
  private reshaped = false;

  constructor(
    private readonly base: OverlayBase,
    private readonly shared: OverlayIndex,
    private readonly changes: readonly ScenarioChange[],
  ) {
    this.copy = new TableCopy(base.lanes, changes.length);
    base.depots.forEach((d, i) => this.depotIndex.set(d.id, i));
  }

  private rowOfKey(key: LaneKey): number | undefined {
    return this.shared.rowOfKey(key) ?? this.addedIndex.get(laneKeyId(key));
  }

  private keyOf(row: number): LaneKey {
    return (this.keys ?? this.shared.keys)[row];
  }

  private pushRow(key: LaneKey, sourceOf: number, changeOf: number): void {
    this.keys ??= this.shared.keys.slice();
    this.keys.push(key);
    this.sourceOfAdded.push(sourceOf);
    this.changeOfAdded.push(changeOf);
  }

  run(): LaneOverlay {
    this.changes.forEach((change, i) => this.apply(change, i));
    const n = this.copy.count;
    const baseCount = this.base.lanes.count;
    const sourceOf = new Int32Array(n);
    const changeOf = new Int32Array(n).fill(-1);
    for (let r = 0; r < baseCount; r++) sourceOf[r] = r;
    this.sourceOfAdded.forEach((s, i) => ((sourceOf[baseCount + i] = s), (changeOf[baseCount + i] = this.changeOfAdded[i])));
    const closed = new Uint8Array(n);
    const changed = new Uint8Array(n);
    for (const r of this.closed) closed[r] = 1;
    for (const r of this.changed) changed[r] = 1;
    return {
      table: this.copy.build(),
      baseCount: this.base.lanes.count,
      keys: this.keys ?? this.shared.keys,
      sourceOf,
      changeOf,
      closed,
      changed,
      problems: this.problems,
      reshaped: this.reshaped,
    };
  }

  private problem(changeIndex: number, code: ScenarioProblemCode, lane: LaneKey, message: string): void {
    this.problems.push({ changeIndex, code, lane, message });
  }

  /** A row and its class copies: what a change naming the row applies to. */
  private rowsOf(row: number): number[] {
    const copies = this.splits.get(row);
    return copies ? [row, ...copies.values()] : [row];
  }

  private apply(change: ScenarioChange, changeIndex: number): void {
    if (change.kind === 'add-lane') return this.addLane(change, changeIndex);
    const row = this.rowOfKey(change.lane);
    if (row === undefined) {
      const near = (this.keys ?? this.shared.keys).filter((k) => k.from === change.lane.from && k.to === change.lane.to).map(laneKeyWords);
      const hint = near.length > 0 ? ` (lanes ${change.lane.from} → ${change.lane.to} in the file now: ${near.slice(0, 5).join('; ')})` : '';
      this.problem(changeIndex, 'lane-missing', change.lane, `change ${changeIndex + 1} (${change.kind}) names lane ${laneKeyWords(change.lane)}, which the lanes file no longer has${hint}`);
      return;
    }
    const c = this.copy;
    switch (change.kind) {
      case 'close-lane':
        for (const r of this.rowsOf(row)) this.closed.push(r), this.changed.push(r);
        return;
      case 'set-validity': {
        const from = change.validFrom === null ? 0 : (readIsoDate(change.validFrom) ?? 0);
        const to = change.validTo === null ? 0 : (readIsoDate(change.validTo) ?? 0);
        for (const r of this.rowsOf(row)) {
          c.column('validFrom')[r] = from;
          c.column('validTo')[r] = to;
          this.changed.push(r);
        }
        this.reshaped = true;
        return;
      }
      case 'set-amount': {
        const undo = c.startUndo();
        const rows = change.field === 'toll' ? this.setToll(row, change.vehicleClass ?? null, change.amountMinor, changeIndex, change.lane) : this.setComponent(row, change.field, change.amountMinor);
        if (rows === null) return;
        const bad = rows.find((r) => !this.netFits(r));
        if (bad !== undefined) {
          c.undo(undo);
          this.problem(changeIndex, 'amount-overflow', change.lane, `change ${changeIndex + 1}: the new ${change.field} makes the net cost of lane ${laneKeyWords(change.lane)} leave the exact range; not applied`);
          return;
        }
        c.endUndo();
        for (const r of rows) this.changed.push(r);
        return;
      }
    }
  }

  private setComponent(row: number, field: 'fuel' | 'fees' | 'rebate', amount: number): number[] {
    const rows = this.rowsOf(row);
    for (const r of rows) this.copy.set(field, r, amount);
    return rows;
  }

  /** A toll for one class (its column, its row, or a class copy of the row) or for every class (`className` null). */
  private setToll(row: number, className: string | null, amount: number, changeIndex: number, lane: LaneKey): number[] | null {
    const t = this.base.lanes;
    const c = this.copy;
    if (className === null) {
      const rows = this.rowsOf(row);
      for (const r of rows) {
        c.set('toll', r, amount);
        t.classTolls.forEach((_, k) => c.setClassToll(k, r, amount));
      }
      return rows;
    }
    const key = classKey(className);
    const wide = t.classTolls.length > 0;
    const k = wide ? t.classTolls.findIndex((x) => x.key === key) : t.classNames.findIndex((x) => classKey(x) === key);
    if (k === -1) {
      const names = wide ? t.classTolls.map((x) => x.name) : t.classNames;
      this.problem(changeIndex, 'unknown-class', lane, `change ${changeIndex + 1} sets the toll of vehicle class "${className}" on lane ${laneKeyWords(lane)}, but the lanes file ${names.length === 0 ? 'has no tolls per vehicle class' : `has no such class (classes: ${names.join(', ')})`}`);
      return null;
    }
    if (wide) {
      const rows = this.rowsOf(row);
      for (const r of rows) c.setClassToll(k, r, amount);
      return rows;
    }
    // Long layout: each row carries the toll of its own class. A row for every class, or one that
    // only stands in for this class, gets a copy for this class, so the other classes keep theirs.
    if (t.vehicleClass![row] === k) {
      c.set('toll', row, amount);
      return [row];
    }
    let copies = this.splits.get(row);
    let r = copies?.get(k);
    if (r === undefined) {
      r = c.copyRow(row);
      c.column('vehicleClass')[r] = k;
      this.pushRow(this.keyOf(row), row, -1);
      if (!copies) this.splits.set(row, (copies = new Map()));
      copies.set(k, r);
      if (this.closed.includes(row)) this.closed.push(r);
      this.reshaped = true;
    }
    c.set('toll', r, amount);
    return [r];
  }

  /** True when every toll the row may be planned with gives an exact net (blank fuel counts as 0 here). */
  private netFits(r: number): boolean {
    const c = this.copy;
    const zero = (v: number) => (Number.isNaN(v) ? 0 : v);
    const tolls = [c.get('toll', r), ...this.base.lanes.classTolls.map((_, k) => c.classToll(k, r))];
    return tolls.every((toll) => netCostOrNull(zero(toll), zero(c.get('fuel', r)), c.get('fees', r), c.get('rebate', r)) !== null);
  }

  private addLane(change: Extract<ScenarioChange, { kind: 'add-lane' }>, changeIndex: number): void {
    const l = change.lane;
    const key: LaneKey = { from: l.from, to: l.to, ref: l.ref, occurrence: 0 };
    const from = this.depotIndex.get(l.from);
    const to = this.depotIndex.get(l.to);
    if (from === undefined || to === undefined) {
      const missing = [l.from, l.to].filter((id) => !this.depotIndex.has(id));
      this.problem(changeIndex, 'unknown-depot', key, `change ${changeIndex + 1} adds a lane ${l.from} > ${l.to} but depot ${missing.map((m) => `"${m}"`).join(' and ')} is not in the depots file`);
      return;
    }
    if (netCostOrNull(l.tollMinor, l.fuelMinor, l.feesMinor, l.rebateMinor) === null) {
      this.problem(changeIndex, 'amount-overflow', key, `change ${changeIndex + 1}: the added lane's net cost leaves the exact range`);
      return;
    }
    const r = this.copy.addRow({
      from,
      to,
      toll: l.tollMinor,
      fuel: l.fuelMinor,
      fees: l.feesMinor,
      rebate: l.rebateMinor,
      distanceKm: l.distanceKm ?? NaN,
      driveMinutes: l.driveMinutes ?? NaN,
      validFrom: l.validFrom === null ? 0 : (readIsoDate(l.validFrom) ?? 0),
      validTo: l.validTo === null ? 0 : (readIsoDate(l.validTo) ?? 0),
      ref: l.ref ?? undefined,
    });
    const group = laneGroupText(l.from, l.to, l.ref);
    key.occurrence = (this.groupCount.get(group) ?? this.shared.groupSize(l.from, l.to, l.ref ?? null)) + 1;
    this.groupCount.set(group, key.occurrence);
    this.addedIndex.set(laneKeyId(key), r);
    this.pushRow(key, -1, changeIndex);
    this.changed.push(r);
    this.reshaped = true;
  }
}
