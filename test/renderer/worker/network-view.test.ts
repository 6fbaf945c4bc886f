// The network view the worker sends to the UI thread: two-way flags equal the map's reference
// lookup (a set of every depot pair), and nothing in it is a per-lane or per-row array of objects or
// strings (500,000 of those took seconds to clone); lane keys read back from it equal the engine's.

import { describe, expect, it } from 'vitest';
import { importNetwork } from '../../../engine/planning/import-network';
import { overlayKeys } from '../../../engine/scenario/overlay';
import { reverseLookup } from '../../../renderer/map/two-way';
import { laneKey, rowClass, rowKey, rowRef, rowValidity } from '../../../renderer/model/lane-names';
import { networkView, reverseFlags, transferablesOf } from '../../../renderer/worker/network-view';
import { seededRandom } from '../../support/seeded-random';

function files(seed: number) {
  const next = seededRandom(seed);
  const depots = ['id,name,lat,lon', ...Array.from({ length: 40 }, (_, i) => `D${i},Depot ${i},${(45 + next()).toFixed(3)},${(3 + next()).toFixed(3)}`)];
  const lanes = ['from,to,ref,vehicle_class,toll,fuel,fees,rebate,valid_from,valid_to'];
  for (let e = 0; e < 300; e++) {
    const a = Math.floor(next() * 40);
    const b = Math.floor(next() * 40);
    const ref = next() < 0.3 ? '' : `C-${Math.floor(next() * 5)}`;
    const cls = next() < 0.5 ? '' : next() < 0.5 ? '2axle' : '5axle';
    const valid = next() < 0.2 ? '2026-09-01,2026-12-31' : ',';
    lanes.push(`D${a},D${b},${ref},${cls},1.00,2.00,0,0,${valid}`);
  }
  return { depots: depots.join('\n') + '\n', lanes: lanes.join('\n') + '\n' };
}

describe('networkView', () => {
  it.each([1, 2, 3])('carries typed arrays and short lists only, and reads back the engine keys (seed %i)', (seed) => {
    const f = files(seed);
    const imported = importNetwork(f.depots, f.lanes, { plan: { date: '2026-08-15', vehicleClass: '2axle' }, skipInvalid: true });
    const view = networkView(imported, { date: '2026-08-15', vehicleClass: '2axle' });
    const keys = overlayKeys(imported);
    const t = imported.lanes;
    for (let r = 0; r < t.count; r++) {
      expect(rowKey(view, r)).toEqual(keys[r]);
      expect(rowRef(view, r)).toBe(t.ref[r] || undefined);
      expect(rowClass(view, r)).toBe(t.vehicleClass && t.vehicleClass[r] >= 0 ? t.classNames[t.vehicleClass[r]] : null);
      expect(rowValidity(view, r).from).toBe(t.validFrom[r] ? '2026-09-01' : null);
    }
    for (let e = 0; e < view.laneFrom.length; e++) expect(laneKey(view, e)).toEqual(keys[imported.plan.laneRecord[e]]);
    const big = (value: unknown) => Array.isArray(value) && value.length >= view.laneFrom.length && value.length > view.depotIds.length;
    for (const [name, value] of [...Object.entries(view), ...Object.entries(view.rows)]) expect(big(value), name).toBe(false);
  });

  it('flags a lane two-way exactly when the reference lookup finds its reverse', () => {
    const f = files(7);
    const imported = importNetwork(f.depots, f.lanes, { plan: { date: '2026-08-15', vehicleClass: '2axle' }, skipInvalid: true });
    const view = networkView(imported, { date: '2026-08-15', vehicleClass: '2axle' });
    const reverse = reverseLookup(view);
    const flags = reverseFlags(imported.network!);
    let twoWay = 0;
    for (let e = 0; e < view.laneFrom.length; e++) {
      expect(flags[e], `lane ${e}`).toBe(reverse(view.laneFrom[e], view.laneTo[e]) ? 1 : 0);
      twoWay += flags[e];
    }
    expect(twoWay).toBeGreaterThan(0);
  });

  it('carries its own copies of what the paint worker needs, each transferable once', () => {
    const f = files(4);
    const imported = importNetwork(f.depots, f.lanes, { plan: { date: '2026-08-15', vehicleClass: '2axle' }, skipInvalid: true });
    const view = networkView(imported, { date: '2026-08-15', vehicleClass: '2axle' });
    const paint = view.paint!;
    for (const key of ['lat', 'lon', 'laneFrom', 'laneTo', 'laneReverse'] as const) {
      expect(Array.from(paint[key]), key).toEqual(Array.from(view[key]));
      expect(paint[key].buffer).not.toBe(view[key].buffer);
    }
    expect(Array.from(paint.laneGrid.lanes)).toEqual(Array.from(view.laneGrid.lanes));
    // postMessage refuses a transfer list naming one buffer twice.
    const buffers = transferablesOf(view);
    expect(new Set(buffers).size).toBe(buffers.length);
    // And the whole view goes through a transfer as the worker sends it.
    const { port1, port2 } = new MessageChannel();
    expect(() => port1.postMessage(view, buffers)).not.toThrow();
    port1.close();
    port2.close();
  });
});
