// Draws the Lanewright application icon (a route through three depots on a rounded tile) and writes
// it as a 512x512 PNG to build/icon.png, where electron-builder looks for it. No image library: the
// shapes are distance functions sampled 4x4 per pixel, and the PNG is encoded with node:zlib.

import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { deflateSync } from 'node:zlib';

type Rgb = readonly [number, number, number];
type Point = readonly [number, number];

const SIZE = 512;
const TILE: Rgb = [0x1d, 0x4b, 0x47];
const ROUTE: Rgb = [0xf4, 0xec, 0xd8];
const DEPOT: Rgb = [0xf2, 0xb5, 0x44];
const DEPOT_CORE: Rgb = [0x1d, 0x4b, 0x47];
const STOPS: Point[] = [
  [148, 368],
  [262, 188],
  [374, 330],
];

function insideRoundedTile(x: number, y: number): boolean {
  const margin = 20;
  const radius = 104;
  const cx = Math.min(Math.max(x, margin + radius), SIZE - margin - radius);
  const cy = Math.min(Math.max(y, margin + radius), SIZE - margin - radius);
  return (x - cx) ** 2 + (y - cy) ** 2 <= radius ** 2 && x >= margin && x <= SIZE - margin && y >= margin && y <= SIZE - margin;
}

function distanceToSegment([x, y]: Point, [ax, ay]: Point, [bx, by]: Point): number {
  const dx = bx - ax;
  const dy = by - ay;
  const t = Math.max(0, Math.min(1, ((x - ax) * dx + (y - ay) * dy) / (dx * dx + dy * dy)));
  return Math.hypot(x - (ax + t * dx), y - (ay + t * dy));
}

/** Colour at a sample point, or null for transparent. */
function shade(x: number, y: number): Rgb | null {
  if (!insideRoundedTile(x, y)) return null;
  for (const [sx, sy] of STOPS) {
    const d = Math.hypot(x - sx, y - sy);
    if (d <= 17) return DEPOT_CORE;
    if (d <= 44) return DEPOT;
  }
  for (let i = 0; i + 1 < STOPS.length; i++) {
    if (distanceToSegment([x, y], STOPS[i], STOPS[i + 1]) <= 17) return ROUTE;
  }
  return TILE;
}

/** RGBA pixels of the icon, 4x4 supersampled. */
export function renderIcon(): Uint8Array {
  const pixels = new Uint8Array(SIZE * SIZE * 4);
  const n = 4;
  for (let py = 0; py < SIZE; py++) {
    for (let px = 0; px < SIZE; px++) {
      let r = 0, g = 0, b = 0, a = 0;
      for (let sy = 0; sy < n; sy++) {
        for (let sx = 0; sx < n; sx++) {
          const colour = shade(px + (sx + 0.5) / n, py + (sy + 0.5) / n);
          if (colour) {
            r += colour[0];
            g += colour[1];
            b += colour[2];
            a += 1;
          }
        }
      }
      const o = (py * SIZE + px) * 4;
      if (a > 0) {
        pixels[o] = Math.round(r / a);
        pixels[o + 1] = Math.round(g / a);
        pixels[o + 2] = Math.round(b / a);
      }
      pixels[o + 3] = Math.round((a / (n * n)) * 255);
    }
  }
  return pixels;
}

const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});

/** CRC-32 as PNG chunks use it (ISO 3309 / ITU-T V.42 polynomial). */
export function crc32(bytes: Uint8Array): number {
  let c = 0xffffffff;
  for (const byte of bytes) c = CRC_TABLE[(c ^ byte) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type: string, data: Uint8Array): Buffer {
  const body = Buffer.concat([Buffer.from(type, 'latin1'), Buffer.from(data)]);
  const out = Buffer.alloc(body.length + 8);
  out.writeUInt32BE(data.length, 0);
  body.copy(out, 4);
  out.writeUInt32BE(crc32(body), body.length + 4);
  return out;
}

/** PNG file bytes for RGBA pixels (8 bits per channel, no filtering). */
export function encodePng(width: number, height: number, rgba: Uint8Array): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = 8; // bit depth
  header[9] = 6; // colour type: RGBA
  const rows = Buffer.alloc((width * 4 + 1) * height);
  for (let y = 0; y < height; y++) {
    rows[y * (width * 4 + 1)] = 0; // filter: none
    Buffer.from(rgba.buffer, rgba.byteOffset + y * width * 4, width * 4).copy(rows, y * (width * 4 + 1) + 1);
  }
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', deflateSync(rows, { level: 9 })),
    chunk('IEND', new Uint8Array()),
  ]);
}

/** Writes build/icon.png under `repoRoot`; returns its path. */
export function writeIcon(repoRoot: string): string {
  const file = path.join(repoRoot, 'build', 'icon.png');
  mkdirSync(path.dirname(file), { recursive: true });
  writeFileSync(file, encodePng(SIZE, SIZE, renderIcon()));
  return file;
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
  process.stdout.write(`make-icon: wrote ${path.relative(root, writeIcon(root))}\n`);
}
