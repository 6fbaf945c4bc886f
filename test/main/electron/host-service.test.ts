import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { hostFixture, type HostFixture } from './host-fixture';
import { emptyWorkspace } from '../../../engine/workspace/document';
import { FileGrantError } from '../../../main/electron/errors';
import { FileAccessError } from '../../../main/workspace/errors';

let h: HostFixture;
beforeEach(async () => {
  h = await hostFixture();
});
afterEach(async () => {
  await h.cleanup();
});

describe('input files', () => {
  it('reads the file the user picks, without its byte-order mark, and grants re-reading it', async () => {
    const lanes = await h.write('lanes.csv', '\ufefffrom,to,toll\r\nRTM,ANR,12.50\r\n');
    h.dialogs.chooseInputFile = lanes;
    expect(await h.service['file:pick-and-read']({ kind: 'lanes' })).toEqual({ path: lanes, name: 'lanes.csv', text: 'from,to,toll\r\nRTM,ANR,12.50\r\n' });
    expect(h.dialogCalls).toEqual(['input:lanes']);
    expect((await h.service['file:read']({ path: lanes })).text).toContain('RTM,ANR');
  });

  it('answers null when the dialog is cancelled', async () => {
    expect(await h.service['file:pick-and-read']({ kind: 'depots' })).toBeNull();
  });

  it('refuses to read a path the user never chose', async () => {
    const secret = await h.write('secret.txt', 'x');
    await expect(h.service['file:read']({ path: secret })).rejects.toBeInstanceOf(FileGrantError);
    await expect(h.service['file:read']({ path: 'relative.csv' })).rejects.toMatchObject({ path: 'relative.csv', operation: 'read' });
  });
});

describe('workspaces', () => {
  it('saves through the dialog, then re-saves in place, and reopens from the recent list', async () => {
    const depots = await h.write('depots.csv', 'id,name,lat,lon\n');
    h.dialogs.chooseInputFile = depots;
    await h.service['file:pick-and-read']({ kind: 'depots' });
    const target = join(h.dir, 'week9.lwspace.json');
    h.dialogs.chooseWorkspaceTarget = target;
    const doc = { ...emptyWorkspace(), files: { depots, lanes: null }, settings: { ...emptyWorkspace().settings, origin: 'RTM' } };
    expect(await h.service['workspace:save']({ document: doc, path: null, saveAs: false })).toEqual({ path: target });
    expect(JSON.parse(await readFile(target, 'utf8')).files.depots).toBe('depots.csv');
    expect(await h.service['workspace:save']({ document: doc, path: target, saveAs: false })).toEqual({ path: target });
    expect(h.dialogCalls.filter((c) => c === 'save-workspace')).toHaveLength(1);
    expect(h.saves).toEqual([target, target]);
    expect(h.recentChanges.at(-1)!.map((e) => e.path)).toEqual([target]);

    const opened = await h.service['workspace:open']({ path: target });
    expect(opened).toMatchObject({ path: target, migratedFrom: emptyWorkspace().version, document: { files: { depots, lanes: null }, settings: { origin: 'RTM' } } });
    expect(await h.service['workspace:recent']({})).toHaveLength(1);
  });

  it('grants reading the files an opened workspace names', async () => {
    const lanes = await h.write('lanes.csv', 'from,to\n');
    const ws = await h.write('w.json', JSON.stringify({ ...emptyWorkspace(), files: { depots: null, lanes: 'lanes.csv' } }));
    h.dialogs.chooseWorkspaceToOpen = ws;
    const opened = await h.service['workspace:open']({ path: null });
    expect(opened!.document.files.lanes).toBe(lanes);
    expect((await h.service['file:read']({ path: lanes })).text).toBe('from,to\n');
  });

  it('grants reading the loads and vehicles files an opened workspace names, and saves only chosen ones', async () => {
    const loads = await h.write('loads.csv', 'load,from,to\n');
    const vehicles = await h.write('vehicles.csv', 'vehicle,vehicle_class\n');
    const ws = await h.write('w.json', JSON.stringify({ ...emptyWorkspace(), files: { depots: null, lanes: null, loads: 'loads.csv', vehicles: 'vehicles.csv' } }));
    h.dialogs.chooseWorkspaceToOpen = ws;
    const opened = await h.service['workspace:open']({ path: null });
    expect(opened!.document.files).toMatchObject({ loads, vehicles });
    expect((await h.service['file:read']({ path: loads })).text).toBe('load,from,to\n');
    expect((await h.service['file:read']({ path: vehicles })).text).toBe('vehicle,vehicle_class\n');
    const secret = await h.write('secret.txt', 'x');
    h.dialogs.chooseWorkspaceTarget = join(h.dir, 'w2.json');
    await expect(h.service['workspace:save']({ document: { ...emptyWorkspace(), files: { depots: null, lanes: null, loads: secret } }, path: null, saveAs: true })).rejects.toBeInstanceOf(FileGrantError);
    await expect(h.service['workspace:save']({ document: { ...emptyWorkspace(), files: { depots: null, lanes: null, vehicles: secret } }, path: null, saveAs: true })).rejects.toBeInstanceOf(FileGrantError);
  });

  it('refuses to open by path a workspace that is not on the recent list', async () => {
    const ws = await h.write('w.json', JSON.stringify(emptyWorkspace()));
    await expect(h.service['workspace:open']({ path: ws })).rejects.toMatchObject({ name: 'FileGrantError', operation: 'open' });
  });

  it('drops a recent workspace that has gone missing when it fails to open', async () => {
    const ws = join(h.dir, 'gone.json');
    await h.recent.touch(ws);
    await expect(h.service['workspace:open']({ path: ws })).rejects.toBeInstanceOf(FileAccessError);
    expect(h.recent.has(ws)).toBe(false);
  });

  it('refuses to overwrite a path it never opened or saved, or to name unchosen input files', async () => {
    const other = join(h.dir, 'other.json');
    await expect(h.service['workspace:save']({ document: emptyWorkspace(), path: other, saveAs: false })).rejects.toMatchObject({ name: 'FileGrantError', operation: 'write' });
    const secret = await h.write('secret.txt', 'x');
    h.dialogs.chooseWorkspaceTarget = join(h.dir, 'w.json');
    await expect(h.service['workspace:save']({ document: { ...emptyWorkspace(), files: { depots: secret, lanes: null } }, path: null, saveAs: true })).rejects.toBeInstanceOf(FileGrantError);
    await expect(h.service['workspace:save']({ document: { ...emptyWorkspace(), files: { depots: '../secret.txt', lanes: null } }, path: null, saveAs: true })).rejects.toBeInstanceOf(FileGrantError);
    // A bare name (the bundled sample) is allowed.
    expect(await h.service['workspace:save']({ document: { ...emptyWorkspace(), files: { depots: 'depots.csv', lanes: null } }, path: null, saveAs: true })).toEqual({ path: join(h.dir, 'w.json') });
  });

  it('saves and reopens the bundled sample\'s references unchanged', async () => {
    const target = join(h.dir, 'sample.lwspace.json');
    h.dialogs.chooseWorkspaceTarget = target;
    const doc = { ...emptyWorkspace(), files: { depots: 'sample:depots.csv', lanes: 'sample:lanes.csv' } };
    await h.service['workspace:save']({ document: doc, path: null, saveAs: true });
    expect((await h.service['workspace:open']({ path: target }))!.document.files).toEqual(doc.files);
  });

  it('reports a cancelled save as null to the caller and to the quit guard', async () => {
    expect(await h.service['workspace:save']({ document: emptyWorkspace(), path: null, saveAs: true })).toBeNull();
    expect(h.saves).toEqual([null]);
  });

  it('reports a failed save to the quit guard as not saved', async () => {
    h.dialogs.chooseWorkspaceTarget = join(h.dir, 'no-folder', 'w.json');
    await expect(h.service['workspace:save']({ document: emptyWorkspace(), path: null, saveAs: true })).rejects.toBeInstanceOf(FileAccessError);
    expect(h.saves).toEqual([null]);
  });
});

describe('exports, dirty state, app info', () => {
  it('writes the export where the user chose', async () => {
    const target = join(h.dir, 'routes.csv');
    h.dialogs.chooseExportTarget = target;
    expect(await h.service['file:save-export']({ suggestedName: 'routes-RTM.csv', text: 'depot,cost\r\n', kind: 'csv' })).toEqual({ path: target });
    expect(await readFile(target, 'utf8')).toBe('depot,cost\r\n');
    expect(h.dialogCalls).toEqual(['export:csv:routes-RTM.csv']);
    h.dialogs.chooseExportTarget = null;
    expect(await h.service['file:save-export']({ suggestedName: 'x.geojson', text: '{}', kind: 'geojson' })).toBeNull();
  });

  it('passes the dirty flag on and answers app info', async () => {
    await h.service['app:set-dirty']({ dirty: true });
    await h.service['app:set-dirty']({ dirty: false });
    expect(h.dirty).toEqual([true, false]);
    expect(await h.service['app:info']({})).toEqual({ name: 'Lanewright', version: '0.1.0', platform: 'linux', runtime: '41.7.1' });
  });
});
