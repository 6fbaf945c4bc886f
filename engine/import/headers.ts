// Header matching for the depots and lanes files: case, surrounding spaces and the difference
// between spaces, hyphens and underscores are ignored; common synonyms are accepted; a unit may
// sit in brackets ("Distance (mi)"). Unknown columns are kept and reported, never an error.

import { lookupTable, ownEntry } from '../text/lookup-table';
import { LANE_LIMIT_HEADER_NAMES, type LaneLimitField } from './lane-limits';

export type DepotField = 'id' | 'name' | 'lat' | 'lon' | 'type' | 'notes';
export type LaneField =
  | 'from' | 'to' | 'ref' | 'distance' | 'distance_unit' | 'drive' | 'toll' | 'vehicle_class'
  | 'fuel' | 'fees' | 'rebate' | 'currency' | 'valid_from' | 'valid_to' | 'notes' | 'clause' | 'derived'
  | LaneLimitField;

// Key a header is matched by: lower case, spaces/hyphens/underscores as one "_".
function headerKey(text: string): string {
  return text.trim().toLowerCase().replace(/[\s_\-]+/g, '_').replace(/^_+|_+$/g, '');
}

/** Key a vehicle class is matched by: lower case with no separators ("5-axle" = "5 axle" = "5axle"). */
export function classKey(text: string): string {
  return text.trim().toLowerCase().replace(/[\s_\-]+/g, '');
}

// Null-prototype tables: a header named "constructor" is an unknown column, not Object's constructor.
const DEPOT_NAMES: Readonly<Record<string, DepotField>> = lookupTable({
  id: 'id', depot: 'id', depot_id: 'id', code: 'id', depot_code: 'id',
  name: 'name', depot_name: 'name',
  lat: 'lat', latitude: 'lat',
  lon: 'lon', lng: 'lon', long: 'lon', longitude: 'lon',
  type: 'type', depot_type: 'type', kind: 'type',
  notes: 'notes', note: 'notes', comment: 'notes', comments: 'notes', remarks: 'notes',
});

// Lane header keys; a value "field:unit" also fixes the unit.
const LANE_NAMES: Readonly<Record<string, string>> = lookupTable({
  from: 'from', origin: 'from', from_depot: 'from', origin_depot: 'from', orig: 'from',
  to: 'to', destination: 'to', dest: 'to', to_depot: 'to', destination_depot: 'to',
  ref: 'ref', reference: 'ref', lane_ref: 'ref', lane_reference: 'ref', contract: 'ref', contract_ref: 'ref',
  contract_reference: 'ref', lane_id: 'ref',
  // The contract clause a row's rebate comes from ("7.2"); the calendar review groups loops by it.
  clause: 'clause', contract_clause: 'clause', clause_id: 'clause', clause_ref: 'clause', clause_no: 'clause',
  clause_number: 'clause', rebate_clause: 'clause',
  distance: 'distance', dist: 'distance', distance_km: 'distance:km', km: 'distance:km',
  distance_mi: 'distance:mi', distance_miles: 'distance:mi', miles: 'distance:mi', mi: 'distance:mi',
  distance_unit: 'distance_unit', unit: 'distance_unit', units: 'distance_unit',
  drive_time: 'drive', drive: 'drive', duration: 'drive', time: 'drive',
  drive_minutes: 'drive:min', drive_min: 'drive:min', drive_time_min: 'drive:min', drive_time_minutes: 'drive:min', minutes: 'drive:min',
  drive_hours: 'drive:h', drive_h: 'drive:h', drive_time_h: 'drive:h', drive_time_hours: 'drive:h', hours: 'drive:h',
  toll: 'toll', tolls: 'toll', toll_default: 'toll', default_toll: 'toll',
  vehicle_class: 'vehicle_class', class: 'vehicle_class', vehicle: 'vehicle_class', axle_class: 'vehicle_class',
  fuel: 'fuel', fuel_cost: 'fuel',
  fees: 'fees', fee: 'fees', charges: 'fees',
  rebate: 'rebate', rebates: 'rebate', credit: 'rebate',
  currency: 'currency', ccy: 'currency', currency_code: 'currency',
  valid_from: 'valid_from', from_date: 'valid_from', start_date: 'valid_from', effective_from: 'valid_from', valid_since: 'valid_from',
  valid_to: 'valid_to', to_date: 'valid_to', end_date: 'valid_to', valid_until: 'valid_to', effective_to: 'valid_to', expires: 'valid_to',
  notes: 'notes', note: 'notes', comment: 'notes', comments: 'notes', remarks: 'notes',
  // Columns the lanes export adds; they are worked out again from the others, never read.
  net: 'derived', net_negative: 'derived', on_rebate_loop: 'derived', distance_source: 'derived', fuel_source: 'derived',
  drive_source: 'derived',
  // Vehicle limits (max_height_m, tunnel_category, ...): declared in lane-limits.ts.
  ...LANE_LIMIT_HEADER_NAMES,
});

export interface MatchedColumn<F extends string> {
  index: number;
  header: string;
  field: F;
  /** Unit from the header ("km", "mi", "min", "h", or an ISO 4217 code in brackets), lower-cased. */
  unit: string | null;
}

export interface HeaderMatch<F extends string> {
  columns: Map<F, MatchedColumn<F>>;
  /** Per vehicle class toll columns (lanes only). */
  classTolls: { index: number; header: string; name: string; key: string }[];
  unknown: { index: number; header: string }[];
  duplicates: { index: number; header: string; first: string }[];
}

function split(header: string): { key: string; unit: string | null } {
  const bracket = /^(.*?)\s*[([]\s*([^)\]]*?)\s*[)\]]\s*$/.exec(header);
  if (bracket) return { key: headerKey(bracket[1]), unit: bracket[2].toLowerCase() || null };
  return { key: headerKey(header), unit: null };
}

export function match<F extends string>(headers: readonly string[], names: Readonly<Record<string, string>>, classes: boolean): HeaderMatch<F> {
  const result: HeaderMatch<F> = { columns: new Map(), classTolls: [], unknown: [], duplicates: [] };
  const seenClass = new Map<string, string>();
  headers.forEach((raw, index) => {
    const header = raw.trim();
    if (header === '') {
      // A trailing delimiter on every line makes an unnamed column; any values in it are kept.
      result.unknown.push({ index, header: `(column ${index + 1})` });
      return;
    }
    const { key, unit } = split(header);
    const target = ownEntry(names, key);
    if (target !== undefined) {
      const [field, fixedUnit] = target.split(':') as [F, string | undefined];
      if (field === ('derived' as F)) return;
      const earlier = result.columns.get(field);
      if (earlier) result.duplicates.push({ index, header, first: earlier.header });
      else result.columns.set(field, { index, header, field, unit: fixedUnit ?? unit });
      return;
    }
    const perClass = classes ? /^tolls?_(.+)$/.exec(key) : null;
    if (perClass) {
      const name = header.replace(/^\s*tolls?[\s_-]*/i, '').replace(/\s*[([].*$/, '').trim();
      const ck = classKey(name);
      const first = seenClass.get(ck);
      if (first !== undefined) result.duplicates.push({ index, header, first });
      else {
        seenClass.set(ck, header);
        result.classTolls.push({ index, header, name, key: ck });
      }
      return;
    }
    result.unknown.push({ index, header });
  });
  return result;
}

export function matchDepotHeaders(headers: readonly string[]): HeaderMatch<DepotField> {
  return match<DepotField>(headers, DEPOT_NAMES, false);
}

export function matchLaneHeaders(headers: readonly string[]): HeaderMatch<LaneField> {
  return match<LaneField>(headers, LANE_NAMES, true);
}
