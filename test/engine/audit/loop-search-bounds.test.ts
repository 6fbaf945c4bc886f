// The loop search is bounded by a count, a work budget and a memory bound, and says which one
// stopped it. On a 12-depot network where every lane is a net rebate (every one of its billions of
// simple cycles is a rebate loop) a cap of 1,000,000 used to run for minutes and run out of memory
// while claiming "more loops exist than the N reported". Checked against brute force on small cases.

import { describe, expect, it } from 'vitest';
import { findDistinctLoops } from '../../../engine/audit/distinct-loops';
import { auditNetwork } from '../../../engine/audit/network-audit';
import { auditReport, loopSearchNote } from '../../../engine/report/audit-report';
import { loopKey } from '../../../engine/routes/rebate-loop';
import { networkOf } from '../../support/network-builder';

/** Every ordered pair of `n` depots joined by a lane of net -1 (a rebate larger than the costs). */
function allRebates(n: number) {
  const ids = Array.from({ length: n }, (_, i) => `D${i}`);
  const lanes: [string, string, number][] = [];
  for (const a of ids) for (const b of ids) if (a !== b) lanes.push([a, b, -1]);
  return networkOf(ids, lanes);
}

describe('loop search bounds', () => {
  it('a complete 4-depot network: the search is complete and finds every simple cycle (brute force: 20)', () => {
    // Simple directed cycles of the complete digraph K4: 6 of length 2, 8 of length 3, 6 of length 4.
    const found = findDistinctLoops(allRebates(4), { cap: 1000 });
    expect(found.stoppedBy).toBe('complete');
    expect(found.capReached).toBe(false);
    expect(new Set(found.loops.map(loopKey)).size).toBe(20);
  });

  it('stops at the cap and says more exist only when it found one more', () => {
    const capped = findDistinctLoops(allRebates(4), { cap: 5 });
    expect(capped.loops).toHaveLength(5);
    expect(capped.stoppedBy).toBe('cap');
    const unsettled = findDistinctLoops(allRebates(4), { cap: 5, probeBudget: 0 });
    expect(unsettled.stoppedBy).toBe('cap-unsettled');
  });

  it('a cap of 1,000,000 on 12 depots stops at a budget before the count, and says so', () => {
    const net = allRebates(12);
    const work = findDistinctLoops(net, { cap: 1_000_000, workBudget: 200_000 });
    expect(work.stoppedBy).toBe('work-budget');
    expect(work.loops.length).toBeLessThan(1_000_000);
    // The budget is checked before each search: at most one search past it.
    expect(work.work).toBeLessThan(200_000 + 12 + 132);
    const memory = findDistinctLoops(net, { cap: 1_000_000, memoryBound: 50_000 });
    expect(memory.stoppedBy).toBe('memory-bound');
    // The defaults stop it too (the default run takes a few seconds; not timed here).
    const defaults = findDistinctLoops(net, { cap: 1_000_000 });
    expect(['work-budget', 'memory-bound']).toContain(defaults.stoppedBy);
    expect(defaults.capReached).toBe(true);
  });

  it('the report never says "more loops exist" when a budget stopped the search', () => {
    const net = allRebates(12);
    const audit = auditNetwork(net, { loopCap: 1_000_000, loopWorkBudget: 200_000 });
    const report = auditReport(net, audit);
    expect(report.loop_search.stopped_by).toBe('work-budget');
    expect(report.loop_search_note).toMatch(/stopped at its work budget .* before the loop cap of 1000000; more loops may exist/);
    expect(report.loop_search_note).not.toMatch(/more loops exist than/);
    const search = { stoppedBy: 'cap' as const, cap: 3, searches: 9, work: 99, workBudget: 1, memoryBound: 1 };
    expect(loopSearchNote(3, search)).toMatch(/^more loops exist than the 3 reported/);
    expect(loopSearchNote(3, { ...search, stoppedBy: 'complete' })).toBeNull();
  });
});
