// `npm run screenshots`: refreshes docs/screenshots/ from the built renderer (dist/renderer, which the
// npm script builds first) in Debian's Chromium through playwright-core, each scene at 1024x700 and
// 1440x900, so a reviewer sees every screen as it now is. Files are named <scene>-<width>x<height>.png;
// screenshots this script does not make are removed, so none goes stale. Nothing leaves localhost.

import { mkdirSync, readdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { serializeScenarioDocument } from '../../engine/index';
import { editLaneAmount, offsiteRequests, openReadyApp, solveCount, waitForPlan } from '../e2e/support/browser';
import { sample } from '../e2e/support/expected';

const OUT = 'docs/screenshots';
const SIZES = [
  { width: 1024, height: 700 },
  { width: 1440, height: 900 },
] as const;

type Scene = { name: string; run(page: Page): Promise<void> };

async function tab(page: Page, name: RegExp | string): Promise<void> {
  await page.getByRole('tab', { name }).click();
}

async function sampleCarrier(page: Page, loop: boolean): Promise<void> {
  const before = await solveCount(page);
  await page.getByRole('button', { name: loop ? 'Sample carrier with rebate loop' : 'Sample carrier', exact: true }).click();
  const prompt = page.getByRole('dialog', { name: 'Unsaved changes' });
  if (await prompt.isVisible().catch(() => false)) await prompt.getByRole('button', { name: 'Discard' }).click();
  await waitForPlan(page, before);
}

const editRebate = (page: Page, nth: number, amount: string) => editLaneAmount(page, 'rebate', nth, amount);

/** Each scene starts from a fresh page (a new browser profile) with the first-run notice read. */
const SCENES: Scene[] = [
  { name: 'plan-overview', run: async () => {} },
  {
    name: 'route-details',
    run: async (page) => {
      await tab(page, 'Results');
      await page.locator('[data-testid="results-table"] tr[data-depot="LYS"]').click();
      await page.locator('[data-testid="route-breakdown"]').waitFor();
    },
  },
  { name: 'rebate-loop-warning', run: (page) => sampleCarrier(page, true) },
  {
    name: 'rebate-loop-folded',
    run: async (page) => {
      await sampleCarrier(page, true);
      await tab(page, 'Results');
      await page.locator('[data-folded="yes"]').first().waitFor();
    },
  },
  {
    name: 'limit-hides-loop',
    run: async (page) => {
      await sampleCarrier(page, true);
      const before = await solveCount(page);
      await page.getByLabel('Maximum legs').fill('3');
      await waitForPlan(page, before);
      await tab(page, 'Results');
      await page.getByTestId('limit-hides-loop-help').waitFor();
    },
  },
  {
    name: 'contract-review',
    run: async (page) => {
      await sampleCarrier(page, true);
      await tab(page, /Contract review/);
      await page.getByTestId('contract-review').waitFor();
      await page.getByRole('button', { name: 'Export one-day review (CSV)' }).scrollIntoViewIfNeeded();
    },
  },
  {
    name: 'contract-review-headroom',
    run: async (page) => {
      await tab(page, /Contract review/);
      await page.getByTestId('contract-review').waitFor();
      await page.locator('table[aria-label="Rebate headroom per lane"]').scrollIntoViewIfNeeded();
    },
  },
  {
    name: 'scenario-compare',
    run: async (page) => {
      // The clause 7.2 refund on FRA > SXB cut to nothing: the loop goes, every route changes.
      await sampleCarrier(page, true);
      await tab(page, /Lanes/);
      await page.getByLabel('Filter lanes by depot or contract ref').fill('BFH-L-019');
      await editRebate(page, 0, '0.00');
      await page.getByRole('button', { name: 'Export comparison (CSV)' }).scrollIntoViewIfNeeded();
    },
  },
  {
    name: 'unsaved-edits-prompt',
    run: async (page) => {
      await editRebate(page, 0, '1.00');
      await editRebate(page, 1, '2.00');
      await page.getByRole('button', { name: 'Sample carrier with rebate loop' }).click();
      await page.getByRole('dialog', { name: 'Unsaved changes' }).waitFor();
    },
  },
  {
    name: 'status-message',
    run: async (page) => {
      await page.locator('.lw-status .lw-message').waitFor();
    },
  },
  {
    name: 'scenario-validity-row',
    run: async (page) => {
      await sampleCarrier(page, true);
      let before = await solveCount(page);
      await page.getByLabel('Dispatch date').fill('2026-11-01');
      await waitForPlan(page, before);
      const scenario = {
        name: 'Refund all year',
        description: null,
        changes: [{ kind: 'set-validity' as const, lane: { from: 'FRA', to: 'SXB', ref: 'BFH-L-019', occurrence: 1 }, validFrom: null, validTo: null, note: null }],
      };
      await tab(page, /Lanes/);
      before = await solveCount(page);
      const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Load a scenario file…' }).click()]);
      await chooser.setFiles({ name: 'refund-all-year.json', mimeType: 'application/json', buffer: Buffer.from(serializeScenarioDocument(scenario), 'utf8') });
      await waitForPlan(page, before);
      await page.locator('[data-testid="lane-table"] tr[data-scenario-row="20"]').waitFor();
    },
  },
  {
    name: 'import-report',
    run: async (page) => {
      await page.getByRole('button', { name: 'Import CSV…' }).click();
      const dialog = page.getByRole('dialog', { name: 'Import depots and lanes' });
      for (const [button, name, text] of [
        ['Choose depots file…', 'depots.csv', sample('depots.csv')],
        ['Choose lanes file…', 'lanes-broken.csv', sample('broken/lanes-broken.csv')],
      ]) {
        const [chooser] = await Promise.all([page.waitForEvent('filechooser'), dialog.getByRole('button', { name: button }).click()]);
        await chooser.setFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(text, 'utf8') });
      }
      await dialog.getByRole('button', { name: 'Import', exact: true }).click();
      await page.getByRole('dialog', { name: 'Import report' }).waitFor();
    },
  },
  {
    name: 'planning-settings',
    run: async (page) => {
      const panel = page.getByTestId('planning-settings');
      await panel.locator('summary').click();
      await panel.scrollIntoViewIfNeeded();
    },
  },
  {
    name: 'csv-dialect',
    run: async (page) => {
      await page.locator('.lw-csv-dialect summary').click();
    },
  },
  {
    name: 'map-labels',
    run: async (page) => {
      const map = page.getByRole('region', { name: /Network map/ });
      for (let i = 0; i < 3; i++) {
        const before = Number(await map.getAttribute('data-zoom'));
        await page.getByRole('button', { name: 'Zoom in' }).click();
        await page.waitForFunction((z) => Number(document.querySelector('[data-zoom]')?.getAttribute('data-zoom')) > z, before);
      }
      await page.waitForTimeout(400); // the zoom animation's last frame
    },
  },
];

async function main(): Promise<void> {
  mkdirSync(OUT, { recursive: true });
  const made = new Set<string>();
  for (const size of SIZES) {
    for (const scene of SCENES) {
      const session = await openReadyApp(size);
      try {
        const page = session.page;
        await scene.run(page);
        await page.waitForTimeout(250); // let the map's canvases finish drawing
        const file = `${scene.name}-${size.width}x${size.height}.png`;
        await page.screenshot({ path: join(OUT, file) });
        made.add(file);
        if (offsiteRequests(session).length > 0) throw new Error(`${scene.name}: a request left localhost: ${offsiteRequests(session).join(', ')}`);
        if (session.errors.length > 0) throw new Error(`${scene.name}: errors in the page: ${session.errors.join('; ')}`);
        console.log(`wrote ${join(OUT, file)}`);
      } finally {
        await session.close();
      }
    }
  }
  for (const file of readdirSync(OUT)) if (file.endsWith('.png') && !made.has(file)) rmSync(join(OUT, file));
}

main().catch((error: Error) => {
  console.error(`screenshots: ${error.message}`);
  process.exitCode = 1;
});
