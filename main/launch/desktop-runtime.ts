// Finds the Electron binary for `npm start`. npm here is told not to run Electron's download step
// at install time (package.json "allowScripts"), so the first start fetches it, as Electron's own
// install script does; when that fails, the caller points the user at `npm run web`.

import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';

/** Where the electron package lives. */
export function electronPackageDir(repoRoot: string): string {
  return path.join(repoRoot, 'node_modules', 'electron');
}

/** Path of the Electron executable when it is installed, else null. */
export function installedElectron(packageDir: string): string | null {
  const pathFile = path.join(packageDir, 'path.txt');
  if (!existsSync(pathFile)) return null;
  const binary = path.join(packageDir, 'dist', readFileSync(pathFile, 'utf8').trim());
  return existsSync(binary) ? binary : null;
}

/** Result of trying to fetch the runtime. */
export type FetchOutcome = { ok: true; binary: string } | { ok: false; reason: string; logFile: string };

/**
 * Runs Electron's own install script (which downloads the binary for this platform), with a time
 * limit, logging its output to `logFile` rather than the console.
 */
export function fetchElectron(packageDir: string, logFile: string, timeoutMs = 180_000): FetchOutcome {
  const script = path.join(packageDir, 'install.js');
  if (!existsSync(script)) return { ok: false, reason: 'the electron package is not installed (run npm install)', logFile };
  const run = spawnSync(process.execPath, [script], { cwd: packageDir, encoding: 'utf8', timeout: timeoutMs, env: { ...process.env } });
  try {
    writeFileSync(logFile, `${run.stdout ?? ''}${run.stderr ?? ''}${run.error ? String(run.error) : ''}`);
  } catch {
    // The log is a courtesy; the outcome below is what matters.
  }
  const binary = installedElectron(packageDir);
  if (run.status === 0 && binary) return { ok: true, binary };
  const reason = run.error ? (run.error as NodeJS.ErrnoException).code === 'ETIMEDOUT' ? 'the download timed out' : run.error.message : firstErrorLine(`${run.stderr ?? ''}`) ?? `the install script exited with status ${run.status}`;
  return { ok: false, reason, logFile };
}

function firstErrorLine(text: string): string | null {
  const line = text.split('\n').map((l) => l.trim()).find((l) => /error/i.test(l));
  return line ? line.replace(/^(Request)?Error:\s*/i, '').slice(0, 160) : null;
}

/** The one line printed when the runtime is missing and cannot be fetched. */
export function runtimeMissingMessage(outcome: { reason: string; logFile: string }): string {
  return `Lanewright: the desktop runtime (Electron) could not be downloaded (${outcome.reason}; details in ${outcome.logFile}). Run \`npm run web\` to use Lanewright in your browser instead.`;
}
