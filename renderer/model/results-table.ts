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
  flagText: string[];
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
function numeric(a: number, b: number, descending: boolean): number {
  const aMissing = !Number.isFinite(a) || a < -1e300;
  const bMissing = !Number.isFinite(b) || b < -1e300;
  if (aMissing || bMissing) return aMissing === bMissing ? 0 : aMissing ? 1 : -1;
  return descending ? b - a : a - b;
}

const STATUS_ORDER: Record<StatusWord, number> = { origin: 0, unbounded: 1, reachable: 2, unreachable: 3 };

function compare(a: ResultRow, b: ResultRow, key: SortKey, descending: boolean): number {
  const text = (x: string, y: string) => (descending ? y.localeCompare(x) : x.localeCompare(y));
  switch (key) {
    case 'id':
      return text(a.id, b.id);
    case 'name':
      return text(a.name, b.name);
    case 'status':
      return descending ? STATUS_ORDER[b.status] - STATUS_ORDER[a.status] : STATUS_ORDER[a.status] - STATUS_ORDER[b.status];
    case 'cost':
      return numeric(a.costMinor, b.costMinor, descending);
    case 'legs':
      return numeric(a.legs < 0 ? NaN : a.legs, b.legs < 0 ? NaN : b.legs, descending);
    case 'drive':
      return numeric(a.driveMinutes, b.driveMinutes, descending);
    case 'flags':
      return descending ? a.flagText.length - b.flagText.length : b.flagText.length - a.flagText.length;
    case 'delta':
      return numeric(a.deltaMinor, b.deltaMinor, descending);
  }
}

/** Filters and sorts rows; ties keep depot order, so the result is stable. */
export function queryRows(rows: readonly ResultRow[], query: TableQuery): ResultRow[] {
  const needle = query.text.trim().toLowerCase();
  const kept = rows.filter(
    (row) =>
      (query.status === 'all' || row.status === query.status || (query.status === 'unbounded' && row.unbounded)) &&
      (!query.flaggedOnly || row.flags !== 0) &&
      (needle === '' || row.id.toLowerCase().includes(needle) || row.name.toLowerCase().includes(needle) || row.flagText.some((f) => f.includes(needle))),
  );
  return kept.sort((a, b) => compare(a, b, query.sortKey, query.descending) || a.depot - b.depot);
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
