// Runs a whole command as a fresh process under /usr/bin/time -v (when present) for the command-level
// benches: wall time measured here, peak resident memory and CPU seconds from time -v, the command's
// own JSON timing line from stderr, and the size of what it wrote.

import { spawnSync } from 'node:child_process';
import { existsSync, rmSync, statSync } from 'node:fs';

const TIME = '/usr/bin/time';

export interface TimedRun {
  ms: number;
  /** Peak resident memory, when /usr/bin/time is there to measure it. */
  mb?: number;
  /** User + system CPU seconds (all threads), from the same; less disturbed than wall time on a busy machine. */
  cpuS?: number;
  ok: boolean;
  /** The command's own timing line (the first stderr line starting with "{"), or the first line of its error. */
  detail: string;
  /** Size of `out` after the run (the file is then removed), 0 without one. */
  outputMb: number;
}

/** Runs `command args` in `cwd` under /usr/bin/time -v when present. */
export function timedCommand(command: string, args: string[], cwd: string, out: string | null = null): TimedRun {
  const timed = existsSync(TIME);
  const start = performance.now();
  const result = spawnSync(timed ? TIME : command, timed ? ['-v', command, ...args] : args, { cwd, encoding: 'utf8', maxBuffer: 1 << 26 });
  const ms = performance.now() - start;
  const rss = /Maximum resident set size \(kbytes\): (\d+)/.exec(result.stderr)?.[1];
  const user = /User time \(seconds\): ([\d.]+)/.exec(result.stderr)?.[1];
  const system = /System time \(seconds\): ([\d.]+)/.exec(result.stderr)?.[1];
  const timing = result.stderr.split('\n').find((line) => line.startsWith('{'));
  const failure = result.stderr.split('\n').find((line) => /heap|RangeError|FATAL|lanewright:|Error/.test(line));
  const outputMb = out && existsSync(out) ? statSync(out).size / 2 ** 20 : 0;
  if (out) rmSync(out, { force: true });
  const cpuS = user && system ? Number(user) + Number(system) : undefined;
  return { ms, mb: rss ? Number(rss) / 1024 : undefined, cpuS, ok: result.status === 0, detail: result.status === 0 ? (timing ?? '') : (failure ?? `exit ${result.status}`), outputMb };
}

/** The run with the least CPU time of `runs` (wall time on a shared machine follows the load; CPU time much less). */
export function bestOf(runs: number, run: () => TimedRun): TimedRun {
  let best: TimedRun | null = null;
  for (let i = 0; i < runs; i++) {
    const r = run();
    if (!r.ok) return r;
    if (best === null || (r.cpuS ?? r.ms / 1000) < (best.cpuS ?? best.ms / 1000)) best = r;
  }
  return best!;
}

/** "3.21 s wall, 3.02 s CPU, 281 MB peak" for a note. */
export function runText(r: TimedRun): string {
  if (!r.ok) return `FAILED: ${r.detail}`;
  return [`${(r.ms / 1000).toFixed(2)} s wall`, r.cpuS === undefined ? null : `${r.cpuS.toFixed(2)} s CPU`, r.mb === undefined ? null : `${r.mb.toFixed(0)} MB peak`].filter((x) => x !== null).join(', ');
}
