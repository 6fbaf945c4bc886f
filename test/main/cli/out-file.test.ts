// --out through a symbolic link writes the linked file and keeps the link; --out onto a read-only
// file is refused in one line (exit 1) and the file is left as it was.

import { chmodSync, lstatSync, readFileSync, symlinkSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli, tempFiles } from './cli-harness';

const SAMPLE = ['--depots', 'sample-data/depots.csv', '--lanes', 'sample-data/lanes.csv', '--date', '2026-06-01', '--from', 'RTM'];

describe('--out', () => {
  it('writes through a symbolic link', async () => {
    const dir = tempFiles({ 'real.csv': 'old' });
    symlinkSync('real.csv', join(dir, 'link.csv'));
    const r = await runCli(['routes', ...SAMPLE, '--out', join(dir, 'link.csv')]);
    expect(r.status).toBe(0);
    expect(lstatSync(join(dir, 'link.csv')).isSymbolicLink()).toBe(true);
    expect(readFileSync(join(dir, 'real.csv'), 'utf8')).toMatch(/^id,name,status,cost/);
  });

  it.runIf(process.platform !== 'win32')('refuses a read-only file with one line', async () => {
    const dir = tempFiles({});
    const target = join(dir, 'locked.csv');
    writeFileSync(target, 'keep');
    chmodSync(target, 0o444);
    const r = await runCli(['routes', ...SAMPLE, '--out', target]);
    expect(r.status).toBe(1);
    // Refused before any work: the one line is all there is.
    expect(r.stderr.trim().split('\n')).toEqual([`lanewright: ${target}: cannot write: the file is read-only`]);
    expect(readFileSync(target, 'utf8')).toBe('keep');
  });
});
