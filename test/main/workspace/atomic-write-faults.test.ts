// Atomic save, deterministically: a file-system seam fails each call of a save in turn (open,
// write, fsync, close, rename, folder sync, listing) and after every one the target holds either the
// last good text or the whole new text, never part of it, and no temporary file is left. The same
// check run against a writer that writes in place finds the torn file, so it can fail.
// Also: a save over a symbolic link writes through to the linked file, a read-only file is refused.

import { chmod, lstat, mkdtemp, readdir, readFile, readlink, rm, symlink, writeFile, mkdir } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { NODE_ATOMIC_FS, writeFileAtomic, type AtomicWriteFs, type AtomicWriteHandle } from '../../../main/workspace/atomic-write';
import { FileAccessError } from '../../../main/workspace/errors';

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(join(tmpdir(), 'lw-atomic-faults-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

const LAST_GOOD = 'last good\n'.repeat(1000);
const NEW_TEXT = 'new version\n'.repeat(1000);

/** A file system whose `failAt`-th call (0-based, in call order) fails; a failing write writes half first. */
function faultyFs(failAt: number, calls: string[]): AtomicWriteFs {
  const step = (name: string) => {
    calls.push(name);
    if (calls.length - 1 === failAt) throw Object.assign(new Error(`injected failure at ${name}`), { code: 'EIO' });
  };
  const wrapHandle = (handle: AtomicWriteHandle): AtomicWriteHandle => ({
    async writeFile(text, encoding) {
      if (calls.length === failAt) {
        calls.push('write');
        await handle.writeFile(text.slice(0, text.length >> 1), encoding);
        throw Object.assign(new Error('injected failure mid-write'), { code: 'ENOSPC' });
      }
      step('write');
      return handle.writeFile(text, encoding);
    },
    async sync() {
      step('fsync');
      return handle.sync();
    },
    async close() {
      // Close always closes (the descriptor must not leak), then reports the failure.
      await handle.close();
      step('close');
    },
  });
  return {
    lstat: async (p) => (step('lstat'), NODE_ATOMIC_FS.lstat(p)),
    readlink: async (p) => (step('readlink'), NODE_ATOMIC_FS.readlink(p)),
    open: async (p, flags, mode) => (step(`open ${flags}`), wrapHandle(await NODE_ATOMIC_FS.open(p, flags, mode))),
    rename: async (a, b) => (step('rename'), NODE_ATOMIC_FS.rename(a, b)),
    unlink: async (p) => NODE_ATOMIC_FS.unlink(p),
    readdir: async (p) => (step('readdir'), NODE_ATOMIC_FS.readdir(p)),
  };
}

type Writer = (target: string, text: string, fs: AtomicWriteFs) => Promise<void>;

/** Runs `writer` with a failure injected at every call in turn; returns what went wrong, if anything. */
async function faultCheck(writer: Writer): Promise<{ steps: string[]; problems: string[] }> {
  const target = join(dir, 'routes.csv');
  const steps: string[] = [];
  const problems: string[] = [];
  for (let failAt = 0; ; failAt++) {
    await writeFile(target, LAST_GOOD);
    const calls: string[] = [];
    const outcome = await writer(target, NEW_TEXT, faultyFs(failAt, calls)).then(
      () => 'ok',
      (error: unknown) => (error instanceof FileAccessError ? 'refused' : `other error ${String(error)}`),
    );
    const text = await readFile(target, 'utf8');
    const where = calls[failAt] ?? '(no failure: every call passed)';
    if (failAt < calls.length) steps.push(where);
    if (text !== LAST_GOOD && text !== NEW_TEXT) problems.push(`failure at ${where}: torn file (${text.length} chars)`);
    if (outcome === 'refused' && text !== LAST_GOOD) problems.push(`failure at ${where}: refused but the file changed`);
    if (outcome.startsWith('other')) problems.push(`failure at ${where}: ${outcome}`);
    const left = (await readdir(dir)).filter((f) => f !== 'routes.csv');
    if (left.length > 0) problems.push(`failure at ${where}: left ${left.join(', ')}`);
    if (failAt >= calls.length) return { steps, problems };
  }
}

describe('writeFileAtomic under injected file-system failures', () => {
  it('keeps the last good file (or the whole new one) after a failure at every step', async () => {
    const { steps, problems } = await faultCheck((target, text, fs) => writeFileAtomic(target, text, {}, fs));
    expect(problems).toEqual([]);
    // The save's steps, each failed once: every one of write, fsync and rename was reached.
    for (const step of ['open wx', 'write', 'fsync', 'close', 'rename']) expect(steps).toContain(step);
  });

  it('the same check finds the torn file a writer that writes in place leaves', async () => {
    const inPlace: Writer = async (target, text, fs) => {
      const handle = await fs.open(target, 'w');
      try {
        await handle.writeFile(text, 'utf8');
        await handle.sync();
      } finally {
        await handle.close();
      }
    };
    const { problems } = await faultCheck(inPlace);
    expect(problems.some((p) => p.includes('torn file'))).toBe(true);
  });
});

describe('writeFileAtomic through links and onto read-only files', () => {
  it('writes through a symbolic link (and a chain of them) to the linked file, keeping the links', async () => {
    await mkdir(join(dir, 'data'));
    const real = join(dir, 'data', 'routes.csv');
    await writeFile(real, 'old');
    await symlink('data/routes.csv', join(dir, 'link.csv'));
    await symlink(join(dir, 'link.csv'), join(dir, 'link2.csv'));
    await writeFileAtomic(join(dir, 'link2.csv'), 'new');
    expect(await readFile(real, 'utf8')).toBe('new');
    expect((await lstat(join(dir, 'link.csv'))).isSymbolicLink()).toBe(true);
    expect((await lstat(join(dir, 'link2.csv'))).isSymbolicLink()).toBe(true);
    expect(await readlink(join(dir, 'link.csv'))).toBe('data/routes.csv');
    expect((await readdir(join(dir, 'data')))).toEqual(['routes.csv']);
  });

  it('a dangling link creates the file it names', async () => {
    await symlink('made.csv', join(dir, 'dangling.csv'));
    await writeFileAtomic(join(dir, 'dangling.csv'), 'made');
    expect(await readFile(join(dir, 'made.csv'), 'utf8')).toBe('made');
    expect((await lstat(join(dir, 'dangling.csv'))).isSymbolicLink()).toBe(true);
  });

  it('a link loop is refused with ELOOP', async () => {
    await symlink('b.csv', join(dir, 'a.csv'));
    await symlink('a.csv', join(dir, 'b.csv'));
    await expect(writeFileAtomic(join(dir, 'a.csv'), 'x')).rejects.toMatchObject({ name: 'FileAccessError', code: 'ELOOP' });
  });

  it.runIf(process.platform !== 'win32')('refuses a read-only file, even through a link, and leaves it as it was', async () => {
    const target = join(dir, 'locked.csv');
    await writeFile(target, 'keep');
    await chmod(target, 0o444);
    await symlink('locked.csv', join(dir, 'to-locked.csv'));
    for (const path of [target, join(dir, 'to-locked.csv')]) {
      const error = await writeFileAtomic(path, 'overwrite').catch((e) => e);
      expect(error).toBeInstanceOf(FileAccessError);
      expect(error).toMatchObject({ path, code: 'EACCES', reason: 'the file is read-only' });
    }
    expect(await readFile(target, 'utf8')).toBe('keep');
    expect(await readdir(dir)).toEqual(['locked.csv', 'to-locked.csv']);
  });
});
