// The what-if scenario model: a named list of changes over the base contract, each naming its lane
// by a LaneKey so that the scenario still applies after the lanes file is edited and re-imported.
// Plain JSON-safe data: the desktop app stores it inside its workspace document as is.

import type { LaneKey } from '../import/lane-key';

export type { LaneKey } from '../import/lane-key';

/** A lane amount a scenario may set; a toll change names its vehicle class (`vehicleClass`, null = every class). */
export type ScenarioAmountField = 'toll' | 'fuel' | 'fees' | 'rebate';

export const SCENARIO_AMOUNT_FIELDS: readonly ScenarioAmountField[] = ['toll', 'fuel', 'fees', 'rebate'];

/** A lane the scenario adds (amounts in integer minor units, dates ISO 8601 YYYY-MM-DD, inclusive). */
export interface NewLane {
  from: string;
  to: string;
  ref: string | null;
  tollMinor: number;
  fuelMinor: number;
  feesMinor: number;
  rebateMinor: number;
  validFrom: string | null;
  validTo: string | null;
  distanceKm: number | null;
  driveMinutes: number | null;
}

/** One change; changes apply in list order. */
export type ScenarioChange =
  | {
      kind: 'set-amount';
      lane: LaneKey;
      field: ScenarioAmountField;
      amountMinor: number;
      /**
       * For `toll`: the vehicle class whose toll this is (as the lanes file names it), or null for
       * every class, explicitly. Absent reads as null (a version 1 document). Ignored for other fields.
       */
      vehicleClass?: string | null;
      note: string | null;
    }
  | { kind: 'close-lane'; lane: LaneKey; note: string | null }
  | { kind: 'set-validity'; lane: LaneKey; validFrom: string | null; validTo: string | null; note: string | null }
  | { kind: 'add-lane'; lane: NewLane; note: string | null };

export type ScenarioChangeKind = ScenarioChange['kind'];

export const SCENARIO_CHANGE_KINDS: readonly ScenarioChangeKind[] = ['set-amount', 'close-lane', 'set-validity', 'add-lane'];

/** A named what-if over the base network. */
export interface Scenario {
  name: string;
  description: string | null;
  changes: ScenarioChange[];
}
