// Rows of the Loads panel and how they sort and filter, and the printed dispatch sheet's pages (one
// per date): pure functions over the dispatch report, unit-tested without a browser.

import type { DispatchLoadRow, DispatchReport } from '../../engine/index';

export type LoadSortKey = 'load' | 'from' | 'to' | 'date' | 'vehicle' | 'status' | 'cost' | 'limits' | 'drive';
export type LoadStatusWord = DispatchLoadRow['status'];

export interface LoadsQuery {
  text: string;
  status: LoadStatusWord | 'all';
  sortKey: LoadSortKey;
  descending: boolean;
}

export const DEFAULT_LOADS_QUERY: LoadsQuery = { text: '', status: 'all', sortKey: 'load', descending: false };

const STATUS_ORDER: Record<LoadStatusWord, number> = { unbounded: 0, blocked: 1, 'no-route': 2, planned: 3 };

// Missing figures sort last in both directions, so blocked loads never hide between real costs.
function numeric(a: number | null | undefined, b: number | null | undefined, descending: boolean): number {
  const am = a === null || a === undefined;
  const bm = b === null || b === undefined;
  if (am || bm) return am === bm ? 0 : am ? 1 : -1;
  return descending ? b - a : a - b;
}

function compare(a: DispatchLoadRow, b: DispatchLoadRow, key: LoadSortKey, descending: boolean): number {
  const text = (x: string, y: string) => (descending ? y.localeCompare(x) : x.localeCompare(y));
  switch (key) {
    case 'load':
      return text(a.load, b.load);
    case 'from':
      return text(a.from, b.from);
    case 'to':
      return text(a.to, b.to);
    case 'date':
      return text(a.date, b.date);
    case 'vehicle':
      return text(a.vehicle ?? '', b.vehicle ?? '');
    case 'status':
      return descending ? STATUS_ORDER[b.status] - STATUS_ORDER[a.status] : STATUS_ORDER[a.status] - STATUS_ORDER[b.status];
    case 'cost':
      return numeric(a.cost_minor, b.cost_minor, descending);
    case 'limits':
      return numeric(a.limits_extra_minor, b.limits_extra_minor, descending);
    case 'drive':
      return numeric(a.breakdown?.drive_minutes, b.breakdown?.drive_minutes, descending);
  }
}

/** The rows that pass the filter, sorted (ties keep file order). */
export function queryLoads(rows: readonly DispatchLoadRow[], q: LoadsQuery): DispatchLoadRow[] {
  const needle = q.text.trim().toLowerCase();
  const kept = rows.filter((r) => {
    if (q.status !== 'all' && r.status !== q.status) return false;
    if (needle === '') return true;
    return [r.load, r.from, r.to, r.vehicle ?? '', r.vehicle_class ?? '', r.date, ...r.blocked_by, ...r.notes].some((t) => t.toLowerCase().includes(needle));
  });
  return kept.map((r, i) => ({ r, i })).sort((x, y) => compare(x.r, y.r, q.sortKey, q.descending) || x.i - y.i).map((x) => x.r);
}

export function toggleLoadSort(q: LoadsQuery, key: LoadSortKey): LoadsQuery {
  return q.sortKey === key ? { ...q, descending: !q.descending } : { ...q, sortKey: key, descending: false };
}

/** Short caution words for a load's row (the full caution is under the table and on every printed page). */
export function loadCautions(r: DispatchLoadRow): string[] {
  const out: string[] = [];
  if (r.over_drive_limit) out.push('over daily driving limit');
  if (r.status === 'unbounded') out.push('rebate loop');
  if (r.status === 'blocked') out.push('vehicle limits');
  if ((r.limits_extra_minor ?? 0) > 0) out.push('detour for vehicle limits');
  if (r.notes.length > 0) out.push(...r.notes);
  return out;
}

export interface SheetPage {
  date: string;
  loads: DispatchLoadRow[];
}

/** The printed sheet: one page (or run of pages) per date, dates in order, loads in file order. */
export function sheetPages(report: DispatchReport): SheetPage[] {
  const byDate = new Map<string, DispatchLoadRow[]>();
  for (const r of report.loads) {
    const list = byDate.get(r.date);
    if (list) list.push(r);
    else byDate.set(r.date, [r]);
  }
  return [...byDate.keys()].sort().map((date) => ({ date, loads: byDate.get(date)! }));
}
