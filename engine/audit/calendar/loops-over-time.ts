// Rebate loops over the calendar. Loops are searched only in the maximal period networks (a covered
// network's loops are all in the network covering it); a loop is then placed in every period and
// class whose network plans all of its rows, with that network's net per lap. Loops are the same
// loop when they are made of the same lane rows, whatever the period or class.

import { findDistinctLoops } from '../distinct-loops';
import type { PeriodNetwork } from './period-networks';
import type { ReviewPeriod } from './periods';

export interface LoopPresence {
  vehicleClass: string | null;
  period: number;
  netPerLap: number;
}

export interface CalendarLoop {
  /** 1-based, in order of the first period the loop exists in. */
  id: number;
  /** LaneTable rows in travel order; rows[i] leaves depots[i]. */
  rows: number[];
  depots: number[];
  /** Every (class, period) in which the loop exists, by class then period. */
  presence: LoopPresence[];
}

export interface LoopsOverTime {
  loops: CalendarLoop[];
  /** True when a search stopped at its cap or budget: more loops may exist. */
  capReached: boolean;
}

export interface LoopRange {
  /** First and last period index of the range. */
  first: number;
  last: number;
  /** Net per lap per class in this range (the same on every day of it). */
  nets: { vehicleClass: string | null; netPerLap: number }[];
}

/** Distinct loops over every period and class, up to `cap` (default 100). */
export function loopsOverTime(nets: readonly PeriodNetwork[], options: { cap?: number; onProgress?: (done: number, total: number) => void } = {}): LoopsOverTime {
  const cap = Math.max(1, options.cap ?? 100);
  const found = new Map<string, { rows: number[]; depots: number[] }>();
  let capReached = false;
  const maximal = nets.filter((n) => n.maximal);
  maximal.forEach((net, i) => {
    options.onProgress?.(i, maximal.length);
    // Once the cap is full the search stops: where a loop exists is read off every network below,
    // and whether more loops exist is already answered (yes, or maybe).
    if (found.size >= cap) {
      capReached = true;
      return;
    }
    const distinct = findDistinctLoops(net.network, { cap });
    if (distinct.capReached) capReached = true;
    for (const loop of distinct.loops) {
      const rows = loop.lanes.map((e) => net.record[e]);
      const key = rows.slice().sort((a, b) => a - b).join(',');
      if (!found.has(key)) found.set(key, { rows, depots: loop.depots });
    }
  });
  options.onProgress?.(maximal.length, maximal.length);

  const loops = [...found.values()].map(({ rows, depots }) => ({ id: 0, rows, depots, presence: presenceOf(nets, rows) }));
  const firstPeriod = (l: CalendarLoop) => Math.min(...l.presence.map((p) => p.period));
  loops.sort((a, b) => firstPeriod(a) - firstPeriod(b) || a.rows.join(',').localeCompare(b.rows.join(',')));
  if (loops.length > cap) {
    loops.length = cap;
    capReached = true;
  }
  loops.forEach((loop, i) => (loop.id = i + 1));
  return { loops, capReached };
}

function presenceOf(nets: readonly PeriodNetwork[], rows: readonly number[]): LoopPresence[] {
  const out: LoopPresence[] = [];
  for (const net of nets) {
    let lap = 0;
    let planned = true;
    for (const r of rows) {
      const e = net.laneOf[r];
      if (e < 0) {
        planned = false;
        break;
      }
      lap += net.network.laneNet[e];
    }
    if (!planned || lap >= 0) continue;
    for (const period of net.periods) out.push({ vehicleClass: net.vehicleClass, period, netPerLap: lap });
  }
  return out.sort((a, b) => a.period - b.period);
}

/** The loop's periods merged into ranges of consecutive periods with the same nets per class. */
export function loopRanges(loop: CalendarLoop, classes: readonly (string | null)[]): LoopRange[] {
  const byPeriod = new Map<number, LoopRange['nets']>();
  for (const p of loop.presence) {
    const list = byPeriod.get(p.period) ?? [];
    list.push({ vehicleClass: p.vehicleClass, netPerLap: p.netPerLap });
    byPeriod.set(p.period, list);
  }
  const order = (c: string | null) => classes.indexOf(c);
  const ranges: LoopRange[] = [];
  for (const period of [...byPeriod.keys()].sort((a, b) => a - b)) {
    const nets = byPeriod.get(period)!.sort((a, b) => order(a.vehicleClass) - order(b.vehicleClass));
    const last = ranges[ranges.length - 1];
    if (last && last.last === period - 1 && JSON.stringify(last.nets) === JSON.stringify(nets)) last.last = period;
    else ranges.push({ first: period, last: period, nets });
  }
  return ranges;
}

/** Merges sorted period indices into [first, last] runs of consecutive periods. */
export function periodRuns(periodIndices: Iterable<number>): [number, number][] {
  const sorted = [...new Set(periodIndices)].sort((a, b) => a - b);
  const runs: [number, number][] = [];
  for (const k of sorted) {
    const last = runs[runs.length - 1];
    if (last && last[1] === k - 1) last[1] = k;
    else runs.push([k, k]);
  }
  return runs;
}

/** Period index -> ids of the loops that exist in it (any class). */
export function loopsByPeriod(loops: readonly CalendarLoop[], periods: readonly ReviewPeriod[]): number[][] {
  const out = periods.map(() => new Set<number>());
  for (const loop of loops) for (const p of loop.presence) out[p.period].add(loop.id);
  return out.map((s) => [...s].sort((a, b) => a - b));
}
