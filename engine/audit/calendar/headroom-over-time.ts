// Rebate headroom over the calendar: a row's floor is the highest of its one-period floors (the
// lowest net that is safe in every period it is valid in), and the period with that floor sets it.
// A covered network's back paths all exist, no dearer, in its cover, so only the maximal networks
// count. With several of them in a class, two solves bound every row's floor from both sides:
// the *core* (lanes in every maximal network, at their dearest net) has no cheaper back path than
// any of them, so its floor is a lower bound; the *union* (every lane, at its cheapest net) has no
// dearer one, so its floor is an upper bound. Where the bounds meet, that is the floor in every
// period; only the other rows are solved per maximal network, from their destinations, stopping
// once their origins are settled. Whole-network floors come from engine/audit/headroom.ts.

import type { Network } from '../../network/types';
import { createDijkstraWorkspace, dijkstra } from '../../routes/dijkstra';
import { johnsonReweighting, restoreCost } from '../../routes/johnson-potentials';
import { laneFloors } from '../headroom';
import { laneSetNetwork } from './lane-set-network';
import type { PeriodNetwork } from './period-networks';
import { firstLoop, weightsWithCuts } from './period-weights';

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
  /** Whole-network floor solves (laneFloors calls). */
  wholeSolves: number;
  /** Rows whose floor the bounds did not settle. */
  refinedRows: number;
  /** Single-destination searches run for them. */
  searches: number;
}

/** Headroom of every row in every class it is planned in, rows in table order within each class. */
export function headroomOverTime(nets: readonly PeriodNetwork[], rows: number, cut: Float64Array | null, onProgress?: (done: number, total: number) => void): { rows: RowHeadroom[]; work: HeadroomWork } {
  const out: RowHeadroom[] = [];
  const work: HeadroomWork = { wholeSolves: 0, refinedRows: 0, searches: 0 };
  const classes = [...new Set(nets.map((n) => n.vehicleClass))];
  classes.forEach((vehicleClass, k) => {
    const maximal = nets.filter((n) => n.maximal && n.vehicleClass === vehicleClass).map((pn) => ({ pn, weights: weightsWithCuts(pn, cut) }));
    const state = { floor: new Float64Array(rows).fill(NaN), net: new Float64Array(rows).fill(NaN), setBy: new Int32Array(rows).fill(-1) };
    const bounded = maximal.length > 1 && byBounds(maximal, rows, state, work);
    if (!bounded) for (const m of maximal) wholeFloors(m.pn, m.weights, state, work);
    for (let r = 0; r < rows; r++) if (!Number.isNaN(state.net[r])) out.push({ row: r, vehicleClass, net: state.net[r], floor: state.floor[r], setBy: state.setBy[r] });
    onProgress?.(k + 1, classes.length);
  });
  return { rows: out, work };
}

interface FloorState {
  floor: Float64Array;
  net: Float64Array;
  setBy: Int32Array;
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

function wholeFloors(pn: PeriodNetwork, weights: Float64Array, state: FloorState, work: HeadroomWork): void {
  const floors = laneFloors(pn.network, { weights });
  work.wholeSolves++;
  for (let e = 0; e < pn.record.length; e++) offer(state, pn.record[e], floors.floor[e], floors.net[e], pn.periods[0]);
}

/** Floors by the core/union bounds and targeted searches; false (nothing done) when the union has a loop. */
function byBounds(maximal: { pn: PeriodNetwork; weights: Float64Array }[], rows: number, state: FloorState, work: HeadroomWork): boolean {
  // Per maximal network: the net of each lane under the cuts (CSR order back to lane order).
  const laneNet = maximal.map(({ pn, weights }) => {
    const net = new Float64Array(pn.record.length);
    for (let p = 0; p < weights.length; p++) net[pn.network.outLane[p]] = weights[p];
    return net;
  });
  const seen = new Uint16Array(rows);
  const low = new Float64Array(rows).fill(Infinity);
  const high = new Float64Array(rows).fill(-Infinity);
  const ends = { from: new Int32Array(rows), to: new Int32Array(rows) };
  maximal.forEach(({ pn }, i) => {
    for (let e = 0; e < pn.record.length; e++) {
      const r = pn.record[e];
      seen[r]++;
      low[r] = Math.min(low[r], laneNet[i][e]);
      high[r] = Math.max(high[r], laneNet[i][e]);
      ends.from[r] = pn.network.laneFrom[e];
      ends.to[r] = pn.network.laneTo[e];
    }
  });
  const build = (keep: (r: number) => boolean, net: Float64Array) => {
    const picked: number[] = [];
    for (let r = 0; r < rows; r++) if (seen[r] > 0 && keep(r)) picked.push(r);
    return laneSetNetwork(
      maximal[0].pn.network,
      Int32Array.from(picked, (r) => ends.from[r]),
      Int32Array.from(picked, (r) => ends.to[r]),
      Float64Array.from(picked, (r) => net[r]),
      Int32Array.from(picked),
    );
  };
  const union = build(() => true, low);
  if (firstLoop(union, union.outNet) !== null) return false;
  const core = build((r) => seen[r] === maximal.length, high);
  const upper = pairFloors(union, laneFloors(union).floor);
  const lower = pairFloors(core, laneFloors(core).floor);
  work.wholeSolves += 2;

  // Rows settled by the bounds take that floor in every maximal network they are in (the earliest
  // period wins ties); the rest are searched in each.
  const pending: number[][] = maximal.map(() => []);
  const open = new Uint8Array(rows);
  maximal.forEach(({ pn }, i) => {
    for (let e = 0; e < pn.record.length; e++) {
      const r = pn.record[e];
      const key = pairKey(ends.to[r], ends.from[r]);
      const hi = upper.get(key) ?? NaN;
      const lo = lower.get(key) ?? NaN;
      // No back path even in the union: none in any period. Equal bounds: that floor in every period.
      const settled = Number.isNaN(hi) || lo === hi;
      if (settled) offer(state, r, hi, laneNet[i][e], pn.periods[0]);
      else {
        if (!open[r]) work.refinedRows++;
        open[r] = 1;
        pending[i].push(e);
        if (Number.isNaN(state.net[r])) state.net[r] = laneNet[i][e];
      }
    }
  });
  maximal.forEach(({ pn, weights }, i) => {
    if (pending[i].length === 0) return;
    for (const lanes of targetedFloors(pn.network, weights, pending[i]).values()) {
      work.searches++;
      for (const { lane, floor } of lanes) offer(state, pn.record[lane], floor, laneNet[i][lane], pn.periods[0]);
    }
  });
  return true;
}

const pairKey = (v: number, u: number) => v * 0x100000000 + u;

/** Floor per (back-path start v, end u) pair of a network's lanes u -> v: the same for parallel lanes. */
function pairFloors(network: Network, floor: Float64Array): Map<number, number> {
  const out = new Map<number, number>();
  for (let e = 0; e < network.laneCount; e++) out.set(pairKey(network.laneTo[e], network.laneFrom[e]), floor[e]);
  return out;
}

/** Floors of chosen lanes: one Dijkstra (Johnson-reweighted) per distinct destination, stopped at their origins. */
function targetedFloors(network: Network, weights: Float64Array, lanes: readonly number[]): Map<number, { lane: number; floor: number }[]> {
  const { potential, reweighted } = johnsonReweighting(network, weights);
  const byDestination = new Map<number, number[]>();
  for (const e of lanes) {
    const v = network.laneTo[e];
    const list = byDestination.get(v) ?? [];
    list.push(e);
    byDestination.set(v, list);
  }
  const workspace = createDijkstraWorkspace(network.depotCount);
  const out = new Map<number, { lane: number; floor: number }[]>();
  for (const [v, into] of byDestination) {
    const { dist } = dijkstra(network, v, { weights: reweighted, workspace, targets: into.map((e) => network.laneFrom[e]), tree: false });
    out.set(
      v,
      into.map((e) => {
        const u = network.laneFrom[e];
        if (dist[u] === Infinity) return { lane: e, floor: NaN };
        const back = restoreCost(dist[u], potential, v, u);
        return { lane: e, floor: back === 0 ? 0 : -back };
      }),
    );
  }
  return out;
}
