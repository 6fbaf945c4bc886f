// The headroom thread pool gives the floors one thread gives, and the previous method's, on random
// networks large enough to be cut into many jobs (workers started for real, through worker-source.mjs).

import { afterAll, describe, expect, it } from 'vitest';
import { laneFloors } from '../../../engine/audit/headroom';
import { laneFloorsPerDestination } from '../../../engine/audit/headroom-per-destination';
import { auditNetwork } from '../../../engine/audit/network-audit';
import { createHeadroomThreadPool } from '../../../main/headroom-threads/pool';
import { randomNetwork } from '../../engine/audit/reference';

describe('headroom over worker threads', () => {
  // minPairs 0: every network goes to the workers, however small.
  const pool = createHeadroomThreadPool({ threads: 3, minPairs: 0 });
  afterAll(() => pool.close());

  it('starts its workers', () => {
    expect(pool.waitForWorkers(60_000)).toBe(2);
  });

  it('gives the same floors with 1 and 3 threads, equal to the Dijkstra-per-destination method', () => {
    for (let seed = 1; seed <= 12; seed++) {
      const depots = 40 + seed * 37;
      const net = randomNetwork(seed, depots, depots * (3 + (seed % 4)), true, 200 + seed);
      // Small balls on some networks, so the searches are long and jobs uneven.
      const ballSize = seed % 3 === 0 ? 3 : undefined;
      const one = laneFloors(net, { ballSize });
      const many = laneFloors(net, { ballSize, runner: pool });
      expect(Array.from(many.floor), `seed ${seed}`).toEqual(Array.from(one.floor));
      expect(many.settled).toBe(one.settled);
      expect(Array.from(many.floor), `seed ${seed} reference`).toEqual(Array.from(laneFloorsPerDestination(net).floor));
    }
    // The workers took part (this thread claims jobs too, so not all of them).
    expect(pool.workerJobs()).toBeGreaterThan(0);
  });

  it('reports progress up to the number of pairs, and a full audit is the same with the pool', () => {
    const net = randomNetwork(77, 300, 1_500, false, 300);
    const seen: [number, number][] = [];
    const threaded = auditNetwork(net, { headroomRunner: pool, onProgress: (p) => p.phase === 'headroom' && seen.push([p.done, p.total]) });
    const plain = auditNetwork(net);
    expect(threaded.loops.length).toBeGreaterThan(0);
    expect(Array.from(threaded.headroom!.floor)).toEqual(Array.from(plain.headroom!.floor));
    expect(seen.at(-1)).toEqual([plain.headroom!.sources, plain.headroom!.sources]);
  });

  it('runs on this thread alone with threads: 1 or below minPairs', () => {
    const net = randomNetwork(5, 60, 240, true, 100);
    const single = createHeadroomThreadPool({ threads: 1, minPairs: 0 });
    expect(Array.from(laneFloors(net, { runner: single }).floor)).toEqual(Array.from(laneFloors(net).floor));
    single.close();
  });
});
