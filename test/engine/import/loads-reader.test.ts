// The loads and vehicles importers' row errors (file, row, column, value, code) and the lane limit
// columns' checks; accepted + rejected = total in every case.

import { describe, expect, it } from 'vitest';
import { importLoads, importVehicles } from '../../../engine/import/import-loads';
import { importNetwork } from '../../../engine/planning/import-network';

const depots = new Map([['RTM', 0], ['ANR', 1], ['LIL', 2]]);
const V_HEADER = 'vehicle,vehicle_class,height_m,width_m,length_m,weight_t,axle_load_t,tunnel_code,carriage,fuel_l_per_100km';

describe('importVehicles', () => {
  it('checks every row and keeps the counts', () => {
    const r = importVehicles(
      [
        V_HEADER,
        'DD1,5axle,4.20,2.55,16.5,40,11.5,,,34',
        'DD1,5axle,4.20,2.55,16.5,40,11.5,,,34',
        'R2,2axle,0,2.55,10,18,10,,,',
        'T1,5axle,3.9,2.55,16.5,40,11.5,Q/Z,,',
        'X1,9axle,3.9,2.55,16.5,forty,11.5,,,',
        'T2,5-Axle,3.9,2.55,16.5,40,11.5,d/e,tank,',
        'T3,5axle,3.9,,16.5,40,11.5,,drum,',
      ].join('\n'),
      { file: 'vehicles.csv', classes: ['2axle', '5axle'] },
    );
    expect(r.report.errors.map((e) => [e.row, e.column, e.value, e.code])).toEqual([
      [3, 'vehicle', 'DD1', 'duplicate-vehicle'],
      [4, 'height_m', '0', 'not-positive'],
      [5, 'tunnel_code', 'Q/Z', 'bad-tunnel-code'],
      [6, 'weight_t', 'forty', 'not-a-number'],
      [6, 'vehicle_class', '9axle', 'unknown-vehicle-class'],
      [8, 'width_m', '', 'missing-value'],
      [8, 'carriage', 'drum', 'bad-carriage'],
    ]);
    expect(r.report.errors.every((e) => e.file === 'vehicles.csv')).toBe(true);
    expect(r.report).toMatchObject({ total: 7, accepted: 2, rejected: 5 });
    expect(r.byId.get('T2')).toMatchObject({ vehicleClass: '5axle', tunnelCode: 'D/E', carriage: 'tank', heightM: 3.9 });
  });

  it('a missing dimension column makes the file unusable, named', () => {
    const r = importVehicles('vehicle,height_m,width_m,length_m,weight_t\nA,4,2.5,12,40', { classes: [] });
    expect(r.report.errors.map((e) => [e.row, e.column, e.code])).toEqual([[1, 'axle_load_t', 'missing-column']]);
    expect(r.report).toMatchObject({ total: 1, accepted: 0, rejected: 1 });
  });
});

describe('importLoads', () => {
  const vehicles = importVehicles(`${V_HEADER}\nDD1,5axle,4.20,2.55,16.5,40,11.5,,,`, { classes: ['2axle', '5axle'] }).byId;
  const read = (text: string, vehiclesFile: string | null = 'vehicles.csv') =>
    importLoads(text, { file: 'loads.csv', depots, vehicles, vehiclesFile, classes: ['2axle', '5axle'], planDate: '2026-08-15', depotsFile: 'depots.csv' });

  it('reports unknown depots and vehicles, from = to, bad dates, classes and codes per row', () => {
    const r = read(
      [
        'Load ID,Origin,Destination,Date,Vehicle,Class,Tunnel Code,Notes',
        'L1,RTM,ANR,,DD1,,,fine',
        'L2,RTM,XXX,2026-08-15,,2axle,,',
        'L3,RTM,RTM,2026-08-15,,,,',
        'L4,RTM,ANR,2026-02-30,,,,',
        'L5,RTM,ANR,2026-08-15,ZZ9,,,',
        'L6,RTM,ANR,2026-08-15,DD1,2axle,,',
        'L7,RTM,ANR,2026-08-15,,7axle,,',
        'L8,RTM,ANR,2026-08-15,,,F,',
        'L1,ANR,LIL,,,,,',
        ',ANR,LIL,,,,,',
        'L9,ANR,LIL,2026-08-16,,5axle,c/e,',
      ].join('\n'),
    );
    expect(r.report.errors.map((e) => [e.row, e.column, e.value, e.code])).toEqual([
      [3, 'Destination', 'XXX', 'unknown-depot'],
      [4, 'Destination', 'RTM', 'same-depot'],
      [5, 'Date', '2026-02-30', 'bad-date'],
      [6, 'Vehicle', 'ZZ9', 'unknown-vehicle'],
      [7, 'Class', '2axle', 'class-mismatch'],
      [8, 'Class', '7axle', 'unknown-vehicle-class'],
      [9, 'Tunnel Code', 'F', 'bad-tunnel-code'],
      [10, 'Load ID', 'L1', 'duplicate-load'],
      [11, 'Load ID', '', 'missing-value'],
    ]);
    expect(r.report.errors[0].message).toContain('depots.csv');
    expect(r.report).toMatchObject({ total: 11, accepted: 2, rejected: 9 });
    expect(r.loads[0]).toMatchObject({ id: 'L1', date: '2026-08-15', dateGiven: false, vehicle: 'DD1', vehicleClass: '5axle' });
    expect(r.loads[1]).toMatchObject({ id: 'L9', date: '2026-08-16', vehicleClass: '5axle', tunnelCode: 'C/E' });
  });

  it('a vehicle named without a vehicles file says so', () => {
    const r = read('load,from,to,vehicle\nL1,RTM,ANR,ZZ1', null);
    expect(r.report.errors[0].message).toMatch(/no vehicles file/);
  });

  it('refuses a file without the required columns, and counts its rows as rejected', () => {
    const r = read('load,from\nL1,RTM');
    expect(r.report.errors.map((e) => [e.column, e.code])).toEqual([['to', 'missing-column']]);
    expect(r.report).toMatchObject({ total: 1, accepted: 0, rejected: 1 });
  });
});

describe('lane limit columns', () => {
  it('are read into the lane table; bad cells are row errors', () => {
    const r = importNetwork(
      'id,lat,lon\nA,50,4\nB,51,5',
      'from,to,toll,fuel,Max Height (m),max_weight_t,tunnel_category,no_dangerous_goods\nA,B,1,0,4.00,,,\nB,A,1,0,-4,x,F,maybe\nA,B,2,0,,26,d,yes',
    );
    expect(r.report.errors.map((e) => [e.row, e.column, e.value, e.code])).toEqual([
      [3, 'Max Height (m)', '-4', 'not-positive'],
      [3, 'max_weight_t', 'x', 'not-a-number'],
      [3, 'tunnel_category', 'F', 'bad-tunnel-category'],
      [3, 'no_dangerous_goods', 'maybe', 'bad-yes-no'],
    ]);
    const limits = r.lanes.limits!;
    expect(limits.measures.map((m) => [m.column.name, Array.from(m.values)])).toEqual([
      ['max_height_m', [4, NaN]],
      ['max_weight_t', [NaN, 26]],
    ]);
    expect(Array.from(limits.tunnelCategory!)).toEqual([0, 4]);
    expect(Array.from(limits.noDangerousGoods!)).toEqual([0, 1]);
  });

  it('a limit column in another unit is refused at the header', () => {
    const r = importNetwork('id,lat,lon\nA,50,4\nB,51,5', 'from,to,toll,fuel,max height (ft)\nA,B,1,0,13');
    expect(r.report.errors.map((e) => [e.row, e.column, e.value, e.code])).toEqual([[1, 'max height (ft)', 'ft', 'bad-unit']]);
    expect(r.report).toMatchObject({ total: 3, accepted: 2, rejected: 1 });
  });
});
