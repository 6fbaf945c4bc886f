// Writes a file so that a crash, power cut or full disk mid-save never leaves a half-written file:
// the text goes to a temporary file in the same folder, is flushed to disk (fsync), and only then
// renamed over the target, which every supported OS does atomically within one file system.

import { randomBytes } from 'node:crypto';
import { closeSync, fsyncSync, lstatSync, openSync, readlinkSync, unlinkSync, writeSync } from 'node:fs';
import * as nodeFs from 'node:fs/promises';
import { rename } from 'node:fs/promises';
import { basename, dirname, join, resolve } from 'node:path';
import { FileAccessError, fileAccessError } from './errors';

/** Test seam: called between the steps, so tests can fail a save at each point. */
export interface AtomicWriteHooks {
  afterTempWritten?(tempPath: string): Promise<void> | void;
  beforeRename?(tempPath: string): Promise<void> | void;
}

/** An open temporary file: the three calls a save makes on it. */
export interface AtomicWriteHandle {
  writeFile(text: string, encoding: 'utf8'): Promise<void>;
  sync(): Promise<void>;
  close(): Promise<void>;
}

/**
 * The file-system calls a save makes, in one seam: tests pass a wrapper that fails any one of
 * them (write, fsync, rename, ...) and check the last good file is intact after each.
 */
export interface AtomicWriteFs {
  lstat(path: string): Promise<{ mode: number; isSymbolicLink(): boolean; isFile(): boolean }>;
  readlink(path: string): Promise<string>;
  open(path: string, flags: string, mode?: number): Promise<AtomicWriteHandle>;
  rename(from: string, to: string): Promise<void>;
  unlink(path: string): Promise<void>;
  readdir(path: string): Promise<string[]>;
}

/** The real file system. */
export const NODE_ATOMIC_FS: AtomicWriteFs = {
  lstat: (path) => nodeFs.lstat(path),
  readlink: (path) => nodeFs.readlink(path),
  open: (path, flags, mode) => nodeFs.open(path, flags, mode),
  rename: (from, to) => nodeFs.rename(from, to),
  unlink: (path) => nodeFs.unlink(path),
  readdir: (path) => nodeFs.readdir(path),
};

// Temporary files of saves still running in this process: another save of the same file must not
// take them for leftovers of a crash (two quick Save commands run side by side).
const inFlight = new Set<string>();

/** Name of the temporary file for `target`: hidden, same folder, unique per attempt. */
export function temporaryPathFor(target: string): string {
  return join(dirname(target), `.${basename(target)}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
}

/** Links followed before giving up, as the kernel does (Linux MAXSYMLINKS). */
const MAX_LINKS = 40;

/**
 * The file a save must replace: `target`, or the file its symbolic link(s) lead to, so a save over a
 * link updates the linked file and keeps the link (renaming over the link would replace the link).
 * A dangling link leads to the file it names, which the save creates.
 */
async function resolveTarget(target: string, fs: AtomicWriteFs): Promise<{ path: string; mode: number | null }> {
  let path = resolve(target);
  for (let links = 0; ; links++) {
    let info;
    try {
      info = await fs.lstat(path);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return { path, mode: null };
      throw error;
    }
    if (!info.isSymbolicLink()) return { path, mode: info.mode & 0o777 };
    if (links >= MAX_LINKS) throw Object.assign(new Error('too many levels of symbolic links'), { code: 'ELOOP' });
    path = resolve(dirname(path), await fs.readlink(path));
  }
}

/**
 * The file a save of `target` replaces (links followed) and the permission bits it keeps; a
 * FileAccessError when it cannot be written. Commands call it before working, so a read-only
 * --out is refused before anything runs, as the shell refuses `>` into it.
 */
export async function writableTarget(target: string, fs: AtomicWriteFs = NODE_ATOMIC_FS): Promise<{ path: string; mode: number }> {
  try {
    const resolved = await resolveTarget(target, fs);
    if (resolved.mode === null) return { path: resolved.path, mode: 0o644 };
    // No write bit for anyone: read-only, refused even where the process could override it (root).
    if ((resolved.mode & 0o222) === 0) throw new FileAccessError(target, 'write', 'EACCES', 'the file is read-only');
    return { path: resolved.path, mode: resolved.mode };
  } catch (error) {
    throw fileAccessError(target, 'write', error);
  }
}

/** `writableTarget` for callers that must stay synchronous (openAtomicFileStream). */
export function writableTargetSync(target: string): { path: string; mode: number } {
  try {
    let path = resolve(target);
    for (let links = 0; ; links++) {
      let info;
      try {
        info = lstatSync(path);
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code === 'ENOENT') return { path, mode: 0o644 };
        throw error;
      }
      if (!info.isSymbolicLink()) {
        const mode = info.mode & 0o777;
        if ((mode & 0o222) === 0) throw new FileAccessError(target, 'write', 'EACCES', 'the file is read-only');
        return { path, mode };
      }
      if (links >= MAX_LINKS) throw Object.assign(new Error('too many levels of symbolic links'), { code: 'ELOOP' });
      path = resolve(dirname(path), readlinkSync(path));
    }
  } catch (error) {
    throw fileAccessError(target, 'write', error);
  }
}

/**
 * Replaces `target` with `text` (UTF-8) atomically. The previous file keeps its permission bits; a
 * symbolic link is written through to its file; a read-only file is refused, as the shell refuses
 * `>` into it. On any failure the temporary file is removed, the previous file is untouched, and a
 * FileAccessError naming `target` is thrown.
 */
export async function writeFileAtomic(target: string, text: string, hooks: AtomicWriteHooks = {}, fs: AtomicWriteFs = NODE_ATOMIC_FS): Promise<void> {
  const { path: real, mode } = await writableTarget(target, fs);
  const temp = temporaryPathFor(real);
  let created = false;
  inFlight.add(temp);
  try {
    const handle = await fs.open(temp, 'wx', mode);
    created = true;
    try {
      await handle.writeFile(text, 'utf8');
      await hooks.afterTempWritten?.(temp);
      await handle.sync();
    } finally {
      await handle.close();
    }
    await hooks.beforeRename?.(temp);
    await fs.rename(temp, real);
    created = false;
  } catch (error) {
    if (created) await fs.unlink(temp).catch(() => undefined);
    throw fileAccessError(target, 'write', error);
  } finally {
    inFlight.delete(temp);
  }
  await syncFolder(dirname(real), fs);
  await removeLeftovers(real, fs);
}

/** A file being written piece by piece that appears at its target only on `commit`. */
export interface AtomicFileStream {
  /** Appends text (UTF-8) to the temporary file; synchronous, so memory never holds a backlog. */
  write(text: string): void;
  /** Flushes, renames over the target and flushes the folder. */
  commit(): Promise<void>;
  /** Removes the temporary file; the target is untouched. Safe to call more than once. */
  abort(): void;
}

/**
 * Opens a temporary file beside `target` for output too large to hold as one string (a report of
 * every route on a large network). Same guarantees as writeFileAtomic: until `commit` succeeds the
 * previous file is intact; any failure removes the temporary file and throws a FileAccessError
 * naming `target`.
 */
export function openAtomicFileStream(target: string): AtomicFileStream {
  // Through symbolic links to the linked file, and a read-only file refused, as writeFileAtomic does.
  const { path: real, mode } = writableTargetSync(target);
  const temp = temporaryPathFor(real);
  let fd = -1;
  let tempExists = false;
  const abort = () => {
    if (fd !== -1) {
      try {
        closeSync(fd);
      } catch {
        // Closing a file that failed to write may fail too; it is removed next.
      }
      fd = -1;
    }
    if (tempExists) {
      try {
        unlinkSync(temp);
      } catch {
        // Already gone.
      }
      tempExists = false;
    }
    inFlight.delete(temp);
  };
  const fail = (error: unknown): never => {
    abort();
    throw fileAccessError(target, 'write', error);
  };
  const handleOrFail = () => {
    if (fd === -1) fail(new Error('the output was already closed'));
    return fd;
  };
  inFlight.add(temp);
  try {
    fd = openSync(temp, 'wx', mode);
    tempExists = true;
  } catch (error) {
    fail(error);
  }
  return {
    write(text) {
      const handle = handleOrFail();
      try {
        // A write may take only part of the bytes (a full pipe, a signal); the rest follows.
        const bytes = Buffer.from(text, 'utf8');
        for (let at = 0; at < bytes.length; ) at += writeSync(handle, bytes, at, bytes.length - at);
      } catch (error) {
        fail(error);
      }
    },
    async commit() {
      const handle = handleOrFail();
      try {
        fsyncSync(handle);
        closeSync(handle);
        fd = -1;
        await rename(temp, real);
        tempExists = false;
      } catch (error) {
        fail(error);
      }
      inFlight.delete(temp);
      await syncFolder(dirname(real), NODE_ATOMIC_FS);
      await removeLeftovers(real, NODE_ATOMIC_FS);
    },
    abort,
  };
}

// A save cut short by a crash or power cut leaves its temporary file behind (the target itself is
// intact). The next successful save of the same file removes such leftovers.
async function removeLeftovers(target: string, fs: AtomicWriteFs): Promise<void> {
  const prefix = `.${basename(target)}.`;
  const pattern = /^\d+\.[0-9a-f]{8}\.tmp$/;
  try {
    for (const name of await fs.readdir(dirname(target))) {
      if (name.startsWith(prefix) && pattern.test(name.slice(prefix.length)) && !inFlight.has(join(dirname(target), name))) {
        await fs.unlink(join(dirname(target), name)).catch(() => undefined);
      }
    }
  } catch {
    // Listing the folder is not essential to the save.
  }
}

// The rename is recorded in the folder; flushing the folder makes it survive a power cut. Windows
// cannot open folders for flushing (and NTFS journals the rename), so there it is skipped.
async function syncFolder(folder: string, fs: AtomicWriteFs): Promise<void> {
  if (process.platform === 'win32') return;
  try {
    const handle = await fs.open(folder, 'r');
    try {
      await handle.sync();
    } finally {
      await handle.close();
    }
  } catch {
    // Some file systems refuse to flush folders; the file itself is already flushed and renamed.
  }
}
