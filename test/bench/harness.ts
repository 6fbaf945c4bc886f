// Shared pieces of `npm run bench`: timing, memory and the side-by-side table. Each suite in
// test/bench/suites/ exports `suite`; run.ts runs them all (or those named on the command line).

import { seededRandom } from '../support/seeded-random';

export interface BenchFigure {
  /** What was measured, e.g. "random sparse 100k/1M: solve". */
  case: string;
  /** Lanewright's figure. */
  engine: number;
  /** The baseline's figure from the same run, when there is one. */
  baseline?: number;
  unit: 'ms' | 'MB' | 'count';
  /** Target the figure must meet (engine <= target), when the issue sets one. */
  target?: number;
  note?: string;
}

export interface BenchSuite {
  name: string;
  run(record: (figure: BenchFigure) => void): Promise<void> | void;
}

/** Milliseconds taken by fn, best of `repeat` runs (the first run also warms the JIT). */
export function timeBest<T>(fn: () => T, repeat = 3): { ms: number; result: T } {
  let best = Infinity;
  let result!: T;
  for (let i = 0; i < repeat; i++) {
    const start = performance.now();
    result = fn();
    best = Math.min(best, performance.now() - start);
  }
  return { ms: best, result };
}

/** Heap growth in MB while `build` runs and its result stays alive (needs node --expose-gc). */
export function retainedMb<T>(build: () => T): { mb: number; result: T } {
  const gc = (globalThis as { gc?: () => void }).gc;
  gc?.();
  const before = process.memoryUsage();
  const result = build();
  gc?.();
  const after = process.memoryUsage();
  const used = after.heapUsed - before.heapUsed + (after.arrayBuffers - before.arrayBuffers);
  return { mb: used / (1024 * 1024), result };
}

/** Seeded pseudo-random numbers, so every bench run sees the same networks. */
export const seeded = seededRandom;
