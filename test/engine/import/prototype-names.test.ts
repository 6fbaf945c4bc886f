// Every name Object.prototype carries ("constructor", "toString", "__proto__", ...) fed into every
// cell and header the importers look up by text: each file still gives a report (never a TypeError),
// counts stay balanced, unknown columns keep their values under that name, and a depot with such an
// id is routed like any other. Exhaustive over names x positions, so a failure names its case.

import { describe, expect, it } from 'vitest';
import { LanewrightError } from '../../../engine/errors';
import { importLoads, importVehicles } from '../../../engine/import/import-loads';
import { laneRecordAt } from '../../../engine/import/lane-table';
import { depotIndexOf } from '../../../engine/network/build';
import { importNetwork } from '../../../engine/planning/import-network';
import { cheapestRoutes } from '../../../engine/routes/cheapest-routes';
import { PROTOTYPE_NAMES } from '../../support/prototype-names';

const DEPOTS = 'id,name,lat,lon,type,notes\nA,Alpha,51.9,4.1,port,\nB,Bravo,51.2,4.3,yard,\n';
const LANE_HEADER = ['from', 'to', 'ref', 'toll', 'toll_2axle', 'fuel', 'fees', 'rebate', 'currency', 'distance_km', 'drive_minutes', 'valid_from', 'valid_to', 'notes'];
const LANE_ROW = ['A', 'B', 'K-1', '1.00', '2.00', '3.00', '0.50', '0.25', 'EUR', '94', '80', '2026-01-01', '2026-12-31', 'ok'];

const csv = (header: readonly string[], ...rows: (readonly string[])[]) => [header, ...rows].map((r) => r.join(',')).join('\n') + '\n';
const replaced = (row: readonly string[], i: number, value: string) => row.map((v, j) => (j === i ? value : v));

/** Runs an import; only a report or a named Lanewright error are acceptable outcomes. */
function imported(depots: string, lanes: string, plan = {}) {
  try {
    const r = importNetwork(depots, lanes, { plan: { date: '2026-06-01', ...plan } });
    expect(r.report.accepted + r.report.rejected).toBe(r.report.total);
    for (const f of r.report.files) expect(f.accepted + f.rejected).toBe(f.total);
    return r;
  } catch (error) {
    expect(error, String(error)).toBeInstanceOf(LanewrightError);
    return null;
  }
}

describe.each(PROTOTYPE_NAMES)('"%s" in the depots and lanes files', (name) => {
  it('as any lanes header, an extra column, a class toll and a unit', () => {
    for (let i = 0; i < LANE_HEADER.length; i++) imported(DEPOTS, csv(replaced(LANE_HEADER, i, name), LANE_ROW));
    const extra = imported(DEPOTS, csv([...LANE_HEADER, name], [...LANE_ROW, 'kept']))!;
    expect(extra.report.warnings.some((w) => w.column === name && w.code === 'unknown-column')).toBe(true);
    expect(laneRecordAt(extra.lanes, extra.depots, extra.exponent, 0).extra[name]).toBe('kept');
    imported(DEPOTS, csv([...LANE_HEADER, `toll_${name}`], [...LANE_ROW, '4.00']));
    imported(DEPOTS, csv([...LANE_HEADER, `toll (${name})`], [...LANE_ROW, '4.00']));
    imported(DEPOTS, csv(replaced(LANE_HEADER, 9, `distance (${name})`), LANE_ROW));
  });

  it('as any lanes cell, an amount\'s currency mark and the vehicle class asked for', () => {
    for (let i = 0; i < LANE_ROW.length; i++) imported(DEPOTS, csv(LANE_HEADER, replaced(LANE_ROW, i, name)));
    for (const amount of [`1.00 ${name}`, `${name} 1.00`, `-1.00 ${name}`]) {
      for (const column of [3, 4, 5, 6, 7]) {
        const r = imported(DEPOTS, csv(LANE_HEADER, replaced(LANE_ROW, column, amount)))!;
        expect(r.report.errors.map((e) => e.column)).toContain(LANE_HEADER[column]);
      }
    }
    const currency = imported(DEPOTS, csv(LANE_HEADER, replaced(LANE_ROW, 8, name)))!;
    expect(currency.report.errors[0]).toMatchObject({ column: 'currency', value: name });
    // Long layout: one row per class, the class named in a cell.
    imported(DEPOTS, csv(['from', 'to', 'vehicle_class', 'toll', 'fuel'], ['A', 'B', name, '1.00', '2.00']), { vehicleClass: name });
    imported(DEPOTS, csv(LANE_HEADER, LANE_ROW), { vehicleClass: name });
  });

  it('as a depots header, an extra depot column and a depot id that is routed', () => {
    for (const i of [0, 1, 2, 3, 4, 5]) imported(DEPOTS.replace(['id', 'name', 'lat', 'lon', 'type', 'notes'][i], name), csv(LANE_HEADER, LANE_ROW));
    const extra = imported(`id,name,lat,lon,${name}\nA,Alpha,51.9,4.1,kept\nB,Bravo,51.2,4.3,\n`, csv(LANE_HEADER, LANE_ROW))!;
    expect(extra.depots[0].extra?.[name]).toBe('kept');
    const ids = imported(`id,name,lat,lon,type\n${name},Alpha,51.9,4.1,${name}\nB,Bravo,51.2,4.3,x\n`, csv(LANE_HEADER, replaced(LANE_ROW, 0, name)))!;
    expect(ids.report.errors).toEqual([]);
    const origin = depotIndexOf(ids.network!, name);
    const tree = cheapestRoutes(ids.network!, origin);
    expect(tree.cost[depotIndexOf(ids.network!, 'B')]).toBe(100 + 300 + 50 - 25);
    // The same id twice is a duplicate, not a second depot.
    const twice = imported(`id,name,lat,lon\n${name},a,51,4\n${name},b,52,4\n`, 'from,to\n')!;
    expect(twice.report.errors.map((e) => e.code)).toContain('duplicate-depot');
  });
});

describe.each(PROTOTYPE_NAMES)('"%s" in the vehicles and loads files', (name) => {
  const V_HEADER = ['vehicle', 'vehicle_class', 'height_m', 'width_m', 'length_m', 'weight_t', 'axle_load_t', 'tunnel_code', 'carriage', 'notes'];
  const V_ROW = ['V1', '2axle', '4.00', '2.55', '16.5', '40', '11.5', '', '', ''];
  const L_HEADER = ['load', 'from', 'to', 'date', 'vehicle', 'vehicle_class', 'tunnel_code', 'notes'];
  const L_ROW = ['L1', 'A', 'B', '2026-06-01', 'V1', '', '', ''];
  const network = importNetwork(DEPOTS, csv(LANE_HEADER, LANE_ROW)).network!;

  function both(vehicles: string, loads: string) {
    try {
      const v = importVehicles(vehicles, { classes: ['2axle'] });
      expect(v.report.accepted + v.report.rejected).toBe(v.report.total);
      const l = importLoads(loads, { depots: network.depotIndex, vehicles: v.byId, classes: ['2axle'], planDate: '2026-06-01' });
      expect(l.report.accepted + l.report.rejected).toBe(l.report.total);
    } catch (error) {
      expect(error, String(error)).toBeInstanceOf(LanewrightError);
    }
  }

  it('as any header or cell', () => {
    for (let i = 0; i < V_HEADER.length; i++) {
      both(csv(replaced(V_HEADER, i, name), V_ROW), csv(L_HEADER, L_ROW));
      both(csv(V_HEADER, replaced(V_ROW, i, name)), csv(L_HEADER, L_ROW));
    }
    for (let i = 0; i < L_HEADER.length; i++) {
      both(csv(V_HEADER, V_ROW), csv(replaced(L_HEADER, i, name), L_ROW));
      both(csv(V_HEADER, V_ROW), csv(L_HEADER, replaced(L_ROW, i, name)));
    }
  });
});
