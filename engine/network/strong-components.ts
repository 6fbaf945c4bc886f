// Strongly connected components (Tarjan 1972, iterative so a 100,000-depot chain cannot overflow
// the call stack). A loop of lanes always lies inside one component, so loop searches run per component.

import type { Network } from './types';

export interface Components {
  /** Component number per depot, or -1 for depots left out by `allowed`. */
  componentOf: Int32Array;
  /** Depots of each component. */
  members: number[][];
}

/**
 * Components of the sub-network of `allowed` depots (all when omitted), using only lanes whose
 * weight at their CSR position is finite (closed lanes carry +Infinity).
 */
export function strongComponents(network: Network, allowed?: Uint8Array, weights?: Float64Array): Components {
  const n = network.depotCount;
  const { outStart, outTo } = network;
  const w = weights ?? network.outNet;
  const index = new Int32Array(n).fill(-1);
  const low = new Int32Array(n);
  const onStack = new Uint8Array(n);
  const componentOf = new Int32Array(n).fill(-1);
  const stack = new Int32Array(n);
  const callDepot = new Int32Array(n);
  const callPos = new Int32Array(n);
  const members: number[][] = [];
  let sp = 0;
  let counter = 0;

  for (let start = 0; start < n; start++) {
    if (index[start] !== -1 || (allowed && !allowed[start])) continue;
    let depth = 0;
    callDepot[0] = start;
    callPos[0] = outStart[start];
    index[start] = low[start] = counter++;
    stack[sp++] = start;
    onStack[start] = 1;
    while (depth >= 0) {
      const v = callDepot[depth];
      const p = callPos[depth];
      if (p < outStart[v + 1]) {
        callPos[depth] = p + 1;
        const x = outTo[p];
        if (w[p] === Infinity || (allowed && !allowed[x])) continue;
        if (index[x] === -1) {
          index[x] = low[x] = counter++;
          stack[sp++] = x;
          onStack[x] = 1;
          depth++;
          callDepot[depth] = x;
          callPos[depth] = outStart[x];
        } else if (onStack[x] && index[x] < low[v]) {
          low[v] = index[x];
        }
        continue;
      }
      if (low[v] === index[v]) {
        const component: number[] = [];
        let x: number;
        do {
          x = stack[--sp];
          onStack[x] = 0;
          componentOf[x] = members.length;
          component.push(x);
        } while (x !== v);
        members.push(component);
      }
      depth--;
      if (depth >= 0) {
        const parent = callDepot[depth];
        if (low[v] < low[parent]) low[parent] = low[v];
      }
    }
  }
  return { componentOf, members };
}

/** True when the component can hold a loop: two or more depots, or one depot with a lane to itself. */
export function componentHasCycle(network: Network, members: readonly number[], weights?: Float64Array): boolean {
  if (members.length > 1) return true;
  const d = members[0];
  const w = weights ?? network.outNet;
  for (let p = network.outStart[d]; p < network.outStart[d + 1]; p++) {
    if (network.outTo[p] === d && w[p] !== Infinity) return true;
  }
  return false;
}
