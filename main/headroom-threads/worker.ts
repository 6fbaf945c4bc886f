// Entry of a headroom worker thread (started by pool.ts; bundled as dist/cli/headroom-worker.mjs).

import { parentPort, workerData } from 'node:worker_threads';
import { HEADROOM_WORKER_KIND, type HeadroomWorkerData } from './contract';
import { runHeadroomWorker } from './worker-loop';

const data = workerData as HeadroomWorkerData | null;
if (parentPort !== null && data !== null && data.kind === HEADROOM_WORKER_KIND) runHeadroomWorker(new Int32Array(data.control), parentPort);
