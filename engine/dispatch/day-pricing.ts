// The one place dispatch turns an import into a priced network for a (date, toll class, fuel
// consumption): the scenario's overlay planned by the planner's own rules (overlayPlan), so a
// load under a what-if is priced exactly as `compare`, the exports and the app price that lane.
// Without a scenario the overlay is the lane table itself.

import { LanewrightError } from '../errors';
import type { LaneTable, ValidationItem } from '../import/types';
import { readIsoDate } from '../text/iso-date';
import type { ImportResult } from '../planning/import-types';
import type { Network } from '../network/types';
import type { PlanningSettings } from '../planning/types';
import type { LaneOverlay } from '../scenario/overlay';
import { overlayPlan } from '../scenario/overlay-network';
import { counted } from '../text/plural';

export interface PricingKey {
  date: string;
  vehicleClass: string | null;
  /** l/100 km for lanes whose fuel is estimated; null = the settings' value. */
  fuelLitresPer100Km: number | null;
}

export interface PricedDay {
  /**
   * Days with the same share key are the same network (same rows valid, same class and consumption):
   * their solves are shared. See `validitySpan`.
   */
  shareKey: string;
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
      `dispatch: planning ${key.date} for vehicle class ${key.vehicleClass ?? '(default)'} has ${counted(problems.length, 'error')}; nothing was planned (--skip-invalid plans with the lanes that are fine):\n` +
        problems.slice(0, 20).map((p) => `  ${p.file}, row ${p.row}, column "${p.column}": ${p.message}`).join('\n'),
    );
  }
}

export function pricingKeyText(k: PricingKey): string {
  return `${k.date}|${k.vehicleClass ?? ''}|${k.fuelLitresPer100Km ?? ''}`;
}

/**
 * The span of dates `date` falls in: two dates in the same span find every row of `table` valid or
 * not alike, so they plan the same network. A span is the number of validity bounds on or before the
 * date (valid_from, and the day after valid_to: both inclusive), so no bound lies between two dates
 * of one span. Without validity windows every date is span 0.
 */
export function validitySpans(table: LaneTable): (date: string) => number {
  const bounds: number[] = [];
  for (let r = 0; r < table.count; r++) {
    if (table.validFrom[r] !== 0) bounds.push(table.validFrom[r]);
    if (table.validTo[r] !== 0) bounds.push(table.validTo[r] + 1);
  }
  const sorted = Float64Array.from(new Set(bounds)).sort();
  return (date) => {
    const d = readIsoDate(date) ?? 0;
    let lo = 0;
    let hi = sorted.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (sorted[mid] <= d) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  };
}

/** The share key of a pricing key whose date is in validity span `span`. */
export function shareKeyText(k: PricingKey, span: number): string {
  return `${span}|${k.vehicleClass ?? ''}|${k.fuelLitresPer100Km ?? ''}`;
}

/**
 * The priced day of another date in the same validity span: the same network and problems; its
 * notes name this date (the rows left out are the same ones).
 */
export function sameDayAs(day: PricedDay, from: string, to: string): PricedDay {
  return { ...day, notes: day.notes.map((n) => n.split(`not valid on ${from} `).join(`not valid on ${to} `)) };
}

/** Prices the overlaid lanes for one day, class and consumption. */
export function priceDay(imported: ImportResult, overlay: LaneOverlay, key: PricingKey, settings: Partial<PlanningSettings>, skipInvalid: boolean, shareKey = pricingKeyText(key)): PricedDay {
  const request = {
    date: key.date,
    vehicleClass: key.vehicleClass ?? undefined,
    settings: key.fuelLitresPer100Km === null ? settings : { ...settings, fuelLitresPer100Km: key.fuelLitresPer100Km },
  };
  const lanesFile = imported.importReport.files.find((f) => f.kind === 'lanes')?.file;
  const planned = overlayPlan(overlay, { ...imported, lanesFile }, request);
  const problems = planned.planProblems;
  if (problems.length > 0 && !skipInvalid) throw new DispatchPlanError(key, problems);
  return { shareKey, network: planned.network, laneRecord: planned.plan.laneRecord, vehicleClass: planned.plan.vehicleClass, problems, notes: planned.plan.notes };
}
