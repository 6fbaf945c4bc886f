// electron-builder.yml is checked with electron-builder's own configuration validator (its JSON
// schema), then for the targets and identity the project asks for.
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { inflateSync } from 'node:zlib';

const require = createRequire(import.meta.url);
const yaml = require('js-yaml') as { load(text: string): any };
const { validateConfiguration } = require('app-builder-lib/out/util/config/config') as { validateConfiguration(config: unknown, logger: unknown): Promise<void> };

const config = yaml.load(readFileSync('electron-builder.yml', 'utf8'));
const logger = { isEnabled: false, add: () => {} };

describe('electron-builder.yml', () => {
  it('passes electron-builder\'s own schema validation', async () => {
    await expect(validateConfiguration(config, logger)).resolves.toBeUndefined();
  });

  it('the validator does refuse a misspelt option (so the check above can fail)', async () => {
    await expect(validateConfiguration({ ...config, linux: { ...config.linux, tagret: ['deb'] } }, logger)).rejects.toThrow();
  });

  it('names the app and builds AppImage + deb, nsis and dmg', () => {
    expect(config.appId).toBe('app.lanewright.desktop');
    expect(config.productName).toBe('Lanewright');
    expect(config.linux.target).toEqual(['AppImage', 'deb']);
    expect(config.win.target).toEqual(['nsis']);
    expect(config.mac.target).toEqual(['dmg']);
    expect(config.extraMetadata.main).toBe('dist/main/main.cjs');
  });

  it('packs the bundles only and switches off run-as-node', () => {
    expect(config.files).toEqual(expect.arrayContaining(['dist/main/**/*', 'dist/renderer/**/*']));
    expect(config.electronFuses).toMatchObject({ runAsNode: false, onlyLoadAppFromAsar: true, enableNodeCliInspectArguments: false });
  });

  it('points at an icon that is a real 512x512 PNG (electron-builder needs at least 256 for macOS and Windows)', () => {
    const png = readFileSync(config.linux.icon);
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    expect([png.readUInt32BE(16), png.readUInt32BE(20)]).toEqual([512, 512]);
    expect(config.win.icon).toBe(config.linux.icon);
    expect(config.mac.icon).toBe(config.linux.icon);
    // The pixel data inflates to 512 rows of (1 filter byte + 512 RGBA pixels).
    const idatLength = png.readUInt32BE(33);
    expect(png.subarray(37, 41).toString('latin1')).toBe('IDAT');
    expect(inflateSync(png.subarray(41, 41 + idatLength)).length).toBe(512 * (1 + 512 * 4));
  });
});
