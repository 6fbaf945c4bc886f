// "limit hides loop" marks a depot whose cost is finite only because of the leg limit. A depot the
// limit leaves unreachable has no cost to hide: it is not flagged (it was).

import { describe, expect, it } from 'vitest';
import { FLAG_LIMIT_HIDES_LOOP } from '../../../renderer/model/flags';
import type { FromWorker, SolveView, ToWorker } from '../../../renderer/worker/protocol';
import { WorkerSession } from '../../../renderer/worker/session';

describe('limit hides loop', () => {
  it('flags reachable depots beyond a loop, never unreachable ones', () => {
    // A>B, then the loop B>C>B nets -1.00 per lap: without a limit B and C are unbounded.
    const depots = 'id,name,lat,lon\nA,a,51,4\nB,b,51.1,4\nC,c,51.2,4\n';
    const lanes = 'from,to,toll,fuel,rebate\nA,B,1.00,0,0\nB,C,1.00,0,0\nC,B,1.00,0,3.00\n';
    const out: FromWorker[] = [];
    const session = new WorkerSession((m) => out.push(m));
    const messages: ToWorker[] = [
      { kind: 'load', id: 1, depots: { name: 'depots.csv', text: depots }, lanes: { name: 'lanes.csv', text: lanes }, acceptPartial: false, plan: { date: '2026-06-01', vehicleClass: '' } },
      // One leg: B is reached (its cost hides the loop); C needs two legs and is unreachable.
      { kind: 'solve', id: 2, settings: { origin: 'A', maxLegs: 1, vehicleClass: '', dispatchDate: '2026-06-01' }, scenario: null },
    ];
    messages.forEach((m) => session.handle(m));
    const solved = out.find((m) => m.kind === 'solved') as { result: SolveView } | undefined;
    expect(solved).toBeDefined();
    const view = solved!.result;
    expect(Array.from(view.status)).toEqual([1, 1, 0]);
    expect((view.flags[1] & FLAG_LIMIT_HIDES_LOOP) !== 0).toBe(true);
    expect(view.flags[2] & FLAG_LIMIT_HIDES_LOOP).toBe(0);
  });
});
