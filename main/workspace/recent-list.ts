// The recent workspaces list: at most ten, most recent first, one entry per file, entries whose file
// has gone pruned on read. Kept as a small JSON file in the user-data folder, written atomically.

import { access } from 'node:fs/promises';
import path from 'node:path';
import type { RecentWorkspace } from '../ipc/contract';
import { checkJson, json, parseJsonText } from '../../engine/index';
import { writeFileAtomic } from './atomic-write';
import { readTextFile } from './workspace-file';

/** Longest the list gets. */
export const MAX_RECENT = 10;

const FORMAT = 'lanewright-recent';

/** The list with `workspacePath` moved (or added) to the front, trimmed to MAX_RECENT. */
export function addRecent(entries: readonly RecentWorkspace[], workspacePath: string, now: Date): RecentWorkspace[] {
  const key = samePathKey(workspacePath);
  const rest = entries.filter((e) => samePathKey(e.path) !== key);
  return [{ path: workspacePath, name: path.basename(workspacePath), openedAt: now.toISOString() }, ...rest].slice(0, MAX_RECENT);
}

/** The list without `workspacePath`. */
export function removeRecent(entries: readonly RecentWorkspace[], workspacePath: string): RecentWorkspace[] {
  const key = samePathKey(workspacePath);
  return entries.filter((e) => samePathKey(e.path) !== key);
}

// Windows and macOS file systems usually ignore case; treating C:\A.json and c:\a.json as one file
// there avoids duplicate entries. Linux is case-sensitive.
function samePathKey(p: string): string {
  const resolved = path.resolve(p);
  return process.platform === 'linux' ? resolved : resolved.toLowerCase();
}

/** The entries whose file still exists. */
export async function pruneMissing(
  entries: readonly RecentWorkspace[],
  exists: (p: string) => Promise<boolean> = fileExists,
): Promise<RecentWorkspace[]> {
  const present = await Promise.all(entries.map((e) => exists(e.path)));
  return entries.filter((_, i) => present[i]);
}

async function fileExists(p: string): Promise<boolean> {
  try {
    await access(p);
    return true;
  } catch {
    return false;
  }
}

const RECENT_SCHEMA = json.object({
  format: json.exactly(FORMAT, `must be "${FORMAT}"`),
  version: json.exactly(1, 'must be 1'),
  entries: json.list(json.object({ path: json.text(32_767), name: json.text(1000), openedAt: json.isoTimestamp() }), MAX_RECENT),
});

/** Parses the stored list; a damaged or foreign file yields an empty list, never an error at start-up. */
export function parseRecent(text: string): RecentWorkspace[] {
  try {
    const o = checkJson(RECENT_SCHEMA, parseJsonText(text));
    return o.entries.map((e) => ({ ...e }))      .filter((e) => path.isAbsolute(e.path));
  } catch {
    return [];
  }
}

/** Text of the stored list. */
export function serializeRecent(entries: readonly RecentWorkspace[]): string {
  return `${JSON.stringify({ format: FORMAT, version: 1, entries }, null, 2)}\n`;
}

/** The recent list backed by a file (normally `<userData>/recent-workspaces.json`). */
export class RecentStore {
  private entries: RecentWorkspace[] = [];

  constructor(
    private readonly file: string,
    private readonly exists: (p: string) => Promise<boolean> = fileExists,
  ) {}

  /** Loads the stored list and prunes missing files; call once at start-up. */
  async load(): Promise<RecentWorkspace[]> {
    let text = '';
    try {
      text = await readTextFile(this.file, 1024 * 1024);
    } catch {
      // First run, or the file is unreadable: start with an empty list.
    }
    this.entries = await pruneMissing(parseRecent(text), this.exists);
    return this.list();
  }

  /** Current entries (pruned of files that have gone since the last check). */
  async current(): Promise<RecentWorkspace[]> {
    const pruned = await pruneMissing(this.entries, this.exists);
    if (pruned.length !== this.entries.length) await this.store(pruned);
    return this.list();
  }

  /** Records an open or save of `workspacePath`. */
  async touch(workspacePath: string, now: Date = new Date()): Promise<RecentWorkspace[]> {
    await this.store(addRecent(this.entries, workspacePath, now));
    return this.list();
  }

  /** Drops `workspacePath` (e.g. it failed to open). */
  async forget(workspacePath: string): Promise<RecentWorkspace[]> {
    await this.store(removeRecent(this.entries, workspacePath));
    return this.list();
  }

  /** Empties the list ("Clear list" in the menu). */
  async clear(): Promise<RecentWorkspace[]> {
    await this.store([]);
    return this.list();
  }

  /** True when `workspacePath` is on the list. */
  has(workspacePath: string): boolean {
    const key = samePathKey(workspacePath);
    return this.entries.some((e) => samePathKey(e.path) === key);
  }

  private list(): RecentWorkspace[] {
    return this.entries.map((e) => ({ ...e }));
  }

  private async store(entries: RecentWorkspace[]): Promise<void> {
    this.entries = entries;
    try {
      await writeFileAtomic(this.file, serializeRecent(entries));
    } catch {
      // The list is a convenience; failing to store it must not fail an open or a save.
    }
  }
}
