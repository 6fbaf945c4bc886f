// Reads the vehicles file: id, toll class, height, width, length, gross weight, axle load, and
// optionally the ADR tunnel restriction code, carriage (tank / bulk / packages) and consumption.
// Every dimension must be a positive number: a limit can only be checked against a known size.

import { readTunnelCode, type TunnelCode } from './adr-tunnels';
import { cellText } from './cells';
import { readNumber } from './decimal-text';
import { matchVehicleHeaders, type VehicleField } from './dispatch-headers';
import { classKey, type HeaderMatch } from './headers';
import { RecordFileReader } from './record-file-reader';
import type { ReportCollector } from './report-collector';
import type { IssueCode } from './types';

export interface VehicleRecord {
  id: string;
  /** Toll class as the lanes file names it; null when blank (the plan's default class applies). */
  vehicleClass: string | null;
  heightM: number;
  widthM: number;
  lengthM: number;
  weightT: number;
  axleLoadT: number;
  tunnelCode: TunnelCode | null;
  carriage: 'tank' | 'bulk' | 'packages' | null;
  /** l/100 km for lanes whose fuel is estimated; null = the planning setting. */
  fuelLitresPer100Km: number | null;
  notes: string | null;
  sourceRow: number;
}

const DIMENSIONS: { field: VehicleField; key: 'heightM' | 'widthM' | 'lengthM' | 'weightT' | 'axleLoadT'; unit: 'm' | 't' }[] = [
  { field: 'height', key: 'heightM', unit: 'm' },
  { field: 'width', key: 'widthM', unit: 'm' },
  { field: 'length', key: 'lengthM', unit: 'm' },
  { field: 'weight', key: 'weightT', unit: 't' },
  { field: 'axle_load', key: 'axleLoadT', unit: 't' },
];
/** Required columns with the header the file is asked for. */
const REQUIRED: [VehicleField, string][] = [
  ['vehicle', 'vehicle'], ['height', 'height_m'], ['width', 'width_m'], ['length', 'length_m'], ['weight', 'weight_t'], ['axle_load', 'axle_load_t'],
];

export class VehiclesReader extends RecordFileReader {
  readonly vehicles: VehicleRecord[] = [];
  readonly index = new Map<string, number>();
  private header: HeaderMatch<VehicleField> | null = null;

  /** `classes`: the lanes file's vehicle classes (a named class must be one of them when there are any). */
  constructor(file: string, report: ReportCollector, private readonly classes: readonly string[]) {
    super(file, report, 'vehicles');
  }

  protected noDataRows(): void {
    this.report.warning(this.file, null, null, null, 'no-data-rows', 'the file has a header but no vehicles');
  }

  protected readHeader(cells: string[]): void {
    const h = matchVehicleHeaders(cells);
    this.header = h;
    this.requireColumns(h, REQUIRED, 'vehicle');
    for (const d of DIMENSIONS) {
      const unit = h.columns.get(d.field)?.unit;
      if (unit && unit !== d.unit) {
        this.report.error(this.file, this.headerRow, h.columns.get(d.field)!.header, unit, 'bad-unit', `${d.field} must be in ${d.unit === 'm' ? 'metres (m)' : 'tonnes (t)'}`);
        this.unusable = true;
      }
    }
    this.reportColumnProblems(h, 'unknown column, not used');
  }

  protected readRow(cells: string[], row: number): boolean {
    const cols = this.header!.columns;
    const at = (f: VehicleField) => cols.get(f)?.index;
    const name = (f: VehicleField) => cols.get(f)?.header ?? f;
    let ok = true;
    const fail = (column: string, value: string | null, code: IssueCode, message: string) => {
      this.report.error(this.file, row, column, value, code, message);
      ok = false;
    };
    this.refuseSurplusFields(cells, fail);
    const id = cellText(cells, at('vehicle'));
    if (id === '') fail(name('vehicle'), '', 'missing-value', 'vehicle id is empty');
    else if (this.index.has(id)) fail(name('vehicle'), id, 'duplicate-vehicle', `duplicate vehicle id; first defined at row ${this.vehicles[this.index.get(id)!].sourceRow}`);

    const positive = (field: VehicleField, unit: string, required: boolean): number => {
      const text = cellText(cells, at(field));
      if (text === '') {
        if (required) fail(name(field), '', 'missing-value', `${field.replace('_', ' ')} is empty; lane limits cannot be checked without it`);
        return NaN;
      }
      const r = readNumber(text, { decimalComma: this.decimalComma, allowGrouping: false });
      if (!r.ok) fail(name(field), text, r.code, r.reason);
      else if (!(r.value > 0)) fail(name(field), text, 'not-positive', `must be a positive number (${unit})`);
      else return r.value;
      return NaN;
    };
    const dims = {} as Record<(typeof DIMENSIONS)[number]['key'], number>;
    for (const d of DIMENSIONS) dims[d.key] = positive(d.field, d.unit === 'm' ? 'metres' : 'tonnes', true);
    const fuel = positive('fuel', 'litres per 100 km', false);

    let vehicleClass: string | null = cellText(cells, at('vehicle_class')) || null;
    if (vehicleClass !== null && this.classes.length > 0) {
      const key = classKey(vehicleClass);
      const known = this.classes.find((c) => classKey(c) === key);
      if (known === undefined) fail(name('vehicle_class'), vehicleClass, 'unknown-vehicle-class', `not a vehicle class of the lanes file (classes: ${this.classes.join(', ')})`);
      else vehicleClass = known;
    }
    const codeText = cellText(cells, at('tunnel_code'));
    const tunnelCode = codeText === '' ? null : readTunnelCode(codeText);
    if (codeText !== '' && tunnelCode === null) fail(name('tunnel_code'), codeText, 'bad-tunnel-code', 'not an ADR tunnel restriction code (B, B1000C, B/D, B/E, C, C5000D, C/D, C/E, D, D/E, E or -; UNECE ADR 8.6.4)');
    const carriageText = cellText(cells, at('carriage')).toLowerCase();
    const carriage = carriageText === '' ? null : carriageText === 'tank' || carriageText === 'bulk' || carriageText === 'packages' ? carriageText : undefined;
    if (carriage === undefined) fail(name('carriage'), cellText(cells, at('carriage')), 'bad-carriage', 'carriage must be tank, bulk or packages (blank = unknown: the stricter ADR row applies)');
    if (!ok) return false;
    this.index.set(id, this.vehicles.length);
    this.vehicles.push({
      id,
      vehicleClass,
      ...dims,
      tunnelCode,
      carriage: carriage ?? null,
      fuelLitresPer100Km: Number.isNaN(fuel) ? null : fuel,
      notes: cellText(cells, at('notes')) || null,
      sourceRow: row,
    });
    return true;
  }
}
