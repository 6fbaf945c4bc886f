import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { mkdir, mkdtemp, rm, utimes, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { isStale, newestMtime } from '../../../main/launch/freshness';
import { fetchElectron, installedElectron, runtimeMissingMessage } from '../../../main/launch/desktop-runtime';

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(join(tmpdir(), 'lw-launch-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

async function touch(file: string, secondsSinceEpoch: number): Promise<void> {
  await mkdir(join(file, '..'), { recursive: true });
  await writeFile(file, 'x');
  await utimes(file, secondsSinceEpoch, secondsSinceEpoch);
}

describe('renderer freshness', () => {
  it('is stale when the output is missing or older than any source, fresh otherwise', async () => {
    const out = join(dir, 'dist', 'index.html');
    const src = join(dir, 'renderer');
    await touch(join(src, 'app', 'App.tsx'), 1000);
    await touch(join(src, 'map', 'layers.ts'), 2000);
    expect(await isStale(out, [src])).toBe(true);
    await touch(out, 3000);
    expect(await isStale(out, [src, join(dir, 'missing')])).toBe(false);
    await touch(join(src, 'map', 'layers.ts'), 4000);
    expect(await isStale(out, [src])).toBe(true);
  });

  it('skips node_modules and hidden folders', async () => {
    await touch(join(dir, 'a.ts'), 1000);
    await touch(join(dir, 'node_modules', 'x.js'), 9000);
    await touch(join(dir, '.cache', 'y'), 9000);
    expect(await newestMtime([dir])).toBe(1000 * 1000);
  });
});

describe('desktop runtime', () => {
  it('finds no runtime without path.txt or without the binary it names', async () => {
    expect(installedElectron(dir)).toBeNull();
    await writeFile(join(dir, 'path.txt'), 'electron');
    expect(installedElectron(dir)).toBeNull();
    await touch(join(dir, 'dist', 'electron'), 1000);
    expect(installedElectron(dir)).toBe(join(dir, 'dist', 'electron'));
  });

  it('reports a failed download with its reason and log, as one line pointing to npm run web', async () => {
    await writeFile(join(dir, 'install.js'), "console.error('RequestError: getaddrinfo ENOTFOUND github.com'); process.exit(1);");
    const outcome = fetchElectron(dir, join(dir, 'install.log'));
    expect(outcome).toMatchObject({ ok: false, reason: 'getaddrinfo ENOTFOUND github.com' });
    const message = runtimeMissingMessage(outcome as { reason: string; logFile: string });
    expect(message).not.toContain('\n');
    expect(message).toContain('npm run web');
    expect(message).toContain('ENOTFOUND');
  });

  it('reports a missing electron package', () => {
    expect(fetchElectron(join(dir, 'nothing'), join(dir, 'log'))).toMatchObject({ ok: false, reason: expect.stringContaining('npm install') });
  });

  it('uses the runtime the install script put in place', async () => {
    await writeFile(join(dir, 'install.js'), "const fs=require('fs');fs.mkdirSync('dist');fs.writeFileSync('dist/electron','');fs.writeFileSync('path.txt','electron');");
    expect(fetchElectron(dir, join(dir, 'install.log'))).toEqual({ ok: true, binary: join(dir, 'dist', 'electron') });
  });
});
