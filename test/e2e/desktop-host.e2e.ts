// The renderer under a scripted desktop host (the `window.lanewright` the preload would define),
// for what only the desktop has: a workspace path that Save writes to without a dialog, workspaces
// naming files on disk that may have gone, and the application menu's commands (exports included).
// The host records every save and export it is asked for.

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
    const state = { saves: [], exports: [], listener: null, failNextSave: false };
    window.__fakeHost = state;
    window.lanewright = {
      kind: 'desktop',
      async openWorkspace(path) {
        if (!path || !docs[path]) return fail('FileAccessError', String(path) + ': no such workspace', path ?? null);
        return ok({ path, document: docs[path], migratedFrom: 1 });
      },
      async saveWorkspace(document, path, saveAs) {
        state.saves.push({ path, saveAs, lanes: document.files.lanes });
        if (state.failNextSave) {
          state.failNextSave = false;
          return fail('FileAccessError', '/work/dispatch/chosen.lwspace.json: disk full', '/work/dispatch/chosen.lwspace.json');
        }
        return ok({ path: path && !saveAs ? path : '/work/dispatch/chosen.lwspace.json' });
      },
      async recentWorkspaces() { return ok([{ path: ${JSON.stringify(OLD)}, name: 'old', openedAt: '2026-08-01T08:00:00Z' }]); },
      async pickFile() { return ok(null); },
      async readFile(path) { return fail('FileAccessError', path + ': no such file', path); },
      async saveExport(suggestedName, text, kind) {
        state.exports.push({ suggestedName, kind, start: text.slice(0, 15) });
        return ok({ path: '/work/dispatch/' + suggestedName });
      },
      async setDirty() { return ok(null); },
      async appInfo() { return ok({ name: 'Lanewright', version: 'test', platform: 'linux', runtime: null }); },
      onMenuCommand(listener) { state.listener = listener; return () => { state.listener = null; }; },
    };
  })();`;
}

let session: Session;
let page: Page;

const menu = (p: Page, command: object) => p.evaluate((c) => (window as unknown as { __fakeHost: { listener: (c: object) => void } }).__fakeHost.listener(c), command);
const saves = (p: Page) => p.evaluate(() => (window as unknown as { __fakeHost: { saves: { path: string | null; saveAs: boolean; lanes: string }[] } }).__fakeHost.saves);
const exports = (p: Page) => p.evaluate(() => (window as unknown as { __fakeHost: { exports: { suggestedName: string; kind: string; start: string }[] } }).__fakeHost.exports);
const failNextSave = (p: Page) => p.evaluate(() => void ((window as unknown as { __fakeHost: { failNextSave: boolean } }).__fakeHost.failNextSave = true));
const dataset = (p: Page) => p.locator('.lw-dataset').innerText();
const prompt = (p: Page) => p.getByRole('dialog', { name: 'Unsaved changes' });

// An edit the workspace keeps (the leg limit is saved with it), so the window has unsaved changes.
async function makeEdit(p: Page, maxLegs: string): Promise<void> {
  const before = await solveCount(p);
  await p.getByLabel('Maximum legs').fill(maxLegs);
  await waitForPlan(p, before);
  await expect.poll(() => dataset(p)).toMatch(/unsaved/);
}
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
    await expect.poll(() => statusMessage(page)).toMatch(/Opened the sample carrier\./);
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

  it('asks before a sample replaces unsaved changes; Escape and Cancel keep them, Cancel has the focus', async () => {
    await page.getByRole('button', { name: 'I understand' }).click(); // the first-run cautions
    expect(await dataset(page)).not.toMatch(/unsaved/);
    await makeEdit(page, '2');
    const solves = await solveCount(page);
    await page.getByRole('button', { name: 'Sample carrier with rebate loop' }).click();
    await prompt(page).waitFor();
    expect(await prompt(page).getAttribute('aria-describedby')).toBeTruthy();
    const description = await page.locator(`#${await prompt(page).getAttribute('aria-describedby')}`).innerText();
    expect(description).toMatch(/sample carrier with a rebate loop.*replaces the workspace/i);
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe('Cancel');
    await page.keyboard.press('Escape');
    await expect.poll(() => prompt(page).count()).toBe(0);
    expect(await dataset(page)).toMatch(/sample:lanes\.csv • unsaved/);

    await page.getByRole('button', { name: 'Sample carrier with rebate loop' }).click();
    await prompt(page).getByRole('button', { name: 'Cancel' }).click();
    await expect.poll(() => prompt(page).count()).toBe(0);
    expect(await dataset(page)).toMatch(/sample:lanes\.csv • unsaved/);
    expect(await page.getByLabel('Maximum legs').inputValue()).toBe('2');
    expect(await solveCount(page)).toBe(solves);
    expect(await saves(page)).toHaveLength(1);
  });

  it('Discard replaces the workspace without saving', async () => {
    const before = await solveCount(page);
    await page.getByRole('button', { name: 'Sample carrier with rebate loop' }).click();
    await prompt(page).getByRole('button', { name: 'Discard' }).click();
    await expect.poll(() => dataset(page)).toMatch(/sample:lanes-rebate-loop\.csv$/);
    await waitForPlan(page, before);
    expect(await saves(page)).toHaveLength(1);
  });

  it('Save saves through the host first, then replaces; a failed save keeps the workspace', async () => {
    await makeEdit(page, '');
    await failNextSave(page);
    await page.getByRole('button', { name: 'Sample carrier', exact: true }).click();
    await prompt(page).getByRole('button', { name: 'Save' }).click();
    await expect.poll(() => statusMessage(page)).toMatch(/Not saved: .*disk full/);
    expect(await dataset(page)).toMatch(/sample:lanes-rebate-loop\.csv • unsaved/);
    expect(await saves(page)).toHaveLength(2);

    const before = await solveCount(page);
    await page.getByRole('button', { name: 'Sample carrier', exact: true }).click();
    await prompt(page).getByRole('button', { name: 'Save' }).click();
    await expect.poll(() => dataset(page)).toMatch(/sample:lanes\.csv$/);
    await waitForPlan(page, before);
    // Saved where the dialog said (a sample has no path of its own), with the edited workspace's files.
    expect((await saves(page))[2]).toEqual({ path: null, saveAs: false, lanes: 'sample:lanes-rebate-loop.csv' });
  });

  it('asks before New workspace and Import from the menu too', async () => {
    await makeEdit(page, '3');
    await menu(page, { command: 'new-workspace' });
    await prompt(page).getByRole('button', { name: 'Cancel' }).click();
    await menu(page, { command: 'import-lanes' });
    await prompt(page).waitFor();
    expect(await page.getByRole('dialog', { name: 'Import depots and lanes' }).count()).toBe(0);
    await prompt(page).getByRole('button', { name: 'Discard' }).click();
    await page.getByRole('dialog', { name: 'Import depots and lanes' }).waitFor();
    await page.getByRole('dialog', { name: 'Import depots and lanes' }).getByRole('button', { name: 'Cancel' }).click();
    // Closing the import dialog replaced nothing: the edit is still there and still unsaved.
    expect(await dataset(page)).toMatch(/unsaved/);
    await menu(page, { command: 'open-workspace', path: OLD });
    await prompt(page).getByRole('button', { name: 'Discard' }).click();
    await expect.poll(() => statusMessage(page)).toMatch(new RegExp(`Opened ${OLD}`));
    expect(await dataset(page)).not.toMatch(/unsaved/);
  });

  it('exports the contract review report and the review tables from the application menu', async () => {
    await menu(page, { command: 'export', what: 'review-html' });
    await expect.poll(() => exports(page), { timeout: 60_000 }).toHaveLength(1);
    // The whole calendar of the sample's lanes file (every class, any origin), as the Export menu names it.
    const [report] = await exports(page);
    expect(report).toEqual({ suggestedName: expect.stringMatching(/^contract-review-\d{4}-\d\d-\d\d-\d{4}-\d\d-\d\d\.html$/), kind: 'html', start: '<!DOCTYPE html>' });
    await expect.poll(() => statusMessage(page)).toContain(`Exported /work/dispatch/${report.suggestedName}.`);
    // The review the report made is the one the review tables export.
    await menu(page, { command: 'export', what: 'review-csv' });
    await menu(page, { command: 'export', what: 'calendar-review-csv' });
    await expect.poll(() => exports(page)).toHaveLength(3);
    const [, day, calendar] = await exports(page);
    expect(day).toMatchObject({ suggestedName: expect.stringMatching(/^contract-review-2026-08-15\.csv$/), kind: 'csv' });
    expect(calendar).toMatchObject({ suggestedName: expect.stringMatching(/^calendar-review-\d{4}-\d\d-\d\d-\d{4}-\d\d-\d\d\.csv$/), kind: 'csv' });
  });

  it('made no request outside localhost and logged no errors', () => {
    expect(offsiteRequests(session)).toEqual([]);
    expect(session.errors).toEqual([]);
  });
});
