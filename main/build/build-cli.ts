// Bundles the `lanewright` command into dist/cli with esbuild, so it starts in a fraction of the
// time tsx takes to compile the TypeScript sources on every run. Each command is its own chunk
// (code splitting on the lazy imports in run.ts): `--help` loads only the entry. Run by the
// `prepare` script, so `npm install` and `npm ci` build it; main/cli/lanewright.mjs uses it while
// no source it was built from is newer (main/cli/fresh-bundle.mjs), else falls back to tsx.

import { existsSync, mkdirSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { build, type Metafile, type Plugin } from 'esbuild';

/** Repository root (two folders above this file). */
export const REPO_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

/** Output folder of the command's bundle; the launcher looks here. */
export const CLI_OUT_DIR = path.join(REPO_ROOT, 'dist', 'cli');

/** Name of the bundle's entry file inside the output folder. */
export const CLI_ENTRY = 'run.mjs';

/** What the launcher reads to tell whether the bundle is fresh. */
export interface CliManifest {
  entry: string;
  /** Milliseconds since the epoch when the build started: a source changed later makes the bundle stale. */
  builtAt: number;
  /** Source files the bundle was built from, relative to the repository root. */
  inputs: string[];
}

export interface CliBuild {
  manifest: CliManifest;
  /** Sources in the entry and the chunks it imports statically: all that `--help` loads. */
  startupInputs: string[];
}

/**
 * What the start-up files (the entry, the option tables, the parser, the help) take from the engine:
 * errors, cautions and the escaping of shown text. esbuild's code splitting follows every re-export
 * of engine/index.ts, so one `import { CAUTIONS } from '../../engine/index'` would put the whole
 * engine (and zod, turf, papaparse) in the chunk `--help` loads. For these files only, the bundle
 * resolves engine/index to the three engine modules they use; a start-up file that imports anything
 * else from the engine fails the build ("No matching export"), it is never silently slow.
 */
export const STARTUP_FILES = ['main/cli/run.ts', 'main/cli/args.ts', 'main/cli/usage.ts', 'main/cli/terminal-text.ts', 'main/workspace/errors.ts'];
const STARTUP_ENGINE = ['engine/errors.ts', 'engine/text/cautions.ts', 'engine/text/shown-text.ts'];

const startupEngine: Plugin = {
  name: 'startup-engine',
  setup(b) {
    const startup = new Set(STARTUP_FILES.map((f) => path.join(REPO_ROOT, f)));
    const engineIndex = path.join(REPO_ROOT, 'engine', 'index');
    b.onResolve({ filter: /engine\/index$/ }, (args) => {
      if (!startup.has(args.importer) || path.resolve(args.resolveDir, args.path) !== engineIndex) return undefined;
      return { path: 'engine-for-start-up', namespace: 'startup-engine' };
    });
    b.onLoad({ filter: /.*/, namespace: 'startup-engine' }, () => ({
      contents: STARTUP_ENGINE.map((f) => `export * from ${JSON.stringify(path.join(REPO_ROOT, f))};`).join('\n'),
      loader: 'ts',
      resolveDir: REPO_ROOT,
    }));
  },
};

/** Builds the bundle and its manifest (inputs.json) into `outDir`. */
export async function buildCli(outDir: string = CLI_OUT_DIR): Promise<CliBuild> {
  const builtAt = Date.now();
  // Written over the previous build, not after deleting it: a command already running from it may
  // still import its chunks. Chunks no longer part of the bundle are removed afterwards.
  mkdirSync(outDir, { recursive: true });
  const result = await build({
    absWorkingDir: REPO_ROOT,
    // The headroom worker thread's entry sits beside run.mjs, where main/headroom-threads/pool.ts looks for it.
    entryPoints: { run: path.join(REPO_ROOT, 'main/cli/run.ts'), 'headroom-worker': path.join(REPO_ROOT, 'main/headroom-threads/worker.ts') },
    bundle: true,
    splitting: true,
    format: 'esm',
    platform: 'node',
    target: 'node20',
    outdir: outDir,
    outExtension: { '.js': '.mjs' },
    chunkNames: 'chunks/[name]-[hash]',
    // CommonJS dependencies (papaparse) call require() for Node modules; an ES module has none.
    banner: { js: "import { createRequire as __lanewrightRequire } from 'node:module'; const require = __lanewrightRequire(import.meta.url);" },
    metafile: true,
    plugins: [startupEngine],
    logLevel: 'warning',
    define: { 'process.env.NODE_ENV': '"production"' },
  });
  const written = new Set(Object.keys(result.metafile.outputs).map((out) => path.resolve(REPO_ROOT, out)));
  const chunks = path.join(outDir, 'chunks');
  for (const name of existsSync(chunks) ? readdirSync(chunks) : []) {
    if (!written.has(path.join(chunks, name))) rmSync(path.join(chunks, name), { force: true });
  }
  // Real files only: not node_modules, not the plugin's virtual module ("namespace:path").
  const inputs = Object.keys(result.metafile.inputs)
    .filter((input) => !input.includes('node_modules/') && !input.includes(':'))
    .sort();
  const manifest: CliManifest = { entry: CLI_ENTRY, builtAt, inputs };
  writeFileSync(path.join(outDir, 'inputs.json'), JSON.stringify(manifest, null, 1) + '\n');
  return { manifest, startupInputs: startupInputs(result.metafile, path.relative(REPO_ROOT, path.join(outDir, CLI_ENTRY))) };
}

// The sources behind the entry and every chunk reached from it without a dynamic import.
function startupInputs(metafile: Metafile, entry: string): string[] {
  const key = Object.keys(metafile.outputs).find((out) => path.resolve(REPO_ROOT, out) === path.resolve(REPO_ROOT, entry));
  const seen = new Set<string>();
  const inputs = new Set<string>();
  const visit = (out: string) => {
    if (seen.has(out) || !metafile.outputs[out]) return;
    seen.add(out);
    for (const input of Object.keys(metafile.outputs[out].inputs)) if (!input.includes(':')) inputs.add(input);
    for (const imported of metafile.outputs[out].imports) if (imported.kind === 'import-statement' && !imported.external) visit(imported.path);
  };
  if (key) visit(key);
  return [...inputs].sort();
}

// Run directly: `node --import tsx main/build/build-cli.ts` (npm run build:cli, and prepare).
if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const { manifest } = await buildCli();
  process.stdout.write(`build-cli: wrote ${path.relative(REPO_ROOT, CLI_OUT_DIR)}/${manifest.entry} from ${manifest.inputs.length} source files\n`);
}
