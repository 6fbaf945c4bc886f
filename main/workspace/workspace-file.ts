// Opens and saves workspace files on disk: size limit, UTF-8, validation and migration on read;
// relative input paths, a fresh save timestamp and an atomic replace on write.

import { readFile, stat } from 'node:fs/promises';
import type { WorkspaceDocument } from '../../engine/index';
import { documentSizeProblem, MAX_DOCUMENT_BYTES, parseWorkspace, serializeWorkspace } from '../../engine/index';
import { writeFileAtomic, type AtomicWriteHooks } from './atomic-write';
import { FileAccessError, fileAccessError } from './errors';
import { withResolvedPaths, withStoredPaths } from './stored-paths';

/** Largest workspace file read (a workspace holds settings and edits, never lane data): the engine's document limit. */
export const MAX_WORKSPACE_BYTES = MAX_DOCUMENT_BYTES;

/** Reads, checks and migrates the workspace at `path`; input paths come back absolute. */
export async function readWorkspaceFile(path: string): Promise<{ document: WorkspaceDocument; migratedFrom: number }> {
  const text = await readTextFile(path, MAX_WORKSPACE_BYTES, 'workspace');
  const { document, migratedFrom } = parseWorkspace(text, path);
  return { document: withResolvedPaths(document, path), migratedFrom };
}

/** Writes `document` to `path` atomically, stamping the save time; returns what was written. */
export async function writeWorkspaceFile(
  path: string,
  document: WorkspaceDocument,
  now: Date = new Date(),
  hooks?: AtomicWriteHooks,
): Promise<WorkspaceDocument> {
  const stamped: WorkspaceDocument = { ...document, savedAt: now.toISOString() };
  const text = serializeWorkspace(withStoredPaths(stamped, path), path);
  await writeFileAtomic(path, text, hooks);
  return stamped;
}

/** Reads a UTF-8 text file of at most `maxBytes`, without the byte-order mark. */
export async function readTextFile(path: string, maxBytes: number, label?: 'scenario' | 'workspace'): Promise<string> {
  let text: string;
  try {
    const info = await stat(path);
    if (!info.isFile()) throw new FileAccessError(path, 'read', 'ENOTFILE', 'this is not a regular file');
    if (info.size > maxBytes) {
      const reason = (label && documentSizeProblem(info.size, label)) ?? `the file is ${info.size} bytes; the limit is ${maxBytes}`;
      throw new FileAccessError(path, 'read', 'EFBIG', reason);
    }
    text = await readFile(path, 'utf8');
  } catch (error) {
    throw fileAccessError(path, 'read', error);
  }
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}
