// Entry points for the dispatch inputs: the vehicles file and the loads file, read from text (whole
// or in chunks) through the same CSV stream and report rules as depots and lanes.

import { CsvRecordStream } from '../io/csv-record-stream';
import { LoadsReader, type LoadRecord, type LoadsReaderContext } from './loads-reader';
import type { RecordFileReader } from './record-file-reader';
import { ReportCollector } from './report-collector';
import type { TextSource, ValidationReport } from './types';
import { VehiclesReader, type VehicleRecord } from './vehicles-reader';

export type { LoadRecord } from './loads-reader';
export type { VehicleRecord } from './vehicles-reader';

function readAll(source: TextSource, reader: RecordFileReader): void {
  const stream: CsvRecordStream = new CsvRecordStream({
    records: (rows, first, bad, text, stray) => {
      reader.decimalComma = stream.delimiter === ';';
      reader.records(rows, first, bad, text, stray);
    },
    issue: (issue) => reader.issue(issue),
  });
  if (typeof source === 'string') stream.feed(source);
  else for (const chunk of source) stream.feed(chunk);
  stream.finish();
  reader.finish();
}

export interface VehiclesImport {
  vehicles: VehicleRecord[];
  /** By id; a Map so ids from the file never meet Object.prototype. */
  byId: Map<string, VehicleRecord>;
  report: ValidationReport;
}

/** Reads a vehicles file; `classes` are the lanes file's vehicle classes. */
export function importVehicles(text: TextSource, options: { file?: string; classes: readonly string[]; maxItems?: number }): VehiclesImport {
  const collector = new ReportCollector(options.maxItems ?? 1000);
  const reader = new VehiclesReader(options.file ?? 'vehicles.csv', collector, options.classes);
  readAll(text, reader);
  return { vehicles: reader.vehicles, byId: new Map(reader.vehicles.map((v) => [v.id, v])), report: collector.report() };
}

export interface LoadsImport {
  loads: LoadRecord[];
  report: ValidationReport;
}

/** Reads a loads file against the network's depots, the vehicles and the lanes file's classes. */
export function importLoads(text: TextSource, context: Omit<LoadsReaderContext, 'vehiclesFile' | 'depotsFile'> & { file?: string; vehiclesFile?: string | null; depotsFile?: string; maxItems?: number }): LoadsImport {
  const collector = new ReportCollector(context.maxItems ?? 1000);
  const reader = new LoadsReader(context.file ?? 'loads.csv', collector, {
    ...context,
    depotsFile: context.depotsFile ?? 'the depots file',
    vehiclesFile: context.vehiclesFile ?? null,
  });
  readAll(text, reader);
  return { loads: reader.loads, report: collector.report() };
}
