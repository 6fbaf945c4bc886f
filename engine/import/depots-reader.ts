// Reads depot records (id, name, lat, lon, optional type and notes) as they stream in, checking
// each row and keeping the accepted ones. Duplicate ids keep the first row and reject the others.

import { textKeyedRecord } from '../text/lookup-table';
import { cellText } from './cells';
import { readNumber } from './decimal-text';
import { matchDepotHeaders, type DepotField, type HeaderMatch } from './headers';
import type { ReportCollector } from './report-collector';
import { RecordFileReader } from './record-file-reader';
import type { DepotRecord } from './types';

const REQUIRED: DepotField[] = ['id', 'lat', 'lon'];

export class DepotsReader extends RecordFileReader {
  readonly depots: DepotRecord[] = [];
  readonly index = new Map<string, number>();
  /** Ids of depot rows that were rejected, with their row, so lanes naming them can say why. */
  readonly rejectedIds = new Map<string, number>();
  private header: HeaderMatch<DepotField> | null = null;

  constructor(file: string, report: ReportCollector) {
    super(file, report, 'depots');
  }

  protected noDataRows(): void {
    this.report.error(this.file, null, null, null, 'no-data-rows', 'the file has a header but no depots');
  }

  protected readHeader(cells: string[]): void {
    this.header = matchDepotHeaders(cells);
    for (const field of REQUIRED) {
      if (!this.header.columns.has(field)) {
        this.report.error(this.file, this.headerRow, field, null, 'missing-column', `required column "${field}" is missing; no depot can be read`);
        this.unusable = true;
      }
    }
    for (const d of this.header.duplicates) this.report.error(this.file, this.headerRow, d.header, null, 'duplicate-column', `column repeats "${d.first}"; only the first is read`);
    for (const u of this.header.unknown) this.report.warning(this.file, this.headerRow, u.header, null, 'unknown-column', 'unknown column, kept with the depot but not used');
  }

  protected readRow(cells: string[], row: number): boolean {
    const cols = this.header!.columns;
    const at = (f: DepotField) => cols.get(f)?.index;
    let ok = true;
    const fail = (column: string, value: string | null, code: Parameters<ReportCollector['error']>[4], message: string) => {
      this.report.error(this.file, row, column, value, code, message);
      ok = false;
    };
    if (cells.length > this.headerCells.length) {
      fail(`(column ${this.headerCells.length + 1})`, cells.slice(this.headerCells.length).join(','), 'too-many-fields', `the row has ${cells.length} fields but the header has ${this.headerCells.length}`);
    }
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
}
