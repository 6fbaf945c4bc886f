// The Loads panel in a real browser: import the sample loads and vehicles files through the file
// picker, select the blocked load and see the limit that blocks it, show alternatives, export the
// dispatch sheet CSV and read it back, then print the sheet to PDF in Chromium and read the PDF
// back (pdfjs-dist): one page per date, the caution on every page. Costs match the engine in Node.

import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { planLoads } from '../../engine/dispatch/plan-loads';
import { importLoads, importVehicles } from '../../engine/import/import-loads';
import { importNetwork } from '../../engine/planning/import-network';
import { parseCsvText } from '../../engine/io/csv-papaparse';
import { DISPATCH_CAUTION } from '../../engine/text/cautions';
import { serializeScenarioDocument } from '../../engine/scenario/document';
import type { Scenario } from '../../engine/scenario/types';
import { chooseFile, offsiteRequests, openReadyApp, snap, type Session } from './support/browser';
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

describe('Loads panel', () => {
  let date: string;

  it('imports the loads and vehicles files and shows every load with the engine cost', async () => {
    date = await page.getByLabel('Dispatch date').inputValue();
    await page.getByRole('tab', { name: /Loads/ }).click();
    await chooseFile(page, () => page.getByRole('button', { name: 'Import vehicles…' }).click(), 'vehicles.csv', text('vehicles.csv'));
    await chooseFile(page, () => page.getByRole('button', { name: 'Import loads…' }).click(), 'loads.csv', text('loads.csv'));
    const table = page.locator('[data-testid="loads-table"]');
    await table.waitFor();
    await expect.poll(() => table.locator('tbody tr').count()).toBe(12);

    const imported = importNetwork(text('depots.csv'), text('lanes.csv'), { plan: { date } });
    const vehicles = importVehicles(text('vehicles.csv'), { classes: imported.vehicleClasses });
    const loads = importLoads(text('loads.csv'), { depots: imported.network!.depotIndex, vehicles: vehicles.byId, classes: imported.vehicleClasses, planDate: date });
    const expected = planLoads(imported, loads.loads, { date, vehicles: vehicles.byId });
    for (const p of expected.loads) {
      const row = table.locator(`tr[data-load="${p.load.id}"]`);
      expect(await row.locator('td').nth(4).innerText()).toBe(p.status);
      if (p.costMinor !== null) expect((await row.locator('td').nth(5).innerText()).replace(/,/g, '')).toBe((p.costMinor / 100).toFixed(2));
    }
    expect(await page.locator('[data-testid="loads-caution"]').innerText()).toContain(DISPATCH_CAUTION);
  });

  it('selecting a blocked load says which limit blocks it', async () => {
    await page.getByLabel('Load status filter').selectOption('blocked');
    await page.locator('tr[data-load="L-0815-03"]').click();
    const why = page.locator('[data-testid="blocked-by"]');
    await why.waitFor();
    expect(await why.innerText()).toContain('max_height_m 4.00 < 4.20 on lane row 36');
    await snap(page, 'loads-blocked');
    await page.getByLabel('Load status filter').selectOption('all');
  });

  it('shows alternatives for a planned load on request', async () => {
    await page.locator('tr[data-load="L-0815-05"]').click();
    await page.getByLabel(/alternative routes? on the map/).check();
    const detail = page.locator('[data-testid="load-detail"]');
    expect(await detail.locator('ol li').count()).toBeGreaterThan(0);
    expect(await detail.innerText()).toMatch(/Alt 1: .* \(\+/);
    await expect.poll(() => page.locator('.lw-loop-label', { hasText: 'Alt 1' }).count()).toBeGreaterThan(0);
    await snap(page, 'loads-alternatives');
  });

  it('exports the dispatch sheet CSV, which reads back with one row per load and the caution', async () => {
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export dispatch sheet CSV' }).click()]);
    const csv = readFileSync((await download.path())!, 'utf8');
    const [header, ...rows] = parseCsvText(csv).rows.filter((r) => r.length > 1);
    expect(rows).toHaveLength(12);
    const at = (name: string) => header.indexOf(name);
    const blocked = rows.find((r) => r[at('load')] === 'L-0815-03')!;
    expect(blocked[at('status')]).toBe('blocked');
    expect(blocked[at('blocked_by')]).toBe('max_height_m 4.00 < 4.20 on lane row 36');
    expect(rows.every((r) => r[at('caution')] === DISPATCH_CAUTION)).toBe(true);
  });

  it('prints one page per date with the caution at the foot of each page', async () => {
    await page.evaluate(() => {
      window.print = () => undefined;
    });
    await page.getByRole('button', { name: 'Print dispatch sheet' }).click();
    const pdf = await page.pdf({ format: 'A4', landscape: true, printBackground: false });
    // Compared without white space: the PDF's text runs break at cell wraps and ligatures ("fi").
    const pages = (await pdfPages(new Uint8Array(pdf))).map((p) => p.replace(/\s+/g, ''));
    const squeeze = (t: string) => t.replace(/\s+/g, '');
    expect(pages).toHaveLength(2);
    expect(pages[0]).toContain(squeeze('dispatch sheet for 2026-08-15'));
    expect(pages[0]).toContain('L-0815-03');
    expect(pages[0]).toContain(squeeze('max_height_m 4.00 < 4.20 on lane row 36'));
    expect(pages[1]).toContain(squeeze('dispatch sheet for 2026-08-16'));
    expect(pages[1]).toContain('L-0816-03');
    expect(pages[1]).not.toContain('L-0815-01');
    for (const p of pages) expect(p).toContain(squeeze(DISPATCH_CAUTION));
    await page.evaluate(() => document.body.classList.remove('lw-printing-sheet'));
    expect(offsiteRequests(session)).toEqual([]);
    expect(session.errors).toEqual([]);
  });

  it('plans the loads under the what-if scenario loaded in the app, as the engine does', async () => {
    const scenario: Scenario = {
      name: 'Gotthard toll up',
      description: null,
      changes: [{ kind: 'set-amount', lane: { from: 'ZRH', to: 'MIL', ref: 'BFH-L-211', occurrence: 1 }, field: 'toll', amountMinor: 90_000, vehicleClass: null, note: null }],
    };
    await page.getByRole('tab', { name: /Lanes/ }).click();
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Load a scenario file…' }).click()]);
    await chooser.setFiles({ name: 'gotthard.json', mimeType: 'application/json', buffer: Buffer.from(serializeScenarioDocument(scenario), 'utf8') });
    await page.getByRole('tab', { name: /Loads/ }).click();
    await expect.poll(() => page.locator('[data-testid="loads-scenario"]').count()).toBe(1);
    expect(await page.locator('[data-testid="loads-scenario"]').innerText()).toContain('Gotthard toll up');

    const imported = importNetwork(text('depots.csv'), text('lanes.csv'), { plan: { date } });
    const vehicles = importVehicles(text('vehicles.csv'), { classes: imported.vehicleClasses });
    const loads = importLoads(text('loads.csv'), { depots: imported.network!.depotIndex, vehicles: vehicles.byId, classes: imported.vehicleClasses, planDate: date });
    const expected = planLoads(imported, loads.loads, { date, vehicles: vehicles.byId, scenario }).loads.find((p) => p.load.id === 'L-0815-05')!;
    expect(expected.path).not.toEqual(['BSL', 'ZRH', 'MIL']);
    const row = page.locator('[data-testid="loads-table"] tr[data-load="L-0815-05"]');
    await expect.poll(async () => (await row.locator('td').nth(5).innerText()).replace(/,/g, '')).toBe((expected.costMinor! / 100).toFixed(2));
    await row.click();
    expect(await page.locator('[data-testid="load-detail"]').innerText()).toContain(`Route ${expected.path.join(' › ')}`);
    expect(session.errors).toEqual([]);
  });
});
