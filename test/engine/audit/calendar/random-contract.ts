// Small random contracts with validity windows for the calendar review's brute-force tests: a few
// depots, lanes with tolls for two classes (wide layout), rebates on some rows, clauses on some, and
// windows over January-February 2026 that touch, nest, overlap and leave gaps.

import { seededRandom } from '../../../support/seeded-random';

export interface ContractRow {
  from: number;
  to: number;
  toll: [number, number];
  fuel: number;
  fees: number;
  rebate: number;
  /** yyyymmdd, 0 = open. */
  validFrom: number;
  validTo: number;
  clause: string;
  ref: string;
}

export interface Contract {
  depots: number;
  rows: ContractRow[];
  depotsCsv: string;
  lanesCsv: string;
}

const DATES = [20260101, 20260105, 20260110, 20260111, 20260120, 20260131, 20260201, 20260214, 20260215, 20260228];
const iso = (d: number) => `${Math.floor(d / 10000)}-${String(Math.floor(d / 100) % 100).padStart(2, '0')}-${String(d % 100).padStart(2, '0')}`;
const money = (minor: number) => (minor / 100).toFixed(2);

export function randomContract(seed: number, depots = 4, lanes = 12): Contract {
  const r = seededRandom(seed);
  const pick = (k: number) => Math.floor(r() * k);
  const rows: ContractRow[] = [];
  for (let i = 0; i < lanes; i++) {
    const from = pick(depots);
    let to = pick(depots - 1);
    if (to >= from) to++;
    const base = 20 + pick(40);
    const rebate = r() < 0.5 ? 10 + pick(60) : 0;
    let validFrom = 0;
    let validTo = 0;
    if (r() < 0.7) {
      const a = pick(DATES.length);
      const b = pick(DATES.length);
      validFrom = r() < 0.15 ? 0 : DATES[Math.min(a, b)];
      validTo = r() < 0.15 ? 0 : DATES[Math.max(a, b)];
    }
    rows.push({
      from,
      to,
      toll: [pick(10), pick(25)],
      fuel: base,
      fees: pick(5),
      rebate,
      validFrom,
      validTo,
      clause: rebate > 0 && r() < 0.7 ? ['1.1', '2.4', '7.2'][pick(3)] : '',
      ref: `R-${i + 1}`,
    });
  }
  const depotsCsv = 'id,lat,lon\n' + Array.from({ length: depots }, (_, d) => `D${d},${50 + d / 10},${4 + d / 10}`).join('\n') + '\n';
  const lanesCsv =
    'from,to,ref,toll_a,toll_b,fuel,fees,rebate,valid_from,valid_to,clause\n' +
    rows
      .map((x) => [`D${x.from}`, `D${x.to}`, x.ref, money(x.toll[0]), money(x.toll[1]), money(x.fuel), money(x.fees), money(x.rebate), x.validFrom ? iso(x.validFrom) : '', x.validTo ? iso(x.validTo) : '', x.clause].join(','))
      .join('\n') +
    '\n';
  return { depots, rows, depotsCsv, lanesCsv };
}

/** Net of a row for class 0 ('a') or 1 ('b'), minor units. */
export const rowNet = (x: ContractRow, cls: number) => x.toll[cls] + x.fuel + x.fees - x.rebate;

export const validOn = (x: ContractRow, day: number) => (x.validFrom === 0 || x.validFrom <= day) && (x.validTo === 0 || x.validTo >= day);

/** Every negative simple loop of the lanes (by row index), each as its sorted rows. Brute force by DFS. */
export function negativeLoops(depots: number, lanes: { row: number; from: number; to: number; net: number }[]): string[] {
  const found = new Set<string>();
  const walk = (start: number, at: number, rows: number[], net: number, visited: Set<number>) => {
    for (const lane of lanes) {
      if (lane.from !== at) continue;
      if (lane.to === start) {
        if (net + lane.net < 0) found.add([...rows, lane.row].sort((a, b) => a - b).join(','));
        continue;
      }
      // Each loop is walked from its lowest depot only.
      if (lane.to < start || visited.has(lane.to)) continue;
      visited.add(lane.to);
      walk(start, lane.to, [...rows, lane.row], net + lane.net, visited);
      visited.delete(lane.to);
    }
  };
  for (let s = 0; s < depots; s++) walk(s, s, [], 0, new Set([s]));
  return [...found].sort();
}

/** Cheapest cost between every pair (Floyd-Warshall by hand; lanes must hold no negative loop). */
export function allPairs(depots: number, lanes: { from: number; to: number; net: number }[]): number[][] {
  const d = Array.from({ length: depots }, (_, i) => Array.from({ length: depots }, (_, j) => (i === j ? 0 : Infinity)));
  for (const l of lanes) if (l.net < d[l.from][l.to]) d[l.from][l.to] = l.net;
  for (let k = 0; k < depots; k++) for (let i = 0; i < depots; i++) for (let j = 0; j < depots; j++) if (d[i][k] + d[k][j] < d[i][j]) d[i][j] = d[i][k] + d[k][j];
  return d;
}
