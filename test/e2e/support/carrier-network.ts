// A carrier-sized synthetic network written once to files (the browser reads them by path, as a
// dispatcher picks them): depots scattered over western Europe, each with lanes to depots in its own
// or a neighbouring map cell, tolls per vehicle class, contract refs, distances and drive times.
// Seeded, so every run measures the same files. Rebates stay below each lane's own cost, so there is
// no rebate loop. Invented data, used only to measure the app at scale.

import { closeSync, openSync, writeSync } from 'node:fs';
import { join } from 'node:path';
import { seededRandom } from '../../support/seeded-random';

export interface CarrierFiles {
  depots: string;
  lanes: string;
  depotCount: number;
  laneCount: number;
  /** Vehicle classes the lanes file prices (wide layout: `toll_<class>` columns). */
  classes: string[];
}

const money = (cents: number) => (cents / 100).toFixed(2);

function writeLines(path: string, lines: Iterable<string>): void {
  const fd = openSync(path, 'w');
  let block: string[] = [];
  for (const line of lines) {
    block.push(line);
    if (block.length === 20_000) {
      writeSync(fd, block.join('\n') + '\n');
      block = [];
    }
  }
  if (block.length > 0) writeSync(fd, block.join('\n') + '\n');
  closeSync(fd);
}

/** Writes `depots` depots and `depots * perDepot` lanes into `folder`. */
export function writeCarrierNetwork(folder: string, depots: number, perDepot: number, seed = 20261203): CarrierFiles {
  const next = seededRandom(seed);
  const lat = new Float64Array(depots);
  const lon = new Float64Array(depots);
  // Cells of a quarter degree: about 18 depots each at 50,000 depots.
  const CELL = 0.25;
  const rows = Math.ceil(11 / CELL);
  const cols = Math.ceil(16 / CELL);
  const cells: number[][] = Array.from({ length: rows * cols }, () => []);
  const cellOf = (d: number) => Math.min(rows - 1, Math.floor((lat[d] - 43) / CELL)) * cols + Math.min(cols - 1, Math.floor((lon[d] + 1) / CELL));
  for (let d = 0; d < depots; d++) {
    lat[d] = 43 + next() * 11;
    lon[d] = -1 + next() * 16;
    cells[cellOf(d)].push(d);
  }
  const depotsPath = join(folder, 'carrier-depots.csv');
  writeLines(
    depotsPath,
    (function* () {
      yield 'id,name,lat,lon';
      for (let d = 0; d < depots; d++) yield `D${d},Synthetic depot ${d},${lat[d].toFixed(4)},${lon[d].toFixed(4)}`;
    })(),
  );
  const lanesPath = join(folder, 'carrier-lanes.csv');
  writeLines(
    lanesPath,
    (function* () {
      yield 'from,to,ref,toll_2axle,toll_5axle,fuel,fees,rebate,distance_km,drive_minutes';
      let row = 0;
      for (let d = 0; d < depots; d++) {
        const c = cellOf(d);
        const r0 = Math.floor(c / cols);
        const c0 = c % cols;
        for (let k = 0; k < perDepot; k++) {
          let to = d;
          for (let tries = 0; to === d && tries < 8; tries++) {
            const r = Math.min(rows - 1, Math.max(0, r0 + Math.floor(next() * 3) - 1));
            const q = Math.min(cols - 1, Math.max(0, c0 + Math.floor(next() * 3) - 1));
            const cell = cells[r * cols + q];
            if (cell.length > 0) to = cell[Math.floor(next() * cell.length)];
          }
          if (to === d) to = (d + 1) % depots;
          const km = Math.max(1, Math.hypot((lat[to] - lat[d]) * 111, (lon[to] - lon[d]) * 75) * 1.25);
          const fuel = Math.round(km * 45);
          const toll2 = Math.floor(next() * 3000);
          const toll5 = toll2 * 2 + Math.floor(next() * 2000);
          const fees = 500 + Math.floor(next() * 1500);
          // Rebates stay below the lane's own cost, so no loop can pay for itself.
          const rebate = next() < 0.2 ? Math.floor(next() * (fees + fuel / 4)) : 0;
          yield `D${d},D${to},SYN-${Math.floor(row / 8)},${money(toll2)},${money(toll5)},${money(fuel)},${money(fees)},${money(rebate)},${km.toFixed(1)},${Math.round(km * 0.9)}`;
          row++;
        }
      }
    })(),
  );
  return { depots: depotsPath, lanes: lanesPath, depotCount: depots, laneCount: depots * perDepot, classes: ['2axle', '5axle'] };
}
