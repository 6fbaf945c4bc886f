// Sorting and filtering of the results table: missing figures always last, stable ties, filters
// by text, status and caution flags.

import { describe, expect, it } from 'vitest';
import { FLAG_LONG_DRIVE, FLAG_UNBOUNDED } from '../../../renderer/model/flags';
import { costText, DEFAULT_QUERY, queryRows, resultRows, statusBadges, statusText, toggleSort } from '../../../renderer/model/results-table';
import type { NetworkView, SolveView } from '../../../renderer/worker/protocol';

function fixture(): { network: NetworkView; solve: SolveView } {
  const ids = ['ORG', 'AAA', 'BBB', 'CCC', 'DDD'];
  const network = { depotIds: ids, depotNames: ['Origin yard', 'Alpha', 'Bravo hub', 'Charlie', 'Delta port'] } as unknown as NetworkView;
  const solve = {
    origin: 0,
    status: Uint8Array.from([1, 1, 2, 0, 1]),
    cost: Float64Array.from([0, 500, NaN, NaN, 200]),
    legs: Int32Array.from([0, 2, -1, -1, 1]),
    driveMinutes: Float64Array.from([0, 600, NaN, NaN, 90]),
    flags: Uint8Array.from([0, FLAG_LONG_DRIVE, FLAG_UNBOUNDED, 0, 0]),
    base: { status: Uint8Array.from([1, 1, 1, 0, 1]), cost: Float64Array.from([0, 450, 300, NaN, 200]), legs: Int32Array.from([0, 2, 1, -1, 1]), routeChanged: new Uint8Array(5) },
  } as unknown as SolveView;
  return { network, solve };
}

describe('results table model', () => {
  const { network, solve } = fixture();
  const rows = resultRows(network, solve);

  it('names statuses, flags and the change against the scenario base', () => {
    expect(rows.map((r) => r.status)).toEqual(['origin', 'reachable', 'unbounded', 'unreachable', 'reachable']);
    expect(rows[1].flagText).toEqual(['over daily driving limit']);
    expect(rows[1].deltaMinor).toBe(50);
    expect(rows[2].deltaMinor).toBeNaN(); // unbounded now: no comparable figure
  });

  it('sorts by cost with missing costs last in both directions', () => {
    expect(queryRows(rows, DEFAULT_QUERY).map((r) => r.id)).toEqual(['ORG', 'DDD', 'AAA', 'BBB', 'CCC']);
    const down = toggleSort(DEFAULT_QUERY, 'cost');
    expect(down.descending).toBe(true);
    expect(queryRows(rows, down).map((r) => r.id)).toEqual(['AAA', 'DDD', 'ORG', 'BBB', 'CCC']);
  });

  it('sorts by name and by status; a new key starts ascending', () => {
    const byName = toggleSort(DEFAULT_QUERY, 'name');
    expect(byName).toMatchObject({ sortKey: 'name', descending: false });
    expect(queryRows(rows, byName).map((r) => r.id)).toEqual(['AAA', 'BBB', 'CCC', 'DDD', 'ORG']);
    expect(queryRows(rows, { ...DEFAULT_QUERY, sortKey: 'status' }).map((r) => r.status)).toEqual(['origin', 'unbounded', 'reachable', 'reachable', 'unreachable']);
  });

  it('filters by text in id, name or caution, by status, and by flagged rows', () => {
    expect(queryRows(rows, { ...DEFAULT_QUERY, text: 'hub' }).map((r) => r.id)).toEqual(['BBB']);
    expect(queryRows(rows, { ...DEFAULT_QUERY, text: 'driving' }).map((r) => r.id)).toEqual(['AAA']);
    expect(queryRows(rows, { ...DEFAULT_QUERY, status: 'unreachable' }).map((r) => r.id)).toEqual(['CCC']);
    expect(queryRows(rows, { ...DEFAULT_QUERY, flaggedOnly: true }).map((r) => r.id)).toEqual(['AAA', 'BBB']);
  });

  it('says an unbounded origin is unbounded in words, not by colour alone, and lists it under "unbounded"', () => {
    const looped = { ...solve, status: Uint8Array.from([2, 2, 2, 0, 2]), cost: Float64Array.from([NaN, NaN, NaN, NaN, NaN]), flags: Uint8Array.from([FLAG_UNBOUNDED, FLAG_UNBOUNDED, FLAG_UNBOUNDED, 0, FLAG_UNBOUNDED]) } as SolveView;
    const loopRows = resultRows(network, looped);
    expect(loopRows[0]).toMatchObject({ status: 'origin', unbounded: true });
    expect(statusText(loopRows[0])).toBe('origin · ∞ unbounded');
    expect(statusBadges(loopRows[0]).map((b) => b.kind)).toEqual(['origin', 'unbounded']);
    expect(costText(loopRows[0], 2)).toBe('no finite cost');
    expect(queryRows(loopRows, { ...DEFAULT_QUERY, status: 'unbounded' }).map((r) => r.id)).toEqual(['ORG', 'AAA', 'BBB', 'DDD']);
    expect(queryRows(loopRows, { ...DEFAULT_QUERY, status: 'origin' }).map((r) => r.id)).toEqual(['ORG']);
  });

  it('keeps the plain words for a bounded origin and the other statuses', () => {
    expect(rows.map(statusText)).toEqual(['origin', 'reachable', '∞ unbounded', 'unreachable', 'reachable']);
    expect(costText(rows[0], 2)).toBe('0.00');
    expect(costText(rows[1], 2)).toBe('5.00');
    expect(costText(rows[2], 2)).toBe('no finite cost');
    expect(costText(rows[3], 2)).toBe('—');
  });
});
