// `npm start`: makes sure the desktop runtime, the renderer bundle and the main-process bundles are
// in place, then starts Electron on this folder (package.json "main" = dist/main/main.cjs).

import { spawn, spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { buildMain, REPO_ROOT } from '../build/build-main';
import { electronPackageDir, fetchElectron, installedElectron, runtimeMissingMessage } from './desktop-runtime';
import { isStale } from './freshness';

/** Sources the renderer bundle is built from. */
export const RENDERER_SOURCES = ['renderer', 'engine', 'main/ipc', 'vite.config.ts', 'package.json'].map((p) => path.join(REPO_ROOT, p));
/** The built renderer page. */
export const RENDERER_OUTPUT = path.join(REPO_ROOT, 'dist', 'renderer', 'index.html');

function npmCommand(): string {
  return process.platform === 'win32' ? 'npm.cmd' : 'npm';
}

async function main(): Promise<number> {
  const packageDir = electronPackageDir(REPO_ROOT);
  let binary = installedElectron(packageDir);
  if (!binary) {
    process.stdout.write('Lanewright: fetching the desktop runtime (Electron) for this computer; this happens once...\n');
    mkdirSync(path.join(REPO_ROOT, 'dist'), { recursive: true });
    const outcome = fetchElectron(packageDir, path.join(REPO_ROOT, 'dist', 'electron-install.log'));
    if (!outcome.ok) {
      process.stderr.write(`${runtimeMissingMessage({ ...outcome, logFile: path.relative(REPO_ROOT, outcome.logFile) })}\n`);
      return 1;
    }
    binary = outcome.binary;
  }

  if (await isStale(RENDERER_OUTPUT, RENDERER_SOURCES)) {
    process.stdout.write('Lanewright: building the workspace view (npm run build:renderer)...\n');
    const built = spawnSync(npmCommand(), ['run', '--silent', 'build:renderer'], { cwd: REPO_ROOT, stdio: 'inherit', shell: process.platform === 'win32' });
    if (built.status !== 0) {
      process.stderr.write('Lanewright: building the workspace view failed (see above); `npm run build:renderer` shows the same errors.\n');
      return 1;
    }
  }

  const imports = await buildMain();
  const strays = imports.preload.filter((name) => name !== 'electron');
  if (strays.length > 0) {
    process.stderr.write(`Lanewright: the preload bundle requires ${strays.join(', ')}; a sandboxed preload may only require electron.\n`);
    return 1;
  }

  const env = { ...process.env };
  delete env.ELECTRON_RUN_AS_NODE; // would start Electron as plain Node
  const child = spawn(binary, [REPO_ROOT, ...process.argv.slice(2)], { cwd: REPO_ROOT, stdio: 'inherit', env });
  return new Promise((resolve) => {
    child.on('error', (error) => {
      process.stderr.write(`Lanewright: could not start the desktop runtime: ${error.message}. Run \`npm run web\` to use Lanewright in your browser instead.\n`);
      resolve(1);
    });
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0)));
  });
}

process.exitCode = await main();
