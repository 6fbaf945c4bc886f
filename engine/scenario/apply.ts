// Applies a scenario to a base network: resolves each change's LaneKey against the base lanes,
// changes amounts, closes, re-dates or adds lanes, and builds the changed network. A change that
// no longer fits the base (its lane is gone after a re-import, an added lane names an unknown depot)
// is reported as a problem and kept in the scenario; it is never dropped silently.

import { buildNetwork } from '../network/build';
import type { DepotInput, LaneInput, Network } from '../network/types';
import type { Minor } from '../money/minor';
import { laneGroupText, laneKeyId, laneKeyIndex, laneKeysOf, laneKeyText, type LaneKey } from '../import/lane-key';
import type { Scenario, ScenarioChange } from './types';

/** A lane as scenarios see it: the engine's LaneInput with an optional validity period (ISO dates, inclusive). */
export type ScenarioLane = LaneInput & { validFrom?: string | null; validTo?: string | null };

/** The importer's accepted rows (lanes may carry validity), or an already built network. */
export type ScenarioBase = Network | { depots: readonly DepotInput[]; lanes: readonly ScenarioLane[]; currency?: string; exponent?: number };

export type ScenarioProblemCode = 'lane-missing' | 'unknown-depot' | 'amount-overflow';

export interface ScenarioProblem {
  /** Position of the change in `scenario.changes`. */
  changeIndex: number;
  code: ScenarioProblemCode;
  /** The lane the change names (for an added lane: its from/to/ref with occurrence 0). */
  lane: LaneKey;
  message: string;
}

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

/** Applies `scenario` to `base`; see the file header. Row 0 marks a lane the scenario added. */
export function applyScenario(base: ScenarioBase, scenario: Scenario, options: ApplyOptions = {}): AppliedScenario {
  const inputs = scenarioBaseInputs(base);
  const depotIds = new Set(inputs.depots.map((d) => d.id));
  const work: ScenarioLane[] = inputs.lanes.map((lane) => ({ ...lane }));
  const keys = laneKeysOf(work);
  const index = laneKeyIndex(keys);
  const groupCount = new Map<string, number>();
  for (const k of keys) groupCount.set(laneGroupText(k.from, k.to, k.ref), k.occurrence);
  const closed = new Uint8Array(work.length + scenario.changes.length);
  const origin: number[] = work.map((_, e) => e);
  const problems: ScenarioProblem[] = [];

  scenario.changes.forEach((change, changeIndex) => {
    const problem = (code: ScenarioProblemCode, lane: LaneKey, message: string) => problems.push({ changeIndex, code, lane, message });
    if (change.kind === 'add-lane') {
      const l = change.lane;
      const key: LaneKey = { from: l.from, to: l.to, ref: l.ref, occurrence: 0 };
      const missing = [l.from, l.to].filter((id) => !depotIds.has(id));
      if (missing.length > 0) {
        problem('unknown-depot', key, `change ${changeIndex + 1} adds a lane ${l.from} > ${l.to} but depot ${missing.map((m) => `"${m}"`).join(' and ')} is not in the depots file`);
        return;
      }
      const lane: ScenarioLane = {
        from: l.from,
        to: l.to,
        toll: l.tollMinor as Minor,
        fuel: l.fuelMinor as Minor,
        fees: l.feesMinor as Minor,
        rebate: l.rebateMinor as Minor,
        sourceRow: 0,
        validFrom: l.validFrom,
        validTo: l.validTo,
      };
      if (l.ref !== null) lane.ref = l.ref;
      if (l.distanceKm !== null) lane.distanceKm = l.distanceKm;
      if (l.driveMinutes !== null) lane.driveMinutes = l.driveMinutes;
      if (!Number.isSafeInteger(lane.toll + lane.fuel + lane.fees - lane.rebate)) {
        problem('amount-overflow', key, `change ${changeIndex + 1}: the added lane's net cost leaves the exact range`);
        return;
      }
      const group = laneGroupText(l.from, l.to, l.ref);
      key.occurrence = (groupCount.get(group) ?? 0) + 1;
      groupCount.set(group, key.occurrence);
      index.set(laneKeyId(key), work.length);
      keys.push(key);
      work.push(lane);
      origin.push(-1);
      return;
    }
    const e = index.get(laneKeyId(change.lane));
    if (e === undefined) {
      const near = keys.filter((k) => k.from === change.lane.from && k.to === change.lane.to).map(laneKeyText);
      const hint = near.length > 0 ? ` (lanes ${change.lane.from} > ${change.lane.to} in the file now: ${near.slice(0, 5).join(', ')})` : '';
      problem('lane-missing', change.lane, `change ${changeIndex + 1} (${change.kind}) names lane ${laneKeyText(change.lane)}, which the lanes file no longer has${hint}`);
      return;
    }
    applyToLane(work[e], change, closed, e, (message) => problem('amount-overflow', change.lane, `change ${changeIndex + 1}: ${message}`));
  });

  const kept: number[] = [];
  for (let e = 0; e < work.length; e++) if (!closed[e] && validOn(work[e], options.date ?? null)) kept.push(e);
  const lanes = kept.map((e) => work[e]);
  const network = buildNetwork(inputs.depots, lanes, { currency: inputs.currency, exponent: inputs.exponent });
  return { network, lanes, laneKeys: kept.map((e) => keys[e]), baseLaneOf: Int32Array.from(kept, (e) => origin[e]), problems };
}

function applyToLane(lane: ScenarioLane, change: Exclude<ScenarioChange, { kind: 'add-lane' }>, closed: Uint8Array, e: number, overflow: (message: string) => void): void {
  switch (change.kind) {
    case 'set-amount': {
      const before = lane[change.field];
      lane[change.field] = change.amountMinor as Minor;
      if (!Number.isSafeInteger(lane.toll + lane.fuel + lane.fees - lane.rebate)) {
        lane[change.field] = before;
        overflow(`the new ${change.field} makes the lane's net cost leave the exact range; not applied`);
      }
      return;
    }
    case 'close-lane':
      closed[e] = 1;
      return;
    case 'set-validity':
      lane.validFrom = change.validFrom;
      lane.validTo = change.validTo;
      return;
  }
}

/** True when the lane is valid on `date` (ISO dates compare as text); every lane is valid with no date. */
function validOn(lane: ScenarioLane, date: string | null): boolean {
  if (date === null) return true;
  if (lane.validFrom && date < lane.validFrom) return false;
  if (lane.validTo && date > lane.validTo) return false;
  return true;
}
