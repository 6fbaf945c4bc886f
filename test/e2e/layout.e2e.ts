// The window's layout at a laptop's 1024×700 and at 1440×900: the rebate-loop banner, the map and
// the results panel each keep a usable height, the banner folds to one line once read, the panels
// resize by dragging and by keyboard, selecting a route leaves the heights alone, and the sticky
// table header hides the rows scrolled under it.

import type { Page } from 'playwright-core';
import { afterAll, describe, expect, it } from 'vitest';
import { offsiteRequests, openReadyApp, snap, waitForPlan, type Session } from './support/browser';

const sessions: Session[] = [];

afterAll(async () => {
  for (const s of sessions) {
    expect(offsiteRequests(s)).toEqual([]);
    expect(s.errors).toEqual([]);
    await s.close();
  }
});

async function heights(page: Page): Promise<{ banner: number; map: number; panel: number }> {
  return page.evaluate(() => {
    const h = (selector: string) => document.querySelector(selector)?.getBoundingClientRect().height ?? 0;
    return { banner: h('.lw-loop-alert'), map: h('.lw-map'), panel: h('#lw-lower') };
  });
}

// Usable: the map shows the network at a readable size, the panel its tools, header and rows.
const MAP_MIN = 150;
const PANEL_MIN = 150;
const ROW_PX = 22;

describe.each([
  [1024, 700],
  [1440, 900],
])('layout at %i×%i', (width, height) => {
  let page: Page;

  it('keeps banner, map and panel usable, and folds the banner to one line once read', async () => {
    const session = await openReadyApp({ width, height });
    sessions.push(session);
    page = session.page;
    await page.getByRole('button', { name: 'Sample carrier with rebate loop' }).click();
    const banner = page.getByRole('alert').filter({ hasText: 'Rebate loop' });
    await banner.waitFor();
    await waitForPlan(page);
    const open = await heights(page);
    expect(open.banner).toBeGreaterThanOrEqual(80); // headline, explanation and the first loop's start
    expect(open.map).toBeGreaterThanOrEqual(MAP_MIN);
    expect(open.panel).toBeGreaterThanOrEqual(PANEL_MIN);
    await snap(page, `layout-banner-open-${width}x${height}`);

    // Acting elsewhere means it was read: one line that still names the loop.
    await page.getByRole('tab', { name: 'Results' }).click();
    await expect.poll(() => banner.getAttribute('data-folded')).toBe('yes');
    expect(await banner.innerText()).toContain('FRA → SXB → FRA');
    const folded = await heights(page);
    expect(folded.banner).toBeLessThanOrEqual(44);
    expect(folded.map).toBeGreaterThan(open.map);
    expect(folded.map).toBeGreaterThanOrEqual(220);
    expect(folded.panel).toBeGreaterThanOrEqual(200);
    const rows = await page.locator('[data-testid="results-table"] tbody tr').evaluateAll((trs, bottom) => trs.filter((tr) => tr.getBoundingClientRect().bottom <= bottom).length, await page.evaluate(() => document.querySelector('#lw-lower')!.getBoundingClientRect().bottom));
    expect(rows).toBeGreaterThanOrEqual(Math.floor((200 - 90) / ROW_PX)); // several rows, not one
    await snap(page, `layout-banner-folded-${width}x${height}`);
    await banner.getByRole('button', { name: 'Details' }).click();
    await expect.poll(() => banner.getAttribute('data-folded')).toBe('no');
    await banner.getByRole('button', { name: 'Fold to one line' }).click();
    await expect.poll(() => banner.getAttribute('data-folded')).toBe('yes');
  });

  it('resizes the results panel by keyboard and by dragging the splitter', async () => {
    const splitter = page.getByRole('separator', { name: 'Height of the results panel' });
    const before = Number(await splitter.getAttribute('aria-valuenow'));
    const panelBefore = (await heights(page)).panel;
    await splitter.focus();
    await page.keyboard.press('ArrowUp');
    await expect.poll(async () => Number(await splitter.getAttribute('aria-valuenow'))).toBe(before + 24);
    await expect.poll(async () => Math.round((await heights(page)).panel)).toBe(Math.round(panelBefore + 24));
    await page.keyboard.press('ArrowDown');
    await expect.poll(async () => Number(await splitter.getAttribute('aria-valuenow'))).toBe(before);

    const box = (await splitter.boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2 + 40, { steps: 4 });
    await page.mouse.up();
    await expect.poll(async () => Number(await splitter.getAttribute('aria-valuenow'))).toBe(before - 40);
    const min = Number(await splitter.getAttribute('aria-valuemin'));
    await splitter.focus();
    await page.keyboard.press('Home');
    expect(Number(await splitter.getAttribute('aria-valuenow'))).toBe(min);
    expect((await heights(page)).map).toBeGreaterThanOrEqual(MAP_MIN);
    await page.keyboard.press('End');
    expect((await heights(page)).map).toBeGreaterThanOrEqual(MAP_MIN - 1);
    // The side panel's width has its own splitter.
    const side = page.getByRole('separator', { name: 'Width of the plan and route panel' });
    const sideBefore = Number(await side.getAttribute('aria-valuenow'));
    await side.focus();
    await page.keyboard.press('ArrowRight');
    expect(Number(await side.getAttribute('aria-valuenow'))).toBe(sideBefore + 24);
    await page.keyboard.press('ArrowLeft');
    await splitter.focus();
    for (let i = 0; i < 40 && Number(await splitter.getAttribute('aria-valuenow')) > before; i++) await page.keyboard.press('ArrowDown');
    for (let i = 0; i < 40 && Number(await splitter.getAttribute('aria-valuenow')) < before; i++) await page.keyboard.press('ArrowUp');
  });

  it('keeps the heights of map and panel when a route is selected', async () => {
    await page.getByRole('button', { name: 'Sample carrier', exact: true }).click();
    await waitForPlan(page);
    await page.getByRole('tab', { name: 'Results' }).click();
    const before = await heights(page);
    for (const id of ['MIL', 'ZRH', 'AMS']) {
      await page.locator(`[data-testid="results-table"] tr[data-depot="${id}"]`).click();
      await expect.poll(() => page.locator('#lw-route-title').innerText()).toContain(`Route to ${id}`);
      const after = await heights(page);
      expect(after.map).toBe(before.map);
      expect(after.panel).toBe(before.panel);
    }
    await snap(page, `layout-route-${width}x${height}`);
  });

  it('shows no row through or above the sticky table header', async () => {
    const panel = page.locator('#panel-results');
    await panel.evaluate((el) => (el.scrollTop = 300));
    const header = page.locator('[data-testid="results-table"] thead th').first();
    const panelBox = (await panel.boundingBox())!;
    const headBox = (await header.boundingBox())!;
    expect(Math.round(headBox.y)).toBe(Math.round(panelBox.y)); // stuck at the very top of the panel
    for (const y of [panelBox.y + 1, headBox.y + headBox.height / 2, headBox.y + headBox.height - 1]) {
      const inHead = await page.evaluate(([x, yy]) => !!document.elementFromPoint(x, yy)?.closest('thead'), [headBox.x + 30, y]);
      expect(inHead, `y=${y}`).toBe(true);
    }
    await panel.evaluate((el) => (el.scrollTop = 0));
  });
});
