// Named errors for file access done by the desktop host on the renderer's behalf. Each names the
// file, what was being done and why it failed, so the renderer can show one clear line.

import { LanewrightError } from '../../engine/index';

/** What the host was doing with the file. */
export type FileOperation = 'read' | 'write' | 'list';

/** A file that could not be read or written (missing, no permission, too large, disk full...). */
export class FileAccessError extends LanewrightError {
  constructor(
    readonly path: string,
    readonly operation: FileOperation,
    /** Node's error code when there is one (ENOENT, EACCES, ENOSPC...), else a short tag. */
    readonly code: string,
    readonly reason: string,
  ) {
    super(`${path}: cannot ${operation}: ${reason}`);
  }
}

/** Wraps a Node file-system error as FileAccessError with a reason a dispatcher can act on. */
export function fileAccessError(path: string, operation: FileOperation, error: unknown): FileAccessError {
  if (error instanceof FileAccessError) return error;
  const code = (error as NodeJS.ErrnoException | null)?.code ?? 'EIO';
  const reasons: Record<string, string> = {
    ENOENT: 'the file or its folder does not exist',
    EACCES: 'permission denied',
    EPERM: 'permission denied',
    EISDIR: 'this is a folder, not a file',
    ENOSPC: 'the disk is full',
    EROFS: 'the disk is read-only',
    EBUSY: 'the file is in use by another program',
  };
  return new FileAccessError(path, operation, code, reasons[code] ?? (error instanceof Error ? error.message : String(error)));
}
