// The routes report as JSON text in chunks: the same text as JSON.stringify(routesReport(...)), but
// written row by row, so no single string ever holds the whole report (V8 caps a string near 512 MB,
// and every path of a large network adds up to far more).

import type { RoutesReportStream } from '../report/routes-report';
import { ROUTES_CHUNK_CHARS } from './routes-csv';

/** JSON text of the report in chunks of about `chunkChars` characters; the last ends with a newline. */
export function* routesJsonChunks(stream: RoutesReportStream, chunkChars = ROUTES_CHUNK_CHARS, before: Readonly<Record<string, unknown>> = {}): Generator<string> {
  // `before`: fields the caller puts first (the CLI names the date planned for).
  const head = JSON.stringify({ ...before, ...stream.head });
  let chunk = `${head.slice(0, -1)},"depots":[`;
  let first = true;
  for (const row of stream.rows()) {
    chunk += (first ? '' : ',') + JSON.stringify(row);
    first = false;
    if (chunk.length >= chunkChars) {
      yield chunk;
      chunk = '';
    }
  }
  const tail = JSON.stringify(stream.tail);
  yield `${chunk}],${tail.slice(1)}\n`;
}
