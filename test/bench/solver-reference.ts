// First-call figures of the label-correcting core beside a C++ reference. Per family, the solve runs
// in fresh child processes (solver-first-call.ts), so the first call meets a V8 that has compiled
// nothing of it; the C++ build of the same algorithm (reference/label-correcting.cpp, g++ -O2)
// solves the same network from the same origin, and its checksum of every cost and of the unbounded
// set must equal Lanewright's.

import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { BenchFigure } from './harness';
import { SOLVER_FAMILIES } from './route-families';
import type { SolverRun } from './solver-first-call';

const root = fileURLToPath(new URL('../../', import.meta.url));
const DRIVER = join(root, 'test', 'bench', 'solver-first-call.ts');
const SOURCE = join(root, 'test', 'bench', 'reference', 'label-correcting.cpp');
/** Fresh processes per family; the first-call figure is their median. */
const PROCESSES = 5;
const REFERENCE_RUNS = 7;
/** The issue's target: the first call within this factor of the C++ reference. */
const TARGET_RATIO = 2.5;

interface ReferenceRun {
  wallMs: number[];
  cpuMs: number[];
  checksum: string;
  loops: number;
  relaxations: number;
  scans: number;
}

export function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/** Compiles the reference into `folder`; null (and the reason) when g++ is missing or fails. */
function buildReference(folder: string): { binary: string | null; why: string } {
  const binary = join(folder, 'label-correcting');
  const built = spawnSync('g++', ['-O2', '-std=c++17', '-o', binary, SOURCE], { encoding: 'utf8' });
  if (built.error && (built.error as NodeJS.ErrnoException).code === 'ENOENT') return { binary: null, why: 'C++ reference skipped: g++ not found' };
  if (built.status !== 0) return { binary: null, why: `C++ reference skipped: g++ failed: ${(built.stderr || '').split('\n')[0]}` };
  return { binary, why: '' };
}

function runDriver(family: string, write: string | null): SolverRun {
  const args = ['--expose-gc', '--import', 'tsx', DRIVER, family, ...(write ? ['--write', write] : [])];
  const child = spawnSync(process.execPath, args, { cwd: root, encoding: 'utf8', maxBuffer: 1 << 24 });
  if (child.status !== 0) throw new Error(`first-call driver failed on ${family}: ${child.stderr}`);
  return JSON.parse(child.stdout.trim().split('\n').pop()!) as SolverRun;
}

// The solver's functions, as V8's --trace-deopt names them.
const SOLVER_FUNCTIONS = /<JSFunction (labelCorrect|scanUntilLoop|markUnbounded|markSeeds|takeLoop|enqueue|linkAfter|recordLoop|Labels) /;

/** Deopts of the solver's functions during the first call, from a fresh process run with --trace-deopt (independent of machine load). */
function firstCallDeopts(family: string): number {
  const args = ['--expose-gc', '--trace-deopt', '--import', 'tsx', DRIVER, family, '--warm', '0'];
  const child = spawnSync(process.execPath, args, { cwd: root, encoding: 'utf8', maxBuffer: 1 << 26 });
  if (child.status !== 0) throw new Error(`first-call driver failed on ${family}: ${child.stderr}`);
  return child.stdout.split('\n').filter((line) => line.startsWith('[bailout (kind: deopt') && SOLVER_FUNCTIONS.test(line)).length;
}

function runReference(binary: string, file: string): ReferenceRun {
  const child = spawnSync(binary, [file, String(REFERENCE_RUNS)], { encoding: 'utf8' });
  if (child.status !== 0) throw new Error(`C++ reference failed: ${child.stderr}`);
  return JSON.parse(child.stdout) as ReferenceRun;
}

const ms = (x: number) => `${x.toFixed(1)} ms`;

/** Records, per family, the first call and the warm median of labelCorrect beside the C++ reference. */
export function firstCallFigures(record: (figure: BenchFigure) => void): void {
  const folder = mkdtempSync(join(tmpdir(), 'lanewright-bench-solver-'));
  try {
    const { binary, why } = buildReference(folder);
    if (!binary) process.stderr.write(`  ${why}\n`);
    for (const family of Object.keys(SOLVER_FAMILIES)) {
      const file = join(folder, 'network.bin');
      const runs: SolverRun[] = [];
      for (let i = 0; i < PROCESSES; i++) runs.push(runDriver(family, i === 0 && binary ? file : null));
      const reference = binary ? runReference(binary, file) : null;
      const deopts = firstCallDeopts(family);
      rmSync(file, { force: true });

      const first = median(runs.map((r) => r.firstMs));
      const firstCpu = median(runs.map((r) => r.firstCpuMs));
      const warm = median(runs.flatMap((r) => r.warmMs));
      const warmCpu = median(runs.flatMap((r) => r.warmCpuMs));
      const run = runs[0];
      const sizes =
        `${run.depots} depots, ${run.lanes} lanes (${run.rebateLanes} with a net rebate); ${run.loops} loop(s) met, ${run.relaxations} relaxations; ` +
        `${deopts} deopt(s) of the solver during the first call (--trace-deopt)`;
      const agreeRuns = runs.every((r) => r.checksum === run.checksum);
      record({ case: `${family}: solver deopts during the first call`, engine: deopts, unit: 'count', note: 'from node --trace-deopt in a fresh process; independent of machine load' });
      if (!reference) {
        record({ case: `${family}: solver first call (fresh process)`, engine: first, unit: 'ms', note: `${sizes}; ${why}` });
        record({ case: `${family}: solver warm median`, engine: warm, unit: 'ms' });
        continue;
      }
      const cpp = median(reference.wallMs);
      const cppCpu = median(reference.cpuMs);
      const agree = agreeRuns && reference.checksum === run.checksum;
      const check = agree
        ? `checksum agrees with C++ (${run.checksum})${reference.relaxations === run.relaxations ? ', same relaxations' : `, relaxations ${reference.relaxations} in C++`}`
        : `checksum DIFFERS: Lanewright ${runs.map((r) => r.checksum).join(' / ')}, C++ ${reference.checksum}`;
      record({
        case: `${family}: solver first call (fresh process) vs C++`,
        engine: first,
        baseline: cpp,
        unit: 'ms',
        target: TARGET_RATIO * cpp,
        note:
          `${sizes}; first call ${(first / cpp).toFixed(2)}x C++ wall, ${(firstCpu / cppCpu).toFixed(2)}x CPU ` +
          `(first call ${ms(first)} wall / ${ms(firstCpu)} CPU, median of ${PROCESSES} processes, runs ${runs.map((r) => r.firstMs.toFixed(1)).join(', ')}; ` +
          `C++ median of ${REFERENCE_RUNS} solves ${ms(cpp)} wall / ${ms(cppCpu)} CPU, its first ${ms(reference.wallMs[0])}); ${check}`,
      });
      // The same comparison in CPU time, less disturbed on a busy machine. Lanewright's includes V8's
      // compiler and GC threads during the call; the reference has one thread.
      record({
        case: `${family}: solver first call CPU vs C++ CPU`,
        engine: firstCpu,
        baseline: cppCpu,
        unit: 'ms',
        target: TARGET_RATIO * cppCpu,
        note: `first call ${(firstCpu / cppCpu).toFixed(2)}x C++ CPU; CPU runs ${runs.map((r) => r.firstCpuMs.toFixed(1)).join(', ')}`,
      });
      record({
        case: `${family}: solver warm median vs C++`,
        engine: warm,
        baseline: cpp,
        unit: 'ms',
        note: `warm ${(warm / cpp).toFixed(2)}x C++ wall, ${(warmCpu / cppCpu).toFixed(2)}x CPU (warm median ${ms(warmCpu)} CPU over ${runs.reduce((k, r) => k + r.warmMs.length, 0)} calls after the first)`,
      });
    }
  } finally {
    rmSync(folder, { recursive: true, force: true });
  }
}
