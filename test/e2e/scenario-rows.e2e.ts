// A lanes-file row that a scenario's validity change brings into the date is planned, listed with
// the lanes only the scenario plans (from the worker's overlay, not from the scenario) and drawn on
// the map with its label; it was solved but left off the map.

import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { serializeScenarioDocument } from '../../engine/index';
import { offsiteRequests, openReadyApp, snap, solveCount, waitForPlan, type Session } from './support/browser';

let session: Session;
let page: Page;

beforeAll(async () => {
  session = await openReadyApp({ width: 1440, height: 900 });
  page = session.page;
});

afterAll(async () => {
  await session?.close();
});

describe('a row the scenario brings into the date', () => {
  it('is listed and drawn, labelled, on the map', async () => {
    let before = await solveCount(page);
    await page.getByRole('button', { name: 'Sample carrier with rebate loop' }).click();
    await waitForPlan(page, before);
    // On 1 November the clause 7.2 refund row (row 20, FRA > SXB, March to September) is not valid.
    before = await solveCount(page);
    await page.getByLabel('Dispatch date').fill('2026-11-01');
    await page.getByLabel('Dispatch date').press('Enter');
    await waitForPlan(page, before);
    const scenario = {
      name: 'Refund all year',
      description: null,
      changes: [{ kind: 'set-validity' as const, lane: { from: 'FRA', to: 'SXB', ref: 'BFH-L-019', occurrence: 1 }, validFrom: null, validTo: null, note: null }],
    };
    await page.getByRole('tab', { name: /Lanes/ }).click();
    before = await solveCount(page);
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Load a scenario file…' }).click()]);
    await chooser.setFiles({ name: 'refund-all-year.json', mimeType: 'application/json', buffer: Buffer.from(serializeScenarioDocument(scenario), 'utf8') });
    await waitForPlan(page, before);

    const row = page.locator('[data-testid="lane-table"] tr[data-scenario-row="20"]');
    await expect.poll(() => row.count()).toBe(1);
    expect(await row.innerText()).toMatch(/row 20 valid by scenario/);
    const map = page.getByRole('region', { name: /Network map/ });
    await expect.poll(() => map.getAttribute('data-added-lanes')).toBe('1');
    expect(await page.locator('.lw-added-label').allInnerTexts()).toContain('Valid by scenario: FRA → SXB (BFH-L-019)');
    // With the refund all year the FRA/SXB loop is back on this date, drawn over the row.
    expect(await page.getByRole('alert').filter({ hasText: 'Rebate loop' }).count()).toBeGreaterThan(0);
    await snap(page, 'scenario-validity-row');
  });

  it('made no request outside localhost and logged no errors', () => {
    expect(offsiteRequests(session)).toEqual([]);
    expect(session.errors).toEqual([]);
  });
});
