// The scenario shape the workspace embeds, as DEVELOPERS.md documents it for engine/scenario.
// Interim copy until engine/scenario lands; then this file re-exports the engine's own types.

/** A lane named by its depots, contract reference and occurrence (see DEVELOPERS.md, "Lane keys"). */
export interface LaneKey {
  from: string;
  to: string;
  ref: string | null;
  occurrence: number;
}

/** A lane added by a scenario. */
export interface NewLane {
  from: string;
  to: string;
  ref: string | null;
  tollMinor: number;
  feesMinor: number;
  fuelMinor: number;
  rebateMinor: number;
  validFrom: string | null;
  validTo: string | null;
  distanceKm: number | null;
  driveMinutes: number | null;
}

/** One change a scenario makes to the base contract. */
export type ScenarioChange =
  | { kind: 'set-amount'; lane: LaneKey; field: 'toll' | 'fuel' | 'fees' | 'rebate'; amountMinor: number; note: string | null }
  | { kind: 'close-lane'; lane: LaneKey; note: string | null }
  | { kind: 'set-validity'; lane: LaneKey; validFrom: string | null; validTo: string | null; note: string | null }
  | { kind: 'add-lane'; lane: NewLane; note: string | null };

/** A named what-if: changes applied in order to the base contract. */
export interface Scenario {
  name: string;
  description: string | null;
  changes: ScenarioChange[];
}
