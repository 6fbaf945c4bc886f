// The sample carrier's day of loads and its vehicles (fictional Brightwater & Fennick Haulage), bundled
// so the Loads panel can show lane limits at work offline: a 4.2 m double-deck trailer, a 2-axle
// rigid and an ADR tanker against a low bridge, a weight-limited bridge and a category-D tunnel.

import loadsText from '../../sample-data/loads.csv?raw';
import vehiclesText from '../../sample-data/vehicles.csv?raw';
import type { NamedText } from '../worker/protocol';
import { SAMPLE_PREFIX } from './sample';

export function sampleLoadFiles(): { loads: NamedText; vehicles: NamedText } {
  return {
    loads: { name: `${SAMPLE_PREFIX}loads.csv`, text: loadsText },
    vehicles: { name: `${SAMPLE_PREFIX}vehicles.csv`, text: vehiclesText },
  };
}
