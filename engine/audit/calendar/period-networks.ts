// The network of every period and vehicle class, rebuilt by the planner for the period's first day
// (the set of valid rows is the same on every day of a period). Periods that plan to the same rows
// share one network. A network whose lanes (with the same nets) all lie in a larger one of the same
// class is *covered*: every loop it has, the larger one has too, and every back path it offers the
// larger one offers at the same or lower cost. So loops, fix plans and headroom need only be
// worked out on the *maximal* networks; the others are read off them.

import { isoDateText } from '../../import/cells';
import type { Network } from '../../network/types';
import type { CalendarSource } from './calendar-source';
import type { ReviewPeriod } from './periods';

export interface PeriodNetwork {
  vehicleClass: string | null;
  /** Indices of the periods that plan to this network, in date order. */
  periods: number[];
  network: Network;
  /** LaneTable row of each lane. */
  record: Int32Array;
  /** Per LaneTable row: its lane index here, -1 when it is not planned here. */
  laneOf: Int32Array;
  /** True when no other network of the same class holds all of this one's lanes and more. */
  maximal: boolean;
  /** A maximal network of the same class holding all of this one's lanes (its own index when maximal). */
  coveredBy: number;
}

export interface PeriodNetworksOptions {
  /** Classes to review; default every class of the file, or the default toll when it has none. */
  vehicleClasses?: (string | null)[];
  onProgress?: (done: number, total: number) => void;
}

/** The classes a review covers by default. */
export function reviewClasses(result: Pick<CalendarSource, 'vehicleClasses'>): (string | null)[] {
  return result.vehicleClasses.length > 0 ? result.vehicleClasses.slice() : [null];
}

/** Distinct networks, grouped by class in the order of `classes`, then by first period. */
export function periodNetworks(source: CalendarSource, periods: readonly ReviewPeriod[], options: PeriodNetworksOptions = {}): PeriodNetwork[] {
  const classes = options.vehicleClasses ?? reviewClasses(source);
  const rows = source.lanes.count;
  const out: PeriodNetwork[] = [];
  let done = 0;
  for (const vehicleClass of classes) {
    const first = out.length;
    const byRows = new Map<string, number>();
    periods.forEach((period, k) => {
      const planned = source.plan(isoDateText(period.from) ?? undefined, vehicleClass);
      const record = planned.laneRecord;
      const key = record.join(',');
      const known = byRows.get(key);
      if (known !== undefined) out[known].periods.push(k);
      else {
        const laneOf = new Int32Array(rows).fill(-1);
        for (let e = 0; e < record.length; e++) laneOf[record[e]] = e;
        byRows.set(key, out.length);
        out.push({ vehicleClass, periods: [k], network: planned.network, record, laneOf, maximal: true, coveredBy: out.length });
      }
      options.onProgress?.(++done, periods.length * classes.length);
    });
    markMaximal(out, first);
  }
  return out;
}

/** True when every lane of `a` is planned in `b` with the same net. */
export function coveredBy(a: PeriodNetwork, b: PeriodNetwork): boolean {
  if (a.record.length > b.record.length) return false;
  for (let e = 0; e < a.record.length; e++) {
    const there = b.laneOf[a.record[e]];
    if (there < 0 || b.network.laneNet[there] !== a.network.laneNet[e]) return false;
  }
  return true;
}

// Largest first: a network covered by a non-maximal one is covered by the maximal one that covers that.
function markMaximal(nets: PeriodNetwork[], first: number): void {
  const order = nets.slice(first).map((_, i) => first + i).sort((a, b) => nets[b].record.length - nets[a].record.length || a - b);
  const maximal: number[] = [];
  for (const i of order) {
    const cover = maximal.find((j) => nets[j].record.length > nets[i].record.length && coveredBy(nets[i], nets[j]));
    nets[i].maximal = cover === undefined;
    nets[i].coveredBy = cover ?? i;
    if (cover === undefined) maximal.push(i);
  }
}
