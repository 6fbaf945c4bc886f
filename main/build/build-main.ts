// Bundles the Electron main process and the preload into dist/main/*.cjs with esbuild. Electron runs
// JavaScript only; one CommonJS file each keeps start-up fast, and the sandboxed preload may only
// require('electron'), so everything else it uses must be inlined.

import { copyFileSync, existsSync, mkdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { build, type Metafile } from 'esbuild';

/** Repository root (two folders above this file). */
export const REPO_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

/** Output folder of the bundles; package.json "main" points at main.cjs inside it. */
export const MAIN_OUT_DIR = path.join(REPO_ROOT, 'dist', 'main');

/** Modules each bundle may still require at run time. */
export interface BundleImports {
  main: string[];
  preload: string[];
}

/** Builds dist/main/main.cjs and dist/main/preload.cjs; returns what each bundle requires at run time. */
export async function buildMain(outDir: string = MAIN_OUT_DIR): Promise<BundleImports> {
  const common = {
    bundle: true,
    format: 'cjs' as const,
    // Electron 41 ships Chromium 146 and Node 24.
    target: ['node22', 'chrome140'],
    external: ['electron'],
    sourcemap: true,
    logLevel: 'warning' as const,
    metafile: true,
    outdir: outDir,
    outExtension: { '.js': '.cjs' },
    absWorkingDir: REPO_ROOT,
    define: { 'process.env.NODE_ENV': '"production"' },
  };
  const [mainResult, preloadResult] = await Promise.all([
    build({ ...common, platform: 'node', entryPoints: { main: path.join(REPO_ROOT, 'main/electron/main.ts') } }),
    build({ ...common, platform: 'browser', entryPoints: { preload: path.join(REPO_ROOT, 'main/preload/preload.ts') } }),
  ]);
  // The window icon (Linux, Windows) sits beside main.cjs so it is inside the packaged app too.
  const icon = path.join(REPO_ROOT, 'build', 'icon.png');
  if (existsSync(icon)) {
    mkdirSync(outDir, { recursive: true });
    copyFileSync(icon, path.join(outDir, 'icon.png'));
  }
  return { main: runtimeImports(mainResult.metafile), preload: runtimeImports(preloadResult.metafile) };
}

function runtimeImports(metafile: Metafile | undefined): string[] {
  const names = new Set<string>();
  for (const output of Object.values(metafile?.outputs ?? {})) {
    for (const imported of output.imports) if (imported.external) names.add(imported.path);
  }
  return [...names].sort();
}

// Run directly: `node --import tsx main/build/build-main.ts`.
if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const imports = await buildMain();
  const strays = imports.preload.filter((name) => name !== 'electron');
  if (strays.length > 0) {
    process.stderr.write(`build-main: the sandboxed preload may only require electron, but requires ${strays.join(', ')}\n`);
    process.exitCode = 1;
  } else {
    process.stdout.write(`build-main: wrote ${path.relative(REPO_ROOT, MAIN_OUT_DIR)}/main.cjs and preload.cjs\n`);
  }
}
