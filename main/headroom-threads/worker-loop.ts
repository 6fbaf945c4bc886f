// The body of a headroom worker thread: sleeps on the control block until the pool raises `Limit`,
// takes the network the jobs belong to from its port (read synchronously: the thread never returns
// to its event loop), claims and runs jobs until none is left, and sleeps again. A job that throws
// is recorded in `Failed`; the pool then runs it on its own thread, so the user sees the engine's error.

import { receiveMessageOnPort, type MessagePort } from 'node:worker_threads';
import type { BucketWorkspace } from '../../engine/index';
import { Control, type HeadroomWorkerMessage, type HeadroomNetworkMessage } from './contract';
import { claimJob, finishJob, jobsEnd, runJob, workspaceFor } from './jobs';

export function runHeadroomWorker(control: Int32Array, port: MessagePort): void {
  let net: HeadroomNetworkMessage | null = null;
  let ws: BucketWorkspace | null = null;
  Atomics.add(control, Control.Ready, 1);
  Atomics.notify(control, Control.Ready);
  for (;;) {
    if (Atomics.load(control, Control.Exit) !== 0) return;
    const job = claimJob(control);
    if (job === -1) {
      // Sleep until the pool raises Limit (or sets Exit and wakes the sleepers).
      const limit = Atomics.load(control, Control.Limit);
      if (Atomics.load(control, Control.Next) >= limit) Atomics.wait(control, Control.Limit, limit);
      continue;
    }
    while (net === null || job >= jobsEnd(net)) {
      const received = receiveMessageOnPort(port);
      if (received === undefined) {
        if (Atomics.load(control, Control.Exit) !== 0) return;
        // The message is posted before Limit is raised; give the port a moment.
        Atomics.wait(control, Control.Exit, 0, 1);
        continue;
      }
      net = received.message as HeadroomWorkerMessage;
    }
    if (job < net.ballBase) {
      // A job of a network the pool abandoned (its thread threw): nothing reads its results.
      finishJob(control);
      continue;
    }
    ws = workspaceFor(ws, net);
    try {
      runJob(net, job, ws);
      Atomics.add(control, Control.WorkerJobs, 1);
    } catch {
      Atomics.compareExchange(control, Control.Failed, 0, job + 1);
    }
    finishJob(control);
  }
}
