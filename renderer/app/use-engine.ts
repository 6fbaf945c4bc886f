// One engine worker per window, with the progress of whatever it is doing and a way to cancel it.
// Progress shows only for work that lasts over a moment, so quick solves do not flash a bar.

import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { EngineClient, WorkCancelledError } from '../worker/client';

export interface Progress {
  phase: string;
  fraction: number;
}

const SHOW_AFTER_MS = 150;

/** Stable for the window's lifetime, so effects depending on it run only when their data changes. */
export interface Engine {
  client: EngineClient;
  /** Runs a request with progress reporting; rejects with WorkCancelledError when cancelled. */
  track<T>(work: (onProgress: (phase: string, fraction: number) => void) => Promise<T>, phase: string): Promise<T>;
  cancel(): void;
}

export function useEngine(): { engine: Engine; progress: Progress | null; generation: number } {
  const clientRef = useRef<EngineClient | null>(null);
  if (clientRef.current === null) {
    clientRef.current = new EngineClient(() => new Worker(new URL('../worker/engine.worker.ts', import.meta.url), { type: 'module', name: 'lanewright-engine' }));
  }
  const client = clientRef.current;
  const [progress, setProgress] = useState<Progress | null>(null);
  // Bumped when a cancel replaces the worker: the new worker has the data but no solve yet.
  const [generation, setGeneration] = useState(0);
  const running = useRef(0);

  useEffect(() => () => client.dispose(), [client]);

  const track = useCallback(
    async <T,>(work: (onProgress: (phase: string, fraction: number) => void) => Promise<T>, phase: string): Promise<T> => {
      running.current++;
      let latest: Progress = { phase, fraction: 0 };
      let shown = false;
      const timer = setTimeout(() => {
        shown = true;
        setProgress(latest);
      }, SHOW_AFTER_MS);
      try {
        return await work((p, fraction) => {
          latest = { phase: p, fraction };
          if (shown) setProgress(latest);
        });
      } finally {
        clearTimeout(timer);
        running.current--;
        if (running.current === 0) setProgress(null);
      }
    },
    [],
  );

  const cancel = useCallback(() => {
    void client
      .cancel()
      .catch(() => undefined)
      .then(() => setGeneration((g) => g + 1));
    setProgress(null);
  }, [client]);

  const engine = useMemo(() => ({ client, track, cancel }), [client, track, cancel]);
  return { engine, progress, generation };
}

export { WorkCancelledError };
