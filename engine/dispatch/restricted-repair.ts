// A vehicle's cheapest routes from its group's solve without limits, instead of a fresh solve: with
// the unrestricted costs d as potentials (Johnson's reweighting, w' = w + d(u) - d(v) >= 0 on every
// lane between depots reached with a bounded cost), depots whose cheapest route uses no closed lane
// keep their cost, and only the subtrees hanging below closed tree lanes are re-solved, by Dijkstra
// seeded from the depots that kept theirs. Exact integers throughout; restricted cost = d(v) + key.
// Only for a solve without unbounded depots (no potentials exist past a rebate loop).
// The seeds are found over the lanes INTO the cut-off depots (a reverse index made once per network),
// so a repair costs the size of the cut-off subtrees, not a scan of every lane of the network.

import { MoneyOverflowError } from '../errors';
import type { Network } from '../network/types';
import { STATUS_REACHABLE, STATUS_UNBOUNDED, STATUS_UNREACHABLE, type RouteTree } from '../routes/cheapest-routes';

/**
 * Lanes into each depot: for q in `inStart[v] .. inStart[v + 1]`, `inPos[q]` is a CSR position p with
 * outTo[p] = v (ascending), `inFrom[q]` its origin depot and `inLane[q]` its lane (fewer lookups per lane).
 */
interface ReverseIndex {
  inStart: Int32Array;
  inPos: Int32Array;
  inFrom: Int32Array;
  inLane: Int32Array;
}

const reverseIndexes = new WeakMap<Network, ReverseIndex>();

function reverseIndexOf(network: Network): ReverseIndex {
  let r = reverseIndexes.get(network);
  if (r) return r;
  const n = network.depotCount;
  const { outTo } = network;
  const inStart = new Int32Array(n + 1);
  for (let p = 0; p < outTo.length; p++) inStart[outTo[p] + 1]++;
  for (let v = 0; v < n; v++) inStart[v + 1] += inStart[v];
  const fill = inStart.slice(0, n);
  const inPos = new Int32Array(outTo.length);
  const inLane = new Int32Array(outTo.length);
  const inFrom = new Int32Array(outTo.length);
  const { outLane, laneFrom } = network;
  for (let p = 0; p < outTo.length; p++) {
    const q = fill[outTo[p]]++;
    inPos[q] = p;
    inLane[q] = outLane[p];
    inFrom[q] = laneFrom[outLane[p]];
  }
  reverseIndexes.set(network, (r = { inStart, inPos, inFrom, inLane }));
  return r;
}

/** True when `repairTree` may be used on `plain`. */
export function canRepair(plain: RouteTree): boolean {
  if (plain.loops.length > 0) return false;
  for (let d = 0; d < plain.status.length; d++) if (plain.status[d] === STATUS_UNBOUNDED) return false;
  return true;
}

/** The RouteTree with `closed` lanes (1 = closed, by lane index) taken out of `plain`'s network. */
export function repairTree(network: Network, plain: RouteTree, closed: Uint8Array): RouteTree {
  const n = network.depotCount;
  const { outStart, outTo, outLane, outNet, laneFrom } = network;
  const d = plain.cost;
  const plainStatus = plain.status;
  // 1. Depots whose cheapest route is open: walk the tree from the origin along open tree lanes.
  const childStart = new Int32Array(n + 1);
  for (let v = 0; v < n; v++) if (plain.viaLane[v] !== -1) childStart[laneFrom[plain.viaLane[v]] + 1]++;
  for (let v = 0; v < n; v++) childStart[v + 1] += childStart[v];
  const fill = childStart.slice(0, n);
  const children = new Int32Array(childStart[n]);
  for (let v = 0; v < n; v++) if (plain.viaLane[v] !== -1) children[fill[laneFrom[plain.viaLane[v]]]++] = v;
  const kept = new Uint8Array(n);
  const stack = [plain.origin];
  kept[plain.origin] = 1;
  while (stack.length > 0) {
    const u = stack.pop()!;
    for (let i = childStart[u]; i < childStart[u + 1]; i++) {
      const v = children[i];
      if (closed[plain.viaLane[v]] === 1) continue;
      kept[v] = 1;
      stack.push(v);
    }
  }

  const status = new Uint8Array(n);
  const cost = new Float64Array(n).fill(NaN);
  const legs = new Int32Array(n).fill(-1);
  const viaLane = new Int32Array(n).fill(-1);
  // key = reduced cost from the origin (0 for kept depots); heap over the others.
  const key = new Float64Array(n).fill(Infinity);
  const heap = new Int32Array(n);
  const heapPos = new Int32Array(n).fill(-1);
  let count = 0;
  const push = (v: number, k: number) => {
    let at = heapPos[v];
    if (at === -1) at = count++;
    while (at > 0) {
      const parentAt = (at - 1) >> 1;
      const p = heap[parentAt];
      if (key[p] <= k) break;
      heap[at] = p;
      heapPos[p] = at;
      at = parentAt;
    }
    heap[at] = v;
    heapPos[v] = at;
  };
  const relaxFrom = (u: number) => {
    for (let p = outStart[u], end = outStart[u + 1]; p < end; p++) {
      const v = outTo[p];
      if (kept[v] || closed[outLane[p]] === 1 || plainStatus[v] !== STATUS_REACHABLE) continue;
      const k = key[u] + outNet[p] + d[u] - d[v];
      if (!(k < key[v])) continue;
      if (!Number.isSafeInteger(k)) throw new MoneyOverflowError(`route cost to depot "${network.depotIds[v]}"`);
      key[v] = k;
      viaLane[v] = outLane[p];
      push(v, k);
    }
  };
  const { inStart, inPos, inFrom, inLane } = reverseIndexOf(network);
  for (let v = 0; v < n; v++) {
    if (!kept[v]) continue;
    status[v] = STATUS_REACHABLE;
    cost[v] = d[v];
    legs[v] = plain.legs[v];
    viaLane[v] = plain.viaLane[v];
    key[v] = 0;
  }
  // Seeds: each cut-off depot's cheapest open lane from a kept depot (the first of equals, by position).
  for (let v = 0; v < n; v++) {
    if (kept[v] || plainStatus[v] !== STATUS_REACHABLE) continue;
    for (let q = inStart[v], end = inStart[v + 1]; q < end; q++) {
      const u = inFrom[q];
      if (!kept[u]) continue;
      const e = inLane[q];
      if (closed[e] === 1) continue;
      const k = outNet[inPos[q]] + d[u] - d[v];
      if (!(k < key[v])) continue;
      if (!Number.isSafeInteger(k)) throw new MoneyOverflowError(`route cost to depot "${network.depotIds[v]}"`);
      key[v] = k;
      viaLane[v] = e;
    }
    if (key[v] !== Infinity) push(v, key[v]);
  }
  // 2. Dijkstra over the rest, seeded above.
  while (count > 0) {
    const u = heap[0];
    heapPos[u] = -1;
    const last = heap[--count];
    if (count > 0) {
      const k = key[last];
      let at = 0;
      for (;;) {
        let child = 2 * at + 1;
        if (child >= count) break;
        if (child + 1 < count && key[heap[child + 1]] < key[heap[child]]) child++;
        if (key[heap[child]] >= k) break;
        heap[at] = heap[child];
        heapPos[heap[at]] = at;
        at = child;
      }
      heap[at] = last;
      heapPos[last] = at;
    }
    kept[u] = 1; // settled
    status[u] = STATUS_REACHABLE;
    const c = d[u] + key[u];
    cost[u] = c === 0 ? 0 : c;
    legs[u] = legs[laneFrom[viaLane[u]]] + 1;
    relaxFrom(u);
  }
  for (let v = 0; v < n; v++) if (status[v] !== STATUS_REACHABLE) status[v] = STATUS_UNREACHABLE;
  return { origin: plain.origin, status, cost, legs, viaLane, loops: [], stats: { relaxations: 0, scans: 0 } };
}
