// The caution on every surface that shows a route or a cost: the results table, the route, the map's
// attribution corner, the scenario comparison and the contract review, in the words of
// engine/text/cautions.ts (the one place they are written). Lanes are named in words on all of them.

import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAP_CAUTION, REVIEW_CAUTION, ROUTE_CAUTION } from '../../engine/text/cautions';
import { editLaneAmount, offsiteRequests, openReadyApp, type Session } from './support/browser';

let session: Session;
let page: Page;

beforeAll(async () => {
  session = await openReadyApp({ width: 1024, height: 700 });
  page = session.page;
});

afterAll(async () => {
  await session?.close();
});

const visibleText = (testId: string) => page.getByTestId(testId).innerText();

describe('cautions', () => {
  it('sits above the results, with the route and on the map', async () => {
    expect(await visibleText('results-caution')).toContain(ROUTE_CAUTION);
    const caution = (await page.getByTestId('results-caution').boundingBox())!;
    const head = (await page.locator('[data-testid="results-table"] thead').boundingBox())!;
    expect(caution.y).toBeLessThan(head.y); // a line above the table
    await page.locator('[data-testid="results-table"] tr[data-depot="LYS"]').click();
    expect(await visibleText('route-caution')).toContain(ROUTE_CAUTION);
    // Its own sentence first in the corner, set apart from the map data's credit.
    expect(await page.locator('.leaflet-control-attribution').innerText()).toMatch(new RegExp(`^${MAP_CAUTION.replace(/[.;]/g, '\\$&')}\\s*\\|\\s*Land and borders`));
  });

  it('comes with the scenario comparison and the contract review', async () => {
    await editLaneAmount(page, 'rebate', 0, '1.00');
    expect(await visibleText('compare-caution')).toContain(ROUTE_CAUTION);
    await page.getByRole('tab', { name: /Contract review/ }).click();
    await page.getByTestId('contract-review').waitFor();
    expect(await visibleText('review-caution')).toContain(REVIEW_CAUTION);
  });

  it('names lanes in words everywhere, never by an internal key, and calls the demo the sample carrier', async () => {
    // Internal lane keys look like `FRA>SXB|BFH-L-019|1`; they must not reach text, titles or labels.
    const shown = () =>
      page.evaluate(() => [document.body.innerText, ...[...document.querySelectorAll('[title],[aria-label]')].map((e) => `${e.getAttribute('title') ?? ''} ${e.getAttribute('aria-label') ?? ''}`)].join('\n'));
    const check = async (where: string) => {
      const text = await shown();
      expect(text, where).not.toMatch(/[^\s>|]+>[^\s>|]+\|[^|\s]*\|\d/);
      expect(text, where).not.toMatch(/sample scenario/i);
    };
    await check('contract review with a scenario edit');
    await page.getByRole('tab', { name: /Lanes & scenario/ }).click();
    await check('lanes and scenario');
    await page.getByRole('button', { name: 'Sample carrier with rebate loop' }).click();
    const prompt = page.getByRole('dialog', { name: 'Unsaved changes' });
    await prompt.getByRole('button', { name: 'Discard' }).click();
    await page.getByRole('alert').filter({ hasText: 'Rebate loop' }).waitFor();
    await check('rebate loop banner');
    await page.getByRole('tab', { name: /Contract review/ }).click();
    await page.getByTestId('contract-review').waitFor();
    await check('contract review of the loop');
  });

  it('made no request outside localhost and logged no errors', () => {
    expect(offsiteRequests(session)).toEqual([]);
    expect(session.errors).toEqual([]);
  });
});
