// The body of a headroom worker thread: sleeps on the control block until the pool raises `Limit`,
// takes the plan the jobs belong to from its port (read synchronously: the thread never returns
// to its event loop), and works on it with the engine's `workOnHeadroomJobs` until every job of it
// is claimed, then sleeps again.

import { receiveMessageOnPort, type MessagePort } from 'node:worker_threads';
import { claimHeadroomJob, HeadroomControl, headroomJobsEnd, headroomWorkspaceFor, workOnHeadroomJobs, type BucketWorkspace, type SharedHeadroomJobs } from '../../engine/index';
import type { HeadroomWorkerMessage } from './contract';

export function runHeadroomWorker(control: Int32Array, port: MessagePort): void {
  let jobs: SharedHeadroomJobs | null = null;
  let ws: BucketWorkspace | null = null;
  let held = -1;
  Atomics.add(control, HeadroomControl.Ready, 1);
  Atomics.notify(control, HeadroomControl.Ready);
  for (;;) {
    if (Atomics.load(control, HeadroomControl.Exit) !== 0) return;
    const job = held !== -1 ? held : claimHeadroomJob(control);
    held = -1;
    if (job === -1) {
      // Sleep until the pool raises Limit (or sets Exit and wakes the sleepers).
      const limit = Atomics.load(control, HeadroomControl.Limit);
      if (Atomics.load(control, HeadroomControl.Next) >= limit) Atomics.wait(control, HeadroomControl.Limit, limit);
      continue;
    }
    while (jobs === null || job >= headroomJobsEnd(jobs)) {
      const received = receiveMessageOnPort(port);
      if (received === undefined) {
        if (Atomics.load(control, HeadroomControl.Exit) !== 0) return;
        // The plan is posted before Limit is raised; give the port a moment.
        Atomics.wait(control, HeadroomControl.Exit, 0, 1);
        continue;
      }
      jobs = (received.message as HeadroomWorkerMessage).jobs;
    }
    ws = headroomWorkspaceFor(ws, jobs);
    held = workOnHeadroomJobs(control, jobs, ws, job);
  }
}
