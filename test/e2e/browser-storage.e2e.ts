// Browser mode reopens the workspace it kept in local storage; one that does not pass the workspace
// checks (an older build or a hand edit may have left anything there) is refused with a message,
// and the sample opens instead. A kept workspace reopens with the panel sizes it was saved with, and
// a moved splitter is kept in it.

import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { emptyWorkspace } from '../../engine/workspace/document';
import { WORKSPACE_KEY } from '../../renderer/host/browser-store';
import { offsiteRequests, openApp, waitForPlan, type Session } from './support/browser';

let session: Session;
let page: Page;

beforeAll(async () => {
  const kept = emptyWorkspace();
  kept.files = { depots: 'sample:depots.csv', lanes: 'sample:lanes.csv' };
  const broken = { ...kept, settings: { ...kept.settings, origin: 'RTM', dispatchDate: 'next Tuesday' } };
  session = await openApp(undefined, `localStorage.setItem(${JSON.stringify(WORKSPACE_KEY)}, ${JSON.stringify(JSON.stringify(broken))});`);
  page = session.page;
  await waitForPlan(page);
});

afterAll(async () => {
  await session?.close();
});

describe('workspace kept in the browser', () => {
  it('refuses a kept workspace that fails the checks, says why, and shows the sample', async () => {
    await expect.poll(() => page.locator('.lw-status .lw-message').innerText()).toMatch(/Could not reopen the last workspace: .*dispatchDate.*Showing the sample instead/);
    expect(await page.locator('.lw-dataset').innerText()).toMatch(/sample:lanes\.csv/);
    expect(await page.locator('.lw-error').count()).toBe(0);
  });

  it('made no request outside localhost and logged no errors', () => {
    expect(offsiteRequests(session)).toEqual([]);
    expect(session.errors).toEqual([]);
  });
});

describe('panel sizes kept in the workspace', () => {
  it('reopens the results panel and side panel at the sizes the workspace names, and keeps a moved splitter', async () => {
    const kept = emptyWorkspace();
    kept.files = { depots: 'sample:depots.csv', lanes: 'sample:lanes.csv' };
    kept.settings = { ...kept.settings, origin: 'RTM', dispatchDate: '2026-08-15' };
    kept.layout = { lowerPx: 262, sidePx: 298 };
    // No window sizes of its own in storage: only the workspace can give these.
    const s = await openApp({ width: 1024, height: 700 }, `localStorage.setItem(${JSON.stringify(WORKSPACE_KEY)}, ${JSON.stringify(JSON.stringify(kept))}); localStorage.setItem('lanewright.workspace.openedAt', '2026-08-15T07:00:00Z');`);
    try {
      await waitForPlan(s.page);
      const lower = s.page.getByRole('separator', { name: 'Height of the results panel' });
      const side = s.page.getByRole('separator', { name: 'Width of the plan and route panel' });
      await expect.poll(() => lower.getAttribute('aria-valuenow')).toBe('262');
      expect(await side.getAttribute('aria-valuenow')).toBe('298');
      expect(Math.round(await s.page.locator('#lw-lower').evaluate((el) => el.getBoundingClientRect().height))).toBe(262);
      await lower.focus();
      await s.page.keyboard.press('ArrowUp');
      await expect
        .poll(() => s.page.evaluate((key) => JSON.parse(localStorage.getItem(key) ?? 'null')?.layout, WORKSPACE_KEY))
        .toEqual({ lowerPx: 286, sidePx: 298 });
      expect(offsiteRequests(s)).toEqual([]);
      expect(s.errors).toEqual([]);
    } finally {
      await s.close();
    }
  });
});
