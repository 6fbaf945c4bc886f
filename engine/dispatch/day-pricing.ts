// The one place dispatch turns an import into a priced network for a (date, toll class, fuel
// consumption): the scenario's overlay planned by the planner's own rules (overlayPlan), so a
// load under a what-if is priced exactly as `compare`, the exports and the app price that lane.
// Without a scenario the overlay is the lane table itself.

import { LanewrightError } from '../errors';
import type { ValidationItem } from '../import/types';
import type { ImportResult } from '../planning/import-types';
import type { Network } from '../network/types';
import type { PlanningSettings } from '../planning/types';
import type { LaneOverlay } from '../scenario/overlay';
import { overlayPlan } from '../scenario/overlay-network';

export interface PricingKey {
  date: string;
  vehicleClass: string | null;
  /** l/100 km for lanes whose fuel is estimated; null = the settings' value. */
  fuelLitresPer100Km: number | null;
}

export interface PricedDay {
  network: Network;
  /** Overlay table row of each network lane (base rows keep their index; added lanes follow). */
  laneRecord: Int32Array;
  vehicleClass: string | null;
  /** Problems of planning this day and class beyond those of the import (lane rows left out). */
  problems: ValidationItem[];
  notes: string[];
}

/** The plan for a day and class has errors (e.g. lanes without a toll for the class) and skipInvalid is off. */
export class DispatchPlanError extends LanewrightError {
  constructor(readonly key: PricingKey, readonly problems: readonly ValidationItem[]) {
    super(
      `dispatch: planning ${key.date} for vehicle class ${key.vehicleClass ?? '(default)'} has ${problems.length} error(s); nothing was planned (--skip-invalid plans with the lanes that are fine):\n` +
        problems.slice(0, 20).map((p) => `  ${p.file}, row ${p.row}, column "${p.column}": ${p.message}`).join('\n'),
    );
  }
}

export function pricingKeyText(k: PricingKey): string {
  return `${k.date}|${k.vehicleClass ?? ''}|${k.fuelLitresPer100Km ?? ''}`;
}

/** Prices the overlaid lanes for one day, class and consumption. */
export function priceDay(imported: ImportResult, overlay: LaneOverlay, key: PricingKey, settings: Partial<PlanningSettings>, skipInvalid: boolean): PricedDay {
  const request = {
    date: key.date,
    vehicleClass: key.vehicleClass ?? undefined,
    settings: key.fuelLitresPer100Km === null ? settings : { ...settings, fuelLitresPer100Km: key.fuelLitresPer100Km },
  };
  const lanesFile = imported.importReport.files.find((f) => f.kind === 'lanes')?.file;
  const planned = overlayPlan(overlay, { ...imported, lanesFile }, request);
  const problems = planned.planProblems;
  if (problems.length > 0 && !skipInvalid) throw new DispatchPlanError(key, problems);
  return { network: planned.network, laneRecord: planned.plan.laneRecord, vehicleClass: planned.plan.vehicleClass, problems, notes: planned.plan.notes };
}
