// The app's headroom pool (renderer/worker/headroom-pool.ts): how many threads for a host, the same
// floors with one thread and with workers (real threads taking plans as events, as Web Workers do),
// and what the review is told about the threads used and why one.

import { Worker } from 'node:worker_threads';
import { afterAll, describe, expect, it } from 'vitest';
import { laneFloors } from '../../../engine/audit/headroom';
import { laneFloorsPerDestination } from '../../../engine/audit/headroom-per-destination';
import { HeadroomControl } from '../../../engine/audit/headroom-shared-jobs';
import { createAppHeadroomPool, headroomThreadsFor, MAX_HEADROOM_THREADS, type HeadroomWorkerHandle } from '../../../renderer/worker/headroom-pool';
import type { ToHeadroomWorker } from '../../../renderer/worker/headroom-protocol';
import { randomNetwork } from '../../engine/audit/reference';

const started: Worker[] = [];
let control: Int32Array | null = null;

/** A headroom worker on a Node thread: the engine's event-driven worker side, as headroom.worker.ts runs it. */
function nodeHeadroomWorker(): HeadroomWorkerHandle {
  let worker: Worker | null = null;
  return {
    postMessage(message: ToHeadroomWorker) {
      if (message.kind === 'start') {
        control = new Int32Array(message.control);
        worker = new Worker(new URL('../../engine/audit/support/plan-receiver-worker.mjs', import.meta.url), { workerData: { control: message.control } });
        started.push(worker);
      } else worker?.postMessage({ jobs: message.jobs });
    },
  };
}

afterAll(async () => {
  if (control) {
    Atomics.store(control, HeadroomControl.Exit, 1);
    Atomics.notify(control, HeadroomControl.Limit);
  }
  await Promise.all(started.map((w) => w.terminate()));
});

describe('headroom threads in the app', () => {
  it('uses the processors the browser reports, capped, at least one, and one without isolation', () => {
    expect(headroomThreadsFor(true, 2)).toBe(2);
    expect(headroomThreadsFor(true, 64)).toBe(MAX_HEADROOM_THREADS);
    expect(headroomThreadsFor(true, 0)).toBe(1);
    expect(headroomThreadsFor(true, undefined)).toBe(1);
    expect(headroomThreadsFor(false, 16)).toBe(1);
  });

  it('gives the floors of one thread with three threads, and says it used more than one', () => {
    const pool = createAppHeadroomPool({ isolated: true, cores: 3, spawn: nodeHeadroomWorker, minPairs: 0 });
    pool.warm();
    // Both workers running before the runs, so the searches are shared for certain.
    for (let ready = Atomics.load(control!, HeadroomControl.Ready); ready < 2; ready = Atomics.load(control!, HeadroomControl.Ready)) Atomics.wait(control!, HeadroomControl.Ready, ready, 60_000);
    for (let seed = 1; seed <= 6; seed++) {
      const net = randomNetwork(700 + seed, 150 + 60 * seed, (150 + 60 * seed) * 4, true, 120);
      const { result, threads } = pool.measure((runner) => laneFloors(net, { runner }));
      expect(Array.from(result.floor), `seed ${seed}`).toEqual(Array.from(laneFloors(net).floor));
      expect(Array.from(result.floor), `seed ${seed} reference`).toEqual(Array.from(laneFloorsPerDestination(net).floor));
      expect(threads).toMatchObject({ available: 3, runs: 1, pairs: result.sources });
      expect(threads.used).toBeGreaterThanOrEqual(1);
      if (threads.used > 1) expect(threads.oneThreadBecause).toBeNull();
    }
    expect(Atomics.load(control!, HeadroomControl.WorkerJobs)).toBeGreaterThan(0);
  });

  it('runs on one thread without cross-origin isolation, and says so', () => {
    const spawn = () => {
      throw new Error('no worker may start without isolation');
    };
    const pool = createAppHeadroomPool({ isolated: false, cores: 8, spawn, minPairs: 0 });
    pool.warm();
    const net = randomNetwork(3, 200, 800, true, 100);
    const { result, threads } = pool.measure((runner) => laneFloors(net, { runner }));
    expect(Array.from(result.floor)).toEqual(Array.from(laneFloors(net).floor));
    expect(threads).toMatchObject({ available: 1, used: 1, runs: 1, pairs: result.sources });
    expect(threads.oneThreadBecause).toMatch(/not cross-origin isolated/);
  });

  it('says why one thread ran on small networks, and reports no threads when no search ran', () => {
    const pool = createAppHeadroomPool({ isolated: true, cores: 4, spawn: nodeHeadroomWorker });
    const net = randomNetwork(4, 100, 300, true, 100);
    const small = pool.measure((runner) => laneFloors(net, { runner }));
    expect(small.threads).toMatchObject({ available: 4, used: 1, runs: 1 });
    expect(small.threads.oneThreadBecause).toMatch(/fewer than 20,000 lane pairs/);
    expect(pool.measure(() => 0).threads).toMatchObject({ runs: 0, used: 0, pairs: 0, oneThreadBecause: null });
  });
});
