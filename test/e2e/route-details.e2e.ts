// A route in full in the browser: every lane with km, drive time, amounts, ref, validity and the
// estimated values marked with their rule, as the engine (run here in Node) plans them; the route
// exported on its own as CSV and read back; the one-page printed route sheet with the caution,
// read back from the PDF by pdfjs.

import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROUTE_CAUTION } from '../../engine/text/cautions';
import { parseCsvText } from '../../engine/io/csv-papaparse';
import { formatMinor, type Minor } from '../../engine/money/minor';
import { importNetwork } from '../../engine/planning/import-network';
import { cheapestRoutes, STATUS_REACHABLE } from '../../engine/routes/cheapest-routes';
import { routePath } from '../../engine/routes/route-path';
import { offsiteRequests, openReadyApp, snap, type Session } from './support/browser';
import { sample } from './support/expected';
import { pdfPages } from './support/pdf-text';

let session: Session;
let page: Page;

interface ExpectedLeg {
  row: number;
  distanceKm: number;
  estimated: number;
  validity: string;
}

/** The first depot (in file order) whose cheapest route from RTM uses an estimated value, with its lanes. */
function routeWithEstimates(date: string): { id: string; cost: number; legs: ExpectedLeg[] } {
  const imported = importNetwork(sample('depots.csv'), sample('lanes.csv'), { plan: { date } });
  const network = imported.network!;
  const tree = cheapestRoutes(network, network.depotIndex.get('RTM')!);
  for (let d = 0; d < network.depotCount; d++) {
    if (tree.status[d] !== STATUS_REACHABLE) continue;
    const path = routePath(network, tree, d);
    if (!path || path.lanes.length < 2) continue;
    const legs = path.lanes.map((e) => {
      const lane = imported.plan.lanes[e];
      const estimated = Number(lane.distanceEstimated) + Number(lane.fuelEstimated) + Number(lane.driveEstimated);
      const validity = lane.validFrom && lane.validTo ? `valid ${lane.validFrom} to ${lane.validTo}` : lane.validFrom ? `valid from ${lane.validFrom}` : lane.validTo ? `valid until ${lane.validTo}` : 'no validity limits';
      return { row: network.laneRow[e], distanceKm: network.laneDistanceKm[e], estimated, validity };
    });
    if (legs.some((l) => l.estimated > 0)) return { id: network.depotIds[d], cost: tree.cost[d], legs };
  }
  throw new Error('the sample has no route with estimated values');
}

beforeAll(async () => {
  session = await openReadyApp({ width: 1440, height: 900 });
  page = session.page;
});

afterAll(async () => {
  await session?.close();
});

describe('route details', () => {
  let expected: ReturnType<typeof routeWithEstimates>;
  let date: string;

  it('lists each lane with km, drive time, amounts, ref and validity, estimates marked with their rule', async () => {
    date = await page.getByLabel('Dispatch date').inputValue();
    expected = routeWithEstimates(date);
    await page.locator(`[data-testid="results-table"] tr[data-depot="${expected.id}"]`).click();
    const lanes = page.locator('[data-testid="route-lanes"] > li');
    await expect.poll(() => lanes.count()).toBe(expected.legs.length);
    // The breakdown table still has one body row per lane (other tests read its cells).
    expect(await page.locator('[data-testid="route-breakdown"] tbody tr').count()).toBe(expected.legs.length);
    for (const [i, leg] of expected.legs.entries()) {
      const item = lanes.nth(i);
      expect(await item.getAttribute('data-lane-row')).toBe(String(leg.row));
      expect(await item.locator('[data-field="distance"]').innerText()).toBe(`${leg.distanceKm} km`);
      expect(await item.locator('[data-field="validity"]').innerText()).toBe(leg.validity);
      expect(await item.locator('abbr.lw-est').count(), `estimates on row ${leg.row}`).toBe(leg.estimated);
      for (const title of await item.locator('abbr.lw-est').evaluateAll((els) => els.map((e) => e.getAttribute('title') ?? ''))) expect(title).toMatch(/^estimated: .+/);
      expect(await item.innerText()).toMatch(/toll .* · fuel .* · fees .* · rebate .* · net /);
    }
    const rules = await page.getByTestId('estimate-rules').innerText();
    expect(rules).toMatch(/detour factor 1\.3|l\/100 km|km\/h/);
    await snap(page, 'route-details');
  });

  it('exports the route on its own as CSV, with the caution and the date, summing to the cost', async () => {
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export this route (CSV)' }).click()]);
    expect(download.suggestedFilename()).toBe(`route-RTM-${expected.id}-${date}.csv`);
    const { rows } = parseCsvText(readFileSync(await download.path(), 'utf8'));
    const at = (name: string) => rows[0].indexOf(name);
    expect(rows).toHaveLength(expected.legs.length + 2);
    expect(rows.slice(1, -1).map((r) => Number(r[at('lanes_file_row')]))).toEqual(expected.legs.map((l) => l.row));
    const total = rows[rows.length - 1];
    expect(total[at('leg')]).toBe('total');
    expect(total[at('net')]).toBe(formatMinor(expected.cost as Minor));
    expect(rows.slice(1).every((r) => r[at('caution')] === ROUTE_CAUTION && r[at('date')] === date)).toBe(true);
    const estimatedRow = rows.slice(1, -1).find((r) => r[at('distance_estimate')] !== '' || r[at('fuel_estimate')] !== '' || r[at('drive_estimate')] !== '');
    expect(estimatedRow).toBeDefined();
  });

  it('prints a one-page route sheet with the caution', async () => {
    await page.evaluate(() => {
      window.print = () => undefined;
    });
    await page.getByRole('button', { name: 'Print route sheet' }).click();
    const pdf = await page.pdf({ format: 'A4', printBackground: false, preferCSSPageSize: true });
    const pages = (await pdfPages(new Uint8Array(pdf))).map((p) => p.replace(/\s+/g, ''));
    const squeeze = (t: string) => t.replace(/\s+/g, '');
    expect(pages).toHaveLength(1);
    expect(pages[0]).toContain(squeeze(`route sheet: RTM → ${expected.id}`));
    expect(pages[0]).toContain(squeeze(`Planned for ${date}`));
    expect(pages[0]).toContain(squeeze(ROUTE_CAUTION));
    expect(pages[0]).not.toContain('Exportroutes'); // only the sheet is printed, not the window
    await page.evaluate(() => document.body.classList.remove('lw-printing-route'));
  });

  it('made no request outside localhost and logged no errors', () => {
    expect(offsiteRequests(session)).toEqual([]);
    expect(session.errors).toEqual([]);
  });
});
