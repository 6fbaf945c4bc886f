// The Loads panel's files travel with the workspace: documentOf names them (only when chosen, so a
// workspace without loads is the file an earlier build wrote), and loadFilesOf reads them back,
// bundled sample names without asking the host, others through it; a file that fails is named.

import { describe, expect, it } from 'vitest';
import type { LanewrightHost } from '../../../main/ipc/contract';
import { parseWorkspace, serializeWorkspace } from '../../../engine/workspace/parse';
import { documentOf, loadFilesOf, stateOf } from '../../../renderer/app/workspace-doc';
import { sampleFiles } from '../../../renderer/sample/sample';
import { sampleLoadFiles } from '../../../renderer/sample/sample-loads';

const network = sampleFiles(false);
const { settings, scenario } = stateOf(documentOf(network, { origin: 'RTM', maxLegs: null, vehicleClass: '', dispatchDate: '2026-08-15' }, { name: 'What-if 1', description: null, changes: [] }));

function hostReading(files: Record<string, string>): LanewrightHost {
  const readFile = async (path: string) =>
    path in files ? { ok: true as const, value: { name: path.split('/').pop()!, path, text: files[path] } } : { ok: false as const, failure: { error: 'FileAccessError', message: `${path}: no such file` } };
  return { readFile } as unknown as LanewrightHost;
}

describe('loads and vehicles files in the workspace', () => {
  it('are saved by name and reopened with their text', async () => {
    const loads = { loads: { name: 'loads.csv', path: '/plans/loads.csv', text: 'load,from,to\nL1,RTM,PAR\n' }, vehicles: null };
    const doc = documentOf(network, settings, scenario, loads);
    expect(doc.files).toEqual({ depots: 'sample:depots.csv', lanes: 'sample:lanes.csv', loads: '/plans/loads.csv' });
    const reopened = parseWorkspace(serializeWorkspace(doc), 'w.json').document;
    const back = await loadFilesOf(hostReading({ '/plans/loads.csv': loads.loads.text }), reopened);
    expect(back.problem).toBeNull();
    expect(back.files).toEqual({ loads: { name: 'loads.csv', path: '/plans/loads.csv', text: loads.loads.text }, vehicles: null });
  });

  it('reopen the bundled sample loads without the host', async () => {
    const doc = documentOf(network, settings, scenario, sampleLoadFiles());
    expect(doc.files).toMatchObject({ loads: 'sample:loads.csv', vehicles: 'sample:vehicles.csv' });
    const back = await loadFilesOf(hostReading({}), doc);
    expect(back.files?.loads.text).toBe(sampleLoadFiles().loads.text);
    expect(back.files?.vehicles?.text).toBe(sampleLoadFiles().vehicles.text);
  });

  it('leave the fields out when none are chosen, and name a file that cannot be read', async () => {
    expect(Object.keys(documentOf(network, settings, scenario, null).files)).toEqual(['depots', 'lanes']);
    // Only a vehicles file chosen: nothing to plan yet, the vehicles file is kept.
    const vehiclesOnly = documentOf(network, settings, scenario, { loads: { name: '', text: '' }, vehicles: { name: 'v.csv', path: '/plans/v.csv', text: 'x' } });
    expect(vehiclesOnly.files).toEqual({ depots: 'sample:depots.csv', lanes: 'sample:lanes.csv', vehicles: '/plans/v.csv' });
    const missing = await loadFilesOf(hostReading({}), { ...vehiclesOnly, files: { ...vehiclesOnly.files, loads: '/plans/gone.csv' } });
    expect(missing.files).toBeNull();
    expect(missing.problem).toContain('/plans/gone.csv');
  });
});

describe('The panel sizes', () => {
  it('travel with the workspace: written as chosen, read back by stateOf; null when never set', () => {
    const doc = documentOf(network, settings, scenario, null, { lowerPx: 296, sidePx: null });
    const reopened = parseWorkspace(serializeWorkspace(doc), 'w.json').document;
    expect(stateOf(reopened).layout).toEqual({ lowerPx: 296, sidePx: null });
    expect(documentOf(network, settings, scenario).layout).toEqual({ lowerPx: null, sidePx: null });
  });
});
