// The map as a dispatcher uses it all day, at a laptop's 1024×700 and at 1440×900: the view fits
// every depot of the sample (and "Fit network" brings it back after zooming), depot ids appear as
// labels when zoomed in and can be switched off, the key folds away and never covers the loop's
// label, and depots are reached with the keyboard.

import type { Page } from 'playwright-core';
import { afterAll, describe, expect, it } from 'vitest';
import { offsiteRequests, openReadyApp, snap, waitForPlan, type Session } from './support/browser';
import { expectedPlan, sample } from './support/expected';

const sessions: Session[] = [];

async function start(width: number, height: number): Promise<Page> {
  const session = await openReadyApp({ width, height });
  sessions.push(session);
  return session.page;
}

const map = (page: Page) => page.getByRole('region', { name: /Network map/ });
const zoom = async (page: Page) => Number(await map(page).getAttribute('data-zoom'));

/** Zooms in up to `level`: with the map's + button, or with the wheel over the origin (each step waits for its zoom to end). */
async function zoomTo(page: Page, level: number, overOrigin = false): Promise<void> {
  while ((await zoom(page)) < level) {
    const before = await zoom(page);
    if (overOrigin) {
      const box = (await page.getByTestId('map-depot-cursor').boundingBox())!;
      await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
      await page.mouse.wheel(0, -100);
    } else await page.getByRole('button', { name: 'Zoom in' }).click();
    await expect.poll(() => zoom(page)).toBeGreaterThan(before);
  }
}
const inView = async (page: Page) => Number(await map(page).getAttribute('data-depots-in-view'));

function overlaps(a: { x: number; y: number; width: number; height: number }, b: { x: number; y: number; width: number; height: number }): boolean {
  return a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
}

afterAll(async () => {
  for (const s of sessions) {
    expect(offsiteRequests(s)).toEqual([]);
    expect(s.errors).toEqual([]);
    await s.close();
  }
});

describe.each([
  [1024, 700],
  [1440, 900],
])('map at %i×%i', (width, height) => {
  let page: Page;

  it('fits every depot of the sample, and Fit network brings them back after zooming in', async () => {
    page = await start(width, height);
    const depots = expectedPlan(sample('depots.csv'), sample('lanes.csv'), 'RTM', await page.getByLabel('Dispatch date').inputValue()).depotCount;
    await expect.poll(() => inView(page)).toBe(depots);
    expect(await map(page).getAttribute('aria-label')).toContain(`${depots} depots (${depots} in view)`);
    await zoomTo(page, (await zoom(page)) + 3);
    await expect.poll(() => inView(page)).toBeLessThan(depots);
    await page.getByRole('button', { name: 'Fit network' }).click();
    await expect.poll(() => inView(page)).toBe(depots);
  });

  it('labels depots with their ids when zoomed in, and the label layer can be turned off', async () => {
    expect(Number(await map(page).getAttribute('data-depot-labels'))).toBe(0); // not at the whole-network view
    await zoomTo(page, 8, true); // labels start at zoom 7 (renderer/map/depot-labels.ts, which needs a DOM to import)
    await expect.poll(async () => Number(await map(page).getAttribute('data-depot-labels'))).toBeGreaterThan(0);
    const ids = new Set(sample('depots.csv').split('\n').slice(1).map((line) => line.split(',')[0]));
    for (const text of await page.locator('.lw-depot-label').allInnerTexts()) expect(ids.has(text), text).toBe(true);
    await snap(page, `map-labels-${width}x${height}`);
    await page.getByLabel('Depot labels').uncheck();
    await expect.poll(() => page.locator('.lw-depot-label').count()).toBe(0);
    await page.getByLabel('Depot labels').check();
    await expect.poll(() => page.locator('.lw-depot-label').count()).toBeGreaterThan(0);
    await page.getByRole('button', { name: 'Fit network' }).click();
  });

  it('reaches depots by keyboard: arrows move, Enter opens the route', async () => {
    const cursor = page.getByTestId('map-depot-cursor');
    await cursor.focus();
    expect(await cursor.getAttribute('aria-label')).toMatch(/^Depot RTM · .*origin/);
    await page.keyboard.press('ArrowDown');
    const label = (await cursor.getAttribute('aria-label')) ?? '';
    const id = /^Depot (\S+)/.exec(label)?.[1];
    expect(id).toBeDefined();
    expect(id).not.toBe('RTM');
    await page.keyboard.press('Enter');
    await expect.poll(() => page.locator('#lw-route-title').innerText()).toContain(`Route to ${id}`);
    await page.keyboard.press('Home');
    expect(await cursor.getAttribute('aria-label')).toMatch(/^Depot RTM/);
  });

  it('keeps the key clear of the loop label, and folds the key away', async () => {
    await page.getByRole('button', { name: 'Sample carrier with rebate loop' }).click();
    await page.getByRole('alert').filter({ hasText: 'Rebate loop' }).waitFor();
    await waitForPlan(page);
    const toggle = page.getByRole('button', { name: /^Map key/ });
    if ((await toggle.getAttribute('aria-expanded')) === 'false') await toggle.click();
    await page.locator('#lw-legend').waitFor();
    await page.getByRole('button', { name: 'Fit network' }).click();
    const label = page.locator('.lw-loop-label').first();
    await label.waitFor();
    await expect
      .poll(async () => overlaps((await label.boundingBox())!, (await page.locator('.lw-map-corner').boundingBox())!))
      .toBe(false);
    await snap(page, `map-loop-${width}x${height}`);
    await toggle.click();
    expect(await toggle.getAttribute('aria-expanded')).toBe('false');
    expect(await page.locator('#lw-legend').count()).toBe(0);
    // The caution sits in the map's attribution corner.
    expect(await page.locator('.leaflet-control-attribution').innerText()).toMatch(/estimates.*driver hours/);
  });
});
