// The app's headroom threads: inside the engine worker, a pool of headroom workers (Web Workers,
// headroom.worker.ts) runs the engine's shared-memory runner (engine/audit/headroom-shared-runner.ts,
// the one the CLI's worker_threads run). This module is the browser plumbing only: how many threads,
// starting the workers, posting them each plan, and what the review says about the threads used.
// Shared memory needs a cross-origin isolated page (main/ipc/cross-origin-isolation.ts); without
// it, or with one processor, the searches run on the engine worker alone and the review says why.

import { createHeadroomControl, MIN_PAIRS_FOR_THREADS, sharedHeadroomRunner, type HeadroomRunner, type SharedRunUsage } from '../../engine/index';
import type { HeadroomThreadsView, ToHeadroomWorker } from './headroom-protocol';

/** At most this many threads (the engine worker included): more add memory and start-up for little. */
export const MAX_HEADROOM_THREADS = 8;

/** A started headroom worker, as far as the pool uses it. */
export interface HeadroomWorkerHandle {
  postMessage(message: ToHeadroomWorker): void;
}

export interface HeadroomPoolEnvironment {
  /** `crossOriginIsolated` of the page (SharedArrayBuffer and Atomics.wait available). */
  isolated: boolean;
  /** `navigator.hardwareConcurrency` (may be undefined in old hosts). */
  cores: number | undefined;
  /** Starts one headroom worker. */
  spawn(): HeadroomWorkerHandle;
  /** Pair count from which workers are used (default MIN_PAIRS_FOR_THREADS); tests lower it. */
  minPairs?: number;
}

export interface AppHeadroomPool {
  /** Threads the searches may use (1 = the engine worker alone). */
  readonly threads: number;
  /** Starts the workers ahead of the first review, so they are running when it needs them. */
  warm(): void;
  /** Runs `work` with the pool's runner and says which threads its headroom searches used. */
  measure<T>(work: (runner: HeadroomRunner) => T): { result: T; threads: HeadroomThreadsView };
}

/** Threads for a host: the processors it reports, capped, at least 1; 1 when memory cannot be shared. */
export function headroomThreadsFor(isolated: boolean, cores: number | undefined): number {
  if (!isolated) return 1;
  return Math.max(1, Math.min(MAX_HEADROOM_THREADS, Math.floor(cores ?? 1)));
}

export function createAppHeadroomPool(env: HeadroomPoolEnvironment): AppHeadroomPool {
  const threads = headroomThreadsFor(env.isolated, env.cores);
  const control = threads > 1 ? createHeadroomControl() : new Int32Array(0);
  const workers: HeadroomWorkerHandle[] = [];
  let started = false;
  let spawnFailed = false;
  let runs: SharedRunUsage[] = [];

  const start = (): boolean => {
    if (!started && threads > 1) {
      started = true;
      try {
        for (let i = 1; i < threads; i++) {
          const worker = env.spawn();
          worker.postMessage({ kind: 'start', control: control.buffer as SharedArrayBuffer });
          workers.push(worker);
        }
      } catch {
        // A worker that cannot start leaves its share to the others (or to the engine worker alone).
        spawnFailed = workers.length === 0;
      }
    }
    return workers.length > 0;
  };

  const runner: HeadroomRunner =
    threads > 1
      ? sharedHeadroomRunner(
          {
            threads,
            minPairs: env.minPairs ?? MIN_PAIRS_FOR_THREADS,
            control,
            start,
            post(jobs) {
              for (const worker of workers) worker.postMessage({ kind: 'plan', jobs });
            },
          },
          (usage) => runs.push(usage),
        )
      : sharedHeadroomRunner({ threads: 1, control, start: () => false, post: () => undefined }, (usage) => runs.push(usage));

  const why = (): string => {
    if (!env.isolated) return 'this page is not cross-origin isolated, so the searches cannot share memory with other threads';
    if (threads === 1) return 'the browser reports one processor';
    if (spawnFailed || runs.some((r) => r.alone === 'no-workers')) return 'the headroom workers could not be started';
    if (runs.every((r) => r.alone === 'few-pairs')) return `each search had fewer than ${(env.minPairs ?? MIN_PAIRS_FOR_THREADS).toLocaleString('en')} lane pairs, where starting threads costs more than it saves`;
    return 'the headroom workers took no job (still starting, or the processors were busy)';
  };

  return {
    threads,
    warm: () => void start(),
    measure(work) {
      runs = [];
      let ms = 0;
      // Wall time of the searches alone (the review does more: loops, the fix plan, the calendar).
      const timed: HeadroomRunner = {
        run(arrays, ballSize, onProgress) {
          const started = performance.now();
          try {
            return runner.run(arrays, ballSize, onProgress);
          } finally {
            ms += performance.now() - started;
          }
        },
      };
      const result = work(timed);
      const used = runs.reduce((most, r) => Math.max(most, r.threads), runs.length > 0 ? 1 : 0);
      return {
        result,
        threads: {
          available: threads,
          used,
          runs: runs.length,
          pairs: runs.reduce((sum, r) => sum + r.pairs, 0),
          ms: Math.round(ms),
          oneThreadBecause: runs.length > 0 && used <= 1 ? why() : null,
        },
      };
    },
  };
}
