// The contract clause a lane row's rebate belongs to. Analysts negotiate clauses, not rows: rows
// with the same `clause` cell form one clause; a row without one is its own clause, named by its ref
// (rows sharing a ref, such as one lane's rows per vehicle class, stay together), or by its row.

import type { LaneTable } from './types';

export interface LaneClause {
  /** Identity: the same key = the same clause. Kinds never collide ("7.2" as a clause and as a ref differ). */
  key: string;
  /** As the report names it: the clause cell, else the ref, else "row N". */
  name: string;
  source: 'clause' | 'ref' | 'row';
}

/** The clause of lane table row `i`. */
export function clauseOf(table: LaneTable, i: number): LaneClause {
  const clause = table.clause?.[i];
  if (clause !== undefined) return { key: `c\u0000${clause}`, name: clause, source: 'clause' };
  const ref = table.ref[i];
  if (ref !== undefined) return { key: `r\u0000${ref}`, name: ref, source: 'ref' };
  const row = table.sourceRow[i];
  return { key: `n\u0000${row}`, name: `row ${row}`, source: 'row' };
}
