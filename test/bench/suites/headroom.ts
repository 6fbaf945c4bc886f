// Rebate headroom for every lane, loop-free networks of 5,000 depots / 50,000 lanes and 20,000 /
// 200,000 (targets 1 s and 10 s): Johnson's reweighting, then bucketed balls (a backward ball per lane
// origin, one forward search per destination). Baseline in the same run: the previous method, one Dijkstra per
// distinct lane destination stopped at the last origin (headroom-per-destination.ts): run in full at
// 5k, on a sample of destinations at 20k (a full run takes minutes), scaled to all of them. Every
// floor the baseline computes is compared with the engine's.

import { buildNetwork } from '../../../engine/network/build';
import type { DepotInput, LaneInput, Network } from '../../../engine/network/types';
import type { Minor } from '../../../engine/money/minor';
import { headroomSetup, laneFloors } from '../../../engine/audit/headroom';
import { laneFloorsPerDestination } from '../../../engine/audit/headroom-per-destination';
import { auditNetwork } from '../../../engine/audit/network-audit';
import { createDijkstraWorkspace, dijkstra } from '../../../engine/routes/dijkstra';
import { restoreCost } from '../../../engine/routes/johnson-potentials';
import { seeded, timeBest, type BenchSuite } from '../harness';
import { createHeadroomThreadPool } from '../../../main/headroom-threads/pool';
import { freshBundle } from '../../../main/cli/fresh-bundle.mjs';
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../../../', import.meta.url));

/** Random sparse network with many negative lanes and no loop: net = c + p(u) - p(v), c >= 0; a ring keeps it connected. */
function lanesOf(depotCount: number, laneCount: number, seed: number, loops: number): { depots: DepotInput[]; lanes: LaneInput[] } {
  const rand = seeded(seed);
  const potential = Array.from({ length: depotCount }, () => Math.floor(rand() * 20_000));
  const depots: DepotInput[] = Array.from({ length: depotCount }, (_, d) => ({ id: `D${d}`, name: `Depot ${d}`, lat: 45 + (d % 1000) / 100, lon: 2 + Math.floor(d / 1000) / 100 }));
  const lanes: LaneInput[] = [];
  const zero = 0 as Minor;
  const add = (u: number, v: number, net: number) =>
    lanes.push({ from: `D${u}`, to: `D${v}`, toll: (net > 0 ? net : 0) as Minor, fuel: zero, fees: zero, rebate: (net < 0 ? -net : 0) as Minor, sourceRow: lanes.length + 2 });
  for (let e = 0; e < laneCount - 2 * loops; e++) {
    const u = e < depotCount ? e : Math.floor(rand() * depotCount);
    const v = e < depotCount ? (e + 1) % depotCount : Math.floor(rand() * depotCount);
    add(u, v, Math.floor(rand() * 10_000) + potential[u] - potential[v]);
  }
  // Optional rebate loops for the full-audit figure: a pair of lanes whose lap nets -1 to -500.
  for (let i = 0; i < loops; i++) {
    const u = Math.floor(rand() * depotCount);
    const v = (u + 1 + Math.floor(rand() * (depotCount - 1))) % depotCount;
    add(u, v, 1_000);
    add(v, u, -1_000 - 1 - Math.floor(rand() * 500));
  }
  return { depots, lanes };
}

function network(depotCount: number, laneCount: number, seed: number, loops: number): Network {
  const { depots, lanes } = lanesOf(depotCount, laneCount, seed, loops);
  return buildNetwork(depots, lanes);
}

/** The same network as depots and lanes CSV files, for whole `lanewright audit` commands. */
function writeFiles(folder: string, depotCount: number, laneCount: number, seed: number): { depots: string; lanes: string } {
  const { depots, lanes } = lanesOf(depotCount, laneCount, seed, 0);
  const money = (minor: number) => (minor / 100).toFixed(2);
  const files = { depots: join(folder, `depots-${depotCount}.csv`), lanes: join(folder, `lanes-${depotCount}.csv`) };
  writeFileSync(files.depots, 'id,name,lat,lon\n' + depots.map((d) => `${d.id},${d.name},${d.lat.toFixed(4)},${d.lon.toFixed(4)}`).join('\n') + '\n');
  writeFileSync(files.lanes, 'from,to,toll,fuel,fees,rebate,distance_km\n' + lanes.map((l) => `${l.from},${l.to},${money(l.toll)},0.00,0.00,${money(l.rebate)},50`).join('\n') + '\n');
  return files;
}

/** `lanewright audit --date` as the user runs it, under /usr/bin/time -v: wall, CPU of all threads, peak memory. */
function auditCommand(files: { depots: string; lanes: string }, out: string, threads: number): { ms: number; cpuS: number; mb: number; ok: boolean; detail: string } {
  const args = ['main/cli/lanewright.mjs', 'audit', '--depots', files.depots, '--lanes', files.lanes, '--date', '2026-06-01', '--json', '--out', out, '--timings', '--threads', String(threads)];
  const timed = existsSync('/usr/bin/time');
  const start = performance.now();
  const result = spawnSync(timed ? '/usr/bin/time' : process.execPath, timed ? ['-v', process.execPath, ...args] : args, { cwd: root, encoding: 'utf8', maxBuffer: 1 << 26 });
  const ms = performance.now() - start;
  const grab = (re: RegExp) => Number(re.exec(result.stderr)?.[1] ?? NaN);
  rmSync(out, { force: true });
  const timing = result.stderr.split('\n').find((line) => line.startsWith('{')) ?? '';
  return {
    ms,
    cpuS: grab(/User time \(seconds\): ([\d.]+)/) + grab(/System time \(seconds\): ([\d.]+)/),
    mb: grab(/Maximum resident set size \(kbytes\): (\d+)/) / 1024,
    ok: result.status === 0,
    detail: result.status === 0 ? timing : result.stderr.split('\n').find((l) => l.startsWith('lanewright')) ?? `exit ${result.status}`,
  };
}

/**
 * The previous method on `sample` destinations only (its inner loop, as headroom-per-destination.ts
 * runs it): milliseconds, and the floors that differ from `floor`.
 */
function perDestinationSample(net: Network, sample: number[], floor: Float64Array): { ms: number; mismatches: number; compared: number } {
  const start = performance.now();
  const { potential, reweighted, inStart, inLane } = headroomSetup(net);
  const workspace = createDijkstraWorkspace(net.depotCount);
  let mismatches = 0;
  let compared = 0;
  for (const v of sample) {
    const targets: number[] = [];
    for (let i = inStart[v]; i < inStart[v + 1]; i++) targets.push(net.laneFrom[inLane[i]]);
    const { dist } = dijkstra(net, v, { weights: reweighted, workspace, targets, tree: false });
    for (let i = inStart[v]; i < inStart[v + 1]; i++) {
      const e = inLane[i];
      const u = net.laneFrom[e];
      const back = dist[u] === Infinity ? NaN : restoreCost(dist[u], potential, v, u);
      const expected = Number.isNaN(back) ? NaN : back === 0 ? 0 : -back;
      compared++;
      if (!Object.is(expected, floor[e]) && !(Number.isNaN(expected) && Number.isNaN(floor[e]))) mismatches++;
    }
  }
  return { ms: performance.now() - start, mismatches, compared };
}

export const suite: BenchSuite = {
  name: 'headroom',
  run(record) {
    for (const [depots, lanes, seed] of [[5_000, 50_000, 4], [20_000, 200_000, 6]] as const) {
      const net = network(depots, lanes, seed, 0);
      const label = `headroom, all lanes ${depots / 1000}k/${lanes / 1000}k, no loop`;
      let progressCalls = 0;
      const engine = timeBest(() => laneFloors(net, { onProgress: () => progressCalls++ }), 2);
      const { floor, sources, settled = 0 } = engine.result;
      let baselineMs: number;
      let check: string;
      if (depots <= 5_000) {
        const baseline = timeBest(() => laneFloorsPerDestination(net), 1);
        baselineMs = baseline.ms;
        let mismatches = 0;
        for (let e = 0; e < net.laneCount; e++) if (!Object.is(baseline.result.floor[e], floor[e])) mismatches++;
        check = `baseline run in full (${baseline.result.sources} Dijkstra runs), ${mismatches} of ${net.laneCount} floors differ`;
      } else {
        const step = 20;
        const sample: number[] = [];
        for (let v = 0; v < depots; v += step) sample.push(v);
        const baseline = perDestinationSample(net, sample, floor);
        baselineMs = (baseline.ms * depots) / sample.length;
        check = `baseline timed on ${sample.length} of ${depots} destinations and scaled; ${baseline.mismatches} of ${baseline.compared} sampled floors differ`;
      }
      // The same searches over worker threads (the CLI's pool, started beforehand: start-up is in the command figures).
      const threads = availableParallelism();
      const pool = createHeadroomThreadPool({ threads });
      const workers = pool.waitForWorkers(120_000);
      const cpuBefore = process.cpuUsage();
      const threaded = timeBest(() => laneFloors(net, { runner: pool }), 2);
      const cpu = process.cpuUsage(cpuBefore);
      pool.close();
      let threadDiffs = 0;
      for (let e = 0; e < net.laneCount; e++) if (!Object.is(threaded.result.floor[e], floor[e])) threadDiffs++;
      record({
        case: `${label}, ${threads} threads (${workers} workers + this one)`,
        engine: threaded.ms,
        baseline: engine.ms,
        unit: 'ms',
        target: depots <= 5_000 ? 1_000 : 10_000,
        note: `baseline = the same searches on one thread; ${threadDiffs} floors differ from it; ${((cpu.user + cpu.system) / 2e3).toFixed(0)} ms CPU per run, all threads`,
      });
      record({
        case: `${label} (Johnson + bucketed balls)`,
        engine: engine.ms,
        baseline: baselineMs,
        unit: 'ms',
        target: depots <= 5_000 ? 1_000 : 10_000,
        note: `${sources} lane pairs, settling ${Math.round(settled / Math.max(1, sources))} depots per pair on average; ${check}; ${progressCalls} progress calls over 2 runs`,
      });
    }

    // Whole commands: read, plan, audit (loops, headroom), JSON written; --threads 1 beside every processor.
    const folder = mkdtempSync(join(tmpdir(), 'lanewright-bench-headroom-'));
    try {
      const via = freshBundle(root, join(root, 'dist', 'cli')) !== null ? 'the bundle' : 'tsx (no fresh bundle: npm run build:cli)';
      for (const [depots, lanes, seed] of [[5_000, 50_000, 4], [20_000, 200_000, 6]] as const) {
        const files = writeFiles(folder, depots, lanes, seed);
        const one = auditCommand(files, join(folder, 'audit.json'), 1);
        const all = auditCommand(files, join(folder, 'audit.json'), availableParallelism());
        const say = (r: ReturnType<typeof auditCommand>) => `${r.ok ? '' : 'FAILED '}${r.cpuS.toFixed(1)} s CPU, ${r.mb.toFixed(0)} MB peak, ${r.detail}`;
        record({
          case: `lanewright audit --date --json, ${depots / 1000}k/${lanes / 1000}k, whole command, --threads ${availableParallelism()}`,
          engine: all.ms,
          baseline: one.ms,
          unit: 'ms',
          note: `via ${via}; baseline = --threads 1; threads: ${say(all)}; one thread: ${say(one)}`,
        });
      }
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }

    const looped = network(5_000, 50_000, 5, 20);
    const audit = timeBest(() => auditNetwork(looped), 1);
    record({
      case: 'full audit 5k/50k with 20 rebate loops (loops, fix plan, headroom after it)',
      engine: audit.ms,
      unit: 'ms',
      note: `${audit.result.loops.length} loops found, ${audit.result.fixPlan?.changes.length ?? 0} lanes cut, plan verified: ${audit.result.fixPlan?.verified}`,
    });
  },
};
