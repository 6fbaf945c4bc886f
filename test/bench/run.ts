// `npm run bench`: runs every suite in test/bench/suites (or those named as arguments) and prints
// Lanewright's figures beside the baseline measured in the same run, with the target and a verdict.

import { readdirSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { join } from 'node:path';
import type { BenchFigure, BenchSuite } from './harness';

const folder = join(fileURLToPath(new URL('.', import.meta.url)), 'suites');
const wanted = process.argv.slice(2);
const files = readdirSync(folder).filter((f) => f.endsWith('.ts')).sort();
const rows: (BenchFigure & { suite: string })[] = [];

for (const file of files) {
  const { suite } = (await import(pathToFileURL(join(folder, file)).href)) as { suite: BenchSuite };
  if (wanted.length > 0 && !wanted.includes(suite.name)) continue;
  process.stderr.write(`bench: ${suite.name} ...\n`);
  await suite.run((figure) => {
    rows.push({ suite: suite.name, ...figure });
    process.stderr.write(`  ${figure.case}: ${format(figure.engine, figure.unit)}\n`);
  });
}

function format(value: number | undefined, unit: string): string {
  if (value === undefined) return '-';
  return unit === 'count' ? String(Math.round(value)) : `${value.toFixed(1)} ${unit}`;
}

const table = [
  ['case', 'lanewright', 'baseline', 'target', 'verdict'],
  ...rows.map((r) => [
    r.case,
    format(r.engine, r.unit),
    format(r.baseline, r.unit),
    r.target === undefined ? '-' : `<= ${format(r.target, r.unit)}`,
    r.target === undefined ? '' : r.engine <= r.target ? 'meets' : 'MISSES',
  ]),
];
const widths = table[0].map((_, c) => Math.max(...table.map((row) => row[c].length)));
for (const row of table) console.log(row.map((cell, c) => cell.padEnd(widths[c])).join('  '));
const notes = rows.filter((r) => r.note);
for (const r of notes) console.log(`note (${r.case}): ${r.note}`);
