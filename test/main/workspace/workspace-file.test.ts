import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { readWorkspaceFile, writeWorkspaceFile } from '../../../main/workspace/workspace-file';
import { emptyWorkspace, WORKSPACE_VERSION } from '../../../engine/workspace/document';
import { WorkspaceFormatError, WorkspaceVersionError } from '../../../engine/workspace/errors';
import { FileAccessError } from '../../../main/workspace/errors';

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(join(tmpdir(), 'lw-wsfile-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('workspace files', () => {
  it('saves with relative input paths and a timestamp, and opens with absolute ones', async () => {
    const file = join(dir, 'week9.lwspace.json');
    const doc = { ...emptyWorkspace(), files: { depots: join(dir, 'depots.csv'), lanes: '/elsewhere/lanes.csv' }, settings: { origin: 'RTM', dispatchDate: '2026-03-02', vehicleClass: null, maxLegs: 5 } };
    const written = await writeWorkspaceFile(file, doc, new Date('2026-03-02T08:00:00Z'));
    expect(written.savedAt).toBe('2026-03-02T08:00:00.000Z');
    const raw = JSON.parse(await readFile(file, 'utf8'));
    expect(raw.files).toEqual({ depots: 'depots.csv', lanes: '/elsewhere/lanes.csv' });
    expect(raw.version).toBe(WORKSPACE_VERSION);
    const opened = await readWorkspaceFile(file);
    expect(opened.document).toEqual({ ...doc, savedAt: '2026-03-02T08:00:00.000Z' });
    expect(opened.migratedFrom).toBe(WORKSPACE_VERSION);
  });

  it('refuses to write an invalid document and leaves the last good file', async () => {
    const file = join(dir, 'w.json');
    await writeWorkspaceFile(file, emptyWorkspace());
    const before = await readFile(file, 'utf8');
    const bad = { ...emptyWorkspace(), settings: { ...emptyWorkspace().settings, maxLegs: 0 } };
    await expect(writeWorkspaceFile(file, bad)).rejects.toBeInstanceOf(WorkspaceFormatError);
    expect(await readFile(file, 'utf8')).toBe(before);
  });

  it('names the file in every open failure', async () => {
    const missing = join(dir, 'missing.json');
    await expect(readWorkspaceFile(missing)).rejects.toMatchObject({ name: 'FileAccessError', path: missing, code: 'ENOENT' });
    await expect(readWorkspaceFile(dir)).rejects.toBeInstanceOf(FileAccessError);
    const broken = join(dir, 'broken.json');
    await writeFile(broken, '{"format":"lanewright-workspace","version":1,');
    await expect(readWorkspaceFile(broken)).rejects.toMatchObject({ name: 'WorkspaceFormatError', source: broken });
    const newer = join(dir, 'newer.json');
    await writeFile(newer, JSON.stringify({ ...emptyWorkspace(), version: WORKSPACE_VERSION + 1 }));
    await expect(readWorkspaceFile(newer)).rejects.toBeInstanceOf(WorkspaceVersionError);
  });
});
