// Browser mode reopens the workspace it kept in local storage; one that does not pass the workspace
// checks (an older build or a hand edit may have left anything there) is refused with a message,
// and the sample opens instead.

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
