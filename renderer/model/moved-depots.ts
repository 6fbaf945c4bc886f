// Which depots a scenario moved against its base, in the order "what moved" lists them: status
// changes first, then cost changes by size, then route changes at the same cost; ties by depot.
// Pure, over the solve's arrays, so a solve that moves 50,000 depots makes no object per depot.

import type { SolveView } from '../worker/protocol';

/** Depots whose status, cost or route differs from the base, largest change first. */
export function movedDepots(solve: Pick<SolveView, 'status' | 'cost' | 'base'>): Int32Array {
  const base = solve.base;
  if (!base) return new Int32Array(0);
  const n = solve.status.length;
  const statusMoved: number[] = [];
  // Cost changes and route-only changes (size 0), each packed as -size * 2^17 + position so the
  // typed array's own sort puts the largest first and ties in depot order.
  const others = new Int32Array(n);
  const size = new Float64Array(n);
  let m = 0;
  let packable = n < PACK;
  for (let d = 0; d < n; d++) {
    if (base.status[d] !== solve.status[d]) statusMoved.push(d);
    else if ((solve.status[d] === 1 && base.cost[d] !== solve.cost[d]) || base.routeChanged[d] === 1) {
      const delta = solve.status[d] === 1 && base.cost[d] !== solve.cost[d] ? Math.abs(solve.cost[d] - base.cost[d]) : 0;
      if (!Number.isInteger(delta) || delta >= 2 ** 35) packable = false;
      others[m] = d;
      size[m++] = delta;
    }
  }
  const out = new Int32Array(statusMoved.length + m);
  out.set(statusMoved);
  if (packable) {
    const keys = new Float64Array(m);
    for (let k = 0; k < m; k++) keys[k] = -size[k] * PACK + k;
    keys.sort();
    for (let j = 0; j < m; j++) out[statusMoved.length + j] = others[keys[j] - Math.floor(keys[j] / PACK) * PACK];
  } else {
    const order = Array.from({ length: m }, (_, k) => k).sort((a, b) => size[b] - size[a] || a - b);
    for (let j = 0; j < m; j++) out[statusMoved.length + j] = others[order[j]];
  }
  return out;
}

// 2^17: positions below it fit beside a whole key under 2^35 in a double's 53 exact bits.
const PACK = 131072;
