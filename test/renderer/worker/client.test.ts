// The typed worker protocol: a request's answer type follows from its kind (WorkerRequests and
// ANSWER_KIND), and an answer of another kind is refused at run time instead of being handed on.

import { describe, expect, expectTypeOf, it } from 'vitest';
import { EngineClient, EngineRequestError } from '../../../renderer/worker/client';
import type { Answer, FromWorker, ToWorker } from '../../../renderer/worker/protocol';

class FakeWorker {
  onmessage: ((event: MessageEvent<FromWorker>) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  sent: ToWorker[] = [];
  postMessage(message: ToWorker) {
    this.sent.push(message);
  }
  terminate() {}
  reply(message: FromWorker) {
    this.onmessage?.({ data: message } as MessageEvent<FromWorker>);
  }
}

function client() {
  const worker = new FakeWorker();
  return { worker, client: new EngineClient(() => worker as unknown as Worker) };
}

describe('EngineClient.request', () => {
  it('sends the kind with the payload and resolves with the answer the map names', async () => {
    const { worker, client: c } = client();
    const answer = c.request('export', { what: 'lanes-csv' });
    expectTypeOf(answer).resolves.toEqualTypeOf<Answer<'export'>>();
    expect(worker.sent[0]).toMatchObject({ kind: 'export', what: 'lanes-csv' });
    worker.reply({ kind: 'exported', id: worker.sent[0].id, fileName: 'lanes.csv', mime: 'text/csv', text: 'x' });
    await expect(answer).resolves.toMatchObject({ kind: 'exported', fileName: 'lanes.csv' });
  });

  it('refuses an answer of another kind', async () => {
    const { worker, client: c } = client();
    const answer = c.request('route', { target: 1, solveId: 1 });
    worker.reply({ kind: 'exported', id: worker.sent[0].id, fileName: 'x', mime: 'x', text: 'x' });
    await expect(answer).rejects.toBeInstanceOf(EngineRequestError);
  });

  it('passes progress on and rejects with the worker\'s error', async () => {
    const { worker, client: c } = client();
    const phases: string[] = [];
    const answer = c.request('replan', { plan: { date: '2026-01-01', vehicleClass: '' } }, (phase) => phases.push(phase));
    worker.reply({ kind: 'progress', id: worker.sent[0].id, phase: 'Planning', fraction: 0.5 });
    worker.reply({ kind: 'error', id: worker.sent[0].id, error: { name: 'PlanRequestError', message: 'bad' } });
    await expect(answer).rejects.toMatchObject({ engineName: 'PlanRequestError' });
    expect(phases).toEqual(['Planning']);
  });
});
