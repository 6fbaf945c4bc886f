// Times engine/routes/label-correcting.ts on one bench family in this (fresh) process: the first
// call, while V8 has compiled nothing of the solver, then warm calls. suites/routes.ts runs it as a
// child process per family, so every first call is cold. With --write it also writes the network
// in the C++ reference's file format (reference/label-correcting.cpp) before any solve.
//
//   node --expose-gc --import tsx test/bench/solver-first-call.ts FAMILY [--warm N] [--write FILE]
// Prints one JSON line (SolverRun) on stdout.

import { writeFileSync } from 'node:fs';
import { parseArgs } from 'node:util';
import { IN_TREE, UNBOUNDED, DETACHED, labelCorrect, type LabelCorrectingResult } from '../../engine/routes/label-correcting';
import type { Network } from '../../engine/network/types';
import { SOLVER_FAMILIES } from './route-families';

export interface SolverRun {
  family: string;
  depots: number;
  lanes: number;
  rebateLanes: number;
  firstMs: number;
  /** Process CPU time (every thread: compiler and GC threads included) during the first call. */
  firstCpuMs: number;
  /** Warm calls after the first, in order. */
  warmMs: number[];
  warmCpuMs: number[];
  checksum: string;
  loops: number;
  relaxations: number;
  scans: number;
}

/** Same checksum as the C++ reference prints: counts, then cost sums of reachable depots modulo 2^64. */
export function solveChecksum(result: LabelCorrectingResult, depotCount: number): string {
  let reachable = 0;
  let unbounded = 0;
  let detached = 0;
  let sum = 0n;
  let weighted = 0n;
  for (let d = 0; d < depotCount; d++) {
    const s = result.state[d];
    if (s === IN_TREE) {
      reachable++;
      const cost = BigInt(result.dist[d]);
      sum += cost;
      weighted += BigInt(d + 1) * cost;
    } else if (s === UNBOUNDED) {
      unbounded++;
    } else if (s === DETACHED) {
      detached++;
    }
  }
  const u64 = (x: bigint) => BigInt.asUintN(64, x).toString();
  return `reachable=${reachable} unbounded=${unbounded} detached=${detached} sum=${u64(sum)} weighted=${u64(weighted)}`;
}

/** The network as the C++ reference reads it (see the header of reference/label-correcting.cpp). */
export function referenceFile(network: Network, origin: number): Uint8Array {
  const n = network.depotCount;
  const m = network.outTo.length;
  const bytes = new Uint8Array(8 + 16 + 4 * (n + 1) + 4 * m + 8 * m);
  const view = new DataView(bytes.buffer);
  bytes.set(new TextEncoder().encode('LWBF1'), 0);
  let at = 8;
  for (const v of [n, m, origin, 0]) {
    view.setInt32(at, v, true);
    at += 4;
  }
  for (let d = 0; d <= n; d++, at += 4) view.setInt32(at, network.outStart[d], true);
  for (let p = 0; p < m; p++, at += 4) view.setInt32(at, network.outTo[p], true);
  for (let p = 0; p < m; p++, at += 8) {
    const w = network.outNet[p];
    if (!Number.isSafeInteger(w)) throw new Error(`lane cost ${w} at position ${p} is not an exact integer`);
    view.setBigInt64(at, BigInt(w), true);
  }
  return bytes;
}

function cpuMsSince(start: NodeJS.CpuUsage): number {
  const used = process.cpuUsage(start);
  return (used.user + used.system) / 1000;
}

async function main(): Promise<void> {
  const { values, positionals } = parseArgs({
    allowPositionals: true,
    options: { warm: { type: 'string', default: '9' }, write: { type: 'string' } },
  });
  const family = positionals[0];
  const make = family === undefined ? undefined : SOLVER_FAMILIES[family];
  if (!make) throw new Error(`unknown family "${family}"; known: ${Object.keys(SOLVER_FAMILIES).join(', ')}`);
  const { network, origin } = make();
  if (values.write) writeFileSync(values.write, referenceFile(network, origin));
  // Let the work of building the network settle (collect its garbage, let V8's compiler threads
  // finish with the generators), so the first call's CPU time is the solve's own. Nothing of the
  // solver has run yet, so this warms nothing of it.
  (globalThis as { gc?: () => void }).gc?.();
  await new Promise((resolve) => setTimeout(resolve, 200));

  const solve = () => labelCorrect(network, { sources: [origin], onLoop: 'mark' });
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  const first = solve();
  const firstMs = performance.now() - t0;
  const firstCpuMs = cpuMsSince(cpu0);

  const warmMs: number[] = [];
  const warmCpuMs: number[] = [];
  for (let i = 0; i < Number(values.warm); i++) {
    const c = process.cpuUsage();
    const t = performance.now();
    solve();
    warmMs.push(performance.now() - t);
    warmCpuMs.push(cpuMsSince(c));
  }
  let rebateLanes = 0;
  for (let e = 0; e < network.laneCount; e++) if (network.laneNet[e] < 0) rebateLanes++;
  const run: SolverRun = {
    family,
    depots: network.depotCount,
    lanes: network.laneCount,
    rebateLanes,
    firstMs,
    firstCpuMs,
    warmMs,
    warmCpuMs,
    checksum: solveChecksum(first, network.depotCount),
    loops: first.loops.length,
    relaxations: first.relaxations,
    scans: first.scans,
  };
  process.stdout.write(JSON.stringify(run) + '\n');
}

await main();
