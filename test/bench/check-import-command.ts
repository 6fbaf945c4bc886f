// The check-command bench's importer comparison: what `lanewright check` does with its two files
// (read in 1 MB chunks, validate, plan, report; no network), with the lanes fed either as UTF-8 bytes
// (the CLI's way now) or decoded into text chunks first (the previous way, still the app's worker's:
// every line a string, cut by character codes). Both run in a fresh process like this one, so the
// two figures are measured alike.
//   node --import tsx test/bench/check-import-command.ts DEPOTS LANES bytes|text
// Prints one JSON line on stderr: the import's wall and CPU time inside the process (tsx's start-up
// left out) and the row counts.

import { formatReport, startImport } from '../../engine/index';
import { nodeUtf8Text, readByteChunks, readTextChunks } from '../../main/cli/read-chunks';

const [depots, lanes, mode] = process.argv.slice(2);
if (mode !== 'bytes' && mode !== 'text') throw new Error('usage: check-import-command.ts DEPOTS LANES bytes|text');
const start = performance.now();
const cpu = process.cpuUsage();
const session = startImport({ plan: { date: '2026-06-01' }, skipInvalid: false, network: false, utf8Text: nodeUtf8Text });
if (mode === 'bytes') {
  for (const c of readByteChunks(depots)) session.feedDepotsBytes(c.bytes, c.fraction);
  session.finishDepots();
  for (const c of readByteChunks(lanes)) session.feedLanesBytes(c.bytes, c.fraction);
} else {
  for (const c of readTextChunks(depots)) session.feedDepots(c.text, c.fraction);
  session.finishDepots();
  for (const c of readTextChunks(lanes)) session.feedLanes(c.text, c.fraction);
}
session.finishLanes();
const result = session.result();
const lines = formatReport(result.report).length;
const used = process.cpuUsage(cpu);
process.stderr.write(JSON.stringify({ import_ms: Math.round(performance.now() - start), cpu_ms: Math.round((used.user + used.system) / 1000), accepted: result.report.accepted, total: result.report.total, lines }) + '\n');
