// Header names of the loads and vehicles files, matched like the lanes file's (case, spaces,
// hyphens and underscores ignored; a unit may sit in brackets; common synonyms accepted).

import { lookupTable } from '../text/lookup-table';
import { match, type HeaderMatch } from './headers';

export type VehicleField = 'vehicle' | 'vehicle_class' | 'height' | 'width' | 'length' | 'weight' | 'axle_load' | 'tunnel_code' | 'fuel' | 'carriage' | 'notes';
export type LoadField = 'load' | 'from' | 'to' | 'date' | 'vehicle' | 'vehicle_class' | 'tunnel_code' | 'notes';

// Null-prototype tables: a header such as "constructor" must not find Object.prototype's.
const VEHICLE_NAMES: Readonly<Record<string, string>> = lookupTable({
  vehicle: 'vehicle', vehicle_id: 'vehicle', truck: 'vehicle', unit: 'vehicle', fleet_no: 'vehicle', fleet_number: 'vehicle', registration: 'vehicle',
  vehicle_class: 'vehicle_class', class: 'vehicle_class', toll_class: 'vehicle_class', axle_class: 'vehicle_class',
  height_m: 'height:m', height: 'height',
  width_m: 'width:m', width: 'width',
  length_m: 'length:m', length: 'length',
  weight_t: 'weight:t', weight: 'weight', gross_weight: 'weight', gross_weight_t: 'weight:t', gvw: 'weight',
  axle_load_t: 'axle_load:t', axle_load: 'axle_load', max_axle_load_t: 'axle_load:t',
  tunnel_code: 'tunnel_code', adr_tunnel_code: 'tunnel_code', tunnel_restriction_code: 'tunnel_code',
  fuel_l_per_100km: 'fuel', fuel_consumption: 'fuel', consumption: 'fuel', l_per_100km: 'fuel',
  carriage: 'carriage', carriage_type: 'carriage',
  notes: 'notes', note: 'notes', comment: 'notes', comments: 'notes', remarks: 'notes',
});

const LOAD_NAMES: Readonly<Record<string, string>> = lookupTable({
  load: 'load', load_id: 'load', id: 'load', order: 'load', order_id: 'load', job: 'load', shipment: 'load',
  from: 'from', origin: 'from', from_depot: 'from', origin_depot: 'from', orig: 'from',
  to: 'to', destination: 'to', dest: 'to', to_depot: 'to', destination_depot: 'to',
  date: 'date', load_date: 'date', dispatch_date: 'date', day: 'date',
  vehicle: 'vehicle', vehicle_id: 'vehicle', truck: 'vehicle',
  vehicle_class: 'vehicle_class', class: 'vehicle_class', toll_class: 'vehicle_class', axle_class: 'vehicle_class',
  tunnel_code: 'tunnel_code', adr_tunnel_code: 'tunnel_code', tunnel_restriction_code: 'tunnel_code',
  notes: 'notes', note: 'notes', comment: 'notes', comments: 'notes', remarks: 'notes',
});

export function matchVehicleHeaders(headers: readonly string[]): HeaderMatch<VehicleField> {
  return match<VehicleField>(headers, VEHICLE_NAMES, false);
}

export function matchLoadHeaders(headers: readonly string[]): HeaderMatch<LoadField> {
  return match<LoadField>(headers, LOAD_NAMES, false);
}
