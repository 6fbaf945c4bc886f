// Text from files goes into the page as text, never as HTML: depots whose ids and names are markup
// (an <img> with an onerror script, a <meta http-equiv=refresh> that navigated the page away on
// import, a <b id=...>) are imported, planned and drawn, and no element is ever created from them;
// the page stays where it was, and the strict policy (style-src without 'unsafe-inline') logs nothing.

import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { offsiteRequests, openReadyApp, pickImportFiles, waitForPlan, type Session } from './support/browser';

let session: Session;
let page: Page;

const IMG = '<img src=x onerror=window.__lwInjected=1>';
const META = '<meta http-equiv=refresh content=0;url=about:blank>';
const BOLD = '<b id=lw-injected>bold</b>';
const depots = `id,name,lat,lon\n${IMG},${BOLD},51.9,4.1\n${META},<i id=lw-injected-2>x</i>,51.2,4.3\nPLAIN,Plain depot,50.6,3.0\n`;
const lanes = `from,to,toll,fuel,fees,rebate,notes\n${IMG},${META},1.00,2.00,0,0,<script>window.__lwInjected=2</script>\n${META},PLAIN,1.00,2.00,0,0,${BOLD}\nPLAIN,${IMG},1.00,2.00,0,0,ok\n`;

beforeAll(async () => {
  session = await openReadyApp();
  page = session.page;
});

afterAll(async () => {
  await session?.close();
});

describe('hostile text in the files', () => {
  it('imports and plans depots with markup in ids and names, and creates no element from them', async () => {
    const url = page.url();
    await page.getByRole('button', { name: 'Import CSV…' }).click();
    const dialog = await pickImportFiles(page, { name: 'depots.csv', text: depots }, { name: 'lanes.csv', text: lanes });
    await dialog.getByRole('button', { name: 'Import', exact: true }).click();
    await expect.poll(() => page.locator('.lw-status').innerText(), { timeout: 30_000 }).toContain('3 depots · 3 lanes');
    await waitForPlan(page);
    // Zoomed in, the map labels every depot with its id (the label layer is on by default).
    const map = page.locator('.leaflet-container');
    await map.hover();
    for (let i = 0; i < 6; i++) await page.mouse.wheel(0, -400);
    await page.waitForTimeout(500);

    expect(page.url()).toBe(url);
    expect(await page.evaluate(() => (window as unknown as { __lwInjected?: number }).__lwInjected)).toBeUndefined();
    expect(await page.locator('#lw-injected, #lw-injected-2, img[src="x"], meta[http-equiv="refresh"], b#lw-injected').count()).toBe(0);
    // The ids are on the page as text.
    expect(await page.locator('body').innerText()).toContain(IMG);
  });

  it('made no request outside localhost and logged no errors (no policy violation)', () => {
    expect(offsiteRequests(session)).toEqual([]);
    expect(session.errors).toEqual([]);
  });
});
