// The desktop workspace in a real browser (browser mode of the same renderer): first run opens the
// sample plan, costs match the engine run here in Node, the rebate-loop variant raises the warning
// and draws the loop, a rebate edit changes the scenario, a broken file gets its report, and the
// routes CSV export re-reads to the same costs. No request may leave localhost.

import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseCsvText } from '../../engine/io/csv-papaparse';
import { formatMinor, type Minor } from '../../engine/money/minor';
import { importNetwork } from '../../engine/planning/import-network';
import { parseScenarioDocument, SCENARIO_VERSION, serializeScenarioDocument } from '../../engine/scenario/document';
import { offsiteRequests, openApp, pickImportFiles, snap, solveCount, waitForPlan, type Session } from './support/browser';
import { expectedPlan, sample } from './support/expected';

let session: Session;
let page: Page;
let date: string;

/** Depot id -> cost in minor units ('' when none) as the results table shows it. */
async function shownCosts(p: Page): Promise<Map<string, string>> {
  const rows = await p.locator('[data-testid="results-table"] tbody tr').evaluateAll((trs) => trs.map((tr) => [tr.getAttribute('data-depot') ?? '', tr.getAttribute('data-cost-minor') ?? '']));
  return new Map(rows as [string, string][]);
}

function expectCostsMatch(shown: Map<string, string>, expected: Map<string, number>, unbounded: Set<string>) {
  for (const [id, cost] of expected) expect(shown.get(id), `cost of ${id}`).toBe(String(cost));
  for (const id of unbounded) expect(shown.get(id), `unbounded ${id} has no cost`).toBe('');
}

beforeAll(async () => {
  session = await openApp();
  page = session.page;
});

afterAll(async () => {
  await session?.close();
});

describe('workspace in the browser', () => {
  it('shows the first-run cautions once, then the sample plan from RTM with the engine costs', async () => {
    const notice = page.getByRole('dialog', { name: 'Before you plan' });
    await expect.poll(() => notice.isVisible()).toBe(true);
    const text = await notice.innerText();
    expect(text).toMatch(/cost estimates/i);
    expect(text).toMatch(/hazardous goods/i);
    expect(text).toMatch(/driver hours/i);
    await snap(page, 'first-run-notice');
    await page.getByRole('button', { name: 'I understand' }).click();
    await waitForPlan(page);

    date = await page.getByLabel('Dispatch date').inputValue();
    const expected = expectedPlan(sample('depots.csv'), sample('lanes.csv'), 'RTM', date);
    expect(expected.cost.size).toBeGreaterThan(5);
    expectCostsMatch(await shownCosts(page), expected.cost, expected.unbounded);
    await snap(page, 'plan-overview');

    // Remembered: a reload does not show the notice again.
    await page.reload();
    await waitForPlan(page);
    expect(await page.getByRole('dialog', { name: 'Before you plan' }).count()).toBe(0);
  });

  it('picks an origin from the searchable list with the keyboard and shows a route breakdown', async () => {
    const before = await solveCount(page);
    const search = page.getByRole('combobox', { name: 'Origin depot' });
    await search.fill('Lyon');
    await search.press('ArrowDown');
    await search.press('Enter');
    await waitForPlan(page, before);
    const expected = expectedPlan(sample('depots.csv'), sample('lanes.csv'), 'LYS', date);
    expectCostsMatch(await shownCosts(page), expected.cost, expected.unbounded);

    await page.locator('tr[data-depot="RTM"]').click();
    const breakdown = page.locator('[data-testid="route-breakdown"]');
    await breakdown.waitFor();
    const total = await breakdown.locator('tfoot td').last().innerText();
    expect(total.replace(/,/g, '')).toBe(formatMinor(expected.cost.get('RTM')! as Minor));
    await expect.poll(() => page.locator('svg.lw-chart').count()).toBe(1);
    // A route with its cost always carries the cautions (estimate; restrictions, hours, regulations).
    const caution = await page.locator('[data-testid="route-caution"]').innerText();
    expect(caution).toMatch(/estimate/i);
    expect(caution).toMatch(/hazardous goods/i);
    expect(caution).toMatch(/driver hours/i);
    await snap(page, 'route-breakdown');
  });

  it('re-plans for another vehicle class and for a leg limit, matching the engine', async () => {
    let before = await solveCount(page);
    await page.getByLabel('Vehicle class').selectOption('2axle');
    await waitForPlan(page, before);
    const byClass = expectedPlan(sample('depots.csv'), sample('lanes.csv'), 'LYS', date, undefined, { vehicleClass: '2axle' });
    const standard = expectedPlan(sample('depots.csv'), sample('lanes.csv'), 'LYS', date);
    expect([...byClass.cost.values()]).not.toEqual([...standard.cost.values()]); // the class's tolls matter
    await expect.poll(async () => (await shownCosts(page)).get('RTM')).toBe(String(byClass.cost.get('RTM')));
    expectCostsMatch(await shownCosts(page), byClass.cost, byClass.unbounded);

    before = await solveCount(page);
    await page.getByLabel('Maximum legs').fill('2');
    await waitForPlan(page, before);
    const limited = expectedPlan(sample('depots.csv'), sample('lanes.csv'), 'LYS', date, undefined, { vehicleClass: '2axle', maxLegs: 2 });
    await expect.poll(async () => (await shownCosts(page)).get('RTM')).toBe(limited.cost.has('RTM') ? String(limited.cost.get('RTM')) : '');
    expectCostsMatch(await shownCosts(page), limited.cost, limited.unbounded);
    expect(await page.locator('[data-testid="results-table"] .lw-badge-unreachable').count()).toBe(limited.depotCount - limited.cost.size);

    before = await solveCount(page);
    await page.getByLabel('Maximum legs').fill('');
    await page.getByLabel('Vehicle class').selectOption('');
    await waitForPlan(page, before);
  });

  it('warns about the rebate loop, marks unbounded depots and draws the loop on the map', async () => {
    await page.getByRole('button', { name: 'Sample carrier with rebate loop' }).click();
    const alert = page.getByRole('alert').filter({ hasText: 'Rebate loop' });
    await alert.waitFor();
    await waitForPlan(page);
    const expected = expectedPlan(sample('depots.csv'), sample('lanes-rebate-loop.csv'), 'RTM', date);
    expect(expected.loops.length).toBeGreaterThan(0);
    const alertText = await alert.innerText();
    for (const loop of expected.loops) {
      expect(alertText).toContain(loop.depots.join(' → '));
      for (const row of loop.rows) expect(alertText).toContain(String(row));
    }
    const shown = await shownCosts(page);
    expectCostsMatch(shown, expected.cost, expected.unbounded);
    // The map draws the loop with a text label and each unbounded depot as a labelled diamond.
    const map = page.getByRole('region', { name: /Network map/ });
    expect(Number(await map.getAttribute('data-loops'))).toBe(expected.loops.length);
    expect(await page.locator('.lw-loop-label').first().innerText()).toContain(expected.loops[0].depots[0]);
    expect(await page.locator('.lw-diamond').count()).toBe(expected.unbounded.size);
    expect(await page.getByRole('img', { name: /: cost unbounded/ }).count()).toBe(expected.unbounded.size);
    await snap(page, 'rebate-loop-warning');

    // The loop runs back through the origin: its row and its route detail say so in words.
    expect(expected.unbounded.has('RTM')).toBe(true);
    const originRow = page.locator('[data-testid="results-table"] tr[data-depot="RTM"]');
    expect(await originRow.locator('td').nth(1).innerText()).toBe('origin · ∞ unbounded');
    expect(await originRow.locator('td').nth(2).innerText()).toBe('no finite cost');
    await originRow.click();
    await expect.poll(() => page.locator('[data-testid="origin-unbounded"]').count()).toBe(1);
    expect(await page.locator('[data-testid="origin-unbounded"]').innerText()).toMatch(/origin · ∞ unbounded/);

    await page.getByRole('tab', { name: /Contract review/ }).click();
    const review = page.locator('[data-testid="contract-review"]');
    await review.waitFor();
    expect(await review.innerText()).toMatch(/Fix plan/);
    await snap(page, 'contract-review');
  });

  it('turns a rebate edit into a scenario change and shows what moved', async () => {
    await page.getByRole('tab', { name: /Lanes/ }).click();
    await page.getByLabel('Filter lanes by depot or contract ref').fill('FRA');
    const loopLane = expectedPlan(sample('depots.csv'), sample('lanes-rebate-loop.csv'), 'RTM', date).loops[0];
    const row = loopLane.rows[0];
    const cell = page.locator(`tr[data-lane-row="${row}"] input[aria-label^="rebate of lane"]`);
    const laneName = (await page.locator(`tr[data-lane-row="${row}"] th`).innerText()).split(' → ');
    const refText = await page.locator(`tr[data-lane-row="${row}"] td`).nth(1).innerText();
    const ref = refText === '—' ? null : refText;
    // A bad amount stays in the cell, marked invalid, with the reason as the input's description.
    await cell.fill('12,5,0');
    await cell.press('Enter');
    expect(await cell.getAttribute('aria-invalid')).toBe('true');
    const described = await cell.getAttribute('aria-describedby');
    expect(described).toBeTruthy();
    expect((await page.locator(`[id="${described}"]`).textContent())?.length).toBeGreaterThan(5);
    const before = await solveCount(page);
    await cell.fill('0.00');
    await cell.press('Enter');
    await waitForPlan(page, before);
    expect(await cell.getAttribute('aria-describedby')).toBeNull();

    const scenario = {
      name: 'What-if 1',
      description: null,
      changes: [{ kind: 'set-amount' as const, lane: { from: laneName[0], to: laneName[1], ref, occurrence: 1 }, field: 'rebate' as const, amountMinor: 0, note: null }],
    };
    const expected = expectedPlan(sample('depots.csv'), sample('lanes-rebate-loop.csv'), 'RTM', date, scenario);
    expect(expected.unbounded.size).toBe(0);
    expect(await page.getByRole('alert').filter({ hasText: 'Rebate loop' }).count()).toBe(0);
    const compare = page.locator('[data-testid="scenario-compare"]');
    // The change is worded by the engine's overlay: the amount before and after.
    expect(await compare.innerText()).toMatch(/rebate \d+\.\d\d → 0\.00/);
    // Each Undo names the change it undoes, so a screen reader tells them apart.
    expect(await compare.getByRole('button', { name: /^Undo change 1: .*rebate \d+\.\d\d → 0\.00$/ }).count()).toBe(1);
    expect(await compare.locator('[data-moved-depot]').count()).toBeGreaterThan(0);
    expect(await compare.innerText()).toMatch(/unbounded → reachable/);
    // Whether each depot's route changed, as lanewright compare says it: a depot freed from the loop has a route again.
    expect(await compare.locator('thead').innerText()).toMatch(/Route/);
    expect(await compare.locator('[data-moved-depot][data-route-changed="yes"]').count()).toBeGreaterThan(0);
    await snap(page, 'scenario-edit');
    await page.getByRole('tab', { name: 'Results' }).click();
    expectCostsMatch(await shownCosts(page), expected.cost, expected.unbounded);
  });

  it('loads a scenario file that adds a lane and plans with it', async () => {
    const cut = { kind: 'set-amount' as const, lane: { from: 'FRA', to: 'SXB', ref: 'BFH-L-019', occurrence: 1 }, field: 'rebate' as const, amountMinor: 0, note: null };
    const milanLane = { from: 'RTM', to: 'MIL', ref: 'WHATIF-1', tollMinor: 9000, feesMinor: 1500, fuelMinor: 30000, rebateMinor: 0, validFrom: null, validTo: null, distanceKm: null, driveMinutes: null };
    const scenario = {
      name: 'Direct Milan run',
      description: 'what-if: a direct lane and no volume refund',
      changes: [cut, { kind: 'add-lane' as const, note: null, lane: milanLane }],
    };
    await page.getByRole('tab', { name: /Lanes/ }).click();
    const before = await solveCount(page);
    // The rebate edit of the test before is in no scenario file: browser mode asks before replacing it.
    await page.getByRole('button', { name: 'Load a scenario file…' }).click();
    const asked = page.getByRole('dialog', { name: 'Unsaved changes' });
    await asked.waitFor();
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), asked.getByRole('button', { name: 'Discard' }).click()]);
    await chooser.setFiles({ name: 'direct-milan.json', mimeType: 'application/json', buffer: Buffer.from(serializeScenarioDocument(scenario), 'utf8') });
    await waitForPlan(page, before);
    const compare = page.locator('[data-testid="scenario-compare"]');
    await expect.poll(() => compare.innerText()).toContain('Direct Milan run');
    expect(await compare.innerText()).toContain('new lane RTM → MIL');
    const expected = expectedPlan(sample('depots.csv'), sample('lanes-rebate-loop.csv'), 'RTM', date, scenario);
    expect(expected.cost.get('MIL')).toBe(40500);

    // The added lane is listed in the lane table, marked as the scenario's, and drawn dotted with a label.
    const addedRow = page.locator('[data-testid="lane-table"] tr[data-added-lane]');
    expect(await addedRow.count()).toBe(1);
    expect(await addedRow.locator('th').innerText()).toBe('RTM → MIL');
    expect(await addedRow.innerText()).toContain('added by scenario');
    expect(await addedRow.locator('input[aria-label^="toll of added lane"]').inputValue()).toBe('90.00');
    const map = page.getByRole('region', { name: /Network map/ });
    expect(Number(await map.getAttribute('data-added-lanes'))).toBe(1);
    expect(await page.locator('.lw-added-label').innerText()).toBe('Added: RTM → MIL (WHATIF-1)');
    await snap(page, 'scenario-added-lane');
    await page.getByRole('tab', { name: 'Results' }).click();
    expectCostsMatch(await shownCosts(page), expected.cost, expected.unbounded);
    // MIL's route runs over the added lane: its breakdown names it with its amounts.
    await page.locator('[data-testid="results-table"] tr[data-depot="MIL"]').click();
    const breakdown = page.locator('[data-testid="route-breakdown"]');
    await expect.poll(() => breakdown.locator('tbody th').first().innerText().catch(() => '')).toBe('RTM → MIL + added');
    expect(await breakdown.locator('tbody td').allInnerTexts()).toEqual(['90.00', '300.00', '15.00', '0.00', '405.00']);
    expect(await breakdown.locator('tfoot td').last().innerText()).toBe('405.00');

    // Editing the added lane's toll rewrites its change; the plan follows the engine.
    await page.getByRole('tab', { name: /Lanes/ }).click();
    let editBefore = await solveCount(page);
    const toll = page.locator('[data-testid="lane-table"] tr[data-added-lane] input[aria-label^="toll of added lane"]');
    await toll.fill('100.00');
    await toll.press('Enter');
    await waitForPlan(page, editBefore);
    const edited = { ...scenario, changes: [cut, { kind: 'add-lane' as const, note: null, lane: { ...milanLane, tollMinor: 10000 } }] };
    const expectedEdited = expectedPlan(sample('depots.csv'), sample('lanes-rebate-loop.csv'), 'RTM', date, edited);
    expect(expectedEdited.cost.get('MIL')).toBe(41500);
    expect(await compare.innerText()).toContain('new lane RTM → MIL');
    await page.getByRole('tab', { name: 'Results' }).click();
    expectCostsMatch(await shownCosts(page), expectedEdited.cost, expectedEdited.unbounded);

    // Saved as a scenario file from the Export menu: the versioned document compare reads, same changes.
    const [saved] = await Promise.all([page.waitForEvent('download'), page.getByLabel('Export', { exact: true }).selectOption('scenario-json')]);
    expect(saved.suggestedFilename()).toBe('direct-milan-run.json');
    const savedText = readFileSync(await saved.path(), 'utf8');
    expect(JSON.parse(savedText)).toMatchObject({ format: 'lanewright-scenario', version: SCENARIO_VERSION });
    expect(parseScenarioDocument(savedText, 'direct-milan-run.json')).toEqual(edited);

    // Removing it takes it off the table and the map.
    await page.getByRole('tab', { name: /Lanes/ }).click();
    editBefore = await solveCount(page);
    await page.getByRole('button', { name: 'Remove added lane RTM → MIL (WHATIF-1)' }).click();
    await waitForPlan(page, editBefore);
    expect(await page.locator('[data-testid="lane-table"] tr[data-added-lane]').count()).toBe(0);
    expect(Number(await map.getAttribute('data-added-lanes'))).toBe(0);
    await expect.poll(() => page.locator('.lw-added-label').count()).toBe(0); // Leaflet fades a label out
    expect(await compare.innerText()).not.toContain('new lane RTM → MIL');
  });

  it('imports a broken lanes file, lists every rejected row, and continues with the accepted rows', async () => {
    const broken = sample('broken/lanes-broken.csv');
    const engineReport = importNetwork(sample('depots.csv'), broken, { depotsFile: 'depots.csv', lanesFile: 'lanes-broken.csv', plan: { date }, skipInvalid: true }).report;
    expect(engineReport.errors.length).toBeGreaterThanOrEqual(5);

    await page.getByRole('button', { name: 'Import CSV…' }).click();
    // Removing the added lane left an edit no scenario file holds: asked first.
    await page.getByRole('dialog', { name: 'Unsaved changes' }).getByRole('button', { name: 'Discard' }).click();
    const dialog = await pickImportFiles(page, { name: 'depots.csv', text: sample('depots.csv') }, { name: 'lanes-broken.csv', text: broken });
    await dialog.getByRole('button', { name: 'Import', exact: true }).click();
    const report = page.getByRole('dialog', { name: 'Import report' });
    await report.waitFor();
    const rows = await report.locator('table tbody tr').evaluateAll((trs) => trs.map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent ?? '')));
    for (const error of engineReport.errors) {
      expect(rows, `${error.file} row ${error.row}`).toContainEqual([error.file, String(error.row ?? '—'), error.column ?? '—', error.value ?? '—', error.message]);
    }
    expect(rows.length).toBe(engineReport.errors.length);
    await snap(page, 'import-report');

    const lanesCounts = engineReport.files.find((f) => f.kind === 'lanes')!;
    expect(lanesCounts.accepted + lanesCounts.rejected).toBe(lanesCounts.total);
    await report.getByRole('button', { name: /Continue with the/ }).click();
    const planned = expectedPlan(sample('depots.csv'), broken, 'RTM', date);
    await expect.poll(() => page.locator('.lw-status').innerText()).toContain(`${planned.depotCount} depots · ${planned.laneCount} lanes`);
    await waitForPlan(page);
    expect(await page.locator('.lw-dataset').innerText()).toContain('lanes-broken.csv');
    // A new import starts without what-if edits (they named rows of the files before and stayed).
    expect(await page.getByRole('tab', { name: /Lanes & scenario/ }).innerText()).not.toMatch(/changed/);
    // The rejected rows stay listed in the import report tab.
    await page.getByRole('tab', { name: /Import report/ }).click();
    expect(await page.locator('[data-testid="import-report"] table tbody tr').count()).toBe(engineReport.errors.length);
  });

  it('exports the routes CSV, which re-reads to the costs the engine gives', async () => {
    await page.getByRole('button', { name: 'Sample carrier', exact: true }).click();
    await waitForPlan(page);
    await page.getByRole('tab', { name: 'Results' }).click();
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export routes CSV' }).click()]);
    const path = await download.path();
    const { rows } = parseCsvText(readFileSync(path, 'utf8'));
    const header = rows[0];
    const id = header.indexOf('id');
    const cost = header.indexOf('cost');
    expect(id).toBeGreaterThanOrEqual(0);
    expect(cost).toBeGreaterThanOrEqual(0);
    const origin = (await page.locator('.lw-origin-current').innerText()).split(' · ')[0];
    const expected = expectedPlan(sample('depots.csv'), sample('lanes.csv'), origin, date);
    const exported = new Map(rows.slice(1).map((r) => [r[id], r[cost]]));
    expect(exported.size).toBe(expected.depotCount);
    for (const [depot, minor] of expected.cost) expect(exported.get(depot), depot).toBe(formatMinor(minor as Minor));
  });

  it('moves through the results with the arrow keys and opens a route with Enter', async () => {
    await page.getByRole('tab', { name: 'Results' }).click();
    const rows = page.locator('[data-testid="results-table"] tbody tr');
    expect(await rows.locator('xpath=self::*[@tabindex="0"]').count()).toBe(1); // one Tab stop
    await rows.first().focus();
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press('ArrowDown');
    const id = await page.evaluate(() => document.activeElement?.getAttribute('data-depot'));
    expect(id).toBe(await rows.nth(2).getAttribute('data-depot'));
    await page.keyboard.press('Enter');
    await expect.poll(() => page.locator('#lw-route-title').innerText()).toContain(`Route to ${id}`);
  });

  it('edits a toll for the vehicle class on screen and lists every row of the file', async () => {
    let before = await solveCount(page);
    await page.getByLabel('Vehicle class').selectOption('2axle');
    await waitForPlan(page, before);
    await page.getByRole('tab', { name: /Lanes/ }).click();
    await page.getByLabel('Filter lanes by depot or contract ref').fill('BFH-L-014');
    // sample-data/lanes.csv row 15: LUX > SXB, toll 18.20, 2axle 8.19, 5axle 18.20.
    const cell = page.locator('tr[data-lane-row="15"] input[aria-label^="toll of lane"]');
    expect(await cell.getAttribute('aria-label')).toMatch(/\(2axle\)$/);
    expect(await cell.inputValue()).toBe('8.19');
    before = await solveCount(page);
    await cell.fill('9,00'); // read by the importer's rules: a decimal comma
    await cell.press('Enter');
    await waitForPlan(page, before);
    const compare = page.locator('[data-testid="scenario-compare"]');
    await expect.poll(() => compare.innerText()).toContain('toll 2axle 8.19 → 9.00');
    await page.getByLabel('Filter lanes by depot or contract ref').fill('');
    await page.getByLabel(/Every row of the file/).check();
    await expect.poll(() => page.locator('.lw-lanes [aria-live="polite"]').innerText()).toMatch(/^147 lanes/);
    await page.getByLabel(/Every row of the file/).uncheck();
    before = await solveCount(page);
    await compare.getByRole('button', { name: 'Back to the base contract' }).click();
    await waitForPlan(page, before);
    before = await solveCount(page);
    await page.getByLabel('Vehicle class').selectOption('');
    await waitForPlan(page, before);
  });

  it('opens the about box with the cautions from the keyboard', async () => {
    await page.getByRole('button', { name: 'About & cautions' }).focus();
    await page.keyboard.press('Enter');
    const about = page.getByRole('dialog', { name: 'About Lanewright' });
    await about.waitFor();
    expect(await about.innerText()).toMatch(/licensed professional practice/);
    await page.keyboard.press('Escape');
    expect(await about.count()).toBe(0);
  });

  it('made no request outside localhost and logged no errors', () => {
    expect(session.requests.length).toBeGreaterThan(3);
    expect(offsiteRequests(session)).toEqual([]);
    expect(session.errors).toEqual([]);
  });
});
