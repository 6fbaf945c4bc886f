import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { spawn } from 'node:child_process';
import { mkdir, mkdtemp, readdir, readFile, rm, stat, writeFile, chmod } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { openAtomicFileStream, writeFileAtomic } from '../../../main/workspace/atomic-write';
import { FileAccessError } from '../../../main/workspace/errors';

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(join(tmpdir(), 'lw-atomic-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('writeFileAtomic', () => {
  it('creates and replaces a file, leaving no temporary file behind', async () => {
    const target = join(dir, 'plan.lwspace.json');
    await writeFileAtomic(target, 'first');
    await writeFileAtomic(target, 'second');
    expect(await readFile(target, 'utf8')).toBe('second');
    expect(await readdir(dir)).toEqual(['plan.lwspace.json']);
  });

  it('keeps the previous file intact when the save fails after writing the temporary file', async () => {
    const target = join(dir, 'plan.json');
    await writeFile(target, 'last good');
    const boom = Object.assign(new Error('no space left on device'), { code: 'ENOSPC' });
    for (const hooks of [{ afterTempWritten: () => Promise.reject(boom) }, { beforeRename: () => Promise.reject(boom) }]) {
      const error = await writeFileAtomic(target, 'half', hooks).catch((e) => e);
      expect(error).toBeInstanceOf(FileAccessError);
      expect(error).toMatchObject({ path: target, operation: 'write', code: 'ENOSPC' });
      expect(await readFile(target, 'utf8')).toBe('last good');
      expect(await readdir(dir)).toEqual(['plan.json']);
    }
  });

  it('removes temporary files left by an earlier interrupted save of the same file, and only those', async () => {
    const target = join(dir, 'plan.json');
    await writeFile(join(dir, '.plan.json.4242.0a1b2c3d.tmp'), 'half');
    await writeFile(join(dir, '.other.json.4242.0a1b2c3d.tmp'), 'someone else');
    await writeFile(join(dir, '.plan.json.notes'), 'keep');
    await writeFileAtomic(target, 'whole');
    expect((await readdir(dir)).sort()).toEqual(['.other.json.4242.0a1b2c3d.tmp', '.plan.json.notes', 'plan.json']);
  });

  it('lets two saves of the same file run side by side: neither takes the other for a leftover', async () => {
    const target = join(dir, 'plan.json');
    let releaseSecond!: () => void;
    const secondWaits = new Promise<void>((resolve) => (releaseSecond = resolve));
    // The second save has written its temporary file when the first one finishes and tidies up.
    let reached!: () => void;
    const atHook = new Promise<void>((resolve) => (reached = resolve));
    const second = writeFileAtomic(target, 'second', { afterTempWritten: () => (reached(), secondWaits) });
    await atHook;
    await writeFileAtomic(target, 'first');
    releaseSecond();
    await second;
    expect(await readFile(target, 'utf8')).toBe('second');
    expect(await readdir(dir)).toEqual(['plan.json']);
  });

  it('reports a missing folder as FileAccessError with ENOENT', async () => {
    const target = join(dir, 'no-such-folder', 'plan.json');
    await expect(writeFileAtomic(target, 'x')).rejects.toMatchObject({ name: 'FileAccessError', code: 'ENOENT', path: target });
  });

  it.runIf(process.platform !== 'win32')('keeps the permission bits of the file it replaces', async () => {
    const target = join(dir, 'plan.json');
    await writeFile(target, 'old');
    await chmod(target, 0o600);
    await writeFileAtomic(target, 'new');
    expect((await stat(target)).mode & 0o777).toBe(0o600);
  });

  it('never leaves a torn file when the writing process is killed mid-save (SIGKILL)', async () => {
    const target = join(dir, 'big.json');
    const child = fileURLToPath(new URL('./atomic-writer-child.ts', import.meta.url));
    for (let round = 0; round < 3; round++) {
      const proc = spawn(process.execPath, ['--import', 'tsx', child, target], { stdio: ['ignore', 'pipe', 'inherit'] });
      let saves = 0;
      await new Promise<void>((resolve) => {
        proc.stdout.on('data', (chunk: Buffer) => {
          saves += chunk.toString().split('\n').filter((l) => l.startsWith('saved')).length;
          // Kill at a different point of a save each round: after 2, 3 or 4 completed saves plus a delay.
          if (saves >= 2 + round) setTimeout(() => proc.kill('SIGKILL'), 3 * round);
        });
        proc.on('exit', () => resolve());
      });
      const parsed = JSON.parse(await readFile(target, 'utf8'));
      expect(parsed.end).toBe(parsed.version);
      expect(parsed.filler).toHaveLength(1024 * 1024);
      expect(parsed.version).toBeGreaterThanOrEqual(2 + round);
    }
  });
});

describe('openAtomicFileStream', () => {
  it('writes pieces to a temporary file; the target changes only on commit', async () => {
    const target = join(dir, 'routes.csv');
    await writeFile(target, 'last good');
    const stream = openAtomicFileStream(target);
    stream.write('id,cost\r\n');
    stream.write('A,1.00\r\n');
    expect(await readFile(target, 'utf8')).toBe('last good');
    expect((await readdir(dir)).length).toBe(2);
    await stream.commit();
    expect(await readFile(target, 'utf8')).toBe('id,cost\r\nA,1.00\r\n');
    expect(await readdir(dir)).toEqual(['routes.csv']);
  });

  it('abort removes the temporary file and leaves the previous file intact', async () => {
    const target = join(dir, 'routes.csv');
    await writeFile(target, 'last good');
    const stream = openAtomicFileStream(target);
    stream.write('half');
    stream.abort();
    stream.abort();
    expect(await readFile(target, 'utf8')).toBe('last good');
    expect(await readdir(dir)).toEqual(['routes.csv']);
  });

  it('a rename that fails is a FileAccessError naming the target, with no temporary file left', async () => {
    const target = join(dir, 'taken');
    await mkdir(target);
    const stream = openAtomicFileStream(target);
    stream.write('text');
    const error = await stream.commit().catch((e) => e);
    expect(error).toBeInstanceOf(FileAccessError);
    expect(error).toMatchObject({ path: target, operation: 'write' });
    expect(await readdir(dir)).toEqual(['taken']);
  });
});
