// Writes a file so that a crash, power cut or full disk mid-save never leaves a half-written file:
// the text goes to a temporary file in the same folder, is flushed to disk (fsync), and only then
// renamed over the target, which every supported OS does atomically within one file system.

import { randomBytes } from 'node:crypto';
import { closeSync, fsyncSync, openSync, statSync, unlinkSync, writeSync } from 'node:fs';
import { open, readdir, rename, stat, unlink } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import { fileAccessError } from './errors';

/** Test seam: called between the steps, so tests can fail a save at each point. */
export interface AtomicWriteHooks {
  afterTempWritten?(tempPath: string): Promise<void> | void;
  beforeRename?(tempPath: string): Promise<void> | void;
}

// Temporary files of saves still running in this process: another save of the same file must not
// take them for leftovers of a crash (two quick Save commands run side by side).
const inFlight = new Set<string>();

/** Name of the temporary file for `target`: hidden, same folder, unique per attempt. */
export function temporaryPathFor(target: string): string {
  return join(dirname(target), `.${basename(target)}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
}

/**
 * Replaces `target` with `text` (UTF-8) atomically. The previous file keeps its permission bits.
 * On any failure the temporary file is removed, the previous file is untouched, and a FileAccessError
 * naming `target` is thrown.
 */
export async function writeFileAtomic(target: string, text: string, hooks: AtomicWriteHooks = {}): Promise<void> {
  const temp = temporaryPathFor(target);
  let mode = 0o644;
  try {
    mode = (await stat(target)).mode & 0o777;
  } catch {
    // New file: default permissions.
  }
  let created = false;
  inFlight.add(temp);
  try {
    const handle = await open(temp, 'wx', mode);
    created = true;
    try {
      await handle.writeFile(text, 'utf8');
      await hooks.afterTempWritten?.(temp);
      await handle.sync();
    } finally {
      await handle.close();
    }
    await hooks.beforeRename?.(temp);
    await rename(temp, target);
    created = false;
  } catch (error) {
    if (created) await unlink(temp).catch(() => undefined);
    throw fileAccessError(target, 'write', error);
  } finally {
    inFlight.delete(temp);
  }
  await syncFolder(dirname(target));
  await removeLeftovers(target);
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
  const temp = temporaryPathFor(target);
  let mode = 0o644;
  try {
    mode = statSync(target).mode & 0o777;
  } catch {
    // New file: default permissions.
  }
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
        await rename(temp, target);
        tempExists = false;
      } catch (error) {
        fail(error);
      }
      inFlight.delete(temp);
      await syncFolder(dirname(target));
      await removeLeftovers(target);
    },
    abort,
  };
}

// A save cut short by a crash or power cut leaves its temporary file behind (the target itself is
// intact). The next successful save of the same file removes such leftovers.
async function removeLeftovers(target: string): Promise<void> {
  const prefix = `.${basename(target)}.`;
  const pattern = /^\d+\.[0-9a-f]{8}\.tmp$/;
  try {
    for (const name of await readdir(dirname(target))) {
      if (name.startsWith(prefix) && pattern.test(name.slice(prefix.length)) && !inFlight.has(join(dirname(target), name))) {
        await unlink(join(dirname(target), name)).catch(() => undefined);
      }
    }
  } catch {
    // Listing the folder is not essential to the save.
  }
}

// The rename is recorded in the folder; flushing the folder makes it survive a power cut. Windows
// cannot open folders for flushing (and NTFS journals the rename), so there it is skipped.
async function syncFolder(folder: string): Promise<void> {
  if (process.platform === 'win32') return;
  try {
    const handle = await open(folder, 'r');
    try {
      await handle.sync();
    } finally {
      await handle.close();
    }
  } catch {
    // Some file systems refuse to flush folders; the file itself is already flushed and renamed.
  }
}
