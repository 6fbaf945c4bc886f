// The one place the command line turns --depots/--lanes files into a Network. Every command goes
// through here, so the importer can change without touching the commands.

import { buildNetwork } from '../../engine/network/build';
import type { Network } from '../../engine/network/types';
import { readDepotsCsv, readLanesCsv } from '../../engine/import/basic-reader';
import { required, type ParsedArgs } from './args';
import { readTextFile } from './files';

/** Reads --depots and --lanes and builds the network. */
export function loadNetwork(args: ParsedArgs): Network {
  const depotsPath = required(args, 'depots');
  const lanesPath = required(args, 'lanes');
  const depots = readDepotsCsv(depotsPath, readTextFile(depotsPath));
  const lanes = readLanesCsv(lanesPath, readTextFile(lanesPath));
  return buildNetwork(depots, lanes);
}
