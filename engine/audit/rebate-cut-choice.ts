// Which rebate a fix plan cuts when a loop must stop paying: the one ranking shared by the one-day
// plan (fix-plan.ts, lanes of one network) and the calendar plan (calendar/lane-fix-plan.ts, lane
// table rows), so both prefer the same lane for the same reasons.

/** What the ranking reads about one candidate (a lane or a lane table row on the loop). */
export interface RebateCutFacts {
  /** Marked negotiable by the user. */
  negotiable: boolean;
  /** Rebate still left on it (minor units, > 0). */
  rebateLeft: number;
  /** The plan already cuts it (cutting it again keeps the clauses to renegotiate down). */
  alreadyCut: boolean;
  /** Row of the lanes file (header = 1): the last tie-break, stable for the user. */
  sourceRow: number;
}

/**
 * The candidate to cut for a lap paying `amount`. In order: negotiable ones; one whose rebate covers
 * the whole amount (one cut fixes the loop); one the plan already cuts; the cut that is the smallest
 * share of its rebate; the largest rebate (when none covers the amount); the lowest source row; the
 * lowest candidate number.
 */
export function pickRebateCut(candidates: readonly number[], amount: number, facts: (candidate: number) => RebateCutFacts): number {
  if (candidates.length === 0) throw new RangeError('pickRebateCut: no candidate');
  const rank = (c: number) => {
    const f = facts(c);
    return [f.negotiable ? 0 : 1, f.rebateLeft >= amount ? 0 : 1, f.alreadyCut ? 0 : 1, Math.min(amount, f.rebateLeft) / f.rebateLeft, -f.rebateLeft, f.sourceRow, c];
  };
  let best = candidates[0];
  let bestRank = rank(best);
  for (let i = 1; i < candidates.length; i++) {
    const r = rank(candidates[i]);
    let k = 0;
    while (k < r.length && r[k] === bestRank[k]) k++;
    if (k < r.length && r[k] < bestRank[k]) (best = candidates[i]), (bestRank = r);
  }
  return best;
}
