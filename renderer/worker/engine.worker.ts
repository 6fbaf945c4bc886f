// Entry point of the engine Web Worker: every import, solve and export runs here so the map and
// tables stay responsive. The UI cancels work by terminating this worker and starting a new one
// (which ends its headroom workers with it). Headroom searches spread over headroom workers when
// the page is cross-origin isolated (headroom-pool.ts).

import type { ToWorker } from './protocol';
import { WorkerSession } from './session';
import { createAppHeadroomPool } from './headroom-pool';

const scope = self as unknown as {
  postMessage(message: unknown, transfer?: Transferable[]): void;
  onmessage: ((event: MessageEvent<ToWorker>) => void) | null;
  crossOriginIsolated?: boolean;
  navigator: { hardwareConcurrency?: number };
};
const headroom = createAppHeadroomPool({
  // Shared memory needs both: an isolated page, and a host that has SharedArrayBuffer at all.
  isolated: scope.crossOriginIsolated === true && typeof SharedArrayBuffer === 'function',
  cores: scope.navigator.hardwareConcurrency,
  spawn: () => new Worker(new URL('./headroom.worker.ts', import.meta.url), { type: 'module', name: 'lanewright-headroom' }),
});
const session = new WorkerSession((message, transfer) => scope.postMessage(message, transfer ?? []), headroom);
scope.onmessage = (event) => session.handle(event.data);
