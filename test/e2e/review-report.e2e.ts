// The calendar review in a real browser: with the loop sample planned for a day without a loop,
// the review still counts the contract's loops on other dates and names the day of the one-day
// review; the review report saves as HTML, and printed to PDF in Chromium it reads back (pdfjs-dist)
// with its window, loops, clause table and caution. Figures come from the engine run here in Node.

import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { reviewCalendar } from '../../engine/audit/calendar/calendar-review';
import { calendarReport } from '../../engine/report/calendar-report';
import { importNetwork } from '../../engine/planning/import-network';
import { offsiteRequests, openApp, snap, waitForPlan, type Session } from './support/browser';
import { pdfPages } from './support/pdf-text';

let session: Session;
let page: Page;
const text = (name: string) => readFileSync(`sample-data/${name}`, 'utf8');

beforeAll(async () => {
  session = await openApp();
  page = session.page;
  await page.getByRole('button', { name: 'I understand' }).click();
  await waitForPlan(page);
});

afterAll(async () => {
  await session?.close();
});

describe('calendar review and its report', () => {
  it('counts the loops of the whole contract on a day without one, and prints the report', async () => {
    const imported = importNetwork(text('depots.csv'), text('lanes-rebate-loop.csv'));
    const expected = calendarReport(imported, reviewCalendar(imported));
    expect(expected.loops.length).toBe(2);

    await page.getByRole('button', { name: 'Sample carrier with rebate loop' }).click();
    await waitForPlan(page);
    await page.getByLabel('Dispatch date').fill('2026-11-01');
    await waitForPlan(page);
    await page.getByRole('tab', { name: /Contract review/ }).click();
    const calendar = page.locator('[data-testid="calendar-review"]');
    await calendar.waitFor({ timeout: 60_000 });
    const shown = await page.locator('[data-testid="contract-review"]').innerText();
    expect(shown).toContain(`Rebate loops in the whole contract, ${expected.window.from} to ${expected.window.to}: 2`);
    expect(shown).toMatch(/One-day review: rebate loops on 2026-11-01: 0/);
    for (const loop of expected.loops) expect(shown).toContain(`Loop ${loop.id}: ${[...loop.depots, loop.depots[0]].join(' → ')}`);
    expect(await page.locator('.lw-strip-on').count()).toBe(expected.periods.reduce((n, p) => n + p.loops.length, 0));
    await snap(page, 'calendar-review');

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Save review report (HTML)' }).click()]);
    const html = readFileSync((await download.path())!, 'utf8');
    expect(html).toContain('Contract review across the calendar');

    const printed = await session.context.newPage();
    await printed.setContent(html);
    const pages = await pdfPages(new Uint8Array(await printed.pdf({ format: 'A4', landscape: true, printBackground: true })));
    await printed.close();
    expect(pages.length).toBeGreaterThanOrEqual(1);
    const all = pages.join(' ');
    expect(all).toContain(`${expected.window.from} to ${expected.window.to}`);
    expect(all).toContain('Loop 1: FRA > SXB > FRA');
    expect(all).toContain('Loop 2: MHG > KRL > MHG');
    expect(all).toMatch(/Fix plan for the whole calendar/);
    expect(all).toMatch(/Defer to local codes/);
    expect(all).toMatch(/[0-9a-f]{64}/);
    expect(offsiteRequests(session)).toEqual([]);
  });
});
