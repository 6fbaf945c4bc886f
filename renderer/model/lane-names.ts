// A lane's and a lanes-file row's names as the UI shows and edits them (key, contract ref, validity,
// vehicle class), read on demand from the network view's typed arrays: only the rows on screen
// are ever made into objects or strings.

import { isoDateText, type LaneKey } from '../../engine/index';
import type { NetworkView } from '../worker/protocol';

type Named = Pick<NetworkView, 'depotIds' | 'refNames' | 'rows'>;

/** The contract ref of row `r` of the lanes file, or undefined. */
export function rowRef(network: Pick<NetworkView, 'refNames' | 'rows'>, r: number): string | undefined {
  const i = network.rows.refIndex[r];
  return i >= 0 ? network.refNames[i] : undefined;
}

/** The contract ref of network lane `e`, or undefined. */
export function laneRef(network: Pick<NetworkView, 'refNames' | 'rows' | 'laneRecord'>, e: number): string | undefined {
  return rowRef(network, network.laneRecord[e]);
}

/** The key a scenario names row `r` by (occurrences counted over the whole file by the engine). */
export function rowKey(network: Named, r: number): LaneKey {
  const rows = network.rows;
  return { from: network.depotIds[rows.from[r]], to: network.depotIds[rows.to[r]], ref: rowRef(network, r) ?? null, occurrence: rows.occurrence[r] };
}

/** The key of network lane `e` (its row's key). */
export function laneKey(network: Named & Pick<NetworkView, 'laneRecord'>, e: number): LaneKey {
  return rowKey(network, network.laneRecord[e]);
}

/** Row `r`'s validity as ISO 8601 dates (null = open). */
export function rowValidity(network: Pick<NetworkView, 'rows'>, r: number): { from: string | null; to: string | null } {
  return { from: isoDateText(network.rows.validFrom[r]), to: isoDateText(network.rows.validTo[r]) };
}

/** Long layout: the vehicle class row `r` is priced for, null = every class (always null in the wide layout). */
export function rowClass(network: Pick<NetworkView, 'rows' | 'rowClassNames'>, r: number): string | null {
  const i = network.rows.classIndex[r];
  return i >= 0 ? network.rowClassNames[i] : null;
}
