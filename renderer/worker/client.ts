// The UI side of the engine worker: request/response by id, progress callbacks, and cancel. Cancel
// terminates the worker (a running solve cannot be interrupted otherwise), starts a fresh one and
// replays the last accepted import so the workspace stays usable.

import { ANSWER_KIND, type Answer, type FromWorker, type LoadRequest, type PlanChoice, type RequestKind, type RequestOf, type ToWorker } from './protocol';

type Pending = { expects: string; resolve: (m: FromWorker) => void; reject: (e: Error) => void; onProgress?: (phase: string, fraction: number) => void };

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

export class EngineClient {
  private worker: Worker;
  private nextId = 1;
  private pending = new Map<number, Pending>();
  private lastLoad: LoadRequest | null = null;

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
    else if (message.kind !== pending.expects) pending.reject(new EngineRequestError('ProtocolError', `worker: answered "${message.kind}" where "${pending.expects}" was due`));
    else pending.resolve(message);
  }

  /**
   * Sends a request of `kind`; resolves with its answer, whose type the protocol fixes
   * (WorkerRequests, ANSWER_KIND): the caller cannot pick another. Progress goes to `onProgress`.
   */
  request<K extends RequestKind>(kind: K, payload: RequestOf<K>, onProgress?: (phase: string, fraction: number) => void): Promise<Answer<K>> {
    const id = this.nextId++;
    return new Promise<Answer<K>>((resolve, reject) => {
      // receive() resolves only with a message of kind ANSWER_KIND[kind], which is an Answer<K>;
      // TypeScript cannot follow that check through the map, hence the one narrowing here.
      const settle = (m: FromWorker) => resolve(m as unknown as Answer<K>);
      this.pending.set(id, { expects: ANSWER_KIND[kind], resolve: settle, reject, onProgress });
      this.worker.postMessage({ ...payload, kind, id } as ToWorker);
    });
  }

  /** Remembers a load that was accepted, to replay after a cancel. */
  rememberLoad(load: LoadRequest): void {
    this.lastLoad = load;
  }

  /** Keeps the remembered load in step with a re-plan for another day or vehicle class. */
  rememberPlan(plan: PlanChoice): void {
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
    if (this.lastLoad) await this.request('load', this.lastLoad);
  }

  dispose(): void {
    this.worker.terminate();
    this.pending.clear();
  }
}
