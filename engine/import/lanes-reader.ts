// Reads lane records as they stream in: depots resolved to indices, amounts read exactly in the
// network currency (converted only with a user-given rate), distance with its unit, drive time,
// validity, vehicle class (one toll column per class, or a vehicle_class column), reference, notes.

import { MoneyOverflowError } from '../errors';
import { formatMinor, type Minor } from '../money/minor';
import { netCostOrNull } from '../money/net-cost';
import { readAmount } from './amount-text';
import { cellText, ownText, readIsoDate } from './cells';
import { convertMinor, readRate } from './currency-convert';
import { currencyExponent, lookupCurrency } from './currencies';
import { checkDriveMinutes, readDistanceKm, readDriveTime } from './lane-cells';
import { classKey, matchLaneHeaders, type HeaderMatch, type LaneField } from './headers';
import { LaneLimitsBuilder } from './lane-limits';
import { LaneTableBuilder } from './lane-table';
import { PlainLaneRows } from './lane-row-fast';
import { DepotIdIndex } from './depot-id-index';
import { PLAIN_LATER, PLAIN_NEVER } from '../io/csv-byte-stream';
import { currencyMarkIn, firstCurrencyNamed } from './network-currency';
import type { ReportCollector } from './report-collector';
import { isBlankRecord, RecordFileReader } from './record-file-reader';
import type { IssueCode } from './types';

const digitsOf = (code: string) => currencyExponent(code) ?? 2;

export interface LanesReaderOptions {
  currency?: string;
  exchangeRates?: Record<string, string>;
  /** False: every row through the general reader (the tests compare the fast path with it). */
  plainRows?: boolean;
}

const own = ownText;

export class LanesReader extends RecordFileReader {
  readonly table = new LaneTableBuilder();
  currency: string | null;
  exponent = 2;
  readonly converted = new Map<string, number>();
  private header: HeaderMatch<LaneField> | null = null;
  private readonly classIndex = new Map<string, number>();
  private col: Partial<Record<LaneField, number>> = {};
  private name: Partial<Record<LaneField, string>> = {};
  /** Every amount column (toll, class tolls, fuel, fees, rebate), in the order a row reads them. */
  private moneyColumns: number[] = [];
  private rowDigits = 2;
  private driveUnit: string | null = null;
  private rowOk = true;
  private row = 0;
  private rowCurrency: string | null = null;
  /** The plain-row fast path, made once the header and the currency are known (null = not for this file). */
  private fast: PlainLaneRows | null | undefined;

  constructor(
    file: string,
    report: ReportCollector,
    private readonly depotIndex: ReadonlyMap<string, number>,
    private readonly options: LanesReaderOptions,
    private readonly rejectedDepots: ReadonlyMap<string, number> = new Map(),
    private readonly depotsFile = 'the depots file',
  ) {
    super(file, report, 'lanes');
    this.currency = options.currency ? options.currency.toUpperCase() : null;
    if (this.currency) this.exponent = currencyExponent(this.currency) ?? 2;
  }

  protected override beforeRows(records: string[][], start: number): void {
    if (this.currency === null) this.pickCurrency(records, start);
  }

  protected noDataRows(): void {
    this.report.warning(this.file, null, null, null, 'no-data-rows', 'the file has a header but no lanes');
  }

  override finish(): void {
    super.finish();
    if (this.currency === null) {
      this.currency = 'EUR';
      this.exponent = 2;
    }
  }

  protected readHeader(cells: string[]): void {
    const h = matchLaneHeaders(cells);
    this.header = h;
    for (const [field, column] of h.columns) {
      this.col[field] = column.index;
      this.name[field] = column.header;
    }
    const driveUnit = h.columns.get('drive')?.unit ?? null;
    this.driveUnit = driveUnit === 'hours' || driveUnit === 'hour' ? 'h' : driveUnit;
    this.requireColumns(h, [['from', 'from'], ['to', 'to']], 'lane');
    this.reportColumnProblems(h, 'unknown column, kept with the lane but not used');
    for (const u of h.unknown) this.table.extra.push({ column: u.header, values: [] });
    for (const c of h.classTolls) this.table.classTolls.push({ name: c.name, key: c.key, toll: new Float64Array(this.table.from.length), header: c.header });
    for (const field of ['toll', 'fuel', 'rebate', 'vehicle_class'] as const) if (this.name[field] !== undefined) this.table.columnHeaders[field] = this.name[field];
    this.moneyColumns = [this.col.toll, ...h.classTolls.map((c) => c.index), this.col.fuel, this.col.fees, this.col.rebate].filter((c): c is number => c !== undefined);
    if (h.columns.has('clause')) this.table.clause = [];
    if (h.columns.has('vehicle_class')) this.table.vehicleClass = new Int16Array(this.table.from.length);
    this.table.limits = LaneLimitsBuilder.forHeader(h.columns, (header, unit, message) => {
      this.report.error(this.file, this.headerRow, header, unit, 'bad-unit', message);
      this.unusable = true;
    });
    const distanceUnit = h.columns.get('distance')?.unit;
    if (distanceUnit && !['km', 'mi', 'miles', 'mile', 'kilometres', 'kilometers'].includes(distanceUnit)) {
      this.report.error(this.file, this.headerRow, h.columns.get('distance')!.header, distanceUnit, 'bad-unit', 'distance unit must be km or mi');
      this.unusable = true;
    }
  }

  private pickCurrency(records: string[][], start: number): void {
    this.currency = firstCurrencyNamed(records, start, this.header!, this.decimalComma) ?? 'EUR';
    this.exponent = currencyExponent(this.currency) ?? 2;
  }

  private fail(column: string | null, value: string | null, code: IssueCode, message: string): void {
    this.report.error(this.file, this.row, column, value, code, message);
    this.rowOk = false;
  }
  // `fail` as a value, made once rather than a closure per row.
  private readonly failRow = (column: string | null, value: string | null, code: IssueCode, message: string) => this.fail(column, value, code, message);

  private headerOf(field: LaneField): string {
    return this.name[field] ?? field;
  }

  protected readRow(cells: string[], row: number): boolean {
    this.row = row;
    this.rowOk = true;
    const h = this.header!;
    const col = this.col;
    this.refuseSurplusFields(cells, this.failRow);
    const from = this.depot(cells, 'from');
    const to = this.depot(cells, 'to');

    // Currency of this row: its currency column, else the network's; a mark in an amount must agree.
    this.rowCurrency = null;
    this.rowDigits = this.exponent;
    const code = cellText(cells, col.currency);
    if (code !== '' && code !== this.currency) {
      const c = lookupCurrency(code);
      if ('code' in c) this.setRowCurrency(c.code);
      else this.fail(this.headerOf('currency'), code, 'unknown-currency', c.detail);
    } else if (code !== '') this.rowCurrency = code;
    else {
      // A mark on any amount sets the row's currency before the first amount is read: an unmarked
      // toll read ahead of a marked fuel ("100", "¥100") would otherwise get the network's digits.
      const marked = currencyMarkIn(cells, this.moneyColumns, this.decimalComma);
      if (marked !== null) this.setRowCurrency(marked);
    }
    let toll = this.amount(cells, col.toll, 'toll');
    const classTolls: number[] = [];
    for (let k = 0; k < h.classTolls.length; k++) classTolls.push(this.amountAt(cells, h.classTolls[k].index, h.classTolls[k].header));
    let fuel = this.amount(cells, col.fuel, 'fuel');
    let fees = this.amount(cells, col.fees, 'fees');
    let rebate = this.amount(cells, col.rebate, 'rebate');
    this.warnNegative(cells, [
      [col.toll, this.headerOf('toll'), 'toll', toll],
      ...h.classTolls.map((c, k) => [c.index, c.header, 'toll', classTolls[k]] as const),
      [col.fuel, this.headerOf('fuel'), 'fuel', fuel],
      [col.fees, this.headerOf('fees'), 'fees', fees],
      [col.rebate, this.headerOf('rebate'), 'rebate', rebate],
    ]);
    const rowCurrency = this.rowCurrency ?? this.currency!;
    if (rowCurrency !== this.currency) {
      const rateText = this.options.exchangeRates?.[rowCurrency];
      const rate = rateText === undefined ? null : readRate(rateText);
      if (rate === null) {
        this.fail(this.headerOf('currency'), rowCurrency, 'mixed-currency', `currency ${rowCurrency} differs from the network's ${this.currency}; one currency per network unless an exchange rate is given`);
      } else {
        const fromExp = currencyExponent(rowCurrency) ?? 2;
        const conv = (v: number) => (Number.isNaN(v) ? v : convertMinor(v, fromExp, this.exponent, rate));
        try {
          toll = conv(toll);
          fuel = conv(fuel);
          fees = conv(fees);
          rebate = conv(rebate);
          for (let k = 0; k < classTolls.length; k++) classTolls[k] = conv(classTolls[k]);
          this.converted.set(rowCurrency, (this.converted.get(rowCurrency) ?? 0) + 1);
        } catch (error) {
          if (!(error instanceof MoneyOverflowError)) throw error;
          this.fail(this.headerOf('currency'), rowCurrency, 'amount-overflow', `an amount converted from ${rowCurrency} is outside the exact range (±${Number.MAX_SAFE_INTEGER} minor units)`);
        }
      }
    }

    if (this.rowOk) this.checkNet(cells, toll, classTolls, fuel, fees, rebate);
    const distanceKm = this.distance(cells);
    const driveMinutes = this.drive(cells);
    const validFrom = this.date(cells, 'valid_from');
    const validTo = this.date(cells, 'valid_to');
    if (validFrom > 0 && validTo > 0 && validFrom > validTo) {
      this.fail(this.headerOf('valid_to'), cellText(cells, col.valid_to), 'bad-period', `validity ends before it starts (${cellText(cells, col.valid_from)})`);
    }
    if (this.table.limits && !this.table.limits.read(cells, this.decimalComma, (c, v, code, m) => this.fail(c, v, code, m))) this.rowOk = false;
    if (!this.rowOk) return false;

    const t = this.table;
    t.limits?.keep();
    const i = t.add();
    t.from[i] = from;
    t.to[i] = to;
    t.sourceRow[i] = row;
    t.toll[i] = toll;
    for (let k = 0; k < classTolls.length; k++) t.classTolls[k].toll[i] = classTolls[k];
    t.fuel[i] = fuel;
    t.fees[i] = Number.isNaN(fees) ? 0 : fees;
    t.rebate[i] = Number.isNaN(rebate) ? 0 : rebate;
    t.distanceKm[i] = distanceKm;
    t.driveMinutes[i] = driveMinutes;
    t.validFrom[i] = validFrom;
    t.validTo[i] = validTo;
    if (t.vehicleClass) t.vehicleClass[i] = this.vehicleClass(cells);
    // Absent optional columns get no per-row entries (a lookup past the end reads undefined).
    if (col.ref !== undefined) {
      const ref = cellText(cells, col.ref);
      t.setRef(i, ref === '' ? undefined : own(ref));
    }
    if (col.notes !== undefined) {
      const notes = cellText(cells, col.notes);
      t.notes.push(notes === '' ? undefined : own(notes));
    }
    if (t.clause) {
      const clause = cellText(cells, col.clause);
      t.clause.push(clause === '' ? undefined : own(clause));
    }
    for (let k = 0; k < h.unknown.length; k++) {
      const value = cellText(cells, h.unknown[k].index);
      t.extra[k].values.push(value === '' ? undefined : own(value));
    }
    if (from === to) this.report.warning(this.file, row, this.headerOf('to'), cellText(cells, col.to), 'self-lane', 'lane from a depot to itself; it never shortens a route');
    return true;
  }

  protected override readPlainRow(text: string, start: number, end: number, row: number, delimiter: string): boolean {
    const fast = this.fastRows();
    return fast !== null && fast !== undefined && fast.read(text, start, end, row, delimiter);
  }

  // Rows that arrive as cells (the first block of a file, lines near a quote) still take the fast
  // path when they are plain: most of a lanes file's first megabyte.
  protected override readPlainCells(cells: readonly string[], row: number): boolean {
    const fast = this.fastRows();
    return fast !== null && fast !== undefined && fast.readCells(cells, row, this.decimalComma ? 59 : 44);
  }

  protected override readPlainBytes(bytes: Uint8Array, start: number, limit: number, row: number, delimiter: number): number {
    const fast = this.fastRows();
    if (fast === undefined) return PLAIN_LATER;
    return fast === null ? PLAIN_NEVER : fast.readBytes(bytes, start, limit, row, delimiter);
  }

  // The fast path, made once the header and the currency are known (undefined until then, null = not for this file).
  private fastRows(): PlainLaneRows | null | undefined {
    if (this.fast === undefined) {
      if (this.currency === null || this.header === null) return undefined;
      if (this.options.plainRows === false) return (this.fast = null);
      this.fast = PlainLaneRows.forFile({
        header: this.header,
        columnCount: this.headerCells.length,
        exponent: this.exponent,
        decimalComma: this.decimalComma,
        driveUnit: this.driveUnit,
        depots: new DepotIdIndex(this.depotIndex),
        table: this.table,
      });
    }
    return this.fast;
  }

  /**
   * A negative amount is accepted (a credit can be real) but named: a negative rebate raises the
   * lane's cost, which is seldom what was meant, and a negative toll, fuel or fee lowers it.
   */
  private warnNegative(cells: string[], amounts: readonly (readonly [number | undefined, string, 'toll' | 'fuel' | 'fees' | 'rebate', number])[]): void {
    for (const [index, column, field, value] of amounts) {
      if (!(value < 0) || index === undefined) continue;
      const by = formatMinor(-value as Minor, this.rowDigits);
      const effect =
        field === 'rebate'
          ? `a negative rebate raises the lane's cost by ${by} (a rebate is subtracted); write a credit as a positive rebate`
          : `a negative ${field === 'fees' ? 'fee' : field === 'fuel' ? 'fuel cost' : 'toll'} lowers the lane's cost by ${by}, like a rebate; check the sign`;
      this.report.warning(this.file, this.row, column, cellText(cells, index), 'negative-amount', effect);
    }
  }

  /**
   * The lane's net cost (toll + fuel + fees - rebate, with every toll it may be planned with) must be
   * exact: past ±MAX_SAFE_INTEGER minor units it is a row error here, not an abort later.
   */
  private checkNet(cells: string[], toll: number, classTolls: readonly number[], fuel: number, fees: number, rebate: number): void {
    const z = (v: number) => (Number.isNaN(v) ? 0 : v);
    const h = this.header!;
    const tolls: [number | undefined, string, number][] = [[this.col.toll, this.headerOf('toll'), z(toll)], ...h.classTolls.map((c, k): [number, string, number] => [c.index, c.header, z(classTolls[k])])];
    for (const tollAmount of tolls) {
      if (netCostOrNull(tollAmount[2], z(fuel), z(fees), z(rebate)) !== null) continue;
      // Name the largest amount: it is the one to look at.
      const parts: [number | undefined, string, number][] = [tollAmount, [this.col.fuel, this.headerOf('fuel'), z(fuel)], [this.col.fees, this.headerOf('fees'), z(fees)], [this.col.rebate, this.headerOf('rebate'), z(rebate)]];
      const [index, column] = parts.reduce((a, b) => (Math.abs(b[2]) > Math.abs(a[2]) ? b : a));
      this.fail(column, cellText(cells, index), 'amount-overflow', `the lane's net cost (toll + fuel + fees - rebate) is outside the exact range (±${Number.MAX_SAFE_INTEGER} minor units); it cannot be costed exactly`);
      return;
    }
  }

  private setRowCurrency(code: string): void {
    this.rowCurrency = code;
    this.rowDigits = currencyExponent(code) ?? 2;
  }

  private depot(cells: string[], field: 'from' | 'to'): number {
    const id = cellText(cells, this.col[field]);
    if (id === '') {
      this.fail(this.headerOf(field), '', 'missing-value', `${field} depot is empty`);
      return -1;
    }
    const index = this.depotIndex.get(id);
    if (index === undefined) {
      const rejectedAt = this.rejectedDepots.get(id);
      this.fail(
        this.headerOf(field),
        id,
        'unknown-depot',
        rejectedAt === undefined ? `no depot with this id in ${this.depotsFile}` : `the depot's row ${rejectedAt} in ${this.depotsFile} was rejected (see its error)`,
      );
      return -1;
    }
    return index;
  }

  private amount(cells: string[], index: number | undefined, field: LaneField): number {
    if (index === undefined) return NaN;
    return this.amountAt(cells, index, this.headerOf(field));
  }

  private amountAt(cells: string[], index: number, column: string): number {
    const text = cellText(cells, index);
    if (text === '') return NaN;
    const r = readAmount(text, this.rowDigits, this.decimalComma, digitsOf);
    if (!r.ok) {
      this.fail(column, text, r.code, r.reason);
      return NaN;
    }
    if (r.currency !== null) {
      if (this.rowCurrency === null) this.setRowCurrency(r.currency);
      else if (r.currency !== this.rowCurrency) {
        this.fail(column, text, 'mixed-currency', `amount in ${r.currency} on a row in ${this.rowCurrency}`);
        return NaN;
      }
    }
    return r.minor;
  }

  private distance(cells: string[]): number {
    const text = cellText(cells, this.col.distance);
    if (text === '') return NaN;
    const unitText = cellText(cells, this.col.distance_unit);
    const r = readDistanceKm(text, this.header!.columns.get('distance')!.unit, unitText, this.decimalComma);
    if (typeof r === 'number') return r;
    if (r.code === 'bad-unit') this.fail(this.headerOf('distance_unit'), unitText, r.code, r.reason);
    else this.fail(this.headerOf('distance'), text, r.code, r.reason);
    return NaN;
  }

  private drive(cells: string[]): number {
    const text = cellText(cells, this.col.drive);
    if (text === '') return NaN;
    // Plain whole minutes, the common case, without the general reader.
    const r = this.driveUnit !== 'h' && /^\d+$/.test(text) ? checkDriveMinutes(Number(text)) : readDriveTime(text, this.driveUnit, this.decimalComma);
    if (typeof r === 'number') return r;
    this.fail(this.headerOf('drive'), text, r.code, r.reason);
    return NaN;
  }

  private date(cells: string[], field: 'valid_from' | 'valid_to'): number {
    const text = cellText(cells, this.col[field]);
    if (text === '') return 0;
    const value = readIsoDate(text);
    if (value === null) {
      this.fail(this.headerOf(field), text, 'bad-date', 'not an ISO 8601 calendar date (YYYY-MM-DD)');
      return 0;
    }
    return value;
  }

  private vehicleClass(cells: string[]): number {
    const text = cellText(cells, this.col.vehicle_class);
    if (text === '') return -1;
    const key = classKey(text);
    let index = this.classIndex.get(key);
    if (index === undefined) {
      index = this.table.classNames.length;
      this.classIndex.set(key, index);
      this.table.classNames.push(own(text));
    }
    return index;
  }
}
