// Rebate headroom over worker threads, for the CLI's audit. The engine stays pure: its shared-memory
// runner (engine/audit/headroom-shared-runner.ts, shared with the app's Web Workers) plans each
// network's jobs in SharedArrayBuffers and runs them on this thread and the workers; this module is
// the Node plumbing only: starting worker_threads, posting them each plan, stopping them. This
// thread blocks while the workers finish, as the synchronous commands expect. Every pair's cost
// depends only on the arrays, so the floors are the same with 1 or N threads.

import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import { createHeadroomControl, HeadroomControl, sharedHeadroomRunner, type HeadroomRunner } from '../../engine/index';
import { HEADROOM_WORKER_KIND, type HeadroomWorkerData, type HeadroomWorkerMessage } from './contract';

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
  /** Pair count from which workers are used (default MIN_PAIRS_FOR_THREADS, engine/audit/headroom-shared-jobs.ts). */
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

export function createHeadroomThreadPool(options: HeadroomPoolOptions = {}): HeadroomThreadPool {
  const threads = Math.max(1, Math.floor(options.threads ?? availableParallelism()));
  const control = createHeadroomControl();
  const workers: Worker[] = [];
  let started = false;

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

  const runner = sharedHeadroomRunner({
    threads,
    minPairs: options.minPairs,
    control,
    start,
    post(jobs) {
      const message: HeadroomWorkerMessage = { kind: 'network', jobs };
      for (const worker of workers) worker.postMessage(message);
    },
  });

  return {
    threads,
    run: runner.run,
    waitForWorkers(timeoutMs: number) {
      start();
      const until = Date.now() + timeoutMs;
      for (;;) {
        const ready = Atomics.load(control, HeadroomControl.Ready);
        if (ready >= workers.length || Date.now() >= until) return ready;
        Atomics.wait(control, HeadroomControl.Ready, ready, Math.max(1, until - Date.now()));
      }
    },
    workerJobs: () => Atomics.load(control, HeadroomControl.WorkerJobs),
    close() {
      Atomics.store(control, HeadroomControl.Exit, 1);
      Atomics.notify(control, HeadroomControl.Limit);
      for (const worker of workers) void worker.terminate();
      workers.length = 0;
    },
  };
}
