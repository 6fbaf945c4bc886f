// Import of a seeded 1,000,000-lane file streamed from disk in 1 MB chunks (the CLI's path), beside
// a baseline measured in the same run: papaparse parsing the whole file as one string, no checks,
// amounts through Number(). Memory = V8 heap + array buffers (typed arrays live outside the heap),
// sampled at every chunk through the progress callback; "kept" is measured after a full GC.

import { mkdtempSync, rmSync, writeFileSync, readFileSync, openSync, writeSync, closeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { startImport } from '../../../engine/planning/import-network';
import { parseCsvText } from '../../../engine/io/csv-papaparse';
import { readTextChunks } from '../../../main/cli/read-chunks';
import { seeded, type BenchSuite } from '../harness';

function memoryMb(): number {
  const m = process.memoryUsage();
  return (m.heapUsed + m.arrayBuffers) / 2 ** 20;
}

const DEPOTS = 2_000;
const LANES = 1_000_000;

/** Writes the seeded depots and 1,000,000-lane files into `folder` (shared with the check-command suite). */
export function writeFiles(folder: string): { depots: string; lanes: string } {
  const random = seeded(20260301);
  const depots = join(folder, 'depots.csv');
  const rows = ['id,name,lat,lon'];
  for (let d = 0; d < DEPOTS; d++) rows.push(`D${d},Depot ${d},${(45 + random() * 10).toFixed(4)},${(0 + random() * 15).toFixed(4)}`);
  writeFileSync(depots, rows.join('\n') + '\n');
  const lanes = join(folder, 'lanes.csv');
  const fd = openSync(lanes, 'w');
  writeSync(fd, 'from,to,ref,toll,fuel,fees,rebate,distance_km,drive_minutes,valid_from,valid_to\n');
  let block: string[] = [];
  for (let e = 0; e < LANES; e++) {
    const from = Math.floor(random() * DEPOTS);
    const to = (from + 1 + Math.floor(random() * (DEPOTS - 1))) % DEPOTS;
    const money = () => (random() * 300).toFixed(2);
    const dated = e % 10 === 0;
    block.push(`D${from},D${to},L${e},${money()},${money()},${(random() * 20).toFixed(2)},${e % 7 === 0 ? (random() * 30).toFixed(2) : '0.00'},${e % 4 === 0 ? '' : (50 + random() * 400).toFixed(1)},${e % 3 === 0 ? '' : Math.round(40 + random() * 300)},${dated ? '2026-01-01' : ''},${dated ? '2026-12-31' : ''}`);
    if (block.length === 50_000) {
      writeSync(fd, block.join('\n') + '\n');
      block = [];
    }
  }
  if (block.length > 0) writeSync(fd, block.join('\n') + '\n');
  closeSync(fd);
  return { depots, lanes };
}

export const suite: BenchSuite = {
  name: 'import',
  run(record) {
    const folder = mkdtempSync(join(tmpdir(), 'lanewright-bench-import-'));
    try {
      const files = writeFiles(folder);
      const gc = (globalThis as { gc?: () => void }).gc;

      // Baseline: whole file as one string, papaparse, Number() per amount, no validation.
      gc?.();
      const baseHeap0 = memoryMb();
      let basePeak = baseHeap0;
      const baseStart = performance.now();
      const text = readFileSync(files.lanes, 'utf8');
      const table = parseCsvText(text).rows;
      let sum = 0;
      for (let i = 1; i < table.length; i++) sum += Number(table[i][3]) + Number(table[i][4]);
      basePeak = Math.max(basePeak, memoryMb());
      const baseMs = performance.now() - baseStart;
      if (!(sum > 0)) throw new Error('baseline read nothing');
      table.length = 0;

      gc?.();
      const heap0 = memoryMb();
      let peak = heap0;
      const start = performance.now();
      const session = startImport({
        onProgress: () => {
          peak = Math.max(peak, memoryMb());
        },
      });
      for (const c of readTextChunks(files.depots)) session.feedDepots(c.text, c.fraction);
      session.finishDepots();
      for (const c of readTextChunks(files.lanes)) session.feedLanes(c.text, c.fraction);
      session.finishLanes();
      const result = session.result();
      const ms = performance.now() - start;
      peak = Math.max(peak, memoryMb());
      gc?.();
      const kept = memoryMb() - heap0;
      if (result.network?.laneCount !== LANES) throw new Error(`imported ${result.network?.laneCount} lanes; report: ${JSON.stringify(result.report.errors.slice(0, 3))}`);

      record({ case: 'import 1M lanes (stream, validate, plan, build)', engine: ms, baseline: baseMs, unit: 'ms', target: 4000, note: 'baseline: papaparse on the whole text + Number(), no validation, no network' });
      record({ case: 'import 1M lanes: peak memory growth (heap + buffers)', engine: peak - heap0, baseline: basePeak - baseHeap0, unit: 'MB' });
      record({ case: 'import 1M lanes: kept after GC (lane table + network)', engine: kept, unit: 'MB' });
      record({ case: 'import 1M lanes: file size', engine: text.length / 2 ** 20, unit: 'MB' });
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  },
};
