// Reads the day's loads file: load id, origin and destination depots, optional date (default: the
// plan's date), vehicle (from the vehicles file) or toll class, ADR tunnel restriction code, notes.
// Unknown depots or vehicles, a load from a depot to itself and bad dates are row errors.

import { readTunnelCode, type TunnelCode } from './adr-tunnels';
import { cellText, isoDateText, readIsoDate } from './cells';
import { matchLoadHeaders, type LoadField } from './dispatch-headers';
import { classKey, type HeaderMatch } from './headers';
import { RecordFileReader } from './record-file-reader';
import type { ReportCollector } from './report-collector';
import type { IssueCode } from './types';
import type { VehicleRecord } from './vehicles-reader';

export interface LoadRecord {
  id: string;
  from: string;
  to: string;
  /** ISO 8601; the plan's date when the file leaves it blank (`dateGiven` false). */
  date: string;
  dateGiven: boolean;
  vehicle: string | null;
  /** The load's class, or its vehicle's; null = the plan's default class. */
  vehicleClass: string | null;
  tunnelCode: TunnelCode | null;
  notes: string | null;
  sourceRow: number;
}

export interface LoadsReaderContext {
  /** Depot ids of the network (accepted depots). */
  depots: ReadonlyMap<string, unknown>;
  vehicles: ReadonlyMap<string, VehicleRecord>;
  /** The lanes file's vehicle classes. */
  classes: readonly string[];
  /** ISO 8601 date for loads without one. */
  planDate: string;
  /** Names used in messages. */
  depotsFile: string;
  vehiclesFile: string | null;
}

const REQUIRED: LoadField[] = ['load', 'from', 'to'];

export class LoadsReader extends RecordFileReader {
  readonly loads: LoadRecord[] = [];
  private readonly ids = new Map<string, number>();
  private header: HeaderMatch<LoadField> | null = null;

  constructor(file: string, report: ReportCollector, private readonly ctx: LoadsReaderContext) {
    super(file, report, 'loads');
  }

  protected noDataRows(): void {
    this.report.warning(this.file, null, null, null, 'no-data-rows', 'the file has a header but no loads');
  }

  protected readHeader(cells: string[]): void {
    const h = matchLoadHeaders(cells);
    this.header = h;
    this.requireColumns(h, REQUIRED.map((field) => [field, field] as const), 'load');
    this.reportColumnProblems(h, 'unknown column, not used');
  }

  protected readRow(cells: string[], row: number): boolean {
    const cols = this.header!.columns;
    const at = (f: LoadField) => cols.get(f)?.index;
    const name = (f: LoadField) => cols.get(f)?.header ?? f;
    let ok = true;
    const fail = (column: string, value: string | null, code: IssueCode, message: string) => {
      this.report.error(this.file, row, column, value, code, message);
      ok = false;
    };
    this.refuseSurplusFields(cells, fail);
    const id = cellText(cells, at('load'));
    if (id === '') fail(name('load'), '', 'missing-value', 'load id is empty');
    else if (this.ids.has(id)) fail(name('load'), id, 'duplicate-load', `duplicate load id; first at row ${this.ids.get(id)}`);

    const depot = (field: 'from' | 'to'): string => {
      const text = cellText(cells, at(field));
      if (text === '') fail(name(field), '', 'missing-value', `${field} depot is empty`);
      else if (!this.ctx.depots.has(text)) fail(name(field), text, 'unknown-depot', `no depot with this id in ${this.ctx.depotsFile}`);
      return text;
    };
    const from = depot('from');
    const to = depot('to');
    if (from !== '' && from === to) fail(name('to'), to, 'same-depot', 'the load starts and ends at the same depot');

    const dateText = cellText(cells, at('date'));
    let date = this.ctx.planDate;
    if (dateText !== '') {
      const value = readIsoDate(dateText);
      if (value === null) fail(name('date'), dateText, 'bad-date', 'not an ISO 8601 calendar date (YYYY-MM-DD)');
      else date = isoDateText(value)!;
    }

    const vehicleId = cellText(cells, at('vehicle'));
    const vehicle = vehicleId === '' ? null : (this.ctx.vehicles.get(vehicleId) ?? null);
    if (vehicleId !== '' && vehicle === null) {
      fail(name('vehicle'), vehicleId, 'unknown-vehicle', this.ctx.vehiclesFile === null ? 'a vehicle is named but no vehicles file was given' : `no vehicle with this id in ${this.ctx.vehiclesFile}`);
    }
    const classText = cellText(cells, at('vehicle_class'));
    let vehicleClass: string | null = vehicle?.vehicleClass ?? null;
    if (classText !== '') {
      const key = classKey(classText);
      const known = this.ctx.classes.find((c) => classKey(c) === key);
      if (this.ctx.classes.length > 0 && known === undefined) fail(name('vehicle_class'), classText, 'unknown-vehicle-class', `not a vehicle class of the lanes file (classes: ${this.ctx.classes.join(', ')})`);
      else if (vehicle && vehicle.vehicleClass !== null && classKey(vehicle.vehicleClass) !== key) {
        fail(name('vehicle_class'), classText, 'class-mismatch', `vehicle ${vehicle.id} is class "${vehicle.vehicleClass}" in the vehicles file`);
      } else vehicleClass = known ?? classText;
    }
    const codeText = cellText(cells, at('tunnel_code'));
    const tunnelCode = codeText === '' ? null : readTunnelCode(codeText);
    if (codeText !== '' && tunnelCode === null) fail(name('tunnel_code'), codeText, 'bad-tunnel-code', 'not an ADR tunnel restriction code (B, B1000C, B/D, B/E, C, C5000D, C/D, C/E, D, D/E, E or -; UNECE ADR 8.6.4)');
    if (!ok) return false;
    this.ids.set(id, row);
    this.loads.push({
      id,
      from,
      to,
      date,
      dateGiven: dateText !== '',
      vehicle: vehicle?.id ?? null,
      vehicleClass,
      tunnelCode,
      notes: cellText(cells, at('notes')) || null,
      sourceRow: row,
    });
    return true;
  }
}
