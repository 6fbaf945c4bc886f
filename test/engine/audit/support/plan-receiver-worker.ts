// Body of plan-receiver-worker.mjs: the engine's event-driven worker side on a Node message port,
// so the shared runner is tested with real threads the way a browser runs it.

import { parentPort, workerData } from 'node:worker_threads';
import { receiveHeadroomPlans, type SharedHeadroomJobs } from '../../../../engine/index';

const receive = receiveHeadroomPlans(new Int32Array((workerData as { control: SharedArrayBuffer }).control));
parentPort?.on('message', (message: { jobs: SharedHeadroomJobs }) => receive(message.jobs));
