// The renderer under a scripted desktop host (the `window.lanewright` the preload would define),
// for what only the desktop has: a workspace path that Save writes to without a dialog, and
// workspaces naming files on disk that may have gone. The host records every save it is asked for.

import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { emptyWorkspace } from '../../engine/workspace/document';
import { offsiteRequests, openApp, solveCount, waitForPlan, type Session } from './support/browser';

const OLD = '/work/dispatch/old.lwspace.json';
const GONE = '/work/dispatch/gone.lwspace.json';

function workspace(depots: string, lanes: string) {
  const doc = emptyWorkspace();
  doc.files = { depots, lanes };
  doc.settings = { origin: 'RTM', dispatchDate: '2026-08-15', vehicleClass: null, maxLegs: null };
  return doc;
}

// Runs in the page before the app: a desktop host whose files are the two workspaces above.
function fakeDesktopHost(docs: Record<string, unknown>): string {
  return `(() => {
    const docs = ${JSON.stringify(docs)};
    const ok = (value) => ({ ok: true, value });
    const fail = (error, message, path) => ({ ok: false, failure: { error, message, path, field: null } });
    const state = { saves: [], listener: null };
    window.__fakeHost = state;
    window.lanewright = {
      kind: 'desktop',
      async openWorkspace(path) {
        if (!path || !docs[path]) return fail('FileAccessError', String(path) + ': no such workspace', path ?? null);
        return ok({ path, document: docs[path], migratedFrom: 1 });
      },
      async saveWorkspace(document, path, saveAs) {
        state.saves.push({ path, saveAs });
        return ok({ path: path && !saveAs ? path : '/work/dispatch/chosen.lwspace.json' });
      },
      async recentWorkspaces() { return ok([{ path: ${JSON.stringify(OLD)}, name: 'old', openedAt: '2026-08-01T08:00:00Z' }]); },
      async pickFile() { return ok(null); },
      async readFile(path) { return fail('FileAccessError', path + ': no such file', path); },
      async saveExport() { return ok(null); },
      async setDirty() { return ok(null); },
      async appInfo() { return ok({ name: 'Lanewright', version: 'test', platform: 'linux', runtime: null }); },
      onMenuCommand(listener) { state.listener = listener; return () => { state.listener = null; }; },
    };
  })();`;
}

let session: Session;
let page: Page;

const menu = (p: Page, command: object) => p.evaluate((c) => (window as unknown as { __fakeHost: { listener: (c: object) => void } }).__fakeHost.listener(c), command);
const saves = (p: Page) => p.evaluate(() => (window as unknown as { __fakeHost: { saves: { path: string | null; saveAs: boolean }[] } }).__fakeHost.saves);
const statusMessage = (p: Page) => p.locator('.lw-status .lw-message').innerText();

beforeAll(async () => {
  const docs = { [OLD]: workspace('sample:depots.csv', 'sample:lanes.csv'), [GONE]: workspace('/work/dispatch/depots.csv', '/work/dispatch/lanes.csv') };
  session = await openApp(undefined, fakeDesktopHost(docs));
  page = session.page;
  await waitForPlan(page);
});

afterAll(async () => {
  await session?.close();
});

describe('renderer under the desktop host', () => {
  it('saves a new workspace through the dialog, never over the workspace opened before', async () => {
    expect(await saves(page)).toEqual([]);
    const before = await solveCount(page);
    await menu(page, { command: 'new-workspace' });
    await expect.poll(() => statusMessage(page)).toMatch(/Opened the sample scenario/);
    await waitForPlan(page, before);
    await menu(page, { command: 'save', thenQuit: false });
    await expect.poll(() => saves(page)).toHaveLength(1);
    expect((await saves(page))[0].path).toBeNull();
  });

  it('says so when a workspace names a file that cannot be read, and keeps the one on screen', async () => {
    const dataset = page.locator('.lw-dataset');
    expect(await dataset.innerText()).toMatch(/sample:depots\.csv/);
    await menu(page, { command: 'open-workspace', path: GONE });
    await expect.poll(() => statusMessage(page)).toMatch(/Could not open the workspace: .*depots\.csv: no such file/);
    expect(await dataset.innerText()).toMatch(/sample:depots\.csv/);
  });

  it('made no request outside localhost and logged no errors', () => {
    expect(offsiteRequests(session)).toEqual([]);
    expect(session.errors).toEqual([]);
  });
});
