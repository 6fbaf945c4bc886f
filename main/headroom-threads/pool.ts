// Rebate headroom over worker threads, for the CLI's audit. The engine stays single-threaded and
// pure: it hands this runner a network's search arrays (HeadroomRunner, engine/audit/headroom.ts),
// and the runner copies them into SharedArrayBuffers, posts them once to each worker, and cuts the
// searches into jobs (backward balls over depot ranges, then pair costs over destination ranges)
// that the workers and this thread claim through Atomics (contract.ts). This thread blocks while the
// workers finish, as the synchronous commands expect. Every pair's cost depends only on the arrays,
// so the floors are the same with 1 or N threads.

import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import { createBackBalls, destinationSlices, singleThreadRunner, type BucketWorkspace, type HeadroomArrays, type HeadroomRunner } from '../../engine/index';
import { Control, HEADROOM_WORKER_KIND, type HeadroomNetworkMessage, type HeadroomWorkerData, type HeadroomWorkerMessage } from './contract';
import { claimJob, finishJob, jobsEnd, runJob, workspaceFor } from './jobs';

/** Below this many lane pairs, starting threads costs more than it saves: the calling thread runs alone. */
export const MIN_PAIRS_FOR_THREADS = 20_000;

/** Jobs per thread and phase: enough that a thread slowed by other work on the machine is waited for briefly. */
const JOBS_PER_THREAD = 8;

/** A worker that has held a job this long without finishing is presumed lost; this thread redoes its job. */
const LOST_WORKER_MS = 60_000;

export interface HeadroomThreadPool extends HeadroomRunner {
  /** Threads that run searches, this one included. */
  readonly threads: number;
  /** Starts the workers if they are not, and waits until they run (at most `timeoutMs`); returns how many do. */
  waitForWorkers(timeoutMs: number): number;
  /** Jobs run by the workers so far (the rest ran on this thread). */
  workerJobs(): number;
  /** Stops the workers (they hold no resource but their thread). */
  close(): void;
}

export interface HeadroomPoolOptions {
  /** Threads in all, this one included (default os.availableParallelism()); 1 = no worker. */
  threads?: number;
  /** Pair count from which workers are used (default MIN_PAIRS_FOR_THREADS). */
  minPairs?: number;
}

// The worker's entry: the TypeScript source under tsx (development, tests), else the bundled file
// next to the CLI bundle (main/build/build-cli.ts), which this module may sit in a chunk folder below.
function workerEntry(): URL | null {
  const here = import.meta.url;
  // (`--import tsx` in a worker's execArgv does not reach its entry on Node 20; worker-source.mjs registers tsx itself.)
  if (here.endsWith('.ts')) return new URL('./worker-source.mjs', here);
  for (const candidate of ['./headroom-worker.mjs', '../headroom-worker.mjs']) {
    const url = new URL(candidate, here);
    if (existsSync(fileURLToPath(url))) return url;
  }
  return null;
}

function shared<T extends Int32Array | Float64Array>(source: T): T {
  const copy = (source instanceof Int32Array ? new Int32Array(new SharedArrayBuffer(source.byteLength)) : new Float64Array(new SharedArrayBuffer(source.byteLength))) as T;
  copy.set(source);
  return copy;
}

function flatRanges(ranges: [number, number][]): Int32Array {
  const flat = new Int32Array(new SharedArrayBuffer(ranges.length * 8));
  ranges.forEach(([from, to], j) => {
    flat[2 * j] = from;
    flat[2 * j + 1] = to;
  });
  return flat;
}

export function createHeadroomThreadPool(options: HeadroomPoolOptions = {}): HeadroomThreadPool {
  const threads = Math.max(1, Math.floor(options.threads ?? availableParallelism()));
  const minPairs = options.minPairs ?? MIN_PAIRS_FOR_THREADS;
  const control = new Int32Array(new SharedArrayBuffer(Control.Size * 4));
  const workers: Worker[] = [];
  let started = false;
  let ws: BucketWorkspace | null = null;

  // Started on the first network large enough; a worker that cannot start leaves its share to the others.
  const start = (): boolean => {
    if (!started) {
      started = true;
      const entry = workerEntry();
      if (entry !== null) {
        const workerData: HeadroomWorkerData = { kind: HEADROOM_WORKER_KIND, control: control.buffer as SharedArrayBuffer };
        for (let i = 1; i < threads; i++) {
          const worker = new Worker(entry, { workerData });
          // The command's exit ends them; they must not keep it alive.
          worker.unref();
          worker.on('error', () => undefined);
          workers.push(worker);
        }
      }
    }
    return workers.length > 0;
  };

  // Runs the jobs from `first` to `end` - 1 here and in the workers; returns once every one is done.
  const phase = (net: HeadroomNetworkMessage, first: number, end: number, slotOf: (job: number) => number, onJob?: () => void): void => {
    Atomics.store(control, Control.Limit, end);
    Atomics.notify(control, Control.Limit);
    ws = workspaceFor(ws, net);
    try {
      for (let job = claimJob(control); job !== -1; job = claimJob(control)) {
        runJob(net, job, ws);
        finishJob(control);
        onJob?.();
      }
    } catch (error) {
      // Leave no job of this network unclaimed: a worker would run it against the next network's arrays.
      while (claimJob(control) !== -1) finishJob(control);
      throw error;
    }
    let waitedSince = Date.now();
    for (;;) {
      const seen = Atomics.load(control, Control.Done);
      const failed = Atomics.exchange(control, Control.Failed, 0);
      if (failed !== 0) {
        // Run here the job a worker could not: the engine's own error reaches the user (or, if the
        // worker failed for a reason of its own, the job completes here).
        runJob(net, failed - 1, ws);
        continue;
      }
      let open = 0;
      for (let job = first; job < end; job++) if (Atomics.load(net.jobDone, slotOf(job)) === 0) open++;
      if (open === 0) return;
      if (Atomics.wait(control, Control.Done, seen, 1_000) !== 'timed-out') waitedSince = Date.now();
      else if (Date.now() - waitedSince > LOST_WORKER_MS) {
        for (let job = first; job < end; job++) if (Atomics.load(net.jobDone, slotOf(job)) === 0) runJob(net, job, ws);
        waitedSince = Date.now();
      }
    }
  };

  return {
    threads,
    run(arrays: HeadroomArrays, ballSize: number, onProgress?: (done: number, total: number) => void) {
      const total = arrays.pairOrigin.length;
      if (threads === 1 || total < minPairs || !start()) return singleThreadRunner.run(arrays, ballSize, onProgress);
      const n = arrays.depotCount;
      const jobs = threads * JOBS_PER_THREAD;
      const ballRanges: [number, number][] = [];
      for (let j = 0; j < jobs; j++) ballRanges.push([Math.floor((n * j) / jobs), Math.floor((n * (j + 1)) / jobs)]);
      const pairRanges = destinationSlices(arrays, jobs);
      const ballBase = Atomics.load(control, Control.Limit);
      const net: HeadroomNetworkMessage = {
        kind: 'network',
        arrays: {
          depotCount: n,
          outStart: shared(arrays.outStart),
          outTo: shared(arrays.outTo),
          outCost: shared(arrays.outCost),
          inStart: shared(arrays.inStart),
          inFrom: shared(arrays.inFrom),
          inCost: shared(arrays.inCost),
          pairStart: shared(arrays.pairStart),
          pairOrigin: shared(arrays.pairOrigin),
          pairUpper: arrays.pairUpper && shared(arrays.pairUpper),
          pairLower: arrays.pairLower && shared(arrays.pairLower),
        },
        balls: createBackBalls(n, ballSize, (bytes) => new SharedArrayBuffer(bytes)),
        cost: new Float64Array(new SharedArrayBuffer(total * 8)),
        ballRanges: flatRanges(ballRanges),
        pairRanges: flatRanges(pairRanges),
        ballBase,
        pairBase: ballBase + ballRanges.length,
        settled: new Float64Array(new SharedArrayBuffer((ballRanges.length + pairRanges.length) * 8)),
        jobDone: new Int32Array(new SharedArrayBuffer((ballRanges.length + pairRanges.length) * 4)),
      };
      const message: HeadroomWorkerMessage = net;
      for (const worker of workers) worker.postMessage(message);
      phase(net, net.ballBase, net.pairBase, (job) => job - net.ballBase);
      let pairsDone = 0;
      const ballJobs = ballRanges.length;
      phase(net, net.pairBase, jobsEnd(net), (job) => ballJobs + job - net.pairBase, () => {
        let done = 0;
        for (let j = 0; j < pairRanges.length; j++) if (Atomics.load(net.jobDone, ballJobs + j) === 1) done += arrays.pairStart[pairRanges[j][1]] - arrays.pairStart[pairRanges[j][0]];
        if (done > pairsDone) onProgress?.((pairsDone = done), total);
      });
      if (pairsDone < total) onProgress?.(total, total);
      let settled = 0;
      for (const s of net.settled) settled += s;
      return { cost: net.cost, settled };
    },
    waitForWorkers(timeoutMs: number) {
      start();
      const until = Date.now() + timeoutMs;
      for (;;) {
        const ready = Atomics.load(control, Control.Ready);
        if (ready >= workers.length || Date.now() >= until) return ready;
        Atomics.wait(control, Control.Ready, ready, Math.max(1, until - Date.now()));
      }
    },
    workerJobs: () => Atomics.load(control, Control.WorkerJobs),
    close() {
      Atomics.store(control, Control.Exit, 1);
      Atomics.notify(control, Control.Limit);
      for (const worker of workers) void worker.terminate();
      workers.length = 0;
    },
  };
}


