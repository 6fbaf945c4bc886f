// The bundled sample carrier (fictional carrier Brightwater & Fennick Haulage) so a first run shows
// a working plan at once, offline, and the loop variant for seeing the rebate-loop warning.

import depotsText from '../../sample-data/depots.csv?raw';
import lanesText from '../../sample-data/lanes.csv?raw';
import loopLanesText from '../../sample-data/lanes-rebate-loop.csv?raw';
import loadsText from '../../sample-data/loads.csv?raw';
import vehiclesText from '../../sample-data/vehicles.csv?raw';
import type { NamedText } from '../worker/protocol';

/** Workspace "paths" of bundled files start with this, so they are never asked of the host. */
export const SAMPLE_PREFIX = 'sample:';

export const SAMPLE_ORIGIN = 'RTM';

/** Dispatch date the sample opens at: inside the period of its date-limited rebate clauses, so the
 *  loop variant shows its loop (the volume refund it needs runs 2026-03-01 to 2026-09-30). */
export const SAMPLE_DATE = '2026-08-15';

// A Map: a workspace may name "sample:constructor", which must find nothing.
const FILES = new Map<string, string>([
  ['depots.csv', depotsText],
  ['lanes.csv', lanesText],
  ['lanes-rebate-loop.csv', loopLanesText],
  // The Loads panel's sample day; a workspace names them as sample:loads.csv and sample:vehicles.csv.
  ['loads.csv', loadsText],
  ['vehicles.csv', vehiclesText],
]);

/** The sample depots and lanes; `loop` picks the variant whose rebates form a loop. */
export function sampleFiles(loop: boolean): { depots: NamedText; lanes: NamedText } {
  const lanes = loop ? 'lanes-rebate-loop.csv' : 'lanes.csv';
  return {
    depots: { name: `${SAMPLE_PREFIX}depots.csv`, text: FILES.get('depots.csv')! },
    lanes: { name: `${SAMPLE_PREFIX}${lanes}`, text: FILES.get(lanes)! },
  };
}

/** Text of a bundled file by its workspace path, or undefined when it is not a sample path. */
export function sampleText(path: string): string | undefined {
  return path.startsWith(SAMPLE_PREFIX) ? FILES.get(path.slice(SAMPLE_PREFIX.length)) : undefined;
}
