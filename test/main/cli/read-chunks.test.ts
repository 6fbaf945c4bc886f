// The CLI's chunked file reader against a whole-file TextDecoder: random byte streams (ASCII,
// multi-byte characters, a byte-order mark, invalid and truncated sequences) read in small chunks
// give the same text, so a character cut by a chunk boundary is never split or lost.

import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readTextChunks } from '../../../main/cli/read-chunks';

const pieces = ['a', ',', '\n', 'é', '€', '𝄞', '\ufeff', 'Ł'].map((t) => [...Buffer.from(t, 'utf8')]);
const invalid = [[0xff], [0xc3], [0xe2, 0x82], [0xf0, 0x9d, 0x84], [0x80], [0xc0, 0xaf], [0xed, 0xa0, 0x80]];

describe('readTextChunks', () => {
  it('decodes in chunks exactly as TextDecoder decodes the whole file', () => {
    const dir = mkdtempSync(join(tmpdir(), 'lw-chunks-'));
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.constantFrom(...pieces), fc.constantFrom(...invalid)), { maxLength: 80 }), fc.integer({ min: 4, max: 9 }), (parts, chunk) => {
        const bytes = Uint8Array.from(parts.flat());
        const file = join(dir, 'f.csv');
        writeFileSync(file, bytes);
        const chunks = [...readTextChunks(file, chunk)];
        expect(chunks.map((c) => c.text).join('')).toBe(new TextDecoder('utf-8', { ignoreBOM: true }).decode(bytes));
        if (chunks.length > 0) expect(chunks[chunks.length - 1].fraction).toBe(1);
      }),
      { seed: 44, numRuns: 500 },
    );
  });
});

describe('check reads the lanes file as bytes', () => {
  it('reports exactly what the text import reports, on a file past one chunk with hostile rows', async () => {
    const { runCli } = await import('./cli-harness');
    const { importNetwork } = await import('../../../engine/index');
    const dir = mkdtempSync(join(tmpdir(), 'lw-bytes-'));
    const depots = join(dir, 'depots.csv');
    const lanes = join(dir, 'lanes.csv');
    // Forty depots, so lanes spread over many pairs (the duplicate check compares lanes of one pair).
    const ids = Array.from({ length: 40 }, (_, d) => `D${d}`);
    writeFileSync(depots, ['id,name,lat,lon', 'A,Alpha,50.1,8.6', 'B,Beta,48.1,11.5', 'Liège,Liège,50.63,5.57', ...ids.map((id, d) => `${id},Depot ${d},${45 + d / 10},${5 + d / 10}`)].join('\n') + '\n');
    const hostile = ['A,B,"R, quoted",1.00,2,"two\nlines"', 'Liège,A,R-L,3.50,1,', 'A,Z,R-Z,1,1,unknown depot', 'B,A,R-H,99999999999999999,1,huge', "A,B,'=R,1,1,'@x", 'B,A,R-C,1,1,crlf\r', 'A,B,R-Q,1,1,inch 48" trailer'];
    const parts: Buffer[] = [Buffer.from('\ufefffrom,to,ref,toll,fuel,notes\n')];
    for (let i = 0; i < 50_000; i++) {
      parts.push(Buffer.from(i % 997 === 500 ? `${hostile[Math.floor(i / 997) % hostile.length]}\n` : `${ids[i % 40]},${ids[(i * 7 + 1) % 40]},R${i},${i % 50}.25,3,n${i}\n`));
      if (i === 45_000) parts.push(Buffer.from([0x42, 0x2c, 0x41, 0x2c, 0x52, 0xff, 0x2c, 0x31, 0x2c, 0x31, 0x2c, 0x0a]));
    }
    const bytes = Buffer.concat(parts);
    expect(bytes.length).toBeGreaterThan(1 << 20);
    writeFileSync(lanes, bytes);
    const run = await runCli(['check', '--depots', depots, '--lanes', lanes, '--date', '2026-06-01', '--json']);
    const cli = JSON.parse(run.stdout) as { total: number; accepted: number; rejected: number; errors: unknown[]; warnings: unknown[] };
    const text = importNetwork(readFileSync(depots, 'utf8'), bytes.toString('utf8'), { depotsFile: depots, lanesFile: lanes, plan: { date: '2026-06-01' }, network: false }).report;
    const items = (list: readonly { file: string; row: number | null; column: string | null; value: string | null; message: string; code: string }[]) =>
      list.map(({ file, row, column, value, message, code }) => ({ file, row, column, value, message, code }));
    expect({ total: cli.total, accepted: cli.accepted, rejected: cli.rejected, errors: cli.errors, warnings: cli.warnings }).toEqual({
      total: text.total,
      accepted: text.accepted,
      rejected: text.rejected,
      errors: items(text.errors),
      warnings: items(text.warnings),
    });
    expect(text.errors.map((e) => e.code)).toEqual(expect.arrayContaining(['unknown-depot', 'not-text']));
  });
});
