// A HeadroomRunner over threads that share memory, for any host that can start threads and post
// them a message (the CLI's worker_threads, main/headroom-threads; the app's Web Workers,
// renderer/worker/headroom-pool.ts): the calling thread plans the jobs in shared memory
// (headroom-shared-jobs.ts), posts the plan, releases the jobs through the control block, claims
// jobs itself and blocks on Atomics while the last ones finish (the engine's runner is synchronous).
// `workOnHeadroomJobs` is the workers' side. Every pair's cost depends only on the arrays, so the floors are
// the same with 1 or N threads; a job that throws in a worker is rerun here, so the engine's own
// error reaches the user.

import type { BucketWorkspace, HeadroomArrays } from './headroom-buckets';
import { singleThreadRunner, type HeadroomRunner } from './headroom';
import { claimHeadroomJob, HeadroomControl, finishHeadroomJob, headroomJobsEnd, headroomJobSlot, MIN_PAIRS_FOR_THREADS, planSharedHeadroom, runHeadroomJob, headroomWorkspaceFor, type SharedHeadroomJobs } from './headroom-shared-jobs';

/** A worker that has held a job this long without finishing is presumed lost; the calling thread redoes its job. */
const LOST_WORKER_MS = 60_000;

/** How a host's threads are reached. */
export interface SharedHeadroomHost {
  /** Threads in all, the calling one included (1 = no worker). */
  readonly threads: number;
  /** Pair count from which workers are used (default MIN_PAIRS_FOR_THREADS). */
  readonly minPairs?: number;
  /** The control block the workers were given (createHeadroomControl). */
  readonly control: Int32Array;
  /** Starts the workers if they are not; true when there is at least one. */
  start(): boolean;
  /** Hands a plan to every worker; called before its jobs are released. */
  post(jobs: SharedHeadroomJobs): void;
}

/** What one run used: its pairs and the threads that ran jobs, the calling one included. */
export interface SharedRunUsage {
  pairs: number;
  threads: number;
  /** Why the calling thread ran alone, when it did. */
  alone: 'one-thread' | 'few-pairs' | 'no-workers' | null;
}

export interface SharedHeadroomRunner extends HeadroomRunner {
  readonly threads: number;
}

/** A runner that spreads each run over the host's threads; `onRun` hears what each run used. */
export function sharedHeadroomRunner(host: SharedHeadroomHost, onRun?: (usage: SharedRunUsage) => void): SharedHeadroomRunner {
  const { control } = host;
  const minPairs = host.minPairs ?? MIN_PAIRS_FOR_THREADS;
  let ws: BucketWorkspace | null = null;

  // Runs the jobs from `first` to `end` - 1 here and in the workers; returns once every one is done.
  const phase = (jobs: SharedHeadroomJobs, first: number, end: number, onJob?: () => void): void => {
    Atomics.store(control, HeadroomControl.Limit, end);
    Atomics.notify(control, HeadroomControl.Limit);
    ws = headroomWorkspaceFor(ws, jobs);
    for (let job = claimHeadroomJob(control); job !== -1; job = claimHeadroomJob(control)) {
      runHeadroomJob(jobs, job, ws);
      finishHeadroomJob(control);
      onJob?.();
    }
    let waitedSince = Date.now();
    for (;;) {
      const seen = Atomics.load(control, HeadroomControl.Done);
      const failed = Atomics.exchange(control, HeadroomControl.Failed, 0) - 1;
      // Run here the job a worker could not: the engine's own error reaches the user (or, if the
      // worker failed for a reason of its own, the job completes here). A failure left from an
      // abandoned run names a job of another plan: nothing reads it.
      if (failed >= first && failed < end) {
        runHeadroomJob(jobs, failed, ws);
        continue;
      }
      let open = 0;
      for (let job = first; job < end; job++) if (Atomics.load(jobs.jobDone, headroomJobSlot(jobs, job)) === 0) open++;
      if (open === 0) return;
      if (Atomics.wait(control, HeadroomControl.Done, seen, 1_000) !== 'timed-out') waitedSince = Date.now();
      else if (Date.now() - waitedSince > LOST_WORKER_MS) {
        for (let job = first; job < end; job++) if (Atomics.load(jobs.jobDone, headroomJobSlot(jobs, job)) === 0) runHeadroomJob(jobs, job, ws);
        waitedSince = Date.now();
      }
    }
  };

  const alone = (arrays: HeadroomArrays, ballSize: number, why: SharedRunUsage['alone'], onProgress?: (done: number, total: number) => void) => {
    const result = singleThreadRunner.run(arrays, ballSize, onProgress);
    onRun?.({ pairs: arrays.pairOrigin.length, threads: 1, alone: why });
    return result;
  };

  return {
    threads: host.threads,
    run(arrays, ballSize, onProgress) {
      const total = arrays.pairOrigin.length;
      if (host.threads <= 1) return alone(arrays, ballSize, 'one-thread', onProgress);
      if (total < minPairs) return alone(arrays, ballSize, 'few-pairs', onProgress);
      if (!host.start()) return alone(arrays, ballSize, 'no-workers', onProgress);
      const jobs = planSharedHeadroom(arrays, ballSize, host.threads, Atomics.load(control, HeadroomControl.Limit));
      host.post(jobs);
      const ballJobs = jobs.ballRanges.length / 2;
      let pairsDone = 0;
      try {
        phase(jobs, jobs.ballBase, jobs.pairBase);
        phase(jobs, jobs.pairBase, headroomJobsEnd(jobs), () => {
          let done = 0;
          for (let j = 0; j < jobs.pairRanges.length / 2; j++) {
            if (Atomics.load(jobs.jobDone, ballJobs + j) === 1) done += arrays.pairStart[jobs.pairRanges[2 * j + 1]] - arrays.pairStart[jobs.pairRanges[2 * j]];
          }
          if (done > pairsDone) onProgress?.((pairsDone = done), total);
        });
      } catch (error) {
        // Leave no job of this plan unclaimed, in either phase: the next plan's jobs are numbered
        // from here, and a worker must never take one of these for one of those.
        Atomics.store(control, HeadroomControl.Limit, headroomJobsEnd(jobs));
        Atomics.notify(control, HeadroomControl.Limit);
        while (claimHeadroomJob(control) !== -1) finishHeadroomJob(control);
        throw error;
      }
      if (pairsDone < total) onProgress?.(total, total);
      let settled = 0;
      for (const s of jobs.settled) settled += s;
      onRun?.({ pairs: total, threads: 1 + Atomics.load(jobs.joined, 0), alone: null });
      return { cost: jobs.cost, settled };
    },
  };
}

/**
 * A worker's share of plan `jobs`: claims and runs its jobs until every one is claimed (sleeping on
 * the control block between the ball and pair phases), starting with `held` if it is one of them.
 * Returns -1 when the plan's jobs are all claimed or the pool exits, or the number of a job it
 * claimed that belongs to a later plan (posted before that job was released: the caller reads that
 * plan and calls again with the job as `held`).
 */
export function workOnHeadroomJobs(control: Int32Array, jobs: SharedHeadroomJobs, ws: BucketWorkspace, held = -1): number {
  let joined = false;
  for (;;) {
    if (Atomics.load(control, HeadroomControl.Exit) !== 0) return -1;
    const job = held !== -1 ? held : claimHeadroomJob(control);
    held = -1;
    if (job === -1) {
      const limit = Atomics.load(control, HeadroomControl.Limit);
      const next = Atomics.load(control, HeadroomControl.Next);
      if (next >= headroomJobsEnd(jobs)) return -1;
      // Between the phases: sleep until the calling thread releases the pair jobs.
      if (next >= limit) Atomics.wait(control, HeadroomControl.Limit, limit, 1_000);
      continue;
    }
    if (job >= headroomJobsEnd(jobs)) return job;
    if (job < jobs.ballBase) {
      // A job of a plan the calling thread abandoned (it threw): nothing reads its results.
      finishHeadroomJob(control);
      continue;
    }
    if (!joined) {
      joined = true;
      Atomics.add(jobs.joined, 0, 1);
    }
    try {
      runHeadroomJob(jobs, job, ws);
      Atomics.add(control, HeadroomControl.WorkerJobs, 1);
    } catch {
      Atomics.compareExchange(control, HeadroomControl.Failed, 0, job + 1);
    }
    finishHeadroomJob(control);
  }
}

/**
 * The worker side for a host that delivers plans as events (a Web Worker's `onmessage`): counts the
 * worker as ready, then for each plan received works on it (`workOnHeadroomJobs`) and returns to the
 * event loop once its jobs are all claimed. A job of a later plan claimed meanwhile is held until
 * that plan arrives (it was posted before the job was released, so it is already on its way).
 */
export function receiveHeadroomPlans(control: Int32Array): (jobs: SharedHeadroomJobs) => void {
  let ws: BucketWorkspace | null = null;
  let held = -1;
  Atomics.add(control, HeadroomControl.Ready, 1);
  Atomics.notify(control, HeadroomControl.Ready);
  return (jobs) => {
    // A plan whose jobs were all claimed before it arrived (the held job is of a later one): skip it.
    if (held !== -1 && held >= headroomJobsEnd(jobs)) return;
    ws = headroomWorkspaceFor(ws, jobs);
    held = workOnHeadroomJobs(control, jobs, ws, held);
  };
}
