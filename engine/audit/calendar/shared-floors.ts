// Floors of several period networks of one class at once, from two headroom runs over all lanes
// and a few narrow ones. Every network N lies between the common core C (lanes every network holds,
// at the same net) and the union U, so for the back path v -> u of a lane u -> v:
//   d_U(v, u) <= d_N(v, u) <= d_C(v, u).
// Where d_U = d_C, every network has that back cost: the lane's floor is settled and every network
// holding the lane sets it. Only the pairs where a seasonal lane makes the union cheaper (d_U < d_C)
// are searched again, network by network, for those pairs alone. All runs use the union's Johnson
// potentials: its reduced costs are >= 0 on every lane, so they serve each network and the core as
// they are (lanes a network lacks are closed), and each run is the fast headroom search
// (headroom-buckets.ts) through the caller's runner (one thread, or the CLI's worker threads).

import type { Network } from '../../network/types';
import { restoreCost } from '../../routes/johnson-potentials';
import { defaultBallSize, reverseLanes, type HeadroomArrays } from '../headroom-buckets';
import { headroomPlan, singleThreadRunner, type HeadroomRunner } from '../headroom';
import { laneSetNetwork } from './lane-set-network';
import { firstLoop } from './period-weights';

/** Lanes of several networks (at most 30): each at one net, with the bit of every network holding it at that net. */
export interface MaskedLanes {
  from: Int32Array;
  to: Int32Array;
  net: Float64Array;
  mask: Int32Array;
  /** LaneTable row, carried through. */
  row: Int32Array;
}

export interface SharedFloors {
  /** Per masked lane: -(cheapest back path over its networks); NaN when none has one. */
  floor: Float64Array;
  /** Per masked lane: networks (bits) whose back path is that cheapest one, the earliest of them always among them (0 when none has a back path). */
  setIn: Int32Array;
  /** Distinct (destination, origin) pairs, those a seasonal lane made cheaper, and the per-network runs over them. */
  pairs: number;
  openPairs: number;
  networkRuns: number;
  /** Depots settled by all the runs. */
  settled: number;
}

// The plan's arrays with only the lanes `keep` accepts (per CSR position) open, asking only `pairs`
// (all when null), with known bounds on each pair's cost (per pair of the plan).
function narrowed(network: Network, arrays: HeadroomArrays, keep: (p: number) => boolean, pairs: number[] | null, upper: Float64Array | undefined, lower: Float64Array | undefined): HeadroomArrays {
  const outCost = arrays.outCost.slice();
  for (let p = 0; p < outCost.length; p++) if (!keep(p)) outCost[p] = Infinity;
  const reverse = reverseLanes(network, outCost);
  if (pairs === null) return { ...arrays, outCost, inCost: reverse.inCost, pairUpper: upper, pairLower: lower };
  const n = arrays.depotCount;
  const pairStart = new Int32Array(n + 1);
  const pairOrigin = new Int32Array(pairs.length);
  // `pairs` are in ascending order, so still grouped by destination.
  let at = 0;
  for (let v = 0; v < n; v++) {
    pairStart[v] = at;
    while (at < pairs.length && pairs[at] < arrays.pairStart[v + 1]) pairOrigin[at] = arrays.pairOrigin[pairs[at++]];
  }
  pairStart[n] = at;
  const pick = (bound: Float64Array) => Float64Array.from(pairs, (k) => bound[k]);
  return { ...arrays, outCost, inCost: reverse.inCost, pairStart, pairOrigin, pairUpper: upper && pick(upper), pairLower: lower && pick(lower) };
}

/**
 * `order`: the networks (bits) earliest period first; null when the union of the networks has a loop
 * (no common potentials): then solve them one by one.
 */
export function sharedFloors(template: Network, lanes: MaskedLanes, networks: number, order: readonly number[], runner: HeadroomRunner = singleThreadRunner): SharedFloors | null {
  const union = laneSetNetwork(template, lanes.from, lanes.to, lanes.net, lanes.row);
  if (firstLoop(union, union.outNet) !== null) return null;
  const plan = headroomPlan(union);
  const { arrays, pairOf, setup } = plan;
  const { inLane, potential } = setup;
  const ballSize = defaultBallSize(union.depotCount);
  const m = union.laneCount;
  const pairs = arrays.pairOrigin.length;
  let all = 0;
  for (let e = 0; e < m; e++) all |= lanes.mask[e];
  const laneAt = union.outLane;

  const union1 = runner.run(arrays, ballSize);
  const inUnion = union1.cost;
  let settled = union1.settled;
  // The union's cost is a lower bound for the core's (and every network's); the core's an upper bound for every network's.
  const core = runner.run(narrowed(union, arrays, (p) => lanes.mask[laneAt[p]] === all, null, undefined, inUnion), ballSize);
  const inCore = core.cost;
  settled += core.settled;

  // Pairs a seasonal lane made cheaper, numbered 0.. in pair order.
  const openIndex = new Int32Array(pairs).fill(-1);
  const open: number[] = [];
  for (let k = 0; k < pairs; k++) if (inUnion[k] < inCore[k]) openIndex[k] = open.length, open.push(k);

  // A pair whose lanes all lie in the same networks ("uniform", nearly all) needs only the cheapest
  // over them and the earliest network that has it: the networks run in period order, each starting
  // from the cheapest found so far (the search then gives min(that, its own cost), see the exactness
  // argument in headroom-buckets.ts), and a pair already at the union's cost is asked no more.
  // Other pairs (a lane and a seasonal twin between the same depots) keep every network's own cost.
  const uniform = new Uint8Array(pairs).fill(1);
  const pairMask = new Int32Array(pairs).fill(-1);
  for (let i = 0; i < inLane.length; i++) {
    const k = pairOf[i];
    const mask = lanes.mask[inLane[i]];
    if (pairMask[k] === -1) pairMask[k] = mask;
    else if (pairMask[k] !== mask) uniform[k] = 0;
  }
  const upper = inCore.slice();
  const achiever = new Int32Array(open.length).fill(-1);
  // Per open non-uniform pair and network: the back cost there (+Infinity where not searched: no lane of the pair in it).
  const perNetwork = new Float64Array(open.length * networks).fill(Infinity);
  let networkRuns = 0;
  for (const bit of order) {
    const asked = new Uint8Array(open.length);
    for (let i = 0; i < inLane.length; i++) {
      const j = openIndex[pairOf[i]];
      if (j !== -1 && lanes.mask[inLane[i]] & (1 << bit)) asked[j] = 1;
    }
    const wanted = open.filter((k, j) => asked[j] === 1 && !(uniform[k] && upper[k] <= inUnion[k]));
    if (wanted.length === 0) continue;
    networkRuns++;
    const run = runner.run(narrowed(union, arrays, (p) => (lanes.mask[laneAt[p]] & (1 << bit)) !== 0, wanted, upper, inUnion), ballSize);
    const cost = run.cost;
    settled += run.settled;
    wanted.forEach((k, at) => {
      const j = openIndex[k];
      if (!uniform[k]) perNetwork[j * networks + bit] = cost[at];
      else if (cost[at] < upper[k]) (upper[k] = cost[at]), (achiever[j] = bit);
    });
  }

  const floor = new Float64Array(m).fill(NaN);
  const setIn = new Int32Array(m);
  for (let i = 0; i < inLane.length; i++) {
    const e = inLane[i];
    const k = pairOf[i];
    const mask = lanes.mask[e];
    let best = inUnion[k];
    let bits = mask;
    const j = openIndex[k];
    if (j !== -1 && uniform[k]) {
      // No network below the core's cost: every one of the lane's networks has it.
      best = upper[k];
      bits = achiever[j] === -1 ? mask : 1 << achiever[j];
    } else if (j !== -1) {
      // The cheapest over the lane's own networks, and every network that has it.
      best = Infinity;
      bits = 0;
      for (let bit = 0; bit < networks; bit++) {
        if (!(mask & (1 << bit))) continue;
        const c = perNetwork[j * networks + bit];
        if (c < best) (best = c), (bits = 1 << bit);
        else if (c === best && c !== Infinity) bits |= 1 << bit;
      }
    }
    if (best === Infinity) continue;
    const back = restoreCost(best, potential, lanes.to[e], lanes.from[e]);
    floor[e] = back === 0 ? 0 : -back;
    setIn[e] = bits;
  }
  return { floor, setIn, pairs, openPairs: open.length, networkRuns, settled };
}
