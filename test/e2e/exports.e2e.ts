// Exports as the user's spreadsheet writes them: the CSV format picker starts from the browser's
// locale (en-US here: comma, decimal point), a semicolon / decimal comma / BOM choice is kept across
// a reload, and the lanes CSV written in it reads back with the project's importer to the same
// lanes; file names carry origin, date and class; the GeoJSON carries its settings and the caution.

import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseCsvText } from '../../engine/io/csv-papaparse';
import { importNetwork } from '../../engine/planning/import-network';
import { editLaneAmount, offsiteRequests, openReadyApp, snap, waitForPlan, type Session } from './support/browser';
import { sample } from './support/expected';

let session: Session;
let page: Page;

beforeAll(async () => {
  session = await openReadyApp({ width: 1440, height: 900 });
  page = session.page;
});

afterAll(async () => {
  await session?.close();
});

async function exportMenu(value: string): Promise<{ name: string; text: string }> {
  return downloaded(() => page.getByLabel('Export', { exact: true }).selectOption(value));
}

async function downloaded(click: () => Promise<unknown>): Promise<{ name: string; text: string }> {
  const [download] = await Promise.all([page.waitForEvent('download'), click()]);
  return { name: download.suggestedFilename(), text: readFileSync(await download.path(), 'utf8') };
}

describe('exports', () => {
  it('starts from the locale, and writes semicolon, decimal comma and BOM when chosen', async () => {
    const picker = page.locator('.lw-csv-dialect');
    expect(await picker.locator('summary').innerText()).toBe('CSV: comma, 1.5');
    const date = await page.getByLabel('Dispatch date').inputValue();
    const plain = await exportMenu('lanes-csv');
    expect(plain.name).toBe(`lanes-${date}.csv`);
    expect(plain.text.charCodeAt(0)).not.toBe(0xfeff);

    await picker.locator('summary').click();
    await picker.getByLabel('Separator').selectOption(';');
    await picker.getByLabel('Decimal mark').selectOption(',');
    await picker.getByLabel('UTF-8 byte-order mark').check();
    await snap(page, 'csv-dialect');
    await picker.locator('summary').click();
    const eu = await exportMenu('lanes-csv');
    expect(eu.text.charCodeAt(0)).toBe(0xfeff);
    expect(parseCsvText(eu.text).delimiter).toBe(';');
    expect(eu.text).toMatch(/;"?\d+,\d\d"?;/); // a cell holding a comma is quoted in every dialect
    const original = importNetwork(sample('depots.csv'), sample('lanes.csv'), { plan: { date } });
    const again = importNetwork(sample('depots.csv'), eu.text, { plan: { date } });
    expect(again.report.errors).toEqual([]);
    expect(Array.from(again.network!.laneNet)).toEqual(Array.from(original.network!.laneNet));
    expect(Array.from(again.network!.laneDistanceKm)).toEqual(Array.from(original.network!.laneDistanceKm));

    await page.reload();
    await waitForPlan(page);
    expect(await page.locator('.lw-csv-dialect summary').innerText()).toBe('CSV: semicolon, 1,5, BOM');
  });

  it('names files by origin, date and class, and the GeoJSON carries its settings and the caution', async () => {
    const before = Number(await page.locator('.lw-app').getAttribute('data-solves'));
    await page.getByLabel('Vehicle class').selectOption('2axle');
    await waitForPlan(page, before);
    const date = await page.getByLabel('Dispatch date').inputValue();
    const routes = await exportMenu('routes-csv');
    expect(routes.name).toBe(`routes-RTM-${date}-2axle.csv`);
    const geo = await exportMenu('geojson');
    expect(geo.name).toBe(`network-RTM-${date}-2axle.geojson`);
    const json = JSON.parse(geo.text) as { caution: string; settings: { date: string; vehicle_class: string; files: string[]; scenario: string | null } };
    expect(json.settings).toEqual({ date, vehicle_class: '2axle', files: ['sample:depots.csv', 'sample:lanes.csv'], scenario: null });
    expect(json.caution).toMatch(/estimate/i);
  });

  it('exports the scenario comparison and the contract review as CSV in the chosen format', async () => {
    await editLaneAmount(page, 'rebate', 0, '1.00');
    const date = await page.getByLabel('Dispatch date').inputValue();
    const comparison = await downloaded(() => page.getByRole('button', { name: 'Export comparison (CSV)' }).click());
    expect(comparison.name).toMatch(new RegExp(`^comparison-RTM-${date}-2axle-.+\\.csv$`));
    expect(comparison.text.charCodeAt(0)).toBe(0xfeff); // the semicolon / comma / BOM choice made above
    const head = comparison.text.slice(1).split('\r\n')[0];
    expect(head).toBe('id;name;base_status;scenario_status;base_cost;scenario_cost;change;route_changed;base_route;scenario_route');
    expect(comparison.text).toMatch(/;(yes|no);/);

    await page.getByRole('tab', { name: /Contract review/ }).click();
    await page.getByTestId('contract-review').waitFor();
    // One name pair for the same figures in the app, the CSV (floor, headroom) and the JSON (floor_minor, headroom_minor).
    const headroomHead = await page.locator('table[aria-label="Rebate headroom per lane"] thead').innerText();
    expect(headroomHead).toMatch(/Floor\s+Headroom/);
    const review = await downloaded(() => page.getByRole('button', { name: 'Export one-day review (CSV)' }).click());
    expect(review.name).toMatch(new RegExp(`^contract-review-${date}-2axle-.+\\.csv$`));
    expect(review.text.slice(1).split('\r\n')[0]).toMatch(/^row;from;to;ref;.*;floor;headroom$/);
    const calendar = await downloaded(() => page.getByRole('button', { name: 'Export calendar review (CSV)' }).click());
    expect(calendar.name).toMatch(/^calendar-review-.*\.csv$/);
    expect(parseCsvText(calendar.text.slice(1)).delimiter).toBe(';');
  });

  it('made no request outside localhost and logged no errors', () => {
    expect(offsiteRequests(session)).toEqual([]);
    expect(session.errors).toEqual([]);
  });
});
