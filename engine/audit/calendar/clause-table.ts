// Loops by clause: which clauses a loop combines (the clauses of its rows that carry a rebate or
// name a clause), and per clause its rows, total rebate, loops and the periods it is on a loop in.

import { clauseOf, type LaneClause } from '../../import/lane-clause';
import type { LaneTable } from '../../import/types';
import type { CalendarLoop } from './loops-over-time';

export interface ClauseRow extends LaneClause {
  /** LaneTable rows of the clause that carry a rebate or name it, in table order. */
  rows: number[];
  /** Sum of the rows' rebates (minor units per trip, one trip on each row). */
  rebate: number;
  /** Ids of the loops the clause takes part in. */
  loops: number[];
  /** Period indices in which one of those loops exists (any class). */
  periods: number[];
}

const counts = (table: LaneTable, r: number) => table.rebate[r] > 0 || table.clause?.[r] !== undefined;

/** The clauses a loop combines, in the order its rows first name them. */
export function loopClauses(table: LaneTable, loop: CalendarLoop): LaneClause[] {
  const seen = new Map<string, LaneClause>();
  for (const r of loop.rows) {
    if (!counts(table, r)) continue;
    const c = clauseOf(table, r);
    if (!seen.has(c.key)) seen.set(c.key, c);
  }
  return [...seen.values()];
}

/** One row per clause with a rebate or on a loop: clauses on loops first, then by name. Rows in `leaveOut` (closed by a what-if) are not in any clause. */
export function clauseTable(table: LaneTable, loops: readonly CalendarLoop[], leaveOut?: Uint8Array): ClauseRow[] {
  const rows = new Map<string, ClauseRow>();
  const get = (r: number) => {
    const c = clauseOf(table, r);
    let row = rows.get(c.key);
    if (!row) rows.set(c.key, (row = { ...c, rows: [], rebate: 0, loops: [], periods: [] }));
    return row;
  };
  for (let r = 0; r < table.count; r++) {
    if (!counts(table, r) || leaveOut?.[r]) continue;
    const row = get(r);
    row.rows.push(r);
    row.rebate += table.rebate[r];
  }
  for (const loop of loops) {
    for (const c of loopClauses(table, loop)) {
      const row = rows.get(c.key)!;
      row.loops.push(loop.id);
      const periods = new Set(row.periods);
      for (const p of loop.presence) periods.add(p.period);
      row.periods = [...periods].sort((a, b) => a - b);
    }
  }
  return [...rows.values()].sort((a, b) => (a.loops.length > 0 ? 0 : 1) - (b.loops.length > 0 ? 0 : 1) || a.name.localeCompare(b.name, 'en', { numeric: true }));
}
