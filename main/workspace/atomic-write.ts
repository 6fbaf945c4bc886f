// Writes a file so that a crash, power cut or full disk mid-save never leaves a half-written file:
// the text goes to a temporary file in the same folder, is flushed to disk (fsync), and only then
// renamed over the target, which every supported OS does atomically within one file system.

import { randomBytes } from 'node:crypto';
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
