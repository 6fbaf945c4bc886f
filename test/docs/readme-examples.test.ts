// Every `npx lanewright ...` example in README.md and sample-data/README.md runs as written (with
// its optional [--flags] dropped and its output files sent to a temporary folder): it exits 0, or 1
// for `check` on the broken file, which is the point of that example. Each example that plans for a
// date names it (`--date`), except `audit` without --date, which reviews the whole calendar.

import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli, tempFiles } from '../main/cli/cli-harness';

const OUTPUT_OPTIONS = new Set(['--out', '--lanes-out', '--routes-out', '--loops-out', '--geojson-out', '--loops-csv', '--report']);

/** The command lines of the ```sh blocks that run lanewright, continuation lines joined. */
function examples(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  const blocks = [...text.matchAll(/```sh\n([\s\S]*?)```/g)].map((m) => m[1].replace(/\\\n\s*/g, ''));
  return blocks.flatMap((b) => b.split('\n')).map((l) => l.trim()).filter((l) => l.startsWith('npx lanewright '));
}

function argvOf(line: string, outDir: string): string[] {
  const words = line.replace(/\[[^\]]*\]/g, ' ').trim().split(/\s+/).slice(2);
  return words.map((w, i) => (i > 0 && OUTPUT_OPTIONS.has(words[i - 1]) ? join(outDir, w) : w));
}

const lines = [...examples('README.md'), ...examples('sample-data/README.md')];

describe('README examples', () => {
  it('finds the examples, including compare with its scenario file under sample-data/', () => {
    expect(lines.length).toBeGreaterThanOrEqual(10);
    const compare = lines.filter((l) => l.includes(' compare '));
    expect(compare.length).toBeGreaterThan(0);
    for (const line of compare) {
      const scenario = /--scenario (\S+)/.exec(line)?.[1];
      expect(scenario).toMatch(/^sample-data\//);
      expect(existsSync(scenario!)).toBe(true);
    }
  });

  it('has one install block', () => {
    const blocks = [...readFileSync('README.md', 'utf8').matchAll(/```\w*\n([\s\S]*?)```/g)].map((m) => m[1]);
    expect(blocks.filter((b) => /^npm (install|ci)\b/m.test(b))).toHaveLength(1);
  });

  it('every example that plans for a date gives --date', () => {
    for (const line of lines) {
      const command = line.split(/\s+/)[2];
      if (command === 'audit' && !line.includes('--date')) continue; // the calendar review: no single date
      expect(line, line).toMatch(/--date \d{4}-\d{2}-\d{2}/);
    }
  });

  it.each(lines)('%s', async (line) => {
    const outDir = tempFiles({});
    const run = await runCli(argvOf(line, outDir));
    const expected = line.includes('lanes-broken.csv') ? 1 : 0;
    expect(run.status, run.stderr.slice(0, 2000)).toBe(expected);
    expect(run.stderr).not.toMatch(/planning for \d{4}-\d{2}-\d{2} \(today\)/);
  }, 120_000);

  it('the compare example ends the FRA/SXB loop: every depot reachable, routes changed', async () => {
    const line = lines.find((l) => l.includes(' compare '))!;
    const run = await runCli([...argvOf(line, tempFiles({})), '--json']);
    expect(run.status, run.stderr).toBe(0);
    const report = JSON.parse(run.stdout) as { problems: unknown[]; depots: { base_status: string; scenario_status: string; route_changed: boolean }[]; loops_disappeared: { depots: string[] }[] };
    expect(report.problems).toEqual([]);
    expect(report.loops_disappeared.map((l) => [...l.depots].sort().join('/'))).toContain('FRA/SXB');
    expect(report.depots.filter((d) => d.base_status === 'unbounded').every((d) => d.scenario_status === 'reachable' && d.route_changed)).toBe(true);
  });
});
