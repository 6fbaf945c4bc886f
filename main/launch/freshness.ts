// Decides whether the built renderer is older than its sources, so `npm start` rebuilds it only
// when something changed. Compares modification times; a missing output is always stale.

import { readdir, stat } from 'node:fs/promises';
import path from 'node:path';

/** Newest modification time (ms) of any file under the given files or folders; 0 when none exist. */
export async function newestMtime(entries: readonly string[], skip: (name: string) => boolean = (n) => n === 'node_modules' || n.startsWith('.')): Promise<number> {
  let newest = 0;
  async function visit(entry: string): Promise<void> {
    let info;
    try {
      info = await stat(entry);
    } catch {
      return;
    }
    if (info.isDirectory()) {
      for (const name of await readdir(entry)) if (!skip(name)) await visit(path.join(entry, name));
    } else {
      newest = Math.max(newest, info.mtimeMs);
    }
  }
  for (const entry of entries) await visit(entry);
  return newest;
}

/** True when `output` is missing or older than the newest of `sources`. */
export async function isStale(output: string, sources: readonly string[]): Promise<boolean> {
  let outputTime: number;
  try {
    outputTime = (await stat(output)).mtimeMs;
  } catch {
    return true;
  }
  return (await newestMtime(sources)) > outputTime;
}
