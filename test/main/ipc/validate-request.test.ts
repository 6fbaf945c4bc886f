import { describe, expect, it } from 'vitest';
import { validateRequest, MAX_IPC_PATH } from '../../../main/ipc/validate-request';
import { isChannelName, CHANNEL_NAMES } from '../../../main/ipc/channels';
import { IpcPayloadError } from '../../../main/electron/errors';
import { emptyWorkspace } from '../../../engine/workspace/document';
import { parseScenarioDocument, serializeScenarioDocument } from '../../../engine/scenario/document';

function refused(channel: Parameters<typeof validateRequest>[0], payload: unknown): IpcPayloadError {
  try {
    validateRequest(channel, payload);
  } catch (error) {
    expect(error).toBeInstanceOf(IpcPayloadError);
    return error as IpcPayloadError;
  }
  throw new Error(`accepted ${JSON.stringify(payload)}`);
}

describe('channel names', () => {
  it('lists eight distinct channels and recognises only those', () => {
    expect(new Set(CHANNEL_NAMES).size).toBe(CHANNEL_NAMES.length);
    expect(CHANNEL_NAMES).toHaveLength(8);
    expect(isChannelName('file:read')).toBe(true);
    expect(isChannelName('shell:exec')).toBe(false);
    expect(isChannelName(7)).toBe(false);
  });
});

describe('validateRequest', () => {
  it('returns a copy holding only the contract fields', () => {
    const doc = emptyWorkspace();
    const request = validateRequest('workspace:save', { document: doc, path: '/p/w.json', saveAs: false });
    expect(request).toEqual({ document: doc, path: '/p/w.json', saveAs: false });
    expect(request.document).not.toBe(doc);
  });

  it('names the channel and field it refuses', () => {
    expect(refused('file:read', { path: '' })).toMatchObject({ channel: 'file:read', field: '/path', reason: 'must not be empty' });
    expect(refused('file:read', { path: 'x'.repeat(MAX_IPC_PATH + 1) })).toMatchObject({ field: '/path' });
    expect(refused('file:read', { path: '/p/a\u0000b' })).toMatchObject({ field: '/path' });
    expect(refused('file:read', ['/p'])).toMatchObject({ field: '' });
    expect(refused('workspace:open', {})).toMatchObject({ field: '/path', reason: 'missing' });
    expect(refused('workspace:recent', { x: 1 })).toMatchObject({ field: '/x', reason: 'unknown field' });
    expect(refused('file:save-export', { suggestedName: 'a/b.csv', text: '', kind: 'csv' })).toMatchObject({ field: '/suggestedName' });
    expect(refused('file:save-export', { suggestedName: 'C:evil.csv', text: '', kind: 'csv' })).toMatchObject({ field: '/suggestedName' });
    expect(refused('file:save-export', { suggestedName: 'r.csv', text: 5, kind: 'csv' })).toMatchObject({ field: '/text' });
    expect(refused('file:save-export', { suggestedName: 'r.csv', text: '', kind: 'xlsx' })).toMatchObject({ field: '/kind' });
    expect(refused('workspace:save', { document: { ...emptyWorkspace(), settings: { ...emptyWorkspace().settings, maxLegs: -1 } }, path: null, saveAs: false })).toMatchObject({ field: '/document/settings/maxLegs' });
  });

  it('accepts a scenario export only when its text is a scenario document compare can read', () => {
    const scenario = {
      name: 'Direct run',
      description: null,
      changes: [{ kind: 'close-lane' as const, lane: { from: 'A', to: 'B', ref: null, occurrence: 1 }, note: 'road works' }],
    };
    const text = serializeScenarioDocument(scenario);
    const request = validateRequest('file:save-export', { suggestedName: 'direct-run.json', text, kind: 'scenario' });
    expect(request.kind).toBe('scenario');
    expect(parseScenarioDocument(request.text)).toEqual(scenario);
    expect(refused('file:save-export', { suggestedName: 's.json', text: '{"format":"lanewright-scenario"', kind: 'scenario' })).toMatchObject({ field: '/text' });
    expect(refused('file:save-export', { suggestedName: 's.json', text: JSON.stringify({ ...JSON.parse(text), version: 99 }), kind: 'scenario' })).toMatchObject({ field: '/text', value: '99' });
    expect(refused('file:save-export', { suggestedName: 's.json', text: 'depot,cost\r\n', kind: 'scenario' })).toMatchObject({ field: '/text' });
    // The same text as a plain CSV export is not checked as a scenario.
    expect(validateRequest('file:save-export', { suggestedName: 's.csv', text: 'depot,cost\r\n', kind: 'csv' }).kind).toBe('csv');
  });

  it('accepts an empty export (a table with only its header is still a file)', () => {
    expect(validateRequest('file:save-export', { suggestedName: 'loops.csv', text: '', kind: 'csv' }).text).toBe('');
  });

  it('refuses prototype tricks: only own, known fields count', () => {
    expect(refused('app:set-dirty', JSON.parse('{"dirty":true,"__proto__":{"x":1}}'))).toMatchObject({ field: '/__proto__' });
  });
});
