// Runs the command line in-process for tests: captures stdout and stderr, and writes input files
// into a fresh temporary folder.

import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { vi } from 'vitest';
import { main } from '../../../main/cli/run';

export async function runCli(argv: string[]): Promise<{ status: number; stdout: string; stderr: string }> {
  let stdout = '';
  let stderr = '';
  const out = vi.spyOn(process.stdout, 'write').mockImplementation((chunk: string | Uint8Array) => ((stdout += String(chunk)), true));
  const err = vi.spyOn(process.stderr, 'write').mockImplementation((chunk: string | Uint8Array) => ((stderr += String(chunk)), true));
  try {
    const status = await main(argv);
    return { status, stdout, stderr };
  } finally {
    out.mockRestore();
    err.mockRestore();
  }
}

/** Writes files (name -> text) into a new temporary folder; returns the folder. */
export function tempFiles(files: Record<string, string>): string {
  const dir = mkdtempSync(join(tmpdir(), 'lanewright-cli-'));
  for (const [name, text] of Object.entries(files)) writeFileSync(join(dir, name), text, 'utf8');
  return dir;
}
