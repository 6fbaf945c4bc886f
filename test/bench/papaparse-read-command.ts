// The check-command bench's papaparse baseline: read a lanes file as one string and parse it with
// papaparse (through the engine's wrapper), with no checks, no exact amounts, no depot lookups.
//   node --import tsx test/bench/papaparse-read-command.ts LANES
// Prints one JSON line on stderr: the read and parse time inside the process (tsx's start-up left out).

import { readFileSync } from 'node:fs';
import { parseCsvText } from '../../engine/io/csv-papaparse';

const start = performance.now();
const table = parseCsvText(readFileSync(process.argv[2], 'utf8'));
const ms = performance.now() - start;
process.stderr.write(JSON.stringify({ read_parse_ms: Math.round(ms), rows: table.rows.length }) + '\n');
