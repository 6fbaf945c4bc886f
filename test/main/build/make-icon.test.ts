import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { inflateSync } from 'node:zlib';
import { crc32, encodePng, renderIcon } from '../../../main/build/make-icon';

describe('icon PNG encoder', () => {
  it('computes CRC-32 with the PNG polynomial', () => {
    // The standard check value of CRC-32 (ISO 3309 / ITU-T V.42) for "123456789" is 0xCBF43926
    // (common practice, no source; listed in every CRC catalogue).
    expect(crc32(new TextEncoder().encode('123456789'))).toBe(0xcbf43926);
    // The IEND chunk of every PNG ends with the CRC of "IEND": AE 42 60 82 (PNG specification).
    expect(crc32(new TextEncoder().encode('IEND'))).toBe(0xae426082);
  });

  it('writes a PNG whose rows decode back to the pixels', () => {
    const pixels = new Uint8Array([255, 0, 0, 255, 0, 255, 0, 128, 0, 0, 255, 0, 10, 20, 30, 40]);
    const png = encodePng(2, 2, pixels);
    expect(png.subarray(12, 16).toString('latin1')).toBe('IHDR');
    const length = png.readUInt32BE(33);
    const rows = inflateSync(png.subarray(41, 41 + length));
    expect([...rows]).toEqual([0, ...pixels.subarray(0, 8), 0, ...pixels.subarray(8)]);
    expect(png.subarray(-12).toString('hex')).toBe('0000000049454e44ae426082'); // empty IEND chunk
  });

  it('the committed build/icon.png is what the script draws now', () => {
    expect(encodePng(512, 512, renderIcon()).equals(readFileSync('build/icon.png'))).toBe(true);
  });
});
