// Starts what an end-to-end run needs: the built renderer on a free localhost port, Debian's
// Chromium headless through playwright-core, and a log of every request the page makes so a test
// can prove nothing left localhost.

import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Locator, type Page } from 'playwright-core';
import { expect } from 'vitest';
import { serveStatic, type RunningServer } from '../../../main/web/static-server';

export const CHROMIUM = '/usr/bin/chromium';
export const SCREENSHOTS = 'test-output/screenshots';

export interface Session {
  server: RunningServer;
  browser: Browser;
  context: BrowserContext;
  page: Page;
  /** Every URL the page requested, in order. */
  requests: string[];
  /** Console errors and uncaught page errors. */
  errors: string[];
  close(): Promise<void>;
}

/** Serves dist/renderer and opens it in a fresh headless Chromium profile; `initScript` runs in the page before the app. */
export async function openApp(viewport = { width: 1440, height: 920 }, initScript?: string): Promise<Session> {
  if (!existsSync('dist/renderer/index.html')) throw new Error('dist/renderer is missing: run "npm run build:renderer" (npm run test:e2e does)');
  if (!existsSync(CHROMIUM)) throw new Error(`${CHROMIUM} is missing: apt-get install -y chromium`);
  mkdirSync(SCREENSHOTS, { recursive: true });
  const server = await serveStatic('dist/renderer', 0);
  const browser = await chromium.launch({
    executablePath: CHROMIUM,
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--no-first-run'],
  });
  const context = await browser.newContext({ viewport, acceptDownloads: true });
  if (initScript) await context.addInitScript(initScript);
  const page = await context.newPage();
  const requests: string[] = [];
  const errors: string[] = [];
  page.on('request', (request) => requests.push(request.url()));
  page.on('console', (message) => {
    if (message.type() === 'error') errors.push(message.text());
  });
  page.on('pageerror', (error) => errors.push(error.message));
  await page.goto(server.url);
  return {
    server,
    browser,
    context,
    page,
    requests,
    errors,
    close: async () => {
      await browser.close();
      await server.close();
    },
  };
}

/** URLs that went anywhere but the local server (data: and blob: URLs stay in the page). */
export function offsiteRequests(session: Session): string[] {
  return session.requests.filter((url) => !url.startsWith(session.server.url) && !url.startsWith('data:') && !url.startsWith('blob:'));
}

/** Waits until a plan is on screen and no solve is pending; `after` = the solve count seen before a change. */
export async function waitForPlan(page: Page, after = -1): Promise<void> {
  await page.waitForFunction(
    (seen) => {
      const app = document.querySelector('.lw-app');
      return !!app && app.getAttribute('data-ready') === 'yes' && Number(app.getAttribute('data-solves')) > seen;
    },
    after,
    { timeout: 60_000 },
  );
}

/** Number of solves the page has shown so far. */
export async function solveCount(page: Page): Promise<number> {
  return Number(await page.locator('.lw-app').getAttribute('data-solves'));
}

/** Saves a screenshot of the whole window under test-output/screenshots. */
export async function snap(page: Page, name: string): Promise<string> {
  const path = join(SCREENSHOTS, `${name}.png`);
  await page.screenshot({ path });
  return path;
}

/** Picks a file through the next file chooser that `click` opens. */
export async function chooseFile(page: Page, click: () => Promise<void>, name: string, text: string): Promise<void> {
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), click()]);
  await chooser.setFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(text, 'utf8') });
}

/** In the open Import dialog, picks the depots file and then the lanes file and waits until the dialog names the lanes file; returns the dialog. */
export async function pickImportFiles(page: Page, depots: { name: string; text: string }, lanes: { name: string; text: string }): Promise<Locator> {
  const dialog = page.getByRole('dialog', { name: 'Import depots and lanes' });
  await chooseFile(page, () => dialog.getByRole('button', { name: 'Choose depots file…' }).click(), depots.name, depots.text);
  await chooseFile(page, () => dialog.getByRole('button', { name: 'Choose lanes file…' }).click(), lanes.name, lanes.text);
  await expect.poll(() => dialog.getByTestId('import-lanes-name').innerText()).toBe(lanes.name);
  return dialog;
}

export const TIMINGS_FILE = 'test-output/e2e-timings.json';

/** Writes `figures` under `key` in the e2e timings file, keeping what other specs wrote there (printed, never asserted). */
export function recordTimings(key: string, figures: Record<string, unknown>): void {
  mkdirSync('test-output', { recursive: true });
  let all: Record<string, unknown> = {};
  try {
    all = JSON.parse(readFileSync(TIMINGS_FILE, 'utf8')) as Record<string, unknown>;
  } catch {
    all = {};
  }
  all[key] = figures;
  writeFileSync(TIMINGS_FILE, JSON.stringify(all, null, 2) + '\n');
}

/** openApp with the first-run notice read and the first plan on screen. */
export async function openReadyApp(viewport?: { width: number; height: number }, initScript?: string): Promise<Session> {
  const session = await openApp(viewport, initScript);
  await session.page.getByRole('button', { name: 'I understand' }).click();
  await waitForPlan(session.page);
  return session;
}

/** Types an amount into the nth lane table cell of `field` ("rebate", "toll", ...) and waits for the re-plan. */
export async function editLaneAmount(page: Page, field: string, nth: number, amount: string): Promise<void> {
  await page.getByRole('tab', { name: /Lanes/ }).click();
  const cell = page.locator(`[data-testid="lane-table"] input[aria-label^="${field} of lane"]`).nth(nth);
  const before = await solveCount(page);
  await cell.fill(amount);
  await cell.press('Enter');
  await waitForPlan(page, before);
}

/** The toll cell of row `nth` of the lane table as shown (the bulk specs' edits). */
export function tollCell(page: Page, nth: number): Locator {
  return page.locator('[data-testid="lane-table"] tbody tr').nth(nth).locator('input[aria-label^="toll of lane"]');
}

/**
 * Types `amount` into `cell`, presses Enter and waits for the re-plan. Returns how long the edit took
 * to reach the screen (from the key press) and the page's own figures of that recompute; for the
 * timings file, never asserted.
 */
export async function timedEdit(page: Page, cell: Locator, amount: string): Promise<{ editToScreenMs: number; roundTripMs: number; solveMs: number }> {
  const before = await solveCount(page);
  await cell.fill(amount);
  const started = Date.now();
  await cell.press('Enter');
  await waitForPlan(page, before);
  const editToScreenMs = Date.now() - started;
  const status = page.locator('[data-testid="recompute-ms"]');
  return { editToScreenMs, roundTripMs: Number(await status.getAttribute('data-round-trip-ms')), solveMs: Number(await status.getAttribute('data-solve-ms')) };
}
