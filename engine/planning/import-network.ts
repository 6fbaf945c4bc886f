// The importer's entry points: a push session (feed chunks of the depots file, then of the lanes
// file) and the one-call forms over whole texts or chunk sequences. Reads, validates, checks for
// duplicate lanes, plans for the requested day and class, and builds the network when allowed.

import { CsvByteStream } from '../io/csv-byte-stream';
import { CsvRecordStream } from '../io/csv-record-stream';
import { rememberDepotIndex } from '../network/depot-index-registry';
import { planLanes } from './plan-network';
import type { PlanRequest } from './types';
import { DepotsReader } from '../import/depots-reader';
import { findDuplicateLanes } from '../import/duplicate-lanes';
import { CURRENCY_EXPONENTS, currencyExponent } from '../import/currencies';
import { readRate } from '../import/currency-convert';
import { ImportCancelledError, PlanRequestError } from '../import/import-errors';
import { LanesReader } from '../import/lanes-reader';
import { ReportCollector } from '../import/report-collector';
import type { TextSource, ValidationReport } from '../import/types';
import type { ImportOptions, ImportResult } from './import-types';
import { counted } from '../text/plural';

/**
 * A streaming import: depots first, then lanes, then `result()`. A file is fed as text chunks or as
 * UTF-8 byte chunks (the `Bytes` forms: plain lane rows are then read from the bytes, with the same
 * result); one file is fed one way.
 */
export interface ImportSession {
  feedDepots(chunk: string, fraction?: number): void;
  feedDepotsBytes(chunk: Uint8Array, fraction?: number): void;
  finishDepots(): void;
  feedLanes(chunk: string, fraction?: number): void;
  feedLanesBytes(chunk: Uint8Array, fraction?: number): void;
  finishLanes(): void;
  result(): ImportResult;
}

/** Starts a streaming import. */
export function startImport(options: ImportOptions = {}): ImportSession {
  if (options.currency !== undefined && currencyExponent(options.currency) === undefined) {
    throw new PlanRequestError('currency', options.currency, `not a supported ISO 4217 code (supported: ${Object.keys(CURRENCY_EXPONENTS).join(', ')})`);
  }
  for (const [code, rate] of Object.entries(options.exchangeRates ?? {})) {
    if (currencyExponent(code) === undefined) throw new PlanRequestError('exchange rate', code, 'not a supported ISO 4217 code');
    if (readRate(rate) === null) throw new PlanRequestError('exchange rate', `${code}=${rate}`, 'the rate must be a positive decimal number');
  }
  const depotsFile = options.depotsFile ?? 'depots.csv';
  const lanesFile = options.lanesFile ?? 'lanes.csv';
  const collector = new ReportCollector(options.maxItems ?? 1000);
  const depots = new DepotsReader(depotsFile, collector);
  const depotStream = new CsvRecordStream({
    records: (rows, first, bad, text, stray) => {
      depots.decimalComma = depotStream.delimiter === ';';
      depots.records(rows, first, bad, text, stray);
    },
    plainLine: (text, start, end, row, delimiter) => depots.plainLine(text, start, end, row, delimiter),
    issue: (issue) => depots.issue(issue),
  });
  // The depots file is small: its bytes are decoded and read as text (no byte taker).
  let depotBytes: CsvByteStream | null = null;
  // One file is fed one way (text or bytes): the byte stream may hold a partial line.
  let depotText = false;
  let laneText = false;
  let lanes: LanesReader | null = null;
  let laneStream: CsvRecordStream | null = null;
  let laneBytes: CsvByteStream | null = null;
  let phase: 'depots' | 'lanes' | 'done' = 'depots';
  let reserved = false;

  const check = (file: string, rows: number) => {
    if (options.signal?.aborted) throw new ImportCancelledError(file, rows);
  };
  const progress = (file: 'depots' | 'lanes', rows: number, fraction?: number) => {
    options.onProgress?.({ file, rows, fraction: fraction === undefined ? null : Math.min(1, Math.max(0, fraction)) });
  };
  const openLanes = () => {
    if (phase === 'depots') session.finishDepots();
    if (lanes === null) {
      const reader = new LanesReader(lanesFile, collector, depots.index, { currency: options.currency, exchangeRates: options.exchangeRates }, depots.rejectedIds, depotsFile);
      lanes = reader;
      const stream: CsvRecordStream = new CsvRecordStream({
        records: (rows, first, bad, text, stray) => {
          reader.decimalComma = stream.delimiter === ';';
          reader.records(rows, first, bad, text, stray);
        },
        plainLine: (text, start, end, row, delimiter) => reader.plainLine(text, start, end, row, delimiter),
        issue: (issue) => reader.issue(issue),
      });
      laneStream = stream;
    }
    return { reader: lanes as LanesReader, stream: laneStream as unknown as CsvRecordStream };
  };
  const lanesAsBytes = () => {
    const { reader, stream } = openLanes();
    laneBytes ??= new CsvByteStream(stream, (bytes, start, limit, row, delimiter) => reader.plainBytes(bytes, start, limit, row, delimiter), options.utf8Text);
    return { reader, bytes: laneBytes };
  };
  const afterLaneChunk = (reader: LanesReader, fraction: number | undefined) => {
    // Size the lane table once from the share of the file read so far, instead of doubling it.
    if (!reserved && fraction !== undefined && fraction > 0 && fraction < 1 && reader.rows > 0) {
      reader.table.reserve(Math.ceil((reader.rows / fraction) * 1.05));
      reserved = true;
    }
    progress('lanes', reader.rows, fraction);
  };

  const session: ImportSession = {
    feedDepots(chunk, fraction) {
      if (phase !== 'depots') throw new Error('import: depots are finished; feed lanes now');
      if (depotBytes !== null) throw new Error('import: the depots file is fed as bytes');
      check(depotsFile, depots.rows);
      depotText = true;
      depotStream.feed(chunk);
      progress('depots', depots.rows, fraction);
    },
    feedDepotsBytes(chunk, fraction) {
      if (phase !== 'depots') throw new Error('import: depots are finished; feed lanes now');
      if (depotText) throw new Error('import: the depots file is fed as text');
      check(depotsFile, depots.rows);
      depotBytes ??= new CsvByteStream(depotStream, undefined, options.utf8Text);
      depotBytes.feed(chunk);
      progress('depots', depots.rows, fraction);
    },
    finishDepots() {
      if (phase !== 'depots') return;
      if (depotBytes !== null) depotBytes.finish();
      else depotStream.finish();
      depots.finish();
      phase = 'lanes';
      progress('depots', depots.rows, 1);
    },
    feedLanes(chunk, fraction) {
      const { reader, stream } = openLanes();
      if (phase !== 'lanes') throw new Error('import: lanes are finished');
      if (laneBytes !== null) throw new Error('import: the lanes file is fed as bytes');
      check(lanesFile, reader.rows);
      laneText = true;
      stream.feed(chunk);
      afterLaneChunk(reader, fraction);
    },
    feedLanesBytes(chunk, fraction) {
      if (laneText) throw new Error('import: the lanes file is fed as text');
      const { reader, bytes } = lanesAsBytes();
      if (phase !== 'lanes') throw new Error('import: lanes are finished');
      check(lanesFile, reader.rows);
      bytes.feed(chunk);
      afterLaneChunk(reader, fraction);
    },
    finishLanes() {
      const { reader, stream } = openLanes();
      if (phase !== 'lanes') return;
      if (laneBytes !== null) laneBytes.finish();
      else stream.finish();
      reader.finish();
      phase = 'done';
      progress('lanes', reader.rows, 1);
    },
    result() {
      if (phase !== 'done') session.finishLanes();
      return assemble(collector, depots, lanes!, lanesFile, options);
    },
  };
  return session;
}

function assemble(collector: ReportCollector, depots: DepotsReader, lanes: LanesReader, lanesFile: string, options: ImportOptions): ImportResult {
  const table = lanes.table.build();
  for (const dup of findDuplicateLanes(table, depots.depots.length)) {
    collector.warning(lanesFile, table.sourceRow[dup.lane], null, null, 'duplicate-lane', `repeats the lane at row ${table.sourceRow[dup.first]} (same from, to, reference, class and validity)`);
  }
  const notes: string[] = [];
  for (const [code, rows] of lanes.converted) notes.push(`${counted(rows, 'lane row')} converted from ${code} to ${lanes.currency} at ${options.exchangeRates?.[code]}.`);
  const importReport = collector.report();
  // The reader's id index is exactly the depots' positions; every plan's network reuses it.
  rememberDepotIndex(depots.depots, depots.index);
  const base = {
    depots: depots.depots,
    lanes: table,
    currency: lanes.currency!,
    exponent: lanes.exponent,
    vehicleClasses: table.classTolls.length > 0 ? table.classTolls.map((c) => c.name) : table.classNames.slice(),
    importReport,
    notes,
  };
  return planFrom(base, options.plan ?? {}, options.skipInvalid ?? false, lanesFile, options.maxItems ?? 1000, options.network ?? true);
}

type ImportBase = Omit<ImportResult, 'network' | 'report' | 'plan'>;

function planFrom(base: ImportBase, request: PlanRequest, skipInvalid: boolean, lanesFile: string, maxItems: number, network = true): ImportResult {
  const importReport = base.importReport;
  // The stored errors are capped, but the first ones are always kept: none stored means none found.
  // The report keeps the first maxItems warnings (the import's first): the plan need make no more.
  const outcome = planLanes({ ...base, lanesFile, maxWarnings: maxItems }, request, (planErrors) => network && (skipInvalid || (importReport.errors.length === 0 && planErrors === 0)));
  const report = mergeReport(importReport, outcome.errors, outcome.warnings, outcome.rejected, lanesFile, maxItems, outcome.dropped);
  return { ...base, network: outcome.plan.network, report, plan: outcome.plan, notes: [...base.notes, ...outcome.plan.notes] };
}

function mergeReport(
  base: ValidationReport,
  errors: ValidationReport['errors'],
  warnings: ValidationReport['warnings'],
  rejected: number,
  lanesFile: string,
  maxItems: number,
  dropped: number,
): ValidationReport {
  const files = base.files.map((f) => (f.kind === 'lanes' && f.file === lanesFile ? { ...f, accepted: f.accepted - rejected, rejected: f.rejected + rejected } : { ...f }));
  // The plan's items obey the same cap as the import's, so a million net-negative lanes stay cheap.
  const allErrors = [...base.errors, ...errors];
  const allWarnings = [...base.warnings, ...warnings];
  const omitted = Math.max(0, allErrors.length - maxItems) + Math.max(0, allWarnings.length - maxItems);
  return {
    total: base.total,
    accepted: base.accepted - rejected,
    rejected: base.rejected + rejected,
    errors: allErrors.slice(0, maxItems),
    warnings: allWarnings.slice(0, maxItems),
    files,
    omitted: base.omitted + omitted + dropped,
  };
}

/**
 * Re-plans an import for another date, vehicle class or settings without reading the files again.
 * The result's report is the import's problems plus this plan's.
 */
export function planNetwork(result: ImportResult, request: PlanRequest, options: { skipInvalid?: boolean; maxItems?: number } = {}): ImportResult {
  const { network: _n, report: _r, plan: _p, ...base } = result;
  return planFrom({ ...base, notes: base.notes.filter((n) => !result.plan.notes.includes(n)) }, request, options.skipInvalid ?? false, lanesFileOf(result), options.maxItems ?? 1000);
}

function lanesFileOf(result: ImportResult): string {
  return result.importReport.files.find((f) => f.kind === 'lanes')?.file ?? 'lanes.csv';
}

function feedAll(source: TextSource, feed: (chunk: string, fraction?: number) => void): void {
  if (typeof source === 'string') {
    // Whole texts are fed in slices too, so progress and cancelling work the same way.
    const step = 1 << 20;
    if (source.length === 0) return;
    for (let at = 0; at < source.length; at += step) feed(source.slice(at, at + step), Math.min(1, (at + step) / source.length));
    return;
  }
  for (const chunk of source) feed(chunk);
}

/** Imports depots and lanes from whole texts or chunk sequences (synchronous). */
export function importNetwork(depots: TextSource, lanes: TextSource, options: ImportOptions = {}): ImportResult {
  const session = startImport(options);
  feedAll(depots, session.feedDepots);
  session.finishDepots();
  feedAll(lanes, session.feedLanes);
  session.finishLanes();
  return session.result();
}

/**
 * Like importNetwork, for async chunk sources (a File's stream through TextDecoderStream). Between
 * chunks it awaits `pause` when given (a worker passes a zero-delay timer so a cancel message can
 * arrive and set the signal), since the engine itself has no timers.
 */
export async function importNetworkAsync(
  depots: TextSource | AsyncIterable<string>,
  lanes: TextSource | AsyncIterable<string>,
  options: ImportOptions & { pause?: () => Promise<void> } = {},
): Promise<ImportResult> {
  const session = startImport(options);
  const pump = async (source: TextSource | AsyncIterable<string>, feed: (chunk: string, fraction?: number) => void) => {
    const chunks: { text: string; fraction?: number }[] = [];
    if (typeof source === 'string' || Symbol.iterator in (source as object)) {
      feedAll(source as TextSource, (text, fraction) => chunks.push({ text, fraction }));
      for (const c of chunks) {
        feed(c.text, c.fraction);
        if (options.pause) await options.pause();
      }
      return;
    }
    for await (const chunk of source as AsyncIterable<string>) {
      feed(chunk);
      if (options.pause) await options.pause();
    }
  };
  await pump(depots, session.feedDepots);
  session.finishDepots();
  await pump(lanes, session.feedLanes);
  session.finishLanes();
  return session.result();
}
