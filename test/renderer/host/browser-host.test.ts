// Browser mode: a scenario picked in the file dialog over the 50 MB document limit is refused before
// it is read, with the reason the desktop host and the CLI give; other files are read as before.

import { describe, expect, it } from 'vitest';
import { MAX_DOCUMENT_BYTES } from '../../../engine/json/document-size';
import { readPickedFile } from '../../../renderer/host/browser-host';

/** A stand-in for a picked File whose text() must never be called. */
function bigFile(name: string, size: number) {
  let read = false;
  return {
    file: { name, size, text: async () => ((read = true), '{}') },
    wasRead: () => read,
  };
}

describe('readPickedFile', () => {
  it('refuses an oversized scenario without reading it', async () => {
    const big = bigFile('what-if.json', MAX_DOCUMENT_BYTES + 1);
    const r = await readPickedFile(big.file, 'scenario');
    expect(r).toMatchObject({ ok: false, failure: { error: 'FileAccessError', path: 'what-if.json' } });
    if (!r.ok) expect(r.failure.message).toMatch(/a scenario file is at most 52,428,800 bytes/);
    expect(big.wasRead()).toBe(false);
  });
  it('reads a scenario within the limit and any CSV, dropping the byte-order mark', async () => {
    const small = await readPickedFile(new File(['\ufeff{"a":1}'], 'what-if.json'), 'scenario');
    expect(small).toEqual({ ok: true, value: { path: 'what-if.json', name: 'what-if.json', text: '{"a":1}' } });
    const lanes = bigFile('lanes.csv', MAX_DOCUMENT_BYTES + 1);
    expect((await readPickedFile(lanes.file, 'lanes')).ok).toBe(true);
  });
});
