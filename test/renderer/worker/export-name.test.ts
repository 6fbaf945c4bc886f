// "Export routes" from an origin whose id holds : / * ? " < > | or is very long: the worker's
// suggested file name passes the desktop host's file-name check (it was refused, so the export failed).

import { describe, expect, it } from 'vitest';
import { validateRequest } from '../../../main/ipc/validate-request';
import type { FromWorker, ToWorker } from '../../../renderer/worker/protocol';
import { WorkerSession } from '../../../renderer/worker/session';

function drive(messages: ToWorker[]): FromWorker[] {
  const out: FromWorker[] = [];
  const session = new WorkerSession((m) => out.push(m));
  messages.forEach((m) => session.handle(m));
  return out.filter((m) => m.kind !== 'progress');
}

describe('export file names', () => {
  it.each(['A:B/C*D?"E"<F>|G', 'x'.repeat(300), 'CON', 'a\u0007b'])('origin %j', (origin) => {
    const id = origin.includes(',') ? `"${origin}"` : origin.includes('"') ? `"${origin.replace(/"/g, '""')}"` : origin;
    const out = drive([
      { kind: 'load', id: 1, depots: { name: 'depots.csv', text: `id,name,lat,lon\n${id},a,51,4\nB,b,52,4\n` }, lanes: { name: 'lanes.csv', text: `from,to,toll,fuel\n${id},B,1.00,2.00\n` }, acceptPartial: false, plan: { date: '2026-06-01', vehicleClass: '' } },
      { kind: 'solve', id: 2, settings: { origin, maxLegs: null, vehicleClass: '', dispatchDate: '2026-06-01' }, scenario: null },
      { kind: 'export', id: 3, what: 'routes-csv' },
    ]);
    const exported = out.find((m) => m.kind === 'exported');
    expect(exported, JSON.stringify(out.filter((m) => m.kind === 'error'))).toBeDefined();
    if (exported?.kind !== 'exported') return;
    expect(validateRequest('file:save-export', { suggestedName: exported.fileName, text: exported.text, kind: 'csv' }).suggestedName).toBe(exported.fileName);
    expect(exported.fileName.startsWith('routes-')).toBe(true);
  });
});
