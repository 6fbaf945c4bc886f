// Entry point of the engine Web Worker: every import, solve and export runs here so the map and
// tables stay responsive. The UI cancels work by terminating this worker and starting a new one.

import type { ToWorker } from './protocol';
import { WorkerSession } from './session';

const scope = self as unknown as { postMessage(message: unknown, transfer?: Transferable[]): void; onmessage: ((event: MessageEvent<ToWorker>) => void) | null };
const session = new WorkerSession((message, transfer) => scope.postMessage(message, transfer ?? []));
scope.onmessage = (event) => session.handle(event.data);
