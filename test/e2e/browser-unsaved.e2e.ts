// Browser mode keeps the workspace in the browser as it changes, but a sample, an import or a
// scenario file replacing it would drop the what-if edits for good: it asks Save scenario file /
// Discard / Cancel first (clicking a sample used to discard two edits silently). A reload reopens
// what was open last. The status line's message belongs to the action that set it.

import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseScenarioDocument } from '../../engine/index';
import { WORKSPACE_KEY } from '../../renderer/host/browser-store';
import { editLaneAmount, offsiteRequests, openReadyApp, waitForPlan, type Session } from './support/browser';

let session: Session;
let page: Page;

beforeAll(async () => {
  session = await openReadyApp({ width: 1440, height: 900 });
  page = session.page;
});

afterAll(async () => {
  await session?.close();
});

const message = () => page.locator('.lw-status').innerText();
const changedBadge = () => page.getByRole('tab', { name: /Lanes & scenario/ }).innerText();
const prompt = () => page.getByRole('dialog', { name: 'Unsaved changes' });

const editRebate = (nth: number, amount: string) => editLaneAmount(page, 'rebate', nth, amount);

async function keptLanesFile(): Promise<string> {
  return page.evaluate((key) => (JSON.parse(localStorage.getItem(key) ?? '{}') as { files?: { lanes?: string } }).files?.lanes ?? '', WORKSPACE_KEY);
}

describe('unsaved what-if edits in browser mode', () => {
  it('a message stands until the next action', async () => {
    await expect.poll(message).toMatch(/Opened the sample carrier\./);
    await page.getByRole('tab', { name: 'Results' }).click();
    await page.locator('[data-testid="results-table"] tr[data-depot="LYS"]').click();
    await expect.poll(message).not.toMatch(/Opened the sample carrier/);
  });

  it('keeps two edits through a reload, still unsaved', async () => {
    await editRebate(0, '1.00');
    await editRebate(1, '2.00');
    expect(await changedBadge()).toMatch(/2 changed/);
    expect(await page.locator('.lw-dataset').innerText()).toMatch(/unsaved/);
    await page.reload();
    await waitForPlan(page);
    await expect.poll(changedBadge).toMatch(/2 changed/);
    expect(await page.locator('.lw-dataset').innerText()).toMatch(/unsaved/);
  });

  it('asks before a sample replaces them; Cancel keeps both', async () => {
    await page.getByRole('button', { name: 'Sample carrier with rebate loop' }).click();
    await prompt().waitFor();
    expect(await prompt().innerText()).toMatch(/what-if edits/);
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe('Cancel');
    await prompt().getByRole('button', { name: 'Cancel' }).click();
    expect(await prompt().count()).toBe(0);
    expect(await changedBadge()).toMatch(/2 changed/);
    expect(await keptLanesFile()).toBe('sample:lanes.csv');
  });

  it('Save writes the scenario file with both edits, then the sample opens; a reload reopens it', async () => {
    await page.getByRole('button', { name: 'Sample carrier with rebate loop' }).click();
    await prompt().waitFor();
    const [download] = await Promise.all([page.waitForEvent('download'), prompt().getByRole('button', { name: 'Save scenario file' }).click()]);
    const saved = parseScenarioDocument(readFileSync(await download.path(), 'utf8'));
    expect(saved.changes).toHaveLength(2);
    await expect.poll(() => page.locator('.lw-dataset').innerText()).toMatch(/lanes-rebate-loop\.csv/);
    await expect.poll(keptLanesFile).toBe('sample:lanes-rebate-loop.csv');
    await page.reload();
    await waitForPlan(page);
    await expect.poll(() => page.locator('.lw-dataset').innerText()).toMatch(/lanes-rebate-loop\.csv/);
    expect(await changedBadge()).not.toMatch(/changed/);
  });

  it('asks before Import and before a scenario file replaces an edit; Discard goes on', async () => {
    await editRebate(0, '3.00');
    await page.getByRole('button', { name: 'Import CSV…' }).click();
    await prompt().waitFor();
    await prompt().getByRole('button', { name: 'Discard' }).click();
    await page.getByRole('dialog', { name: /Import depots and lanes/ }).waitFor();
    await page.keyboard.press('Escape');
    await page.getByRole('button', { name: 'Load a scenario file…' }).click();
    await prompt().waitFor();
    await prompt().getByRole('button', { name: 'Cancel' }).click();
    expect(await changedBadge()).toMatch(/1 changed/);
  });

  it('made no request outside localhost and logged no errors', () => {
    expect(offsiteRequests(session)).toEqual([]);
    expect(session.errors).toEqual([]);
  });
});
