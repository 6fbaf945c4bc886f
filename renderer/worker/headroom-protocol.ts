// The typed contract between the engine worker (headroom-pool.ts, which runs the searches' calling
// thread) and its headroom workers (headroom.worker.ts): the two messages a headroom worker
// receives. Jobs are handed out through the control block and results land in shared memory
// (engine/audit/headroom-shared-jobs.ts), so a headroom worker posts nothing back: it counts itself
// ready on the control block, and a job that throws there is rerun by the engine worker.

import type { SharedHeadroomJobs } from '../../engine/index';

/** Messages to a headroom worker, by kind. */
export interface HeadroomWorkerMessages {
  /** Once, first: the control block (an Int32Array over it, slots `HeadroomControl`). */
  start: { control: SharedArrayBuffer };
  /** A network's plan of jobs, posted before its jobs are released. */
  plan: { jobs: SharedHeadroomJobs };
}

export type ToHeadroomWorker = { [K in keyof HeadroomWorkerMessages]: { kind: K } & HeadroomWorkerMessages[K] }[keyof HeadroomWorkerMessages];

/** What the review tells the user about the threads its headroom searches ran on. */
export interface HeadroomThreadsView {
  /** Threads the app may use for headroom (the engine worker included). */
  available: number;
  /** The most threads any headroom search of the review ran on. */
  used: number;
  /** Headroom searches run (one per network reviewed) and the lane pairs they answered. */
  runs: number;
  pairs: number;
  /** Wall time of the searches, in milliseconds. */
  ms: number;
  /** Why the searches ran on one thread, when they did (null: they were shared, or none ran). */
  oneThreadBecause: string | null;
}
