// A day of 10,000 loads in the Loads panel: the table is windowed (only the rows in view are in the
// DOM, the spacer rows keep the scrollbar's length), scrolling to the end shows the last load, and
// the keyboard still walks the whole table (End, arrows, Enter selects) across the window's edge.
// The loads run over the sample network's depots; which rows are planned is the engine's business.

import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chooseFile, openReadyApp, snap, type Session } from './support/browser';

const LOADS = 10_000;
/** Far fewer than the loads: a window of rows in view plus overscan. */
const MAX_RENDERED = 200;

let session: Session;
let page: Page;

function loadsFile(): { text: string; ids: string[] } {
  const depots = readFileSync('sample-data/depots.csv', 'utf8').trim().split('\n').slice(1).map((line) => line.split(',')[0]);
  const lines = ['load,from,to,vehicle_class'];
  const ids: string[] = [];
  for (let i = 0; i < LOADS; i++) {
    // Zero-padded, so the table's default order (by load id, as text) is the file's order.
    const id = `B${String(i).padStart(5, '0')}`;
    const from = depots[i % depots.length];
    const to = depots[(i * 7 + 3) % depots.length];
    ids.push(id);
    lines.push(`${id},${from},${to === from ? depots[(i + 1) % depots.length] : to},`);
  }
  return { text: lines.join('\n') + '\n', ids };
}

const rendered = () => page.locator('[data-testid="loads-table"] tbody tr[data-load]').count();
const focusedLoad = () => page.evaluate(() => document.activeElement?.getAttribute('data-load') ?? null);

beforeAll(async () => {
  session = await openReadyApp({ width: 1440, height: 900 });
  page = session.page;
});

afterAll(async () => {
  await session?.close();
});

describe('Loads panel with 10,000 loads', () => {
  const { text, ids } = loadsFile();

  it('renders only the rows in view and scrolls to the last load', async () => {
    await page.getByRole('tab', { name: /Loads/ }).click();
    const started = Date.now();
    await chooseFile(page, () => page.getByRole('button', { name: 'Import loads…' }).click(), 'loads-10000.csv', text);
    const table = page.locator('[data-testid="loads-table"]');
    await table.waitFor({ timeout: 120_000 });
    console.log(JSON.stringify({ loads: LOADS, import_plan_and_first_table_ms: Date.now() - started, note: 'shared machine; not asserted' }));
    expect(await table.getAttribute('aria-rowcount')).toBe(String(LOADS + 1));
    expect(await table.getAttribute('data-windowed')).toBe('true');
    expect(await rendered()).toBeLessThan(MAX_RENDERED);
    expect(await table.locator(`tr[data-load="${ids[0]}"]`).count()).toBe(1);

    const scroller = page.locator('[data-testid="loads-scroll"]');
    await scroller.evaluate((e) => (e.scrollTop = e.scrollHeight));
    await expect.poll(() => table.locator(`tr[data-load="${ids[LOADS - 1]}"]`).count()).toBe(1);
    expect(await table.locator(`tr[data-load="${ids[0]}"]`).count()).toBe(0);
    expect(await rendered()).toBeLessThan(MAX_RENDERED);
    await snap(page, 'loads-10000-end');
  });

  it('walks the whole table by keyboard and selects with Enter', async () => {
    const scroller = page.locator('[data-testid="loads-scroll"]');
    await scroller.evaluate((e) => (e.scrollTop = 0));
    const first = page.locator(`tr[data-load="${ids[0]}"]`);
    await first.waitFor();
    await first.focus();
    await page.keyboard.press('End');
    await expect.poll(focusedLoad).toBe(ids[LOADS - 1]);
    await page.keyboard.press('ArrowUp');
    await expect.poll(focusedLoad).toBe(ids[LOADS - 2]);
    await page.keyboard.press('Enter');
    await expect.poll(() => page.locator('[data-testid="load-detail"] h3').innerText()).toContain(`Load ${ids[LOADS - 2]}:`);
    await page.keyboard.press('Home');
    await expect.poll(focusedLoad).toBe(ids[0]);
    await page.keyboard.press('PageDown');
    await expect.poll(focusedLoad).toBe(ids[15]);
    // The table is one Tab stop: Tab leaves it rather than walking 10,000 rows.
    expect(await page.locator('[data-testid="loads-table"] tbody tr[tabindex="0"]').count()).toBe(1);
    expect(await rendered()).toBeLessThan(MAX_RENDERED);
  });
});
