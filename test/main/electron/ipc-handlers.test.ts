import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { IpcMain } from 'electron';
import { registerIpcHandlers, toFailure } from '../../../main/electron/ipc-handlers';
import { CHANNEL_NAMES } from '../../../main/ipc/channels';
import { APP_PAGE_URL } from '../../../main/electron/app-page';
import { hostFixture, type HostFixture } from './host-fixture';
import { WorkspaceFormatError } from '../../../engine/workspace/errors';

type Handler = (event: unknown, ...args: unknown[]) => Promise<any>;

let h: HostFixture;
let handlers: Map<string, Handler>;
let unregister: () => void;
const removed: string[] = [];

const appFrame = { senderFrame: { url: APP_PAGE_URL, parent: null } };

beforeEach(async () => {
  h = await hostFixture();
  handlers = new Map();
  const ipcMain = { handle: (channel: string, l: Handler) => handlers.set(channel, l), removeHandler: (c: string) => removed.push(c) };
  unregister = registerIpcHandlers(ipcMain as unknown as Pick<IpcMain, 'handle' | 'removeHandler'>, h.service);
});
afterEach(async () => {
  await h.cleanup();
});

describe('registration', () => {
  it('registers exactly the contract channels, and removes them again', () => {
    expect([...handlers.keys()].sort()).toEqual([...CHANNEL_NAMES].sort());
    unregister();
    expect(removed.sort()).toEqual([...CHANNEL_NAMES].sort());
  });
});

describe('sender checks', () => {
  const strangers = [
    { label: 'a foreign page', event: { senderFrame: { url: 'https://example.org/', parent: null } } },
    { label: 'a local file page', event: { senderFrame: { url: 'file:///tmp/evil.html', parent: null } } },
    { label: 'another app host', event: { senderFrame: { url: 'lanewright://other/index.html', parent: null } } },
    { label: 'a subframe of the app', event: { senderFrame: { url: APP_PAGE_URL, parent: { url: APP_PAGE_URL } } } },
    { label: 'a frame that is gone', event: { senderFrame: null } },
  ];
  for (const { label, event } of strangers) {
    it(`refuses ${label} on every channel without running anything`, async () => {
      for (const channel of CHANNEL_NAMES) {
        const result = await handlers.get(channel)!(event, { dirty: true });
        expect(result, channel).toMatchObject({ ok: false, failure: { error: 'IpcSenderError' } });
      }
      expect(h.dirty).toEqual([]);
      expect(h.dialogCalls).toEqual([]);
    });
  }

  it('accepts the app page, including one routed with a fragment', async () => {
    expect(await handlers.get('app:set-dirty')!(appFrame, { dirty: true })).toEqual({ ok: true, value: null });
    expect(await handlers.get('app:set-dirty')!({ senderFrame: { url: `${APP_PAGE_URL}#/loops`, parent: null } }, { dirty: false })).toEqual({ ok: true, value: null });
    expect(h.dirty).toEqual([true, false]);
  });
});

describe('payload checks', () => {
  it('refuses unknown fields, wrong types and extra arguments with IpcPayloadError naming the field', async () => {
    const cases: [string, unknown[], string][] = [
      ['app:set-dirty', [{ dirty: 'yes' }], '/dirty'],
      ['app:set-dirty', [{ dirty: true, also: 1 }], '/also'],
      ['app:set-dirty', [], ''],
      ['app:set-dirty', [{ dirty: true }, 'extra'], ''],
      ['file:pick-and-read', [{ kind: 'passwords' }], '/kind'],
      ['file:read', [{ path: 42 }], '/path'],
      ['file:save-export', [{ suggestedName: '../../.bashrc', text: 'x', kind: 'csv' }], '/suggestedName'],
      ['workspace:save', [{ document: { format: 'lanewright-workspace' }, path: null, saveAs: true }], '/document/version'],
      ['app:info', [null], ''],
    ];
    for (const [channel, args, field] of cases) {
      const result = await handlers.get(channel)!(appFrame, ...args);
      expect(result, `${channel} ${JSON.stringify(args)}`).toMatchObject({ ok: false, failure: { error: 'IpcPayloadError', field } });
    }
    expect(h.dirty).toEqual([]);
    expect(h.dialogCalls).toEqual([]);
  });
});

describe('failures as data', () => {
  it('returns named errors with their path and field', async () => {
    const result = await handlers.get('file:read')!(appFrame, { path: '/etc/shadow' });
    expect(result).toEqual({ ok: false, failure: { error: 'FileGrantError', message: expect.stringContaining('/etc/shadow'), path: '/etc/shadow', field: null } });
    expect(toFailure(new WorkspaceFormatError('w.json', '/settings/maxLegs', '0', 'must be from 1'))).toMatchObject({ error: 'WorkspaceFormatError', path: 'w.json', field: '/settings/maxLegs' });
  });

  it('reports unexpected errors without throwing', () => {
    expect(toFailure(new TypeError('boom'))).toMatchObject({ error: 'InternalError' });
    expect(toFailure('odd')).toMatchObject({ error: 'InternalError' });
  });

  it('never rejects, even when the service throws', async () => {
    const spy = vi.spyOn(h.service, 'app:info').mockRejectedValue(new Error('disk on fire'));
    expect(await handlers.get('app:info')!(appFrame, {})).toMatchObject({ ok: false, failure: { error: 'InternalError' } });
    spy.mockRestore();
  });
});
