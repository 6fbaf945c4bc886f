// The Loads panel's files belong to the workspace: a workspace that names a loads and a vehicles file
// (here the bundled sample's, as browser mode keeps it in local storage) reopens with the day's loads
// planned, and the kept workspace names them again.

import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { emptyWorkspace } from '../../engine/workspace/document';
import { WORKSPACE_KEY } from '../../renderer/host/browser-store';
import { offsiteRequests, openReadyApp, type Session } from './support/browser';

let session: Session;
let page: Page;

beforeAll(async () => {
  const kept = emptyWorkspace();
  kept.files = { depots: 'sample:depots.csv', lanes: 'sample:lanes.csv', loads: 'sample:loads.csv', vehicles: 'sample:vehicles.csv' };
  kept.settings = { ...kept.settings, origin: 'RTM', dispatchDate: '2026-08-15' };
  session = await openReadyApp(undefined, `localStorage.setItem(${JSON.stringify(WORKSPACE_KEY)}, ${JSON.stringify(JSON.stringify(kept))});`);
  page = session.page;
});

afterAll(async () => {
  await session?.close();
});

describe('loads and vehicles files in the workspace', () => {
  it('reopens the day\'s loads with the workspace, planned with the vehicles file', async () => {
    await page.getByRole('tab', { name: /Loads/ }).click();
    const table = page.locator('[data-testid="loads-table"]');
    await table.waitFor();
    await expect.poll(() => table.locator('tbody tr[data-load]').count()).toBe(12);
    // The blocked load is blocked by its vehicle's height: the vehicles file was read too.
    expect(await table.locator('tr[data-load="L-0815-03"]').innerText()).toContain('blocked');
    expect(await page.getByRole('button', { name: /Vehicles: sample:vehicles\.csv/ }).count()).toBe(1);
  });

  it('keeps naming them in the stored workspace', async () => {
    const stored = await page.evaluate((key) => JSON.parse(localStorage.getItem(key) ?? 'null'), WORKSPACE_KEY);
    expect(stored.files).toMatchObject({ loads: 'sample:loads.csv', vehicles: 'sample:vehicles.csv' });
  });

  it('made no request outside localhost and logged no errors', () => {
    expect(offsiteRequests(session)).toEqual([]);
    expect(session.errors).toEqual([]);
  });
});
