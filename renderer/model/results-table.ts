// Rows of the results table and how they sort and filter: pure functions over the network and the
// solve, so the table component only renders and the logic is unit-tested without a browser.

import { flagLabels } from './flags';
import { formatMoney } from './format';
import type { NetworkView, SolveView } from '../worker/protocol';

export type StatusWord = 'origin' | 'reachable' | 'unreachable' | 'unbounded';

export interface ResultRow {
  depot: number;
  id: string;
  name: string;
  status: StatusWord;
  /** Cost unbounded (a rebate loop reaches it); true for the origin too when a loop runs back through it. */
  unbounded: boolean;
  /** Minor units; NaN when there is no finite cost. */
  costMinor: number;
  legs: number;
  driveMinutes: number;
  flags: number;
  flagText: readonly string[];
  /** Cost change against the scenario's base (minor units), NaN when not comparable or no scenario. */
  deltaMinor: number;
}

export type SortKey = 'id' | 'name' | 'status' | 'cost' | 'legs' | 'drive' | 'flags' | 'delta';

export interface TableQuery {
  text: string;
  status: StatusWord | 'all';
  /** Only rows carrying at least one caution flag. */
  flaggedOnly: boolean;
  sortKey: SortKey;
  descending: boolean;
}

export const DEFAULT_QUERY: TableQuery = { text: '', status: 'all', flaggedOnly: false, sortKey: 'cost', descending: false };

const STATUS_WORDS: readonly StatusWord[] = ['unreachable', 'reachable', 'unbounded'];

/** The row of depot `d`, read from the network and the solve. */
export function resultRow(network: NetworkView, solve: SolveView, d: number): ResultRow {
  return {
    depot: d,
    id: network.depotIds[d],
    name: network.depotNames[d],
    status: statusOf(solve, d),
    unbounded: solve.status[d] === 2,
    costMinor: solve.cost[d],
    legs: solve.legs[d],
    driveMinutes: solve.driveMinutes[d],
    flags: solve.flags[d],
    flagText: flagLabels(solve.flags[d]),
    deltaMinor: deltaOf(solve, d),
  };
}

function statusOf(solve: SolveView, d: number): StatusWord {
  return d === solve.origin ? 'origin' : STATUS_WORDS[solve.status[d]];
}

function deltaOf(solve: SolveView, d: number): number {
  const base = solve.base;
  return base !== null && base.status[d] === 1 && solve.status[d] === 1 ? solve.cost[d] - base.cost[d] : NaN;
}

/** One row per depot. */
export function resultRows(network: NetworkView, solve: SolveView): ResultRow[] {
  return Array.from({ length: network.depotIds.length }, (_, d) => resultRow(network, solve, d));
}

// Missing numbers (NaN, -1 legs) always sort last, whatever the direction, so unbounded and
// unreachable depots never hide between real figures.
const present = (v: number) => (Number.isFinite(v) && v >= -1e300 ? v : NaN);

const STATUS_ORDER: Record<StatusWord, number> = { origin: 0, unbounded: 1, reachable: 2, unreachable: 3 };

type NumericKey = Exclude<SortKey, 'id' | 'name'>;

/**
 * A row's number for a numeric sort key (NaN = missing, sorted last), signed so that ascending
 * order of the number is the column's ascending order: "cautions" ascending lists the most first.
 */
function numberOf(row: ResultRow, key: NumericKey): number {
  switch (key) {
    case 'status':
      return STATUS_ORDER[row.status];
    case 'cost':
      return present(row.costMinor);
    case 'legs':
      return row.legs < 0 ? NaN : row.legs;
    case 'drive':
      return present(row.driveMinutes);
    case 'flags':
      return -row.flagText.length;
    case 'delta':
      return present(row.deltaMinor);
  }
}

/** `numberOf` read straight from the solve's arrays (tested equal to it on random solves). */
function depotNumberOf(solve: SolveView, d: number, key: NumericKey): number {
  switch (key) {
    case 'status':
      return STATUS_ORDER[statusOf(solve, d)];
    case 'cost':
      return present(solve.cost[d]);
    case 'legs':
      return solve.legs[d] < 0 ? NaN : solve.legs[d];
    case 'drive':
      return present(solve.driveMinutes[d]);
    case 'flags':
      return -flagLabels(solve.flags[d]).length;
    case 'delta':
      return present(deltaOf(solve, d));
  }
}

// Text compares as String.prototype.localeCompare does (same default locale and options), but one
// collator serves every comparison: a sort of 50,000 depots by id made 800,000 localeCompare calls.
const collator = new Intl.Collator();

/** Rows by index, for filtering and sorting: row objects, or a network and a solve read in place. */
interface RowSource {
  count: number;
  row(i: number): ResultRow;
  depot(i: number): number;
  text(i: number, key: 'id' | 'name'): string;
  number(i: number, key: NumericKey): number;
}

function matches(row: ResultRow, query: TableQuery, needle: string): boolean {
  return (
    (query.status === 'all' || row.status === query.status || (query.status === 'unbounded' && row.unbounded)) &&
    (!query.flaggedOnly || row.flags !== 0) &&
    (needle === '' || row.id.toLowerCase().includes(needle) || row.name.toLowerCase().includes(needle) || row.flagText.some((f) => f.includes(needle)))
  );
}

/**
 * Indices of the rows the query keeps, sorted by its key; ties keep depot order, so the result is
 * stable. Keys are read once per row into an array and the sort compares those (a comparator
 * reading each row's fields through a switch per comparison held the UI thread for a fifth of a
 * second at 50,000 depots).
 */
function ordered(source: RowSource, query: TableQuery): Int32Array {
  const needle = query.text.trim().toLowerCase();
  const everything = needle === '' && query.status === 'all' && !query.flaggedOnly;
  const kept: number[] = [];
  for (let i = 0; i < source.count; i++) if (everything || matches(source.row(i), query, needle)) kept.push(i);
  const { sortKey: key, descending } = query;
  const byDepot = (a: number, b: number) => source.depot(kept[a]) - source.depot(kept[b]);
  const order = kept.map((_, k) => k);
  if (key === 'id' || key === 'name') {
    const text = kept.map((i) => source.text(i, key));
    order.sort((a, b) => (descending ? collator.compare(text[b], text[a]) : collator.compare(text[a], text[b])) || byDepot(a, b));
  } else {
    const value = Float64Array.from(kept, (i) => source.number(i, key));
    const packed = inDepotOrder(source, kept) ? packedOrder(value, descending) : null;
    if (packed) return Int32Array.from(packed, (k) => kept[k]);
    order.sort((a, b) => {
      const x = value[a];
      const y = value[b];
      const xMissing = Number.isNaN(x);
      const yMissing = Number.isNaN(y);
      if (xMissing || yMissing) return xMissing === yMissing ? byDepot(a, b) : xMissing ? 1 : -1;
      return (descending ? y - x : x - y) || byDepot(a, b);
    });
  }
  return Int32Array.from(order, (k) => kept[k]);
}

function inDepotOrder(source: RowSource, kept: readonly number[]): boolean {
  for (let k = 1; k < kept.length; k++) if (source.depot(kept[k]) <= source.depot(kept[k - 1])) return false;
  return true;
}

// 2^17: positions below it fit beside an integer key under 2^35 in a double's 53 exact bits.
const PACK = 131072;

/**
 * The order of `value` (ascending, or descending) with missing values (NaN) last and ties by
 * position, by the typed array's own numeric sort of `key * 2^17 + position`: no comparator call per
 * comparison, a few milliseconds for 50,000 depots where a comparator sort took tens to a hundred
 * on a loaded machine. Null when a key is not an integer under 2^35 or there are 2^17 positions or
 * more (the comparator sort then runs); every figure of a solve is whole minor units or minutes.
 */
function packedOrder(value: Float64Array, descending: boolean): number[] | null {
  if (value.length >= PACK) return null;
  const keys = new Float64Array(value.length);
  const missing: number[] = [];
  let n = 0;
  for (let k = 0; k < value.length; k++) {
    const v = value[k];
    if (Number.isNaN(v)) {
      missing.push(k);
      continue;
    }
    const signed = descending ? -v : v;
    if (!Number.isInteger(signed) || Math.abs(signed) >= 2 ** 35) return null;
    keys[n++] = signed * PACK + k;
  }
  const sorted = keys.subarray(0, n).sort();
  const out: number[] = [];
  for (let j = 0; j < n; j++) out.push(sorted[j] - Math.floor(sorted[j] / PACK) * PACK);
  return out.concat(missing);
}

/** Filters and sorts rows; ties keep depot order, so the result is stable. */
export function queryRows(rows: readonly ResultRow[], query: TableQuery): ResultRow[] {
  const source: RowSource = { count: rows.length, row: (i) => rows[i], depot: (i) => rows[i].depot, text: (i, key) => rows[i][key], number: (i, key) => numberOf(rows[i], key) };
  return Array.from(ordered(source, query), (i) => rows[i]);
}

/**
 * The depots `queryRows(resultRows(network, solve), query)` lists, in its order, without making a
 * row per depot: the windowed table makes rows only for what it shows (`resultRow`). 50,000 row
 * objects per solve, and their garbage, were most of the UI thread's work after a solve.
 */
export function queryDepots(network: NetworkView, solve: SolveView, query: TableQuery): Int32Array {
  const source: RowSource = {
    count: network.depotIds.length,
    row: (d) => resultRow(network, solve, d),
    depot: (d) => d,
    text: (d, key) => (key === 'id' ? network.depotIds[d] : network.depotNames[d]),
    number: (d, key) => depotNumberOf(solve, d, key),
  };
  return ordered(source, query);
}

/** The status words a row shows, each with its badge kind: an unbounded origin is both. */
export function statusBadges(row: Pick<ResultRow, 'status' | 'unbounded'>): { text: string; kind: StatusWord }[] {
  const unbounded = { text: '∞ unbounded', kind: 'unbounded' as const };
  if (row.status === 'origin') return row.unbounded ? [{ text: 'origin', kind: 'origin' }, unbounded] : [{ text: 'origin', kind: 'origin' }];
  return row.status === 'unbounded' ? [unbounded] : [{ text: row.status, kind: row.status }];
}

/** The status cell as text, e.g. "origin · ∞ unbounded". */
export function statusText(row: Pick<ResultRow, 'status' | 'unbounded'>): string {
  return statusBadges(row)
    .map((b) => b.text)
    .join(' · ');
}

/** The cost cell: the amount, or words when no finite cost exists. */
export function costText(row: Pick<ResultRow, 'unbounded' | 'costMinor'>, exponent: number): string {
  return row.unbounded ? 'no finite cost' : formatMoney(row.costMinor, exponent);
}

/** Next query after a header click: same key flips direction, a new key sorts ascending. */
export function toggleSort(query: TableQuery, key: SortKey): TableQuery {
  return query.sortKey === key ? { ...query, descending: !query.descending } : { ...query, sortKey: key, descending: false };
}
