// The UI side of the engine worker: request/response by id, progress callbacks, and cancel. Cancel
// terminates the worker (a running solve cannot be interrupted otherwise), starts a fresh one and
// replays the last accepted import so the workspace stays usable.

import type { FromWorker, ToWorker } from './protocol';

type Pending = { resolve: (m: FromWorker) => void; reject: (e: Error) => void; onProgress?: (phase: string, fraction: number) => void };

/** Raised to callers whose request was cancelled. */
export class WorkCancelledError extends Error {
  constructor() {
    super('worker: cancelled');
    this.name = 'WorkCancelledError';
  }
}

/** Raised when the worker answers with an error. */
export class EngineRequestError extends Error {
  constructor(readonly engineName: string, message: string) {
    super(message);
    this.name = 'EngineRequestError';
  }
}

type Request = ToWorker extends infer T ? (T extends { id: number } ? Omit<T, 'id'> : never) : never;

export class EngineClient {
  private worker: Worker;
  private nextId = 1;
  private pending = new Map<number, Pending>();
  private lastLoad: Extract<Request, { kind: 'load' }> | null = null;

  constructor(private readonly create: () => Worker) {
    this.worker = this.start();
  }

  private start(): Worker {
    const worker = this.create();
    worker.onmessage = (event: MessageEvent<FromWorker>) => this.receive(event.data);
    worker.onerror = (event) => {
      const error = new EngineRequestError('WorkerError', event.message || 'the engine worker stopped');
      for (const p of this.pending.values()) p.reject(error);
      this.pending.clear();
    };
    return worker;
  }

  private receive(message: FromWorker): void {
    const pending = this.pending.get(message.id);
    if (!pending) return;
    if (message.kind === 'progress') {
      pending.onProgress?.(message.phase, message.fraction);
      return;
    }
    this.pending.delete(message.id);
    if (message.kind === 'error') pending.reject(new EngineRequestError(message.error.name, message.error.message));
    else pending.resolve(message);
  }

  /** Sends a request; resolves with the worker's answer (never a progress message). */
  request<K extends FromWorker['kind']>(request: Request, onProgress?: (phase: string, fraction: number) => void): Promise<Extract<FromWorker, { kind: K }>> {
    const id = this.nextId++;
    return new Promise((resolve, reject) => {
      this.pending.set(id, { resolve: resolve as (m: FromWorker) => void, reject, onProgress });
      this.worker.postMessage({ ...request, id } as ToWorker);
    });
  }

  /** Remembers a load that was accepted, to replay after a cancel. */
  rememberLoad(load: Extract<Request, { kind: 'load' }>): void {
    this.lastLoad = load;
  }

  /** Keeps the remembered load in step with a re-plan for another day or vehicle class. */
  rememberPlan(plan: Extract<Request, { kind: 'load' }>['plan']): void {
    if (this.lastLoad) this.lastLoad = { ...this.lastLoad, plan };
  }

  /** True while any request is unanswered. */
  get busy(): boolean {
    return this.pending.size > 0;
  }

  /** Stops all running work; pending requests reject with WorkCancelledError. */
  async cancel(): Promise<void> {
    this.worker.terminate();
    const cancelled = new WorkCancelledError();
    for (const p of this.pending.values()) p.reject(cancelled);
    this.pending.clear();
    this.worker = this.start();
    if (this.lastLoad) await this.request({ ...this.lastLoad });
  }

  dispose(): void {
    this.worker.terminate();
    this.pending.clear();
  }
}
