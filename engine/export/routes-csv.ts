// The routes export: the routes report's flat table (one row per depot with status, cost, legs,
// the previous depot and lane, path and breakdown) as RFC 4180 CSV, whole or as a stream of chunks.

import { formatCsvRows } from '../io/csv-papaparse';
import { routesReportHeader, routesReportRows, type RoutesReport, type RoutesReportStream } from '../report/routes-report';

/**
 * Characters gathered before a chunk is handed on: large enough that writes are few, small enough
 * that a batch's rows die young (a 1 MB batch outlived two scavenges and was copied into the old space).
 */
export const ROUTES_CHUNK_CHARS = 1 << 16;

/** The routes report as CSV text. */
export function routesCsv(report: RoutesReport): string {
  return formatCsvRows(routesReportRows(report));
}

/**
 * The report as CSV chunks of about `chunkChars` characters (more only when one row alone is
 * longer). Rows are formatted in batches, so memory stays at one batch whatever the output adds up to.
 */
export function* routesCsvChunks(stream: RoutesReportStream, chunkChars = ROUTES_CHUNK_CHARS): Generator<string> {
  let batch: (string | number)[][] = [routesReportHeader(stream.paths)];
  const plainColumns = stream.plainColumns();
  let size = 0;
  for (let i = 0; i < stream.depots.length; i++) {
    const cells = stream.cells(stream.depots[i]);
    batch.push(cells);
    for (const cell of cells) size += typeof cell === 'string' ? cell.length + 1 : 12;
    if (size >= chunkChars) {
      yield formatCsvRows(batch, { plainColumns });
      batch = [];
      size = 0;
    }
  }
  if (batch.length > 0) yield formatCsvRows(batch, { plainColumns });
}
