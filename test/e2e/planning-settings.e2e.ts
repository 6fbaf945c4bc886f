// The planning settings panel: every setting shows its default and the default's source; a changed
// fuel price re-plans and the costs match the engine run here with the same setting; a value the
// engine cannot use is refused in place with its reason; the settings are kept in the workspace and
// come back after a reload.

import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { importNetwork } from '../../engine/planning/import-network';
import { cheapestRoutes, STATUS_REACHABLE } from '../../engine/routes/cheapest-routes';
import { offsiteRequests, openReadyApp, snap, solveCount, waitForPlan, type Session } from './support/browser';
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

async function shownCosts(p: Page): Promise<Map<string, string>> {
  const rows = await p.locator('[data-testid="results-table"] tbody tr').evaluateAll((trs) => trs.map((tr) => [tr.getAttribute('data-depot') ?? '', tr.getAttribute('data-cost-minor') ?? '']));
  return new Map(rows as [string, string][]);
}

function engineCosts(date: string, fuelPricePerLitre: string): Map<string, string> {
  const network = importNetwork(sample('depots.csv'), sample('lanes.csv'), { plan: { date, settings: { fuelPricePerLitre } } }).network!;
  const tree = cheapestRoutes(network, network.depotIndex.get('RTM')!);
  const out = new Map<string, string>();
  for (let d = 0; d < network.depotCount; d++) if (tree.status[d] === STATUS_REACHABLE) out.set(network.depotIds[d], String(tree.cost[d]));
  return out;
}

describe('planning settings', () => {
  it('shows each default with its source', async () => {
    const panel = page.getByTestId('planning-settings');
    await panel.locator('summary').click();
    const text = await panel.innerText();
    expect(text).toMatch(/Default EUR 1\.65\/l/);
    expect(text).toMatch(/561\/2006/); // the EU driving-limit source
    expect(text).toMatch(/Default 1\.3 .*common practice/s);
    for (const label of ['Fuel price per litre', 'Fuel use (l/100 km)', 'Daily driving limit', 'Detour factor', 'Average speed (km/h)', 'Default toll', 'Network currency', 'Exchange rates']) {
      expect(await panel.getByLabel(label).count(), label).toBe(1);
    }
    await snap(page, 'planning-settings');
  });

  it('re-plans with a new fuel price, matching the engine', async () => {
    const date = await page.getByLabel('Dispatch date').inputValue();
    const before = await solveCount(page);
    const price = page.getByLabel('Fuel price per litre');
    await price.fill('2.40');
    await price.press('Enter');
    await waitForPlan(page, before);
    const expected = engineCosts(date, '2.40');
    const defaults = engineCosts(date, '1.65');
    expect([...expected.values()]).not.toEqual([...defaults.values()]); // the price matters on the sample
    await expect.poll(async () => (await shownCosts(page)).get('PAR')).toBe(expected.get('PAR'));
    const shown = await shownCosts(page);
    for (const [id, cost] of expected) expect(shown.get(id), id).toBe(cost);
    expect(await page.getByTestId('planning-settings').locator('summary').innerText()).toContain('(1 changed)');
  });

  it('refuses a value it cannot use, in place, with the reason', async () => {
    const before = await solveCount(page);
    const speed = page.getByLabel('Average speed (km/h)');
    await speed.fill('fast');
    await speed.press('Enter');
    expect(await speed.getAttribute('aria-invalid')).toBe('true');
    expect(await page.getByRole('alert').filter({ hasText: 'Average speed' }).innerText()).toMatch(/positive number/);
    expect(await solveCount(page)).toBe(before);
    await speed.fill('');
    await speed.press('Enter');
    expect(await speed.getAttribute('aria-invalid')).toBeNull();
  });

  it('keeps the settings in the workspace across a reload', async () => {
    await page.reload();
    await waitForPlan(page);
    const panel = page.getByTestId('planning-settings');
    expect(await panel.locator('summary').innerText()).toContain('(1 changed)');
    await panel.locator('summary').click();
    expect(await page.getByLabel('Fuel price per litre').inputValue()).toBe('2.40');
    const date = await page.getByLabel('Dispatch date').inputValue();
    await expect.poll(async () => (await shownCosts(page)).get('PAR')).toBe(engineCosts(date, '2.40').get('PAR'));
  });

  it('refuses 0, -2 and 2.5 as maximum legs with a message, keeping the limit in force', async () => {
    const legs = page.getByLabel('Maximum legs');
    let before = await solveCount(page);
    await legs.fill('3');
    await waitForPlan(page, before);
    for (const bad of ['0', '-2', '2.5']) {
      before = await solveCount(page);
      await legs.fill(bad);
      expect(await legs.getAttribute('aria-invalid'), bad).toBe('true');
      expect(await legs.inputValue()).toBe(bad); // not silently cleared
      expect(await page.getByRole('alert').filter({ hasText: 'Maximum legs' }).innerText()).toContain(`"${bad}" is not a whole number from 1; the limit stays 3`);
      expect(await solveCount(page)).toBe(before);
    }
    before = await solveCount(page);
    await legs.fill('');
    await waitForPlan(page, before);
    expect(await legs.getAttribute('aria-invalid')).toBeNull();
  });

  it('made no request outside localhost and logged no errors', () => {
    expect(offsiteRequests(session)).toEqual([]);
    expect(session.errors).toEqual([]);
  });
});
