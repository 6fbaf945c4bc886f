// Seeded networks written as depots and lanes CSV files, for benches that time whole commands
// (read, solve, report, write). Rebates come from depot potentials (net = base + p(u) - p(v)), so no
// network here has a rebate loop; every lane gives its distance, drive time and fuel, so nothing is
// estimated.

import { closeSync, openSync, writeSync } from 'node:fs';
import { join } from 'node:path';
import { seeded } from './harness';
import { gridLanes, ringLanes, sparsePotentials } from './network-shapes';

export type NetworkShape = 'grid' | 'chain' | 'random';

export interface NetworkFiles {
  depots: string;
  lanes: string;
  /** Depot id the routes are asked from. */
  origin: string;
  depotCount: number;
  laneCount: number;
}

// Buffers lines and writes them in blocks, so a million-lane file never sits in memory as one string.
function lineWriter(path: string): { line(text: string): void; close(): void } {
  const fd = openSync(path, 'w');
  let block: string[] = [];
  const flush = () => {
    writeSync(fd, block.join('\n') + '\n');
    block = [];
  };
  return {
    line(text) {
      block.push(text);
      if (block.length === 50_000) flush();
    },
    close() {
      if (block.length > 0) flush();
      closeSync(fd);
    },
  };
}

const cents = (minor: number) => (minor / 100).toFixed(2);

/** Writes a lane whose net is base + p(u) - p(v): the base as fuel, the rest as toll or rebate. */
function laneLine(u: number, v: number, base: number, pu: number, pv: number, km: number): string {
  const shift = pu - pv;
  return `D${u},D${v},${cents(shift > 0 ? shift : 0)},${cents(base)},0.00,${cents(shift < 0 ? -shift : 0)},${km.toFixed(1)},${Math.round(km * 0.9)}`;
}

/**
 * Writes one of the bench networks into `folder`:
 * - grid: side x side depots, lanes both ways to the four neighbours (about 4 per depot);
 * - chain: depot i has lanes to i+1 .. i+10, the one-step lanes cheapest, so the route to depot i has i legs;
 * - random: a ring through every depot plus random lanes.
 */
export function writeNetworkFiles(folder: string, shape: NetworkShape, size: number, laneTarget = 0): NetworkFiles {
  const rand = seeded(shape === 'grid' ? 23 : shape === 'chain' ? 29 : 11);
  const depotCount = shape === 'grid' ? size * size : size;
  const potential = sparsePotentials(depotCount, rand);

  const depots = join(folder, `${shape}-depots.csv`);
  const dw = lineWriter(depots);
  dw.line('id,name,lat,lon');
  for (let d = 0; d < depotCount; d++) dw.line(`D${d},Depot ${d},${(45 + (d % 1000) / 100).toFixed(4)},${(2 + Math.floor(d / 1000) / 100).toFixed(4)}`);
  dw.close();

  const lanes = join(folder, `${shape}-lanes.csv`);
  const lw = lineWriter(lanes);
  lw.line('from,to,toll,fuel,fees,rebate,distance_km,drive_minutes');
  let laneCount = 0;
  const lane = (u: number, v: number, base: number) => {
    lw.line(laneLine(u, v, base, potential[u], potential[v], base / 20));
    laneCount++;
  };
  let origin = 0;
  if (shape === 'grid') origin = gridLanes(size, rand, lane);
  else if (shape === 'chain') {
    // No potentials here: a one-step lane costs 1.00 and a k-step lane k.00 + 0.01, so one step at a time is cheapest.
    potential.fill(0);
    for (let d = 0; d < depotCount; d++) for (let k = 1; k <= 10 && d + k < depotCount; k++) lane(d, d + k, 100 * k + (k > 1 ? 1 : 0));
  } else ringLanes(depotCount, laneTarget, rand, lane);
  lw.close();
  return { depots, lanes, origin: `D${origin}`, depotCount, laneCount };
}
