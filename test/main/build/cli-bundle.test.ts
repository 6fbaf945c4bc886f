// The prebuilt bundle of the `lanewright` command: built into a temporary folder, it gives the same
// help and the same routes output as the TypeScript sources, and the
// launcher's freshness check refuses a bundle older than its sources or missing a manifest.

import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildCli, REPO_ROOT, type CliBuild } from '../../../main/build/build-cli';
import { freshBundle } from '../../../main/cli/fresh-bundle.mjs';
import { COMMANDS } from '../../../main/cli/run';
import { overview } from '../../../main/cli/usage';
import { runCli } from '../cli/cli-harness';

let outDir: string;
let built: CliBuild;

beforeAll(async () => {
  outDir = mkdtempSync(join(tmpdir(), 'lw-cli-bundle-'));
  built = await buildCli(outDir);
}, 120_000);
afterAll(() => rmSync(outDir, { recursive: true, force: true }));

/** Runs the bundle's `main` in a fresh Node process, as the launcher would. */
function runBundle(...args: string[]) {
  const entry = pathToFileURL(join(outDir, built.manifest.entry)).href;
  const script = `const { main } = await import(${JSON.stringify(entry)}); process.exitCode = await main(${JSON.stringify(args)});`;
  const result = spawnSync(process.execPath, ['--input-type=module', '-e', script], { cwd: REPO_ROOT, encoding: 'utf8', timeout: 60_000 });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

describe('lanewright bundle', () => {
  it('lists its sources in the manifest, the command and the engine among them', () => {
    expect(built.manifest.inputs).toContain('main/cli/run.ts');
    expect(built.manifest.inputs).toContain('engine/report/routes-report.ts');
    expect(built.manifest.inputs.every((input) => !input.includes('node_modules'))).toBe(true);
  });

  it('loads no engine code for the help beyond errors, cautions and shown text; each command is its own chunk', () => {
    const startup = built.startupInputs;
    expect(startup.filter((input) => input.startsWith('engine/'))).toEqual(['engine/errors.ts', 'engine/text/cautions.ts', 'engine/text/shown-text.ts']);
    expect(startup.some((input) => input.includes('node_modules'))).toBe(false);
    expect(startup).toContain('main/cli/commands/routes.ts');
    expect(startup.some((input) => input.endsWith('-run.ts') || input.endsWith('load-network.ts'))).toBe(false);
    expect(built.manifest.inputs).toContain('main/cli/commands/routes-run.ts');
  });

  it('prints the same help as the sources, and the same routes CSV', async () => {
    const help = runBundle('--help');
    expect(help.status).toBe(0);
    expect(help.stdout).toBe(overview(COMMANDS));
    const args = ['routes', '--depots', 'sample-data/depots.csv', '--lanes', 'sample-data/lanes.csv', '--from', 'RTM', '--to', 'PAR,ANR', '--date', '2026-06-01'];
    const fromBundle = runBundle(...args);
    const fromSources = await runCli(args);
    expect(fromBundle.status).toBe(0);
    expect(fromBundle.stdout).toBe(fromSources.stdout);
    expect(fromBundle.stdout).toMatch(/^id,name,status,cost/);
  });

  it('gives one-line errors with the usual exit codes', () => {
    const unknown = runBundle('reroute');
    expect(unknown.status).toBe(2);
    expect(unknown.stderr.trim().split('\n')).toHaveLength(1);
    const missing = runBundle('routes', '--depots', 'sample-data/depots.csv', '--lanes', 'no-such.csv', '--from', 'RTM');
    expect(missing.status).toBe(1);
    expect(missing.stderr).toContain('no-such.csv');
    expect(missing.stderr).not.toMatch(/^\s+at /m);
  });

  it('is fresh right after its build, stale once a source is newer, and never without a manifest', () => {
    expect(freshBundle(REPO_ROOT, outDir)).toBe(join(outDir, built.manifest.entry));
    const copy = mkdtempSync(join(tmpdir(), 'lw-cli-manifest-'));
    try {
      writeFileSync(join(copy, built.manifest.entry), '');
      const manifest = (builtAt: number, inputs = built.manifest.inputs) => writeFileSync(join(copy, 'inputs.json'), JSON.stringify({ ...built.manifest, builtAt, inputs }));
      // Built before every source was last written: stale.
      manifest(0);
      expect(freshBundle(REPO_ROOT, copy)).toBeNull();
      manifest(Date.now() + 60_000);
      expect(freshBundle(REPO_ROOT, copy)).toBe(join(copy, built.manifest.entry));
      // A source the bundle was built from is gone.
      manifest(Date.now() + 60_000, [...built.manifest.inputs, 'main/cli/removed.ts']);
      expect(freshBundle(REPO_ROOT, copy)).toBeNull();
      rmSync(join(copy, 'inputs.json'));
      expect(freshBundle(REPO_ROOT, copy)).toBeNull();
    } finally {
      rmSync(copy, { recursive: true, force: true });
    }
  });

  it('the launcher prints the help whichever way it runs', () => {
    const launcher = fileURLToPath(new URL('../../../main/cli/lanewright.mjs', import.meta.url));
    const result = spawnSync(process.execPath, [launcher, '--help'], { cwd: REPO_ROOT, encoding: 'utf8', timeout: 60_000 });
    expect(result.status).toBe(0);
    expect(result.stdout).toBe(overview(COMMANDS));
  });
});
