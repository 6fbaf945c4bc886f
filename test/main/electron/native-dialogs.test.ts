import { describe, expect, it } from 'vitest';
import path from 'node:path';
import type { BrowserWindow, Dialog } from 'electron';
import { ElectronDialogs, withExtension } from '../../../main/electron/native-dialogs';

function dialogs(answer: { canceled: boolean; filePaths?: string[]; filePath?: string }) {
  const calls: { kind: string; win: unknown; options: any }[] = [];
  const fake = {
    showOpenDialog: async (win: unknown, options: unknown) => (calls.push({ kind: 'open', win, options }), { canceled: answer.canceled, filePaths: answer.filePaths ?? [] }),
    showSaveDialog: async (win: unknown, options: unknown) => (calls.push({ kind: 'save', win, options }), { canceled: answer.canceled, filePath: answer.filePath ?? '' }),
  };
  const win = { id: 1 } as unknown as BrowserWindow;
  return { d: new ElectronDialogs(fake as unknown as Pick<Dialog, 'showOpenDialog' | 'showSaveDialog'>, () => win, () => '/home/ana/Documents'), calls, win };
}

describe('native dialogs', () => {
  it('adds the extension only when the chosen name has none', () => {
    expect(withExtension('/p/routes', 'csv')).toBe('/p/routes.csv');
    expect(withExtension('/p/routes.txt', 'csv')).toBe('/p/routes.txt');
  });

  it('opens input files modally with a title and filters per kind', async () => {
    const { d, calls, win } = dialogs({ canceled: false, filePaths: ['/data/lanes.csv'] });
    expect(await d.chooseInputFile('lanes')).toBe('/data/lanes.csv');
    expect(calls[0]).toMatchObject({ kind: 'open', win, options: { title: 'Import lanes', properties: ['openFile'] } });
    expect(calls[0].options.filters[0].extensions).toContain('csv');
  });

  it('answers null when cancelled', async () => {
    const { d } = dialogs({ canceled: true });
    expect(await d.chooseWorkspaceToOpen()).toBeNull();
    expect(await d.chooseExportTarget('routes.csv', 'csv')).toBeNull();
  });

  it('saves exports and workspaces with overwrite confirmation and the right extension', async () => {
    const { d, calls } = dialogs({ canceled: false, filePath: '/out/routes' });
    expect(await d.chooseExportTarget('routes-RTM.csv', 'csv')).toBe('/out/routes.csv');
    expect(calls[0].options).toMatchObject({ defaultPath: path.join('/home/ana/Documents', 'routes-RTM.csv'), properties: ['showOverwriteConfirmation', 'createDirectory'] });
    expect(await d.chooseWorkspaceTarget(null)).toBe('/out/routes.lwspace.json');
    expect(await d.chooseExportTarget('map.geojson', 'geojson')).toBe('/out/routes.geojson');
    expect(await d.chooseExportTarget('direct-run.json', 'scenario')).toBe('/out/routes.json');
    expect(calls[calls.length - 1].options).toMatchObject({ title: 'Save scenario file', filters: [{ extensions: ['json'] }] });
  });
});
