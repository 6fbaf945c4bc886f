// Headroom over threads in the browser: the served app is cross-origin isolated (the page and every
// worker), the contract review's headroom searches run over the headroom workers, and the one-day
// review it exports (every lane's floor and headroom) is the engine's on one thread in this process.
// A second browser context gets the page without its isolation headers (an old host): the review
// then runs on one thread, says so, and exports the same floors. Both reviews are timed with the
// CPU seconds of the browser's processes: figures under `headroom_threads` in the e2e timings,
// printed, never asserted. LANEWRIGHT_E2E_HEADROOM_DEPOTS sets the network size (default 5,000
// depots, 10 lanes each).

import { readdirSync, readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditNetwork, auditReport, overlayKeys, reviewCsv } from '../../engine/index';
import { importNetwork } from '../../engine/planning/import-network';
import { bigNetwork } from './support/big-network';
import { chooseFile, offsiteRequests, openApp, recordTimings, waitForPlan, type Session } from './support/browser';
import type { Page } from 'playwright-core';

const DEPOTS = Number(process.env.LANEWRIGHT_E2E_HEADROOM_DEPOTS ?? 5_000);
const LANES_PER_DEPOT = 10;
const { depotsText, lanesText } = bigNetwork(DEPOTS, LANES_PER_DEPOT, 20261203);
// Larger networks take minutes on a loaded machine.
const TIMEOUT = Math.max(240_000, DEPOTS * 60);

let session: Session;
const figures: Record<string, unknown> = { depots: DEPOTS, lanes: DEPOTS * LANES_PER_DEPOT };

beforeAll(async () => {
  session = await openApp({ width: 1440, height: 1000 });
});

afterAll(async () => {
  if (figures.isolated || figures.not_isolated) recordTimings('headroom_threads', { ...figures, note: 'shared 2-core machine with other work running; CPU = user + system seconds of every browser process during the review' });
  await session?.close();
});

/** User + system CPU seconds of every process descended from this one (the browser's), from /proc. */
function browserCpuSeconds(): number {
  const parent = new Map<number, number>();
  const ticks = new Map<number, number>();
  for (const name of readdirSync('/proc')) {
    if (!/^\d+$/.test(name)) continue;
    try {
      const stat = readFileSync(`/proc/${name}/stat`, 'utf8');
      // Fields after the command name (which may hold spaces, inside parentheses): state, ppid, ...
      const rest = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
      parent.set(Number(name), Number(rest[1]));
      ticks.set(Number(name), Number(rest[11]) + Number(rest[12]));
    } catch {
      // The process ended meanwhile.
    }
  }
  const descends = (pid: number): boolean => {
    for (let p = parent.get(pid), hops = 0; p !== undefined && p > 1 && hops < 64; p = parent.get(p), hops++) if (p === process.pid) return true;
    return false;
  };
  let sum = 0;
  for (const [pid, t] of ticks) if (descends(pid)) sum += t;
  // Linux reports CPU time in clock ticks of 1/100 s (USER_HZ).
  return Math.round(sum) / 100;
}

/** Imports the network; returns the dispatch date it is planned for. */
async function importBig(page: Page): Promise<string> {
  await page.getByRole('button', { name: 'I understand' }).click();
  await waitForPlan(page);
  await page.getByRole('button', { name: 'Import CSV…' }).click();
  const dialog = page.getByRole('dialog', { name: 'Import depots and lanes' });
  await chooseFile(page, () => dialog.getByRole('button', { name: 'Choose depots file…' }).click(), 'threads-depots.csv', depotsText);
  await chooseFile(page, () => dialog.getByRole('button', { name: 'Choose lanes file…' }).click(), 'threads-lanes.csv', lanesText);
  await expect.poll(() => dialog.getByTestId('import-lanes-name').innerText()).toBe('threads-lanes.csv');
  await expect.poll(() => dialog.getByTestId('import-depots-name').innerText()).toBe('threads-depots.csv');
  await dialog.getByRole('button', { name: 'Import', exact: true }).click();
  await expect.poll(() => page.locator('.lw-status').innerText(), { timeout: TIMEOUT }).toContain(`${DEPOTS} depots · ${DEPOTS * LANES_PER_DEPOT} lanes`);
  await waitForPlan(page);
  return page.getByLabel('Dispatch date').inputValue();
}

/** Opens the contract review and waits for it; returns its thread figures, wall time and the browser's CPU seconds. */
async function review(page: Page) {
  const cpuBefore = browserCpuSeconds();
  const started = Date.now();
  await page.getByRole('tab', { name: /Contract review/ }).click();
  const line = page.locator('[data-testid="review-threads"]');
  await line.waitFor({ timeout: TIMEOUT });
  const wallMs = Date.now() - started;
  const cpuSeconds = Math.round((browserCpuSeconds() - cpuBefore) * 100) / 100;
  const attr = async (name: string) => Number(await line.getAttribute(name));
  return { used: await attr('data-threads'), available: await attr('data-available'), pairs: await attr('data-pairs'), headroomMs: await attr('data-ms'), wallMs, cpuSeconds, text: await line.innerText() };
}

/** The one-day review CSV the app exports. */
async function exportedReview(page: Page): Promise<string> {
  // By CSS, not by role: working out the accessible names of a page this large took over 30 s.
  try {
    const [download] = await Promise.all([page.waitForEvent('download'), page.locator('.lw-review-exports button', { hasText: 'Export one-day review (CSV)' }).click()]);
    return readFileSync(await download.path(), 'utf8');
  } catch (error) {
    // Say what the page said (an export that failed puts its reason in the message line).
    const said = await page.evaluate(() => document.body.innerText.split('\n').filter((l) => /export/i.test(l)).join(' | '));
    throw new Error(`no download: ${(error as Error).message}; the page says: ${said}`);
  }
}

/** The same review by the engine in this process, on one thread (auditNetwork's default runner). */
function engineReview(date: string): { csv: string; floors: number } {
  const imported = importNetwork(depotsText, lanesText, { plan: { date }, skipInvalid: true });
  const network = imported.network!;
  const rowKeys = overlayKeys(imported);
  const audit = auditNetwork(network, { laneKeys: Array.from(imported.plan.laneRecord, (r) => rowKeys[r]) });
  return { csv: reviewCsv(network, auditReport(network, audit)), floors: Array.from(audit.headroom!.floor).filter((f) => !Number.isNaN(f)).length };
}

describe(`headroom threads in the browser, ${DEPOTS} depots`, () => {
  it('is cross-origin isolated in the page and its workers; the review shares the searches over the threads and exports the engine\'s floors', { timeout: TIMEOUT * 3 }, async () => {
    const page = session.page;
    expect(await page.evaluate(() => crossOriginIsolated)).toBe(true);
    const cores = await page.evaluate(() => navigator.hardwareConcurrency);
    const date = await importBig(page);
    const shown = await review(page);
    // Every worker of the page (the engine worker and its headroom workers) shares the isolation.
    const workers = page.workers();
    expect(workers.length).toBeGreaterThanOrEqual(1);
    figures.workers_seen = workers.length;
    for (const worker of workers) expect(await worker.evaluate(() => (self as unknown as { crossOriginIsolated: boolean }).crossOriginIsolated)).toBe(true);
    expect(shown.available).toBe(Math.max(1, Math.min(8, cores)));
    if (shown.available > 1) {
      expect(shown.used).toBeGreaterThan(1);
      expect(shown.text).toMatch(new RegExp(`threads used: ${shown.used} of ${shown.available}\\.`));
    }
    const expected = engineReview(date);
    expect(expected.floors).toBeGreaterThan(0);
    expect(await exportedReview(page)).toBe(expected.csv);
    figures.pairs_per_search = shown.pairs;
    figures.isolated = { threads_used: shown.used, threads_available: shown.available, headroom_ms: shown.headroomMs, review_wall_ms: shown.wallMs, browser_cpu_s: shown.cpuSeconds };
    expect(offsiteRequests(session)).toEqual([]);
  });

  it('without the isolation headers runs the searches on one thread, says so, and exports the same floors', { timeout: TIMEOUT * 3 }, async () => {
    const context = await session.browser.newContext({ viewport: { width: 1440, height: 1000 }, acceptDownloads: true });
    try {
      const page = await context.newPage();
      // The page as an old host serves it: no COOP or COEP on the document.
      await page.route(session.server.url, async (route) => {
        const response = await route.fetch();
        const headers = Object.fromEntries(Object.entries(response.headers()).filter(([name]) => !/^cross-origin-(opener|embedder)-policy$/i.test(name)));
        await route.fulfill({ response, headers });
      });
      await page.goto(session.server.url);
      expect(await page.evaluate(() => crossOriginIsolated)).toBe(false);
      const date = await importBig(page);
      const shown = await review(page);
      expect(shown).toMatchObject({ used: 1, available: 1 });
      expect(shown.text).toMatch(/threads used: 1 of 1 \(one thread: this page is not cross-origin isolated/);
      expect(await exportedReview(page)).toBe(engineReview(date).csv);
      figures.not_isolated = { threads_used: shown.used, headroom_ms: shown.headroomMs, review_wall_ms: shown.wallMs, browser_cpu_s: shown.cpuSeconds };
      console.log(`[e2e timing] headroom ${DEPOTS} depots / ${DEPOTS * LANES_PER_DEPOT} lanes (${figures.pairs_per_search} lane pairs per search): ${JSON.stringify(figures.isolated)} vs one thread ${JSON.stringify(figures.not_isolated)}`);
    } finally {
      await context.close();
    }
  });
});
