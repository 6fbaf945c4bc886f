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

/** One row per depot. */
export function resultRows(network: NetworkView, solve: SolveView): ResultRow[] {
  const rows: ResultRow[] = [];
  for (let d = 0; d < network.depotIds.length; d++) {
    const base = solve.base;
    const comparable = base !== null && base.status[d] === 1 && solve.status[d] === 1;
    rows.push({
      depot: d,
      id: network.depotIds[d],
      name: network.depotNames[d],
      status: d === solve.origin ? 'origin' : STATUS_WORDS[solve.status[d]],
      unbounded: solve.status[d] === 2,
      costMinor: solve.cost[d],
      legs: solve.legs[d],
      driveMinutes: solve.driveMinutes[d],
      flags: solve.flags[d],
      flagText: flagLabels(solve.flags[d]),
      deltaMinor: comparable ? solve.cost[d] - base.cost[d] : NaN,
    });
  }
  return rows;
}

// Missing numbers (NaN, -1 legs) always sort last, whatever the direction, so unbounded and
// unreachable depots never hide between real figures.
const present = (v: number) => (Number.isFinite(v) && v >= -1e300 ? v : NaN);

const STATUS_ORDER: Record<StatusWord, number> = { origin: 0, unbounded: 1, reachable: 2, unreachable: 3 };

/**
 * A row's number for a numeric sort key (NaN = missing, sorted last), signed so that ascending
 * order of the number is the column's ascending order: "cautions" ascending lists the most first.
 */
function numberOf(row: ResultRow, key: Exclude<SortKey, 'id' | 'name'>): number {
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

// Text compares as String.prototype.localeCompare does (same default locale and options), but one
// collator serves every comparison: a sort of 50,000 depots by id made 800,000 localeCompare calls.
const collator = new Intl.Collator();

/**
 * Sorts rows by the query's key; ties keep depot order, so the result is stable. Keys are read once
 * per row into an array and the sort compares those (a comparator reading each row's fields through
 * a switch per comparison held the UI thread for a fifth of a second at 50,000 depots).
 */
function sortRows(rows: ResultRow[], key: SortKey, descending: boolean): ResultRow[] {
  const order = rows.map((_, i) => i);
  const byDepot = (i: number, j: number) => rows[i].depot - rows[j].depot;
  if (key === 'id' || key === 'name') {
    const text = rows.map((row) => row[key]);
    order.sort((i, j) => (descending ? collator.compare(text[j], text[i]) : collator.compare(text[i], text[j])) || byDepot(i, j));
  } else {
    const value = Float64Array.from(rows, (row) => numberOf(row, key));
    order.sort((i, j) => {
      const x = value[i];
      const y = value[j];
      const xMissing = Number.isNaN(x);
      const yMissing = Number.isNaN(y);
      if (xMissing || yMissing) return xMissing === yMissing ? byDepot(i, j) : xMissing ? 1 : -1;
      return (descending ? y - x : x - y) || byDepot(i, j);
    });
  }
  return order.map((i) => rows[i]);
}

/** Filters and sorts rows; ties keep depot order, so the result is stable. */
export function queryRows(rows: readonly ResultRow[], query: TableQuery): ResultRow[] {
  const needle = query.text.trim().toLowerCase();
  const everything = needle === '' && query.status === 'all' && !query.flaggedOnly;
  const kept = everything
    ? rows.slice()
    : rows.filter(
        (row) =>
          (query.status === 'all' || row.status === query.status || (query.status === 'unbounded' && row.unbounded)) &&
          (!query.flaggedOnly || row.flags !== 0) &&
          (needle === '' || row.id.toLowerCase().includes(needle) || row.name.toLowerCase().includes(needle) || row.flagText.some((f) => f.includes(needle))),
      );
  return sortRows(kept, query.sortKey, query.descending);
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
