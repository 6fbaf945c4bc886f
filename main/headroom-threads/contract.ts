// The typed contract between the headroom thread pool (pool.ts, on the command's thread) and its
// worker threads (worker-loop.ts): the one message (a network's shared arrays) and the layout of the
// shared control block through which jobs are handed out. The command's thread stays synchronous
// (the CLI commands are), so jobs are claimed with Atomics, not by messages, and results land in
// shared memory: no object crosses, only typed arrays over SharedArrayBuffers.

import type { HeadroomArrays } from '../../engine/index';

/** `workerData` of a headroom worker. */
export interface HeadroomWorkerData {
  kind: typeof HEADROOM_WORKER_KIND;
  /** The control block (Int32Array over it, indexes `Control`). */
  control: SharedArrayBuffer;
}

export const HEADROOM_WORKER_KIND = 'lanewright-headroom-worker';

/**
 * Slots of the control block. Jobs are numbered across the pool's life: the jobs of the current
 * phase are those below `Limit` not yet claimed; a thread claims one by compare-and-swap on `Next` while
 * `Next < Limit`, so a thread that looks late never takes a job of a phase it has not read. The
 * pool posts the network's message before it raises `Limit`, and a job's number tells which network
 * it belongs to (a worker reads messages until it has that one; a number below its latest network's
 * is a job the pool has abandoned). A network's ball jobs (growBackBalls over depot ranges) are
 * numbered before its pair jobs (pairCostsOfSlice over destination ranges), which start once every
 * ball is grown.
 */
export const Control = {
  Next: 0,
  Limit: 1,
  /** Raised each time a job ends (the pool sleeps on it; jobDone says which). */
  Done: 2,
  /** 1 + the job number of the first job that threw in a worker (0: none). */
  Failed: 3,
  /** Raised to make the workers return. */
  Exit: 4,
  /** Workers started (each adds 1 before its first claim). */
  Ready: 5,
  /** Jobs run by workers (all networks). */
  WorkerJobs: 6,
  Size: 7,
} as const;

/** The one message: a network's arrays and results, all views on SharedArrayBuffers. */
export interface HeadroomNetworkMessage {
  kind: 'network';
  arrays: HeadroomArrays;
  balls: { size: number; node: Int32Array; dist: Float64Array; count: Int32Array; radius: Float64Array };
  /** Back cost per pair (pairCostsOfSlice's output, at pairStart[from]). */
  cost: Float64Array;
  /** Job j of a phase covers [ranges[2j], ranges[2j+1]): depots for balls, destinations for pairs. */
  ballRanges: Int32Array;
  pairRanges: Int32Array;
  /** First pool-wide job number of each phase (ball jobs, then pair jobs); pair jobs end before pairBase + pairRanges.length / 2. */
  ballBase: number;
  pairBase: number;
  /** Depots settled per job (ball jobs, then pair jobs). */
  settled: Float64Array;
  /** Per job: 1 once done (the pool redoes a job a lost worker took). */
  jobDone: Int32Array;
}

/** Messages a worker receives on its port. */
export type HeadroomWorkerMessage = HeadroomNetworkMessage;
