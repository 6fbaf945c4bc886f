// The calendar review in a real browser: with the loop sample planned for a day without a loop,
// the review still counts the contract's loops on other dates and names the day of the one-day
// review; the review report saves as HTML, and printed to PDF in Chromium it reads back (pdfjs-dist)
// with its window, loops, clause table and caution. The strip's ranges set the dispatch date; the
// clause table sits beside the lane table and picks its lanes; the fix plan, by lane or by clause,
// applies as scenario changes that name plan, row and classes, and the review then runs under that
// what-if; undoing a change brings its loop back. Figures come from the engine run here in Node.

import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { reviewCalendar } from '../../engine/audit/calendar/calendar-review';
import { calendarReport } from '../../engine/report/calendar-report';
import { importNetwork } from '../../engine/planning/import-network';
import { offsiteRequests, openReadyApp, snap, waitForPlan, type Session } from './support/browser';
import { pdfPages } from './support/pdf-text';

let session: Session;
let page: Page;
const text = (name: string) => readFileSync(`sample-data/${name}`, 'utf8');

beforeAll(async () => {
  session = await openReadyApp();
  page = session.page;
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
    // One hatched bar per loop range, carrying its number and dates as text (readable without colour).
    const bars = page.locator('[data-testid="calendar-strip"] .lw-cal-bar');
    expect(await bars.count()).toBe(expected.loops.reduce((n, l) => n + l.ranges.length, 0));
    expect(await bars.allInnerTexts()).toEqual(expected.loops.flatMap((l) => l.ranges.map((r) => `${l.id}: ${r.from!.slice(5)} – ${r.to!.slice(5)}`)));
    expect(await page.locator('[data-testid="calendar-strip"] .lw-cal-period').count()).toBe(expected.periods.length);
    const hatch = await bars.first().evaluate((el) => getComputedStyle(el).backgroundImage);
    expect(hatch).toMatch(/repeating-linear-gradient/);
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

  it('a range of the strip sets the dispatch date; the one-day review then names that date', async () => {
    const imported = importNetwork(text('depots.csv'), text('lanes-rebate-loop.csv'));
    const expected = calendarReport(imported, reviewCalendar(imported));
    // Loop 2 holds for the 2-axle class only: its bar plans 2026-06-01 for that class, where both
    // loops hold, as the calendar's ranges by class say.
    expect(expected.loops[1].classes).toEqual(['2axle']);
    expect(await page.getByLabel('Vehicle class').inputValue()).toBe('');
    const onJune1 = expected.loops.filter((l) => l.ranges.some((r) => r.from! <= '2026-06-01' && r.to! >= '2026-06-01' && r.by_class.some((c) => c.vehicle_class === '2axle'))).length;
    expect(onJune1).toBe(2);
    const loop = page.getByRole('button', { name: 'Loop 2, 2026-06-01 to 2026-08-31: set the dispatch date to 2026-06-01' });
    await loop.click();
    await expect.poll(() => page.getByLabel('Dispatch date').inputValue(), { timeout: 30_000 }).toBe('2026-06-01');
    expect(await page.getByLabel('Vehicle class').inputValue()).toBe('2axle');
    await waitForPlan(page);
    await page.locator('[data-testid="calendar-review"]').waitFor({ timeout: 60_000 });
    await expect.poll(() => page.locator('[data-testid="contract-review"]').innerText(), { timeout: 60_000 }).toMatch(new RegExp(`One-day review: rebate loops on 2026-06-01: ${onJune1}`));
    const period = page.getByRole('button', { name: /^Period 2026-10-01 to .*: set the dispatch date to 2026-10-01$/ });
    await period.click();
    await expect.poll(() => page.getByLabel('Dispatch date').inputValue(), { timeout: 30_000 }).toBe('2026-10-01');
  });

  it('the clause table sits beside the lane table, and a clause shows its lanes', async () => {
    await page.locator('[data-testid="calendar-review"]').waitFor({ timeout: 60_000 });
    const clauses = page.getByRole('table', { name: 'Clauses' });
    const lanes = page.getByRole('table', { name: 'Lanes over the calendar' });
    const [a, b] = [await clauses.boundingBox(), await lanes.boundingBox()];
    expect(a && b && a.x + a.width <= b.x + 1 && Math.abs(a.y - b.y) < 40, `side by side: ${JSON.stringify([a, b])}`).toBe(true);
    await clauses.getByRole('button', { name: '8.1', exact: true }).click();
    const of81 = page.getByRole('table', { name: 'Lanes of clause 8.1' });
    const text = await of81.innerText();
    expect(text).toMatch(/MHG → KRL/);
    expect(text).toMatch(/KRL → MHG/);
    expect(text).not.toMatch(/FRA → SXB/);
    await page.getByRole('button', { name: 'Every lane' }).click();
    await lanes.waitFor();
    await snap(page, 'calendar-clauses-beside-lanes');
  });

  it('applies the fix plan by clause, then by lane, as a scenario: named changes, the review under it, undo and save', async () => {
    const imported = importNetwork(text('depots.csv'), text('lanes-rebate-loop.csv'));
    const byClause = calendarReport(imported, reviewCalendar(imported, { fixBy: 'clause' }), 'clause');
    const review = page.locator('[data-testid="contract-review"]');
    await page.locator('[data-testid="calendar-review"]').waitFor({ timeout: 60_000 });
    await page.getByLabel('Fix plan by lane or by clause').selectOption('clause');
    await expect.poll(() => review.innerText(), { timeout: 60_000 }).toMatch(/Method: /);
    await page.getByRole('button', { name: 'Apply this fix plan (by clause) as a scenario' }).click();
    // The review runs again under the what-if: no loop in any period.
    await expect.poll(() => review.innerText(), { timeout: 60_000 }).toMatch(/Rebate loops in the whole contract, 2026-01-01 to 2027-06-30 \(scenario “[^”]+”\): 0/);
    expect(await review.innerText()).toMatch(/the contract as the scenario “[^”]+” changes it \(3 of 3 changes applied\)/);
    // The Export menu's review report is the calendar under the same what-if.
    const [exported] = await Promise.all([page.waitForEvent('download'), page.getByLabel('Export', { exact: true }).selectOption('review-html')]);
    expect(exported.suggestedFilename()).toMatch(/^contract-review-2026-01-01-2027-06-30.*\.html$/);
    const html = readFileSync((await exported.path())!, 'utf8');
    expect(html).toMatch(/Under the what-if scenario “[^”]+”/);
    expect(html).toContain('No rebate loop in any period of the window, for any vehicle class.');
    expect(html).toContain('calendar fix plan by clause 7.2');

    await page.getByRole('tab', { name: /Lanes & scenario/ }).click();
    const changes = page.locator('[data-testid="scenario-compare"] li');
    await expect.poll(() => changes.count(), { timeout: 30_000 }).toBe(byClause.fix_plan.length);
    const listed = await changes.allInnerTexts();
    for (const f of byClause.fix_plan) {
      const line = listed.find((l) => l.includes(`lanes-file row ${f.row};`));
      expect(line, `row ${f.row}`).toBeDefined();
      expect(line).toContain(`calendar fix plan by clause ${f.clause} (${f.clause_percent} % of its rebates)`);
      expect(line).toMatch(/the rebate holds for every vehicle class \(reviewed: 2axle(, 5axle)?\)/);
    }
    const [saved] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Save as scenario file…' }).click()]);
    const document = JSON.parse(readFileSync((await saved.path())!, 'utf8'));
    expect(document.changes.map((c: { field: string; note: string }) => [c.field, c.note.startsWith('calendar fix plan by clause')])).toEqual(byClause.fix_plan.map(() => ['rebate', true]));

    // Undo the change on row 20 (FRA > SXB): loop 1 comes back in the review under the scenario.
    await page.getByRole('button', { name: /^Undo change \d+: .*FRA( → |>)SXB/ }).click();
    await page.getByRole('tab', { name: /Contract review/ }).click();
    await expect.poll(() => review.innerText(), { timeout: 60_000 }).toMatch(/Rebate loops in the whole contract, 2026-01-01 to 2027-06-30 \(scenario “[^”]+”\): 1/);
    expect(await review.innerText()).toContain('Loop 1: FRA → SXB → FRA');
    await snap(page, 'calendar-review-under-fix-scenario');

    // By lane, over what the scenario still leaves: one more change, on the lane the plan names.
    const byLane = calendarReport(imported, reviewCalendar(imported), 'lane');
    await page.getByLabel('Fix plan by lane or by clause').selectOption('lane');
    await page.getByRole('button', { name: 'Apply this fix plan (by lane) as a scenario' }).click();
    await expect.poll(() => review.innerText(), { timeout: 60_000 }).toMatch(/Rebate loops in the whole contract, 2026-01-01 to 2027-06-30 \(scenario “[^”]+”\): 0/);
    await page.getByRole('tab', { name: /Lanes & scenario/ }).click();
    const lane20 = byLane.fix_plan.find((f) => f.row === 20)!;
    expect(await changes.allInnerTexts()).toContainEqual(expect.stringContaining(`calendar fix plan by lane (clause ${lane20.clause}): lanes-file row 20;`));
    await page.getByRole('button', { name: 'Back to the base contract' }).click();

    // The one-day plan's changes name their day, class and row too.
    await page.getByRole('tab', { name: /Contract review/ }).click();
    await page.getByRole('button', { name: 'Loop 2, 2026-06-01 to 2026-08-31: set the dispatch date to 2026-06-01' }).click();
    await expect.poll(() => review.innerText(), { timeout: 60_000 }).toMatch(/One-day review: rebate loops on 2026-06-01: 2/);
    await page.getByRole('button', { name: 'Try the fix plan as a scenario' }).click();
    await page.getByRole('tab', { name: /Lanes & scenario/ }).click();
    await expect.poll(() => changes.allInnerTexts(), { timeout: 30_000 }).toContainEqual(expect.stringContaining('one-day fix plan on 2026-06-01 (vehicle class 2axle): lanes-file row 20;'));
    await page.getByRole('button', { name: 'Back to the base contract' }).click();
    expect(offsiteRequests(session)).toEqual([]);
  });
});
