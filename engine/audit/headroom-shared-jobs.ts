// The shared-memory form of a headroom run, the same for every host that spreads it over threads
// (the CLI's worker_threads, the app's Web Workers): the layout of the control block through which
// jobs are handed out, the plan of jobs (backward balls over depot ranges, then pair costs over
// destination ranges) with the network's arrays copied into shared memory, and claiming and running
// one job with the pure slice functions of headroom-buckets.ts. Only typed arrays over
// SharedArrayBuffers cross between threads; a host adds its own way of starting threads and of
// posting the plan (headroom-shared-runner.ts drives it).

import { createBackBalls, createBucketWorkspace, growBackBalls, pairCostsOfSlice, type BackBalls, type BucketWorkspace, type HeadroomArrays } from './headroom-buckets';
import { destinationSlices } from './headroom';

/**
 * Slots of the control block (an Int32Array over a SharedArrayBuffer of `HeadroomControl.Size` slots). Jobs
 * are numbered across the pool's life: the jobs of the current phase are those below `Limit` not
 * yet claimed; a thread claims one by compare-and-swap on `Next` while `Next < Limit`, so a thread
 * that looks late never takes a job of a phase it has not read. The calling thread posts the plan
 * before it raises `Limit`, and a job's number tells which plan it belongs to (a worker reads plans
 * until it has that one; a number below its latest plan's is a job the calling thread abandoned). A
 * plan's ball jobs are numbered before its pair jobs, which start once every ball is grown.
 */
export const HeadroomControl = {
  Next: 0,
  Limit: 1,
  /** Raised each time a job ends (the calling thread sleeps on it; `jobDone` says which). */
  Done: 2,
  /** 1 + the job number of the first job that threw in a worker (0: none). */
  Failed: 3,
  /** Raised to make the workers return. */
  Exit: 4,
  /** Workers started (each adds 1 before its first claim). */
  Ready: 5,
  /** Jobs run by workers (all plans). */
  WorkerJobs: 6,
  Size: 7,
} as const;

/** A new control block. */
export function createHeadroomControl(): Int32Array {
  return new Int32Array(new SharedArrayBuffer(HeadroomControl.Size * 4));
}

/** One network's run in shared memory: its arrays, the balls and costs being filled in, and the jobs. */
export interface SharedHeadroomJobs {
  arrays: HeadroomArrays;
  balls: BackBalls;
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
  /** Per job: 1 once done (the calling thread redoes a job a lost worker took). */
  jobDone: Int32Array;
  /** [0]: workers that ran a job of this plan (the calling thread not counted). */
  joined: Int32Array;
}

/** Jobs per thread and phase: enough that a thread slowed by other work on the machine is waited for briefly. */
export const JOBS_PER_THREAD = 8;

/** Below this many lane pairs, starting threads costs more than it saves: the calling thread runs alone. */
export const MIN_PAIRS_FOR_THREADS = 20_000;

const sharedBytes = (bytes: number) => new SharedArrayBuffer(bytes);

function shared<T extends Int32Array | Float64Array>(source: T): T {
  const copy = (source instanceof Int32Array ? new Int32Array(sharedBytes(source.byteLength)) : new Float64Array(sharedBytes(source.byteLength))) as T;
  copy.set(source);
  return copy;
}

function flatRanges(ranges: [number, number][]): Int32Array {
  const flat = new Int32Array(sharedBytes(ranges.length * 8));
  ranges.forEach(([from, to], j) => {
    flat[2 * j] = from;
    flat[2 * j + 1] = to;
  });
  return flat;
}

/**
 * The jobs of one run over `threads` threads, numbered from `firstJob` (the control block's `Limit`
 * when the run starts), with `arrays` copied into shared memory: ball jobs cut the depots into
 * equal ranges, pair jobs cut the destinations into ranges of about equal pair counts.
 */
export function planSharedHeadroom(arrays: HeadroomArrays, ballSize: number, threads: number, firstJob: number): SharedHeadroomJobs {
  const n = arrays.depotCount;
  const jobs = Math.max(1, threads) * JOBS_PER_THREAD;
  const ballRanges: [number, number][] = [];
  for (let j = 0; j < jobs; j++) ballRanges.push([Math.floor((n * j) / jobs), Math.floor((n * (j + 1)) / jobs)]);
  const pairRanges = destinationSlices(arrays, jobs);
  const jobCount = ballRanges.length + pairRanges.length;
  return {
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
    balls: createBackBalls(n, ballSize, sharedBytes),
    cost: new Float64Array(sharedBytes(arrays.pairOrigin.length * 8)),
    ballRanges: flatRanges(ballRanges),
    pairRanges: flatRanges(pairRanges),
    ballBase: firstJob,
    pairBase: firstJob + ballRanges.length,
    settled: new Float64Array(sharedBytes(jobCount * 8)),
    jobDone: new Int32Array(sharedBytes(jobCount * 4)),
    joined: new Int32Array(sharedBytes(4)),
  };
}

/** Claims the next job of the current phase, or returns -1 when none is left. */
export function claimHeadroomJob(control: Int32Array): number {
  for (;;) {
    const next = Atomics.load(control, HeadroomControl.Next);
    if (next >= Atomics.load(control, HeadroomControl.Limit)) return -1;
    if (Atomics.compareExchange(control, HeadroomControl.Next, next, next + 1) === next) return next;
  }
}

/** Pool-wide number one past the last job of `jobs`. */
export function headroomJobsEnd(jobs: SharedHeadroomJobs): number {
  return jobs.pairBase + jobs.pairRanges.length / 2;
}

/** The slot of pool-wide job `job` in `jobs.jobDone` and `jobs.settled`. */
export function headroomJobSlot(jobs: SharedHeadroomJobs, job: number): number {
  return job - jobs.ballBase;
}

/** Runs job `job` (a pool-wide number of `jobs`') and writes its results into the shared arrays. */
export function runHeadroomJob(jobs: SharedHeadroomJobs, job: number, ws: BucketWorkspace): void {
  // Ball jobs are numbered before the plan's pair jobs.
  const balls = job < jobs.pairBase;
  const local = job - (balls ? jobs.ballBase : jobs.pairBase);
  const ranges = balls ? jobs.ballRanges : jobs.pairRanges;
  const from = ranges[2 * local];
  const to = ranges[2 * local + 1];
  const slot = headroomJobSlot(jobs, job);
  if (balls) {
    jobs.settled[slot] = growBackBalls(jobs.arrays, jobs.balls, from, to, ws);
  } else {
    const found = pairCostsOfSlice(jobs.arrays, jobs.balls, from, to, ws);
    jobs.cost.set(found.cost, jobs.arrays.pairStart[from]);
    jobs.settled[slot] = found.settled;
  }
  Atomics.store(jobs.jobDone, slot, 1);
}

/** Marks a job finished and wakes the calling thread. */
export function finishHeadroomJob(control: Int32Array): void {
  Atomics.add(control, HeadroomControl.Done, 1);
  Atomics.notify(control, HeadroomControl.Done);
}

/** A workspace for `jobs`, reused while the depot count fits. */
export function headroomWorkspaceFor(ws: BucketWorkspace | null, jobs: SharedHeadroomJobs): BucketWorkspace {
  return ws !== null && ws.dist.length >= jobs.arrays.depotCount ? ws : createBucketWorkspace(jobs.arrays.depotCount);
}
