// The typed contract between the CLI's headroom thread pool (pool.ts, on the command's thread) and
// its worker threads (worker-loop.ts): the start data and the one message, a plan of jobs in shared
// memory. The plan's layout and the control block through which jobs are handed out belong to the
// engine (engine/audit/headroom-shared-jobs.ts), shared with the app's Web Workers; only typed
// arrays over SharedArrayBuffers cross, no object.

import type { SharedHeadroomJobs } from '../../engine/index';

/** `workerData` of a headroom worker. */
export interface HeadroomWorkerData {
  kind: typeof HEADROOM_WORKER_KIND;
  /** The control block (Int32Array over it, indexes `HeadroomControl`). */
  control: SharedArrayBuffer;
}

export const HEADROOM_WORKER_KIND = 'lanewright-headroom-worker';

/** The one message: a network's plan of jobs, posted before its jobs are released. */
export interface HeadroomNetworkMessage {
  kind: 'network';
  jobs: SharedHeadroomJobs;
}

/** Messages a worker receives on its port. */
export type HeadroomWorkerMessage = HeadroomNetworkMessage;
