// Compiles depots and lanes into the typed-array Network. Runs once per import; every solver then
// works on flat arrays, which keeps a million lanes in well under 100 MB.

import { knownDepotIndex } from './depot-index-registry';
import { NetworkBuildError, UnknownDepotError } from '../errors';
import { netCost } from '../money/net-cost';
import { compressRows } from './compressed-rows';
import type { DepotInput, LaneInput, Network } from './types';

export interface BuildOptions {
  /** ISO 4217 code of every amount; default "EUR". */
  currency?: string;
  /** Minor digits of the currency; default 2. */
  exponent?: number;
}

/**
 * Builds the compiled network. Depot ids must be unique and every lane must name known depots;
 * the importer reports such problems per row before it gets here, so here they are programming errors.
 */
export function buildNetwork(depots: readonly DepotInput[], lanes: readonly LaneInput[], options: BuildOptions = {}): Network {
  const depotCount = depots.length;
  const laneCount = lanes.length;
  const depotPart = depotColumns(depots);
  const { depotIndex } = depotPart;

  const laneFrom = new Int32Array(laneCount);
  const laneTo = new Int32Array(laneCount);
  const laneToll = new Float64Array(laneCount);
  const laneFuel = new Float64Array(laneCount);
  const laneFees = new Float64Array(laneCount);
  const laneRebate = new Float64Array(laneCount);
  const laneNet = new Float64Array(laneCount);
  const laneRow = new Int32Array(laneCount);
  const laneDistanceKm = new Float64Array(laneCount);
  const laneDriveMinutes = new Float64Array(laneCount);
  const laneRef: (string | undefined)[] = new Array(laneCount);

  for (let e = 0; e < laneCount; e++) {
    const lane = lanes[e];
    const from = depotIndex.get(lane.from);
    if (from === undefined) throw new UnknownDepotError(lane.from, `lane from row ${lane.sourceRow}`);
    const to = depotIndex.get(lane.to);
    if (to === undefined) throw new UnknownDepotError(lane.to, `lane from row ${lane.sourceRow}`);
    const net = netCost(lane.toll, lane.fuel, lane.fees, lane.rebate, () => `net cost of the lane from row ${lane.sourceRow}`);
    laneFrom[e] = from;
    laneTo[e] = to;
    laneToll[e] = lane.toll;
    laneFuel[e] = lane.fuel;
    laneFees[e] = lane.fees;
    laneRebate[e] = lane.rebate;
    laneNet[e] = net;
    laneRow[e] = lane.sourceRow;
    laneDistanceKm[e] = lane.distanceKm ?? NaN;
    laneDriveMinutes[e] = lane.driveMinutes ?? NaN;
    laneRef[e] = lane.ref;
  }

  return {
    depotCount,
    laneCount,
    currency: options.currency ?? 'EUR',
    exponent: options.exponent ?? 2,
    ...depotPart,
    laneFrom,
    laneTo,
    laneToll,
    laneFuel,
    laneFees,
    laneRebate,
    laneNet,
    laneRow,
    laneDistanceKm,
    laneDriveMinutes,
    laneRef,
    ...compressRows(depotCount, laneFrom, laneTo, laneNet),
  };
}

/** The depot part of a Network (ids, names, coordinates, id index), shared by both network builders. */
export function depotColumns(depots: readonly DepotInput[]): Pick<Network, 'depotIds' | 'depotNames' | 'lat' | 'lon' | 'depotIndex'> {
  const depotCount = depots.length;
  const remembered = knownDepotIndex(depots);
  const depotIndex = new Map<string, number>();
  const depotIds: string[] = new Array(depotCount);
  const depotNames: string[] = new Array(depotCount);
  const lat = new Float64Array(depotCount);
  const lon = new Float64Array(depotCount);
  for (let i = 0; i < depotCount; i++) {
    const d = depots[i];
    if (remembered === undefined) {
      if (depotIndex.has(d.id)) throw new NetworkBuildError(`duplicate depot id "${d.id}"`);
      depotIndex.set(d.id, i);
    }
    depotIds[i] = d.id;
    depotNames[i] = d.name;
    lat[i] = d.lat;
    lon[i] = d.lon;
  }
  return { depotIds, depotNames, lat, lon, depotIndex: remembered ?? depotIndex };
}

/** Index of a depot id, or UnknownDepotError. */
export function depotIndexOf(network: Network, id: string, context = 'network'): number {
  const index = network.depotIndex.get(id);
  if (index === undefined) throw new UnknownDepotError(id, context);
  return index;
}
