// Entry of a headroom worker (started by headroom-pool.ts inside the engine worker): runs the jobs
// of each plan it receives with the engine's shared-memory worker side, then returns to its event
// loop for the next plan. It needs a cross-origin isolated page (shared memory).

import { receiveHeadroomPlans, type SharedHeadroomJobs } from '../../engine/index';
import type { ToHeadroomWorker } from './headroom-protocol';

const scope = self as unknown as { onmessage: ((event: MessageEvent<ToHeadroomWorker>) => void) | null };
let receive: ((jobs: SharedHeadroomJobs) => void) | null = null;
scope.onmessage = (event) => {
  const message = event.data;
  switch (message.kind) {
    case 'start':
      receive ??= receiveHeadroomPlans(new Int32Array(message.control));
      return;
    case 'plan':
      receive?.(message.jobs);
      return;
    default: {
      // Every message kind is handled above: a new kind fails to compile here.
      const unhandled: never = message;
      return unhandled;
    }
  }
};
