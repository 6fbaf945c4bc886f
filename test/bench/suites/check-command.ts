// `lanewright check` as a user runs it (a fresh process: start-up, read, validate, report) on the
// seeded 1,000,000-lane file, beside pandas `read_csv` on the same file in the same run, which only
// parses (no validation, no exact amounts). pandas is the baseline when Debian's python3-pandas is
// installed; otherwise the figure stands alone and the note says so.

import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { BenchSuite } from '../harness';
import { writeFiles } from './import';

const cli = fileURLToPath(new URL('../../../main/cli/lanewright.mjs', import.meta.url));

/** Best wall time of `runs` runs of a command, or null when it failed. */
function wallMs(command: string, args: string[], runs = 2): number | null {
  let best = Infinity;
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    const result = spawnSync(command, args, { stdio: ['ignore', 'ignore', 'pipe'], maxBuffer: 64 * 2 ** 20 });
    if (result.status !== 0) return null;
    best = Math.min(best, performance.now() - start);
  }
  return best;
}

export const suite: BenchSuite = {
  name: 'check-command',
  run(record) {
    const folder = mkdtempSync(join(tmpdir(), 'lanewright-bench-check-'));
    try {
      const files = writeFiles(folder);
      const engine = wallMs(process.execPath, [cli, 'check', '--depots', files.depots, '--lanes', files.lanes]);
      if (engine === null) throw new Error('lanewright check failed');
      const python = '/usr/bin/python3';
      const pandas = existsSync(python) ? wallMs(python, ['-c', `import pandas; pandas.read_csv(${JSON.stringify(files.lanes)})`]) : null;
      record({
        case: 'check 1M lanes: whole command (fresh process)',
        engine,
        baseline: pandas ?? undefined,
        unit: 'ms',
        note: pandas === null ? 'no baseline: python3-pandas is not installed' : 'baseline: pandas read_csv of the lanes file (parse only, includes Python start-up)',
      });
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  },
};
