// The shared-memory headroom runner (engine/audit/headroom-shared-runner.ts, used by the CLI's
// worker_threads and the app's Web Workers) gives the floors of one thread and of the previous
// method, with workers that receive plans as events (real threads, as in the browser) and with none;
// a run that throws leaves no job of its plan for a worker to mistake for the next plan's.

import { Worker } from 'node:worker_threads';
import { afterAll, describe, expect, it } from 'vitest';
import { laneFloors } from '../../../engine/audit/headroom';
import { laneFloorsPerDestination } from '../../../engine/audit/headroom-per-destination';
import { createHeadroomControl, HeadroomControl, headroomJobsEnd, type SharedHeadroomJobs } from '../../../engine/audit/headroom-shared-jobs';
import { sharedHeadroomRunner, type SharedRunUsage } from '../../../engine/audit/headroom-shared-runner';
import { MoneyOverflowError } from '../../../engine/errors';
import { networkOf } from '../../support/network-builder';
import { randomNetwork } from './reference';

/** A host whose workers never run (start says there are some): the calling thread takes every job. */
function hostWithoutWorkers(threads: number) {
  const posted: SharedHeadroomJobs[] = [];
  const usage: SharedRunUsage[] = [];
  const runner = sharedHeadroomRunner({ threads, minPairs: 0, control: createHeadroomControl(), start: () => true, post: (jobs) => posted.push(jobs) }, (u) => usage.push(u));
  return { runner, posted, usage };
}

describe('shared-memory headroom runner', () => {
  const control = createHeadroomControl();
  const workers: Worker[] = [];
  const usage: SharedRunUsage[] = [];
  const threaded = sharedHeadroomRunner(
    {
      threads: 3,
      minPairs: 0,
      control,
      start() {
        if (workers.length === 0) {
          for (let i = 0; i < 2; i++) workers.push(new Worker(new URL('./support/plan-receiver-worker.mjs', import.meta.url), { workerData: { control: control.buffer } }));
        }
        return true;
      },
      post: (jobs) => workers.forEach((w) => w.postMessage({ jobs })),
    },
    (u) => usage.push(u),
  );
  afterAll(async () => {
    Atomics.store(control, HeadroomControl.Exit, 1);
    Atomics.notify(control, HeadroomControl.Limit);
    await Promise.all(workers.map((w) => w.terminate()));
  });

  it('gives the same floors with 1 and 3 threads, equal to the Dijkstra-per-destination method', () => {
    for (let seed = 1; seed <= 10; seed++) {
      const depots = 50 + seed * 41;
      const net = randomNetwork(300 + seed, depots, depots * (3 + (seed % 4)), true, 150 + seed);
      // Small balls on some networks, so the searches are long and jobs uneven.
      const ballSize = seed % 3 === 0 ? 3 : undefined;
      const one = laneFloors(net, { ballSize });
      const many = laneFloors(net, { ballSize, runner: threaded });
      if (seed === 1) {
        // Wait for both workers once, so the later runs are shared for certain.
        for (let ready = Atomics.load(control, HeadroomControl.Ready); ready < 2; ready = Atomics.load(control, HeadroomControl.Ready)) Atomics.wait(control, HeadroomControl.Ready, ready, 60_000);
      }
      expect(Array.from(many.floor), `seed ${seed}`).toEqual(Array.from(one.floor));
      expect(many.settled, `seed ${seed}`).toBe(one.settled);
      expect(Array.from(many.floor), `seed ${seed} reference`).toEqual(Array.from(laneFloorsPerDestination(net).floor));
    }
    expect(Atomics.load(control, HeadroomControl.WorkerJobs)).toBeGreaterThan(0);
    expect(usage).toHaveLength(10);
    expect(usage.every((u) => u.alone === null && u.threads >= 1 && u.threads <= 3)).toBe(true);
    expect(Math.max(...usage.map((u) => u.threads))).toBeGreaterThan(1);
  });

  it('gives the one-thread floors when the calling thread runs every job', () => {
    const { runner, posted, usage: seen } = hostWithoutWorkers(4);
    const net = randomNetwork(41, 400, 2_000, true, 300);
    expect(Array.from(laneFloors(net, { runner }).floor)).toEqual(Array.from(laneFloors(net).floor));
    expect(posted).toHaveLength(1);
    // 8 ball jobs and 8 pair jobs per thread.
    expect(posted[0].ballRanges.length / 2).toBe(32);
    expect(seen).toEqual([{ pairs: posted[0].arrays.pairOrigin.length, threads: 1, alone: null }]);
  });

  it('after a run that throws, numbers the next run\'s jobs after every job of the failed plan', () => {
    const { runner, posted } = hostWithoutWorkers(2);
    // Back costs past Number.MAX_SAFE_INTEGER: the backward balls throw in the first phase.
    const huge = networkOf(['A', 'B', 'C'], [['A', 'B', 5e15], ['B', 'C', 5e15], ['C', 'A', 5e15]]);
    expect(() => laneFloors(huge, { runner })).toThrow(MoneyOverflowError);
    const net = randomNetwork(9, 120, 600, true, 80);
    expect(Array.from(laneFloors(net, { runner }).floor)).toEqual(Array.from(laneFloors(net).floor));
    // A worker asleep between the failed plan's phases wakes on the next plan's jobs: were their
    // numbers those of the failed plan's pair jobs, it would run them against the failed plan.
    expect(posted[1].ballBase).toBe(headroomJobsEnd(posted[0]));
  });

  it('runs alone with one thread or below minPairs, and says why', () => {
    const net = randomNetwork(5, 60, 240, true, 100);
    const seen: SharedRunUsage[] = [];
    const control = createHeadroomControl();
    const never = () => {
      throw new Error('no plan is posted when the calling thread runs alone');
    };
    const one = sharedHeadroomRunner({ threads: 1, minPairs: 0, control, start: () => true, post: never }, (u) => seen.push(u));
    const few = sharedHeadroomRunner({ threads: 4, minPairs: 1_000_000, control, start: () => true, post: never }, (u) => seen.push(u));
    const none = sharedHeadroomRunner({ threads: 4, minPairs: 0, control, start: () => false, post: never }, (u) => seen.push(u));
    for (const runner of [one, few, none]) expect(Array.from(laneFloors(net, { runner }).floor)).toEqual(Array.from(laneFloors(net).floor));
    expect(seen.map((u) => [u.threads, u.alone])).toEqual([
      [1, 'one-thread'],
      [1, 'few-pairs'],
      [1, 'no-workers'],
    ]);
  });
});
