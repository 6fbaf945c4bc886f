// Rebate headroom over the calendar: a row's floor is the highest of its one-period floors (the
// lowest net that is safe in every period it is valid in), and the period with that floor sets it.
// A covered network's back paths all exist, no dearer, in its cover, so only the maximal networks
// count. One maximal network: the one-network headroom (engine/audit/headroom.ts). Several: all of
// them at once, bounded by their union and their common core (shared-floors.ts), falling back to one
// headroom solve per network when their union has a loop or there are more than 30 of them.

import type { PeriodNetwork } from './period-networks';
import { laneFloors, type HeadroomRunner } from '../headroom';
import { sharedFloors } from './shared-floors';
import { weightsWithCuts } from './period-weights';

export interface RowHeadroom {
  /** LaneTable row. */
  row: number;
  vehicleClass: string | null;
  /** The row's net in this class (after the fix plan when one was applied). */
  net: number;
  /** Lowest safe net over the periods it is valid in; NaN = no limit in any of them. */
  floor: number;
  /** Period index that sets the floor (-1 when there is no limit). */
  setBy: number;
}

export interface HeadroomWork {
  /** Classes whose maximal networks were searched together. */
  together: number;
  /** Whole-network headroom solves (laneFloors calls). */
  wholeSolves: number;
  /** Searched together: lane pairs, those a seasonal lane made cheaper, and the per-network runs over them. */
  pairs: number;
  openPairs: number;
  networkRuns: number;
  /** Depots settled by the headroom searches (a measure of the work, independent of the machine's load). */
  settled: number;
}

interface FloorState {
  floor: Float64Array;
  net: Float64Array;
  setBy: Int32Array;
}

type Maximal = { pn: PeriodNetwork; weights: Float64Array }[];

/** Headroom of every row in every class it is planned in, rows in table order within each class. */
export function headroomOverTime(nets: readonly PeriodNetwork[], rows: number, cut: Float64Array | null, onProgress?: (done: number, total: number) => void, runner?: HeadroomRunner): { rows: RowHeadroom[]; work: HeadroomWork } {
  const out: RowHeadroom[] = [];
  const work: HeadroomWork = { together: 0, wholeSolves: 0, pairs: 0, openPairs: 0, networkRuns: 0, settled: 0 };
  const classes = [...new Set(nets.map((n) => n.vehicleClass))];
  onProgress?.(0, classes.length);
  classes.forEach((vehicleClass, k) => {
    const maximal: Maximal = nets.filter((n) => n.maximal && n.vehicleClass === vehicleClass).map((pn) => ({ pn, weights: weightsWithCuts(pn, cut) }));
    const state: FloorState = { floor: new Float64Array(rows).fill(NaN), net: new Float64Array(rows).fill(NaN), setBy: new Int32Array(rows).fill(-1) };
    if (maximal.length > 1 && maximal.length <= 30 && together(maximal, state, work, runner)) work.together++;
    else for (const m of maximal) wholeFloors(m.pn, m.weights, state, work, runner);
    for (let r = 0; r < rows; r++) if (!Number.isNaN(state.net[r])) out.push({ row: r, vehicleClass, net: state.net[r], floor: state.floor[r], setBy: state.setBy[r] });
    onProgress?.(k + 1, classes.length);
  });
  return { rows: out, work };
}

// Keeps the highest floor per row, the earliest period on ties.
function offer(state: FloorState, r: number, f: number, net: number, period: number): void {
  if (Number.isNaN(state.net[r])) state.net[r] = net;
  if (Number.isNaN(f)) return;
  if (Number.isNaN(state.floor[r]) || f > state.floor[r] || (f === state.floor[r] && period < state.setBy[r])) {
    state.floor[r] = f;
    state.net[r] = net;
    state.setBy[r] = period;
  }
}

function wholeFloors(pn: PeriodNetwork, weights: Float64Array, state: FloorState, work: HeadroomWork, runner: HeadroomRunner | undefined): void {
  const floors = laneFloors(pn.network, { weights, runner });
  work.wholeSolves++;
  work.settled += floors.settled ?? 0;
  for (let e = 0; e < pn.record.length; e++) offer(state, pn.record[e], floors.floor[e], floors.net[e], pn.periods[0]);
}

/** All maximal networks of a class at once; false when their union has a loop. */
function together(maximal: Maximal, state: FloorState, work: HeadroomWork, runner: HeadroomRunner | undefined): boolean {
  // One masked lane per (row, net under the cuts): the bits of the networks holding the row at that net.
  const index = new Map<string, number>();
  const from: number[] = [];
  const to: number[] = [];
  const net: number[] = [];
  const mask: number[] = [];
  const row: number[] = [];
  maximal.forEach(({ pn, weights }, bit) => {
    const { network, record } = pn;
    for (let p = 0; p < weights.length; p++) {
      const e = network.outLane[p];
      const key = `${record[e]}|${weights[p]}`;
      let j = index.get(key);
      if (j === undefined) {
        index.set(key, (j = from.length));
        from.push(network.laneFrom[e]);
        to.push(network.laneTo[e]);
        net.push(weights[p]);
        mask.push(0);
        row.push(record[e]);
      }
      mask[j] |= 1 << bit;
    }
  });
  const found = sharedFloors(maximal[0].pn.network, {
    from: Int32Array.from(from),
    to: Int32Array.from(to),
    net: Float64Array.from(net),
    mask: Int32Array.from(mask),
    row: Int32Array.from(row),
  }, maximal.length, maximal.map((_, bit) => bit).sort((a, b) => maximal[a].pn.periods[0] - maximal[b].pn.periods[0]), runner);
  if (found === null) return false;
  work.pairs += found.pairs;
  work.openPairs += found.openPairs;
  work.networkRuns += found.networkRuns;
  work.settled += found.settled;
  const earliest = (bits: number) => {
    let period = Infinity;
    maximal.forEach(({ pn }, bit) => {
      if (bits & (1 << bit)) period = Math.min(period, pn.periods[0]);
    });
    return period;
  };
  // Nets in table order of the first network holding the row, so a row's net does not depend on the search.
  maximal.forEach(({ pn, weights }) => {
    for (let p = 0; p < weights.length; p++) {
      const r = pn.record[pn.network.outLane[p]];
      if (Number.isNaN(state.net[r])) state.net[r] = weights[p];
    }
  });
  for (let j = 0; j < from.length; j++) offer(state, row[j], found.floor[j], net[j], found.setIn[j] === 0 ? -1 : earliest(found.setIn[j]));
  return true;
}
