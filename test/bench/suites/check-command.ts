// `lanewright check` as a user runs it (a fresh process from the bundle: start-up, read, validate,
// plan, report) on the seeded 1,000,000-lane file, beside two baselines measured in the same run on
// the same file: pandas `read_csv` (a fresh Python process: parse only, no validation, no exact
// amounts), when Debian's python3-pandas is installed (the note says so when it is not), and
// papaparse with no checks (the file as one string, parsed inside a process; tsx's start-up left out).
// Each figure is the run with the least CPU time of two, with its wall time, CPU seconds and peak RSS.

import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { BenchSuite } from '../harness';
import { bestOf, runText, timedCommand } from '../timed-command';
import { writeFiles } from './import';

const root = fileURLToPath(new URL('../../../', import.meta.url));
const PYTHON = '/usr/bin/python3';

export const suite: BenchSuite = {
  name: 'check-command',
  run(record) {
    const folder = mkdtempSync(join(tmpdir(), 'lanewright-bench-check-'));
    try {
      const files = writeFiles(folder);
      const check = bestOf(2, () => timedCommand(process.execPath, ['main/cli/lanewright.mjs', 'check', '--depots', files.depots, '--lanes', files.lanes, '--date', '2026-06-01'], root));
      if (!check.ok) throw new Error(`lanewright check failed: ${check.detail}`);
      const hasPandas = existsSync(PYTHON) && timedCommand(PYTHON, ['-c', 'import pandas'], root).ok;
      const pandas = hasPandas ? bestOf(2, () => timedCommand(PYTHON, ['-c', `import pandas; pandas.read_csv(${JSON.stringify(files.lanes)})`], root)) : null;
      const papa = bestOf(2, () => timedCommand(process.execPath, ['--import', 'tsx', 'test/bench/papaparse-read-command.ts', files.lanes], root));
      const papaMs = papa.ok ? (JSON.parse(papa.detail) as { read_parse_ms: number }).read_parse_ms : undefined;
      const checkText = `check: ${runText(check)}`;
      record({
        case: 'check 1M lanes: whole command (fresh process) vs pandas read_csv',
        engine: check.ms,
        baseline: pandas?.ms,
        unit: 'ms',
        target: pandas?.ok ? 0.7 * pandas.ms : undefined,
        note: pandas === null ? `${checkText}; no pandas baseline: python3-pandas is not installed` : `${checkText}; pandas read_csv (parse only, with Python start-up): ${runText(pandas)}; target 0.7 x pandas wall`,
      });
      record({
        case: 'check 1M lanes: whole command vs papaparse with no checks',
        engine: check.ms,
        baseline: papaMs,
        unit: 'ms',
        note: `papaparse: the whole file as one string, parsed in-process (start-up not counted), ${papaMs ?? '?'} ms; its process: ${runText(papa)}`,
      });
      record({ case: 'check 1M lanes: peak memory (max RSS)', engine: check.mb ?? NaN, baseline: pandas?.mb, unit: 'MB', target: 300, note: `baseline: pandas read_csv; papaparse (one string) peaked at ${papa.mb?.toFixed(0) ?? '?'} MB` });
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  },
};
