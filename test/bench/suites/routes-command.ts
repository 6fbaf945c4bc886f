// `lanewright routes` as the user runs it (start-up, read, solve, report, write to a file), on the
// road-like grid of 250,000 depots / 998,000 lanes and a random network of 100,000 / 1,000,000, with
// and without paths: wall time and peak memory (maximum resident set, from /usr/bin/time -v), beside
// a baseline in the same run that reports by walking every path and builds the output as one string
// (routes-path-walk-command.ts, the method before the linear report), given a 1.5 GB heap. Also the
// start-up of `lanewright --help` from the bundle beside the same help through tsx.

import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { freshBundle } from '../../../main/cli/fresh-bundle.mjs';
import { writeNetworkFiles, type NetworkFiles } from '../network-files';
import type { BenchSuite } from '../harness';
import { timedCommand, type TimedRun } from '../timed-command';

const root = fileURLToPath(new URL('../../../', import.meta.url));
const BASELINE_HEAP_MB = 1536;

type Run = TimedRun;
const measure = (args: string[], out: string | null): Run => timedCommand(process.execPath, args, root, out);

export const suite: BenchSuite = {
  name: 'routes-command',
  run(record) {
    const folder = mkdtempSync(join(tmpdir(), 'lanewright-bench-routes-command-'));
    try {
      // Checked before each run: a source edited while the bench runs makes the launcher use tsx.
      const launcher = () => (freshBundle(root, join(root, 'dist', 'cli')) !== null ? 'the bundle' : 'tsx (no fresh bundle: npm run build:cli)');
      const networks: [string, NetworkFiles][] = [
        ['grid 500x500 (250k depots, 998k lanes)', writeNetworkFiles(folder, 'grid', 500)],
        ['random 100k/1M', writeNetworkFiles(folder, 'random', 100_000, 1_000_000)],
      ];
      for (const [label, files] of networks) {
        for (const paths of [false, true]) {
          const out = join(folder, 'routes.csv');
          const engineArgs = ['main/cli/lanewright.mjs', 'routes', '--depots', files.depots, '--lanes', files.lanes, '--from', files.origin, '--out', out, '--timings'];
          const via = launcher();
          const engine = measure(paths ? engineArgs : [...engineArgs, '--no-paths'], out);
          const baselineArgs = [`--max-old-space-size=${BASELINE_HEAP_MB}`, '--import', 'tsx', 'test/bench/routes-path-walk-command.ts', files.depots, files.lanes, files.origin, paths ? 'paths' : 'no-paths', 'csv', out];
          const baseline = measure(baselineArgs, out);
          const name = `routes CSV ${paths ? 'with paths' : '--no-paths'}, ${label}`;
          const cpu = (r: Run) => (r.cpuS === undefined ? '' : `${r.cpuS.toFixed(1)} s CPU, `);
          const say = (r: Run) => cpu(r) + (r.ok ? `${r.outputMb.toFixed(0)} MB written, ${r.detail}` : `FAILED: ${r.detail}`);
          record({
            case: `${name}: wall`,
            engine: engine.ms,
            baseline: baseline.ms,
            unit: 'ms',
            target: files.depotCount === 250_000 && !paths ? 4_000 : undefined,
            note: `engine via ${via}: ${say(engine)}; baseline (path walk, one string, tsx, ${BASELINE_HEAP_MB} MB heap): ${say(baseline)}`,
          });
          if (engine.mb !== undefined) {
            record({
              case: `${name}: peak memory (max RSS)`,
              engine: engine.mb,
              baseline: baseline.mb,
              unit: 'MB',
              target: files.depotCount === 250_000 ? (paths ? 1_024 : 600) : undefined,
            });
          }
        }
      }

      // Start-up: the help screen from the bundle, from the sources through tsx, and bare Node.
      const helpVia = launcher();
      const best = (args: string[]) => Math.min(...[0, 1, 2].map(() => measure(args, null).ms));
      const help = best(['main/cli/lanewright.mjs', '--help']);
      const script = "const { main } = await import('./main/cli/run.ts'); await main(['--help']);";
      const viaTsx = best(['--import', 'tsx', '--input-type=module', '-e', script]);
      const bare = best(['-e', '0']);
      record({
        case: 'lanewright --help: start-up wall',
        engine: help,
        baseline: viaTsx,
        unit: 'ms',
        target: 300,
        note: `best of 3; engine via ${helpVia}; baseline = the same help through tsx; bare node -e 0 takes ${bare.toFixed(0)} ms on this machine now`,
      });
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  },
};
