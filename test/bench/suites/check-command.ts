// `lanewright check` as a user runs it (a fresh process from the bundle: start-up, read, validate,
// plan, report) on the seeded 1,000,000-lane file, beside baselines measured in the same run on the
// same file: pandas `read_csv` (a fresh Python process: parse only, no validation, no exact
// amounts), when Debian's python3-pandas is installed (the note says so when it is not); the
// previous importer's way in (the lanes decoded into text chunks, every line a string) beside the
// byte path the CLI now takes, both as check's import in a fresh process (test/bench/check-import-command.ts,
// tsx's start-up left out); and papaparse with no checks (the file as one string, parsed inside a process).
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
      const importRun = (mode: 'bytes' | 'text') => {
        const run = bestOf(2, () => timedCommand(process.execPath, ['--import', 'tsx', 'test/bench/check-import-command.ts', files.depots, files.lanes, mode], root));
        if (!run.ok) throw new Error(`check import (${mode}) failed: ${run.detail}`);
        return { run, figures: JSON.parse(run.detail) as { import_ms: number; cpu_ms: number; accepted: number } };
      };
      const asBytes = importRun('bytes');
      const asText = importRun('text');
      if (asBytes.figures.accepted !== asText.figures.accepted) throw new Error('the byte and text paths accepted different rows');
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
      const inProcess = (f: { import_ms: number; cpu_ms: number }) => `${f.import_ms} ms wall, ${(f.cpu_ms / 1000).toFixed(2)} s CPU in-process`;
      record({
        case: "check 1M lanes: check's import, lanes as bytes vs as text (the previous importer's way in)",
        engine: asBytes.figures.import_ms,
        baseline: asText.figures.import_ms,
        unit: 'ms',
        note: `bytes: ${inProcess(asBytes.figures)}, process ${runText(asBytes.run)}; text: ${inProcess(asText.figures)}, process ${runText(asText.run)} (both with tsx's start-up in the process figures)`,
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
