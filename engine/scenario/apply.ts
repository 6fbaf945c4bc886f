// Applies a scenario to a plain list of lanes (or a built network) and builds the changed network.
// The amounts, keys, closures and problems come from the overlay (overlay.ts), the one owner of
// what a scenario means; this file only turns a lane list into a lane table and back. An import's
// lane table goes through overlay-network.ts instead, which plans dates and vehicle classes.

import { UnknownDepotError } from '../errors';
import { isoDateText, readIsoDate } from '../import/cells';
import type { LaneKey } from '../import/lane-key';
import type { LaneTable } from '../import/types';
import type { Minor } from '../money/minor';
import { buildNetwork } from '../network/build';
import type { DepotInput, LaneInput, Network } from '../network/types';
import { buildOverlay, type ScenarioProblem } from './overlay';
import type { Scenario } from './types';

export type { ScenarioProblem, ScenarioProblemCode } from './overlay';

/** A lane as scenarios see it: the engine's LaneInput with an optional validity period (ISO dates, inclusive). */
export type ScenarioLane = LaneInput & { validFrom?: string | null; validTo?: string | null };

/** The importer's accepted rows (lanes may carry validity), or an already built network. */
export type ScenarioBase = Network | { depots: readonly DepotInput[]; lanes: readonly ScenarioLane[]; currency?: string; exponent?: number };

export interface AppliedScenario {
  network: Network;
  /** The changed network's lanes, in its lane order. */
  lanes: ScenarioLane[];
  /** Key of each lane of the changed network, as resolved against the base (added lanes keyed after the base lanes). */
  laneKeys: LaneKey[];
  /** Base lane index of each lane of the changed network, or -1 for a lane the scenario added. */
  baseLaneOf: Int32Array;
  problems: ScenarioProblem[];
}

export interface ApplyOptions {
  /** ISO 8601 date: lanes not valid on it are left out after the changes. */
  date?: string | null;
}

/** The base as plain depots and lanes (a built network is read back lane by lane). */
export function scenarioBaseInputs(base: ScenarioBase): { depots: DepotInput[]; lanes: ScenarioLane[]; currency?: string; exponent?: number } {
  if (!('laneCount' in base)) return { depots: base.depots.slice(), lanes: base.lanes.slice(), currency: base.currency, exponent: base.exponent };
  const net = base;
  const depots = net.depotIds.map((id, d) => ({ id, name: net.depotNames[d], lat: net.lat[d], lon: net.lon[d] }));
  const lanes: ScenarioLane[] = [];
  for (let e = 0; e < net.laneCount; e++) {
    const lane: ScenarioLane = {
      from: net.depotIds[net.laneFrom[e]],
      to: net.depotIds[net.laneTo[e]],
      toll: net.laneToll[e] as Minor,
      fuel: net.laneFuel[e] as Minor,
      fees: net.laneFees[e] as Minor,
      rebate: net.laneRebate[e] as Minor,
      sourceRow: net.laneRow[e],
    };
    if (net.laneRef[e] !== undefined) lane.ref = net.laneRef[e];
    if (!Number.isNaN(net.laneDistanceKm[e])) lane.distanceKm = net.laneDistanceKm[e];
    if (!Number.isNaN(net.laneDriveMinutes[e])) lane.driveMinutes = net.laneDriveMinutes[e];
    lanes.push(lane);
  }
  return { depots, lanes, currency: net.currency, exponent: net.exponent };
}

/** A lane list as a lane table (no vehicle classes), depots by their position in `depots`. */
export function laneTableOf(depots: readonly DepotInput[], lanes: readonly ScenarioLane[]): LaneTable {
  const n = lanes.length;
  const index = new Map(depots.map((d, i) => [d.id, i]));
  const col = () => new Float64Array(n);
  const t: LaneTable = {
    count: n,
    from: new Int32Array(n),
    to: new Int32Array(n),
    sourceRow: new Int32Array(n),
    toll: col(),
    classTolls: [],
    vehicleClass: null,
    classNames: [],
    fuel: col(),
    fees: col(),
    rebate: col(),
    distanceKm: col(),
    driveMinutes: col(),
    validFrom: new Int32Array(n),
    validTo: new Int32Array(n),
    ref: new Array<string | undefined>(n),
    notes: new Array<string | undefined>(n),
    extra: [],
  };
  lanes.forEach((l, i) => {
    const from = index.get(l.from);
    const to = index.get(l.to);
    if (from === undefined || to === undefined) throw new UnknownDepotError(from === undefined ? l.from : l.to, `lane from row ${l.sourceRow}`);
    t.from[i] = from;
    t.to[i] = to;
    t.sourceRow[i] = l.sourceRow;
    t.toll[i] = l.toll;
    t.fuel[i] = l.fuel;
    t.fees[i] = l.fees;
    t.rebate[i] = l.rebate;
    t.distanceKm[i] = l.distanceKm ?? NaN;
    t.driveMinutes[i] = l.driveMinutes ?? NaN;
    t.validFrom[i] = l.validFrom ? (readIsoDate(l.validFrom) ?? 0) : 0;
    t.validTo[i] = l.validTo ? (readIsoDate(l.validTo) ?? 0) : 0;
    t.ref[i] = l.ref === '' ? undefined : l.ref;
  });
  return t;
}

/** Applies `scenario` to `base`; see the file header. Row 0 marks a lane the scenario added. */
export function applyScenario(base: ScenarioBase, scenario: Scenario, options: ApplyOptions = {}): AppliedScenario {
  const inputs = scenarioBaseInputs(base);
  const overlay = buildOverlay({ depots: inputs.depots, lanes: laneTableOf(inputs.depots, inputs.lanes) }, scenario);
  const t = overlay.table;
  const date = options.date ? readIsoDate(options.date) : 0;
  const validOn = (r: number) => !date || ((t.validFrom[r] === 0 || t.validFrom[r] <= date) && (t.validTo[r] === 0 || t.validTo[r] >= date));
  const kept: number[] = [];
  for (let r = 0; r < t.count; r++) if (!overlay.closed[r] && validOn(r)) kept.push(r);
  const lanes = kept.map((r): ScenarioLane => {
    const lane: ScenarioLane = {
      from: inputs.depots[t.from[r]].id,
      to: inputs.depots[t.to[r]].id,
      toll: t.toll[r] as Minor,
      fuel: t.fuel[r] as Minor,
      fees: t.fees[r] as Minor,
      rebate: t.rebate[r] as Minor,
      sourceRow: t.sourceRow[r],
      validFrom: isoDateText(t.validFrom[r]),
      validTo: isoDateText(t.validTo[r]),
    };
    if (t.ref[r] !== undefined) lane.ref = t.ref[r];
    if (!Number.isNaN(t.distanceKm[r])) lane.distanceKm = t.distanceKm[r];
    if (!Number.isNaN(t.driveMinutes[r])) lane.driveMinutes = t.driveMinutes[r];
    return lane;
  });
  const network = buildNetwork(inputs.depots, lanes, { currency: inputs.currency, exponent: inputs.exponent });
  return { network, lanes, laneKeys: kept.map((r) => overlay.keys[r]), baseLaneOf: Int32Array.from(kept, (r) => overlay.sourceOf[r]), problems: overlay.problems };
}
