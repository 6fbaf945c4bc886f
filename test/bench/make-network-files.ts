// Writes the bench networks as CSV files for timing commands by hand:
//   node --import tsx test/bench/make-network-files.ts FOLDER
// prints one line per network with the files and the origin to pass to --from.

import { mkdirSync } from 'node:fs';
import { writeNetworkFiles } from './network-files';

const folder = process.argv[2];
if (!folder) throw new Error('usage: make-network-files.ts FOLDER');
mkdirSync(folder, { recursive: true });
for (const [shape, size, lanes] of [['grid', 500, 0], ['chain', 20_000, 0], ['random', 100_000, 1_000_000]] as const) {
  const f = writeNetworkFiles(folder, shape, size, lanes);
  console.log(`${shape}: --depots ${f.depots} --lanes ${f.lanes} --from ${f.origin} (${f.depotCount} depots, ${f.laneCount} lanes)`);
}
