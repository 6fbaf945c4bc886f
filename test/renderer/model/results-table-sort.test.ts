// The results table's keyed sort against brute force: on random depots (missing and infinite
// figures, repeated values, mixed-case ids, every caution combination) every sort key in both
// directions gives the order of a plain comparator written from the rules (String.prototype
// .localeCompare for text, missing figures last either way, most cautions first, ties by depot);
// and the table's in-place order over a solve's arrays lists the same depots as the rows would.

import { describe, expect, it } from 'vitest';
import { DEFAULT_QUERY, queryDepots, queryRows, resultRows, type ResultRow, type SortKey, type StatusWord, type TableQuery } from '../../../renderer/model/results-table';
import type { NetworkView, SolveView } from '../../../renderer/worker/protocol';
import { flagLabels } from '../../../renderer/model/flags';
import { seededRandom } from '../../support/seeded-random';

const KEYS: SortKey[] = ['id', 'name', 'status', 'cost', 'legs', 'drive', 'flags', 'delta'];
const ORDER: Record<StatusWord, number> = { origin: 0, unbounded: 1, reachable: 2, unreachable: 3 };

function reference(rows: readonly ResultRow[], key: SortKey, descending: boolean): ResultRow[] {
  const missing = (v: number) => !Number.isFinite(v) || v < -1e300;
  const numeric = (a: number, b: number) => (missing(a) || missing(b) ? (missing(a) === missing(b) ? 0 : missing(a) ? 1 : -1) : descending ? b - a : a - b);
  const text = (a: string, b: string) => (descending ? b.localeCompare(a) : a.localeCompare(b));
  const by = (a: ResultRow, b: ResultRow): number => {
    if (key === 'id' || key === 'name') return text(a[key], b[key]);
    if (key === 'status') return descending ? ORDER[b.status] - ORDER[a.status] : ORDER[a.status] - ORDER[b.status];
    if (key === 'legs') return numeric(a.legs < 0 ? NaN : a.legs, b.legs < 0 ? NaN : b.legs);
    if (key === 'flags') return descending ? a.flagText.length - b.flagText.length : b.flagText.length - a.flagText.length;
    const field = key === 'cost' ? 'costMinor' : key === 'drive' ? 'driveMinutes' : 'deltaMinor';
    return numeric(a[field], b[field]);
  };
  return [...rows].sort((a, b) => by(a, b) || a.depot - b.depot);
}

/**
 * Random rows; with `odd`, some figures are not whole or are past 2^35 (the sort's packed fast path
 * then steps aside for the comparator), else every present figure is whole and small (the fast path).
 */
function randomRows(seed: number, n: number, odd: 'fractions' | 'huge' | null = null): ResultRow[] {
  const next = seededRandom(seed);
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(next() * xs.length)];
  const figure = () => pick([NaN, Infinity, -Infinity, -1e301, 0, -5, 120, 120, Math.round(next() * 1000), odd === 'fractions' ? 12.5 : odd === 'huge' ? 2 ** 40 : -7]);
  return Array.from({ length: n }, (_, depot) => {
    const flags = Math.floor(next() * 32);
    return {
      depot,
      id: pick(['D1', 'd1', 'D10', 'D2', 'É3', 'e3', 'Z', 'a']) + (next() < 0.5 ? '' : String(Math.floor(next() * 20))),
      name: pick(['Lyon', 'lyon', 'Łódź', 'Ängelholm', 'Zürich', 'Aachen', '']),
      status: pick(['origin', 'reachable', 'unreachable', 'unbounded'] as const),
      unbounded: next() < 0.1,
      costMinor: figure(),
      legs: pick([-1, 0, 1, 2, 2, 7]),
      driveMinutes: figure(),
      flags,
      flagText: flagLabels(flags),
      deltaMinor: figure(),
    };
  });
}

describe('queryRows sorting', () => {
  it.each([
    [1, null],
    [2, null],
    [3, 'fractions'],
    [4, 'huge'],
  ] as const)('orders random depots as the plain comparator does, every key both ways (seed %i, odd figures: %s)', (seed, odd) => {
    const rows = randomRows(seed, 400, odd);
    for (const sortKey of KEYS)
      for (const descending of [false, true]) {
        const got = queryRows(rows, { text: '', status: 'all', flaggedOnly: false, sortKey, descending }).map((r) => r.depot);
        expect(got, `${sortKey} ${descending ? 'descending' : 'ascending'}`).toEqual(reference(rows, sortKey, descending).map((r) => r.depot));
      }
  });
});

describe('queryDepots', () => {
  it.each([4, 5])('lists the depots queryRows lists for every key, direction and filter, without making rows (seed %i)', (seed) => {
    const next = seededRandom(seed);
    const n = 300;
    const figure = () => [NaN, Infinity, 0, 120, 120, Math.round(next() * 1000), -40][Math.floor(next() * 7)];
    const network = { depotIds: Array.from({ length: n }, (_, d) => ['D', 'd', 'É', 'e'][d % 4] + String(Math.floor(next() * 50))), depotNames: Array.from({ length: n }, () => ['Lyon', 'lyon', 'Łódź hub', 'Aachen'][Math.floor(next() * 4)]) } as unknown as NetworkView;
    const status = Uint8Array.from({ length: n }, () => Math.floor(next() * 3));
    const solve = {
      origin: 3,
      status,
      cost: Float64Array.from({ length: n }, figure),
      legs: Int32Array.from({ length: n }, () => Math.floor(next() * 5) - 1),
      driveMinutes: Float64Array.from({ length: n }, figure),
      flags: Uint8Array.from({ length: n }, () => Math.floor(next() * 32)),
      base: { status: Uint8Array.from({ length: n }, () => (next() < 0.8 ? 1 : 0)), cost: Float64Array.from({ length: n }, figure), legs: new Int32Array(n), routeChanged: new Uint8Array(n) },
    } as unknown as SolveView;
    const rows = resultRows(network, solve);
    const queries: TableQuery[] = [];
    for (const sortKey of KEYS) for (const descending of [false, true]) queries.push({ ...DEFAULT_QUERY, sortKey, descending });
    queries.push({ ...DEFAULT_QUERY, text: 'hub' }, { ...DEFAULT_QUERY, text: 'd1' }, { ...DEFAULT_QUERY, status: 'unbounded' }, { ...DEFAULT_QUERY, flaggedOnly: true, sortKey: 'flags' }, { ...DEFAULT_QUERY, text: 'loop', status: 'reachable' });
    for (const query of queries) expect(Array.from(queryDepots(network, solve, query)), JSON.stringify(query)).toEqual(queryRows(rows, query).map((r) => r.depot));
  });
});
