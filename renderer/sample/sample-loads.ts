// The sample carrier's day of loads and its vehicles (fictional Brightwater & Fennick Haulage), bundled
// so the Loads panel can show lane limits at work offline: a 4.2 m double-deck trailer, a 2-axle
// rigid and an ADR tanker against a low bridge, a weight-limited bridge and a category-D tunnel.

// The texts are bundled in sample.ts, so a workspace naming sample:loads.csv reopens them.
import type { NamedText } from '../worker/protocol';
import { SAMPLE_PREFIX, sampleText } from './sample';

export function sampleLoadFiles(): { loads: NamedText; vehicles: NamedText } {
  const named = (file: string): NamedText => ({ name: `${SAMPLE_PREFIX}${file}`, text: sampleText(`${SAMPLE_PREFIX}${file}`)! });
  return { loads: named('loads.csv'), vehicles: named('vehicles.csv') };
}
