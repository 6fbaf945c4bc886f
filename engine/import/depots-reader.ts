// Reads depot records (id, name, lat, lon, optional type and notes) as they stream in, checking
// each row and keeping the accepted ones. Duplicate ids keep the first row and reject the others.

import { withoutFormulaGuard } from '../io/csv-cell-safety';
import { textKeyedRecord } from '../text/lookup-table';
import { cellText, ownText } from './cells';
import { readNumber } from './decimal-text';
import { matchDepotHeaders, type DepotField, type HeaderMatch } from './headers';
import type { ReportCollector } from './report-collector';
import { cutCells } from './plain-cells';
import { RecordFileReader } from './record-file-reader';
import type { DepotRecord } from './types';

const REQUIRED: DepotField[] = ['id', 'lat', 'lon'];
const POW10 = [1, 10, 100, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15];

/** Where a plain row's cells are cut, and the column of each field (-1 = absent). */
interface PlainDepotColumns {
  starts: Int32Array;
  ends: Int32Array;
  id: number;
  name: number;
  lat: number;
  lon: number;
  type: number;
  notes: number;
}

export class DepotsReader extends RecordFileReader {
  readonly depots: DepotRecord[] = [];
  readonly index = new Map<string, number>();
  /** Ids of depot rows that were rejected, with their row, so lanes naming them can say why. */
  readonly rejectedIds = new Map<string, number>();
  private header: HeaderMatch<DepotField> | null = null;
  /** The plain-row fast path's columns, made at its first row (null = not for this file). */
  private plain: PlainDepotColumns | null | undefined;

  constructor(file: string, report: ReportCollector) {
    super(file, report, 'depots');
  }

  protected noDataRows(): void {
    this.report.error(this.file, null, null, null, 'no-data-rows', 'the file has a header but no depots');
  }

  protected readHeader(cells: string[]): void {
    this.header = matchDepotHeaders(cells);
    this.requireColumns(this.header, REQUIRED.map((field) => [field, field] as const), 'depot');
    this.reportColumnProblems(this.header, 'unknown column, kept with the depot but not used');
  }

  protected readRow(cells: string[], row: number): boolean {
    const cols = this.header!.columns;
    const at = (f: DepotField) => cols.get(f)?.index;
    let ok = true;
    const fail = (column: string, value: string | null, code: Parameters<ReportCollector['error']>[4], message: string) => {
      this.report.error(this.file, row, column, value, code, message);
      ok = false;
    };
    this.refuseSurplusFields(cells, fail);
    const idColumn = cols.get('id')!.header;
    const id = cellText(cells, at('id'));
    if (id === '') fail(idColumn, '', 'missing-value', 'depot id is empty');
    const coordinate = (field: 'lat' | 'lon', limit: number): number => {
      const column = cols.get(field)!.header;
      const text = cellText(cells, at(field));
      if (text === '') {
        fail(column, '', 'missing-value', `${field === 'lat' ? 'latitude' : 'longitude'} is empty`);
        return NaN;
      }
      const read = readNumber(text, { decimalComma: this.decimalComma, allowGrouping: false });
      if (!read.ok) {
        fail(column, text, read.code, read.reason);
        return NaN;
      }
      if (Math.abs(read.value) > limit) {
        fail(column, text, field === 'lat' ? 'latitude-range' : 'longitude-range', `outside -${limit}..${limit} degrees (WGS 84 decimal degrees)`);
        return NaN;
      }
      return read.value;
    };
    const lat = coordinate('lat', 90);
    const lon = coordinate('lon', 180);
    if (id !== '' && this.index.has(id)) {
      fail(idColumn, id, 'duplicate-depot', `duplicate depot id; first defined at row ${this.depots[this.index.get(id)!].sourceRow}`);
    }
    if (!ok) {
      if (id !== '' && !this.index.has(id) && !this.rejectedIds.has(id)) this.rejectedIds.set(id, row);
      return false;
    }
    this.rejectedIds.delete(id);
    let extra: Record<string, string> | null = null;
    for (const u of this.header!.unknown) {
      const value = cellText(cells, u.index);
      if (value !== '') (extra ??= textKeyedRecord<string>())[u.header] = value;
    }
    this.index.set(id, this.depots.length);
    this.depots.push({
      id,
      name: cellText(cells, at('name')) || id,
      lat,
      lon,
      type: cellText(cells, at('type')) || null,
      notes: cellText(cells, at('notes')) || null,
      sourceRow: row,
      extra,
    });
    return true;
  }

  /**
   * The fast path for a plain row (no quote): cut by character codes, every cell already trimmed, an
   * id not seen before, coordinates as plain decimals within range. Anything else, including every
   * row with a problem to report, returns false and goes through readRow, which owns the messages;
   * this path accepts only what readRow accepts, with the same values (depot-row-fast.test.ts).
   */
  protected override readPlainRow(text: string, start: number, end: number, row: number, delimiter: string): boolean {
    if (this.plain === undefined) this.plain = this.plainColumns();
    const p = this.plain;
    if (p === null || !cutCells(text, start, end, delimiter.charCodeAt(0), p.starts, p.ends)) return false;
    const { starts, ends } = p;
    const lat = plainCoordinate(text, starts[p.lat], ends[p.lat], 90);
    const lon = plainCoordinate(text, starts[p.lon], ends[p.lon], 180);
    if (Number.isNaN(lat) || Number.isNaN(lon) || starts[p.id] === ends[p.id]) return false;
    const id = keptText(text, starts[p.id], ends[p.id]);
    if (id === '' || this.index.has(id)) return false;
    if (this.rejectedIds.size > 0) this.rejectedIds.delete(id);
    let extra: Record<string, string> | null = null;
    for (const u of this.header!.unknown) {
      const value = keptText(text, starts[u.index], ends[u.index]);
      if (value !== '') (extra ??= textKeyedRecord<string>())[u.header] = value;
    }
    this.index.set(id, this.depots.length);
    this.depots.push({
      id,
      name: optionalText(text, p.name, starts, ends) || id,
      lat,
      lon,
      type: optionalText(text, p.type, starts, ends) || null,
      notes: optionalText(text, p.notes, starts, ends) || null,
      sourceRow: row,
      extra,
    });
    return true;
  }

  private plainColumns(): PlainDepotColumns | null {
    const h = this.header;
    if (h === null || h.duplicates.length > 0 || this.headerCells.length === 0) return null;
    const at = (f: DepotField) => h.columns.get(f)?.index ?? -1;
    const n = this.headerCells.length;
    return { starts: new Int32Array(n), ends: new Int32Array(n), id: at('id'), name: at('name'), lat: at('lat'), lon: at('lon'), type: at('type'), notes: at('notes') };
  }
}

function optionalText(text: string, column: number, starts: Int32Array, ends: Int32Array): string {
  return column === -1 ? '' : keptText(text, starts[column], ends[column]);
}

/** A kept text cell of a plain row as cellText reads it (the exporter's formula guard removed), copied out of the block. */
function keptText(text: string, start: number, end: number): string {
  return start === end ? '' : ownText(withoutFormulaGuard(text.slice(start, end)));
}

/**
 * A coordinate written as a plain decimal ("-12.345"), the form readNumber reads with Number(): the
 * same value (an exact integer divided by an exact power of ten is the correctly rounded decimal),
 * or NaN for anything else and for a value past `limit`, which the general reader refuses with its reason.
 */
function plainCoordinate(text: string, start: number, end: number, limit: number): number {
  let i = start;
  const negative = i < end && text.charCodeAt(i) === 45;
  if (negative) i++;
  let value = 0;
  let digits = 0;
  let fraction = -1;
  for (; i < end; i++) {
    const c = text.charCodeAt(i);
    if (c >= 48 && c <= 57) {
      value = value * 10 + (c - 48);
      digits++;
      if (fraction >= 0) fraction++;
    } else if (c === 46 && fraction === -1 && digits > 0) fraction = 0;
    else return NaN;
  }
  if (digits === 0 || fraction === 0) return NaN;
  const read = digits > 15 ? Number(text.slice(start, end)) : fraction > 0 ? value / POW10[fraction] : value;
  const signed = negative && digits <= 15 ? -read : read;
  return Math.abs(signed) <= limit ? signed : NaN;
}
