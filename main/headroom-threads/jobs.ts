// Claiming and running headroom jobs, the same code on the pool's thread and in every worker: a job
// is claimed by compare-and-swap on the control block's `Next` below `Limit` (contract.ts), run with
// the engine's pure slice functions, and counted in `Done`.

import { createBucketWorkspace, growBackBalls, pairCostsOfSlice, type BucketWorkspace } from '../../engine/index';
import { Control, type HeadroomNetworkMessage } from './contract';

/** Claims the next job of the current phase, or returns -1 when none is left. */
export function claimJob(control: Int32Array): number {
  for (;;) {
    const next = Atomics.load(control, Control.Next);
    if (next >= Atomics.load(control, Control.Limit)) return -1;
    if (Atomics.compareExchange(control, Control.Next, next, next + 1) === next) return next;
  }
}

/** Pool-wide number one past the last job of `net`. */
export function jobsEnd(net: HeadroomNetworkMessage): number {
  return net.pairBase + net.pairRanges.length / 2;
}

/** Runs job `job` (a pool-wide number of `net`'s) and writes its results into the shared arrays. */
export function runJob(net: HeadroomNetworkMessage, job: number, ws: BucketWorkspace): void {
  // Ball jobs are numbered before the network's pair jobs.
  const balls = job < net.pairBase;
  const local = job - (balls ? net.ballBase : net.pairBase);
  const ranges = balls ? net.ballRanges : net.pairRanges;
  const from = ranges[2 * local];
  const to = ranges[2 * local + 1];
  const slot = balls ? local : net.ballRanges.length / 2 + local;
  if (balls) {
    net.settled[slot] = growBackBalls(net.arrays, net.balls, from, to, ws);
  } else {
    const found = pairCostsOfSlice(net.arrays, net.balls, from, to, ws);
    net.cost.set(found.cost, net.arrays.pairStart[from]);
    net.settled[slot] = found.settled;
  }
  Atomics.store(net.jobDone, slot, 1);
}

/** Marks a job finished and wakes the pool's thread. */
export function finishJob(control: Int32Array): void {
  Atomics.add(control, Control.Done, 1);
  Atomics.notify(control, Control.Done);
}

/** A workspace for `net`, reused while the depot count fits. */
export function workspaceFor(ws: BucketWorkspace | null, net: HeadroomNetworkMessage): BucketWorkspace {
  return ws !== null && ws.dist.length >= net.arrays.depotCount ? ws : createBucketWorkspace(net.arrays.depotCount);
}
