// Scenario and workspace files over the 50 MB document limit are refused before they are read, with
// one clear line, in the desktop host (workspace open, scenario pick) and the CLI (compare
// --scenario). The files here are sparse: 50 MB + 1 byte on disk without writing the bytes.

import { truncate, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { MAX_DOCUMENT_BYTES } from '../../../engine/json/document-size';
import { FileAccessError } from '../../../main/workspace/errors';
import { readWorkspaceFile } from '../../../main/workspace/workspace-file';
import { runCli } from '../cli/cli-harness';
import { hostFixture, type HostFixture } from './host-fixture';

let h: HostFixture;
beforeEach(async () => {
  h = await hostFixture();
});
afterEach(async () => {
  await h.cleanup();
});

async function oversized(name: string): Promise<string> {
  const file = join(h.dir, name);
  await writeFile(file, '{');
  await truncate(file, MAX_DOCUMENT_BYTES + 1);
  return file;
}

describe('documents over the size limit', () => {
  it('a workspace is refused by the desktop host with EFBIG and a clear reason', async () => {
    const file = await oversized('big.lwspace.json');
    const error = await readWorkspaceFile(file).catch((e) => e);
    expect(error).toBeInstanceOf(FileAccessError);
    expect(error).toMatchObject({ path: file, code: 'EFBIG' });
    expect(error.reason).toMatch(/a workspace file is at most 52,428,800 bytes \(50 MB/);
  });

  it('a scenario picked in the desktop app is refused; a lanes file of that size is not', async () => {
    const file = await oversized('what-if.json');
    h.dialogs.chooseInputFile = file;
    await expect(h.service['file:pick-and-read']({ kind: 'scenario' })).rejects.toMatchObject({ code: 'EFBIG', path: file });
    const lanes = await oversized('lanes.csv');
    h.dialogs.chooseInputFile = lanes;
    expect((await h.service['file:pick-and-read']({ kind: 'lanes' }))?.name).toBe('lanes.csv');
  });

  it('compare --scenario refuses it in one line', async () => {
    const file = await oversized('what-if.json');
    const r = await runCli(['compare', '--depots', 'sample-data/depots.csv', '--lanes', 'sample-data/lanes.csv', '--date', '2026-06-01', '--from', 'RTM', '--scenario', file]);
    expect(r.status).toBe(1);
    expect(r.stderr.trim().split('\n')).toEqual([`lanewright: ${file}: the file is 52,428,801 bytes; a scenario file is at most 52,428,800 bytes (50 MB: it holds settings and edits, not lane data), so it was not read`]);
  });
});
