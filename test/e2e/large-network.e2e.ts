// Recompute time after an edit on 5,000 depots and 50,000 lanes, measured in the real browser and
// printed as figures (never asserted: timings on a shared machine are noise, and speed targets
// belong to `npm run bench`). The test checks only that the edit took effect and nothing froze
// for good; costs on this synthetic network are checked against the engine for a few depots.

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bigNetwork } from './support/big-network';
import { offsiteRequests, openReadyApp, pickImportFiles, recordTimings, snap, solveCount, timedEdit, tollCell, waitForPlan, type Session } from './support/browser';
import { expectedPlan } from './support/expected';

const DEPOTS = 5_000;
const LANES_PER_DEPOT = 10;
const EDITS = 5;

let session: Session;

beforeAll(async () => {
  session = await openReadyApp({ width: 1440, height: 1000 });
});

afterAll(async () => {
  await session?.close();
});

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

describe('5,000 depots and 50,000 lanes', () => {
  it('imports, solves, and recomputes after lane edits (figures printed)', async () => {
    const page = session.page;
    const { depotsText, lanesText } = bigNetwork(DEPOTS, LANES_PER_DEPOT);

    // Long tasks on the UI thread show whether the page froze while the worker computed.
    await page.evaluate(() => {
      (window as unknown as { longTasks: number[] }).longTasks = [];
      new PerformanceObserver((list) => list.getEntries().forEach((e) => (window as unknown as { longTasks: number[] }).longTasks.push(e.duration))).observe({ type: 'longtask', buffered: false });
    });

    // A large import shows its progress and can be cancelled; the sample stays on screen and usable.
    // (A network four times larger, so the import is surely still running when Cancel is pressed.)
    const huge = bigNetwork(DEPOTS * 4, LANES_PER_DEPOT, 7);
    const statusBefore = await page.locator('.lw-status').innerText();
    await page.getByRole('button', { name: 'Import CSV…' }).click();
    let dialog = await pickImportFiles(page, { name: 'huge-depots.csv', text: huge.depotsText }, { name: 'huge-lanes.csv', text: huge.lanesText });
    await dialog.getByRole('button', { name: 'Import', exact: true }).click();
    // The progress sits inside the modal dialog, so the keyboard reaches its Cancel: Tab from Import.
    const progress = dialog.getByRole('group', { name: 'Work in progress' });
    await progress.waitFor();
    expect(await progress.locator('progress').count()).toBe(1);
    // While it runs, Import and the other workspace-replacing commands wait, and say why.
    const importButton = dialog.getByRole('button', { name: 'Import', exact: true });
    expect(await importButton.getAttribute('aria-disabled')).toBe('true');
    expect(await importButton.getAttribute('title')).toMatch(/import is running/);
    for (const name of ['Sample carrier', 'Sample carrier with rebate loop', 'Import CSV…']) expect(await page.getByRole('button', { name, exact: true, includeHidden: true }).getAttribute('aria-disabled'), name).toBe('true');
    const solvesBeforeCancel = await solveCount(page);
    await dialog.getByRole('button', { name: 'Import', exact: true }).focus();
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => (document.activeElement?.closest('.lw-progress') ? document.activeElement.textContent : null))).toBe('Cancel');
    await page.keyboard.press('Enter');
    await waitForPlan(page, solvesBeforeCancel); // the fresh worker solves the sample again
    expect(await page.locator('.lw-status').innerText()).toContain(statusBefore.split(' · ').slice(0, 2).join(' · '));
    await page.getByRole('button', { name: 'Cancel' }).first().click(); // close the import dialog
    await expect.poll(() => page.getByRole('dialog').count()).toBe(0);

    await page.getByRole('button', { name: 'Import CSV…' }).click();
    dialog = await pickImportFiles(page, { name: 'synthetic-depots.csv', text: depotsText }, { name: 'synthetic-lanes.csv', text: lanesText });
    await expect.poll(() => dialog.getByTestId('import-depots-name').innerText()).toBe('synthetic-depots.csv');
    const importStart = Date.now();
    await dialog.getByRole('button', { name: 'Import', exact: true }).click();
    await expect.poll(() => page.locator('.lw-status').innerText(), { timeout: 120_000 }).toContain(`${DEPOTS} depots · ${DEPOTS * LANES_PER_DEPOT} lanes`);
    await waitForPlan(page);
    const importMs = Date.now() - importStart;

    const origin = (await page.locator('.lw-origin-current').innerText()).split(' · ')[0];
    const date = await page.getByLabel('Dispatch date').inputValue();
    const expected = expectedPlan(depotsText, lanesText, origin, date);
    const shown = await page.locator('[data-testid="results-table"] tbody tr').evaluateAll((trs) => trs.slice(0, 50).map((tr) => [tr.getAttribute('data-depot'), tr.getAttribute('data-cost-minor')]));
    for (const [id, cost] of shown) if (expected.cost.has(id!)) expect(cost, `cost of ${id}`).toBe(String(expected.cost.get(id!)));
    await snap(page, 'large-network');

    const longTasksOf = () => page.evaluate(() => (window as unknown as { longTasks: number[] }).longTasks.splice(0));
    const importLongTasks = await longTasksOf();
    await page.getByRole('tab', { name: /Lanes/ }).click();
    await longTasksOf();
    const roundTrips: number[] = [];
    const engineMs: number[] = [];
    const editToScreen: number[] = [];
    for (let i = 0; i < EDITS; i++) {
      const edit = await timedEdit(page, tollCell(page, i), `${100 + i}.00`);
      editToScreen.push(edit.editToScreenMs);
      roundTrips.push(edit.roundTripMs);
      engineMs.push(edit.solveMs);
    }
    expect(await page.locator('[data-testid="lane-table"] tbody tr.lw-changed-row').count()).toBe(EDITS);
    const longTasks = await longTasksOf();

    const figures = {
      depots: DEPOTS,
      lanes: DEPOTS * LANES_PER_DEPOT,
      import_and_first_plan_ms: importMs,
      recompute_after_edit_round_trip_ms: { median: median(roundTrips), all: roundTrips },
      engine_solve_ms: { median: median(engineMs), all: engineMs },
      edit_to_screen_ms_including_120ms_debounce: { median: median(editToScreen), all: editToScreen },
      longest_ui_thread_task_during_edits_ms: longTasks.length ? Math.max(...longTasks) : 0,
      longest_ui_thread_task_during_cancel_and_import_ms: importLongTasks.length ? Math.max(...importLongTasks) : 0,
      note: 'shared 2-core machine with other work running; figures are noisy',
    };
    recordTimings('large_network', figures);
    console.log(`[e2e timing] ${DEPOTS} depots / ${DEPOTS * LANES_PER_DEPOT} lanes: recompute after an edit ${figures.recompute_after_edit_round_trip_ms.median.toFixed(1)} ms median round trip (engine ${figures.engine_solve_ms.median.toFixed(1)} ms), edit to screen ${figures.edit_to_screen_ms_including_120ms_debounce.median} ms incl. 120 ms debounce; import + first plan ${importMs} ms; longest UI-thread task during edits ${figures.longest_ui_thread_task_during_edits_ms} ms (during cancel + import ${figures.longest_ui_thread_task_during_cancel_and_import_ms} ms) (target <= 200 ms recompute; noisy shared machine)`);
    expect(offsiteRequests(session)).toEqual([]);
  });

  it('keeps the windowed results table navigable, sortable and filterable over all 5,000 depots', async () => {
    const page = session.page;
    await page.getByRole('tab', { name: 'Results' }).click();
    const table = page.locator('[data-testid="results-table"]');
    expect(await table.getAttribute('aria-rowcount')).toBe(String(DEPOTS + 1));
    const rendered = table.locator('tbody tr[aria-rowindex]');
    expect(await rendered.count()).toBeLessThan(200); // windowed: only rows near the view are in the DOM
    const activeRow = () => page.evaluate(() => [document.activeElement?.getAttribute('aria-rowindex'), document.activeElement?.getAttribute('data-depot')]);

    await rendered.first().focus();
    await page.keyboard.press('End');
    await expect.poll(async () => (await activeRow())[0]).toBe(String(DEPOTS + 1));
    const lastDepot = (await activeRow())[1];
    expect(await table.locator(`tr[data-depot="${lastDepot}"]`).count()).toBe(1);
    await page.keyboard.press('ArrowUp');
    await expect.poll(async () => (await activeRow())[0]).toBe(String(DEPOTS));
    await page.keyboard.press('PageUp');
    await expect.poll(async () => (await activeRow())[0]).toBe(String(DEPOTS - 15));
    await page.keyboard.press('Home');
    await expect.poll(async () => (await activeRow())[0]).toBe('2');
    await page.keyboard.press('Enter');
    const first = (await activeRow())[1];
    await expect.poll(() => page.locator('#lw-route-title').innerText()).toContain(`Route to ${first}`);

    // Sorting by depot id descending puts the last id in file order first (D999 sorts after D4999 as text).
    await table.getByRole('button', { name: /^Depot/ }).click();
    await table.getByRole('button', { name: /^Depot/ }).click();
    await expect.poll(() => rendered.first().getAttribute('data-depot')).toBe('D999');
    await page.getByLabel('Filter depots by id, name or caution').fill('Synthetic depot 4321');
    await expect.poll(() => table.getAttribute('aria-rowcount')).toBe('2');
    expect(await rendered.first().getAttribute('data-depot')).toBe('D4321');
  });

  it('windows the lane table, and keeps a half-typed amount while its row is scrolled away', async () => {
    const page = session.page;
    await page.getByRole('tab', { name: /Lanes/ }).click();
    const table = page.locator('[data-testid="lane-table"]');
    const rowCount = Number(await table.getAttribute('aria-rowcount'));
    expect(rowCount).toBeGreaterThan(1000);
    const rendered = table.locator('tbody tr[aria-rowindex]');
    expect(await rendered.count()).toBeLessThan(200); // windowed: only rows near the view are in the DOM
    const firstToll = table.locator('tr[aria-rowindex="2"] input[aria-label^="toll of lane"]');
    await firstToll.fill('7.77');
    const scrollTableTo = (where: 'bottom' | 'top') =>
      table.evaluate((t, to) => {
        let e: HTMLElement | null = t.parentElement;
        while (e && !['auto', 'scroll'].includes(getComputedStyle(e).overflowY)) e = e.parentElement;
        e!.scrollTop = to === 'bottom' ? e!.scrollHeight : 0;
      }, where);
    await scrollTableTo('bottom');
    await expect.poll(() => table.locator(`tr[aria-rowindex="${rowCount}"]`).count()).toBe(1);
    // The row being typed in stays rendered (far above the window), with its text and the focus.
    expect(await firstToll.inputValue()).toBe('7.77');
    expect(await firstToll.evaluate((input) => input === document.activeElement)).toBe(true);
    expect(await rendered.count()).toBeLessThan(200);
    await scrollTableTo('top');
    const before = await solveCount(page);
    await firstToll.press('Enter');
    await waitForPlan(page, before);
    await expect.poll(() => table.locator('tr[aria-rowindex="2"]').getAttribute('class')).toContain('lw-changed-row');
  });
});
