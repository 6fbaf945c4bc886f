// Which files the renderer may reach through the host. A compromised page must not be able to read
// or overwrite arbitrary files, so a path becomes reachable only when the user chose it in a native
// dialog or opened a workspace that names it; the renderer can never grant itself a path.

import path from 'node:path';

function key(p: string): string {
  const resolved = path.resolve(p);
  return process.platform === 'linux' ? resolved : resolved.toLowerCase();
}

/** The set of readable input files and writable workspace files for this session. */
export class FileGrants {
  private readonly readable = new Set<string>();
  private readonly workspaces = new Set<string>();

  /** The user picked this input file, or an opened workspace names it. */
  allowRead(file: string): void {
    if (path.isAbsolute(file)) this.readable.add(key(file));
  }

  /** The user opened or saved this workspace: it may be saved again without a dialog. */
  allowWorkspace(file: string): void {
    if (path.isAbsolute(file)) this.workspaces.add(key(file));
  }

  canRead(file: string): boolean {
    return path.isAbsolute(file) && this.readable.has(key(file));
  }

  canWriteWorkspace(file: string): boolean {
    return path.isAbsolute(file) && this.workspaces.has(key(file));
  }
}
