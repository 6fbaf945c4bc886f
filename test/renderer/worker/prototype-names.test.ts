// The app's import path (the worker session behind the import dialog) with every Object.prototype
// name in headers, cells, currency marks and depot ids: the answer is always `loaded` with a report
// (the dialog showed "l.split is not a function"), and a depot named so is solved like any other.

import { describe, expect, it } from 'vitest';
import type { FromWorker, ToWorker } from '../../../renderer/worker/protocol';
import { WorkerSession } from '../../../renderer/worker/session';
import { PROTOTYPE_NAMES } from '../../support/prototype-names';

function drive(messages: ToWorker[]): FromWorker[] {
  const out: FromWorker[] = [];
  const session = new WorkerSession((m) => out.push(m));
  messages.forEach((m) => session.handle(m));
  return out.filter((m) => m.kind !== 'progress');
}

const load = (depots: string, lanes: string): ToWorker => ({
  kind: 'load',
  id: 1,
  depots: { name: 'depots.csv', text: depots },
  lanes: { name: 'lanes.csv', text: lanes },
  acceptPartial: true,
  plan: { date: '2026-06-01', vehicleClass: '' },
});

describe.each(PROTOTYPE_NAMES)('worker import with "%s"', (name) => {
  it('answers loaded with a report for every keyed header and cell', () => {
    const cases: [string, string][] = [
      [`id,name,lat,lon,${name}\nA,a,51,4,x\nB,b,52,4,y\n`, `from,to,toll,fuel,fees,rebate,currency,${name}\nA,B,1.00,2.00,0,0,EUR,z\n`],
      ['id,name,lat,lon\nA,a,51,4\nB,b,52,4\n', `from,to,toll,fuel,fees,rebate,currency\nA,B,1.00,2.00,0,0,${name}\nA,B,1.00 ${name},2.00,0,0,EUR\n`],
      ['id,name,lat,lon\nA,a,51,4\nB,b,52,4\n', `from,to,toll_${name},fuel\nA,B,1.00,2.00\n`],
    ];
    for (const [depots, lanes] of cases) {
      const [answer] = drive([load(depots, lanes)]);
      expect(answer.kind, JSON.stringify(answer)).toBe('loaded');
    }
  });

  it('solves from a depot with that id', () => {
    const [loaded, solved] = drive([
      load(`id,name,lat,lon\n${name},a,51,4\nB,b,52,4\n`, `from,to,toll,fuel,fees,rebate\n${name},B,1.00,2.00,0,0.50\n`),
      { kind: 'solve', id: 2, settings: { origin: name, maxLegs: null, vehicleClass: '', dispatchDate: '2026-06-01' }, scenario: null },
    ]);
    expect(loaded.kind).toBe('loaded');
    expect(solved.kind, JSON.stringify(solved)).toBe('solved');
    if (solved.kind === 'solved') expect(Array.from(solved.result.cost)).toEqual([0, 250]);
  });

  it('a dispatch request with that name as load and vehicle ids, a class and a header gives a result or a named error', () => {
    const dispatch = (vehicleClass: string) =>
      drive([
        load('id,name,lat,lon\nA,a,51,4\nB,b,52,4\n', 'from,to,toll_2axle,fuel,fees,rebate\nA,B,1.00,2.00,0,0\n'),
        {
          kind: 'dispatch',
          id: 3,
          request: {
            loads: { name: 'loads.csv', text: `load,from,to,date,vehicle,${name}\n${name},A,B,2026-06-01,${name},x\n` },
            vehicles: { name: 'vehicles.csv', text: `vehicle,vehicle_class,height_m,width_m,length_m,weight_t,axle_load_t,${name}\n${name},${vehicleClass},4,2.5,16,40,11,x\n` },
            date: '2026-06-01',
            alternatives: 0,
            acceptPartial: true,
          },
        },
      ])[1];
    const planned = dispatch('2axle');
    expect(planned.kind, JSON.stringify(planned)).toBe('dispatched');
    if (planned.kind === 'dispatched') expect(planned.result.report?.loads.map((l) => [l.load, l.vehicle, l.status])).toEqual([[name, name, 'planned']]);
    // A class the lanes file does not have is refused by name (the same as for any other word).
    const unknownClass = dispatch(name);
    if (unknownClass.kind === 'error') expect(unknownClass.error.name).not.toBe('TypeError');
    else expect(unknownClass.kind).toBe('dispatched');
  });
});
