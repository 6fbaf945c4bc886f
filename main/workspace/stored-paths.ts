// Input file paths inside a saved workspace: stored relative to the workspace file when the input
// sits in the same folder tree (so a project folder can be copied or moved and still open), and
// absolute otherwise. Relative paths are written with "/" so a workspace moves between Windows and Unix.

import path from 'node:path';
import type { WorkspaceDocument, WorkspaceFiles } from '../../engine/index';

type PathApi = Pick<typeof path, 'dirname' | 'relative' | 'resolve' | 'isAbsolute' | 'sep'>;

// Names like "sample:lanes.csv" are not file paths but references the renderer resolves itself (the
// bundled sample); they are stored and returned untouched. A Windows drive ("C:") is one letter.
function isOpaqueName(name: string, api: PathApi): boolean {
  return !api.isAbsolute(name) && /^[a-z][a-z0-9+.-]+:/i.test(name);
}

/** Form of one input path as stored in the workspace at `workspacePath`. */
export function storedPath(inputPath: string, workspacePath: string, api: PathApi = path): string {
  if (!api.isAbsolute(inputPath) || isOpaqueName(inputPath, api)) return inputPath;
  const relative = api.relative(api.dirname(workspacePath), inputPath);
  if (relative === '' || relative.startsWith('..') || api.isAbsolute(relative)) return inputPath;
  return relative.split(api.sep).join('/');
}

/** Absolute form of a stored input path, resolved against the workspace's folder. */
export function resolvedPath(stored: string, workspacePath: string, api: PathApi = path): string {
  if (api.isAbsolute(stored) || isOpaqueName(stored, api)) return stored;
  return api.resolve(api.dirname(workspacePath), stored.split('/').join(api.sep));
}

function mapFiles(files: WorkspaceFiles, map: (p: string) => string): WorkspaceFiles {
  const mapped: WorkspaceFiles = {
    depots: files.depots === null ? null : map(files.depots),
    lanes: files.lanes === null ? null : map(files.lanes),
  };
  // The loads and vehicles fields are optional: left out when the document leaves them out.
  if (files.loads !== undefined) mapped.loads = files.loads === null ? null : map(files.loads);
  if (files.vehicles !== undefined) mapped.vehicles = files.vehicles === null ? null : map(files.vehicles);
  return mapped;
}

/** The document as it should be written to `workspacePath`. */
export function withStoredPaths(document: WorkspaceDocument, workspacePath: string, api: PathApi = path): WorkspaceDocument {
  return { ...document, files: mapFiles(document.files, (p) => storedPath(p, workspacePath, api)) };
}

/** The document as read from `workspacePath`, with absolute input paths. */
export function withResolvedPaths(document: WorkspaceDocument, workspacePath: string, api: PathApi = path): WorkspaceDocument {
  return { ...document, files: mapFiles(document.files, (p) => resolvedPath(p, workspacePath, api)) };
}
