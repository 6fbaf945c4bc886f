// The planning settings as a user types them (settings panel, workspace file): text per field,
// null = the default. `readPlanningChoices` turns them into the importer's settings, currency and
// exchange rates, and lists every value it cannot use with the reason, so the panel can mark it.

import { DEFAULT_PLANNING_SETTINGS, drivingLimitOf, PLANNING_DEFAULT_SOURCES } from './settings';
import type { PlanningSettings } from './types';

export interface PlanningChoices {
  /** Price of a litre of diesel in the network currency, e.g. "1.659". */
  fuelPrice: string | null;
  /** Litres per 100 km. */
  fuelConsumption: string | null;
  /** "eu", "us" or hours, e.g. "10". */
  drivingLimit: string | null;
  detourFactor: string | null;
  /** km/h. */
  averageSpeed: string | null;
  defaultToll: string | null;
  /** ISO 4217 code of the network currency. */
  currency: string | null;
  /** "USD=0.92,CHF=1.05": 1 unit of each = this much of the network currency. */
  exchangeRates: string | null;
}

export const EMPTY_PLANNING_CHOICES: PlanningChoices = {
  fuelPrice: null,
  fuelConsumption: null,
  drivingLimit: null,
  detourFactor: null,
  averageSpeed: null,
  defaultToll: null,
  currency: null,
  exchangeRates: null,
};

export const PLANNING_CHOICE_FIELDS = Object.keys(EMPTY_PLANNING_CHOICES) as (keyof PlanningChoices)[];

export interface PlanningChoiceProblem {
  field: keyof PlanningChoices;
  value: string;
  reason: string;
}

export interface ReadPlanningChoices {
  settings: Partial<PlanningSettings>;
  currency?: string;
  /** Null-prototype table keyed by ISO 4217 code. */
  exchangeRates?: Record<string, string>;
  problems: PlanningChoiceProblem[];
}

const POSITIVE = /^\d+(\.\d+)?$/;

/** Reads every choice; an unusable one is left at its default and listed in `problems`. */
export function readPlanningChoices(choices: PlanningChoices): ReadPlanningChoices {
  const out: ReadPlanningChoices = { settings: {}, problems: [] };
  const text = (field: keyof PlanningChoices) => {
    const v = choices[field];
    return v === null || v.trim() === '' ? null : v.trim();
  };
  const problem = (field: keyof PlanningChoices, value: string, reason: string) => out.problems.push({ field, value, reason });
  const positive = (field: 'fuelConsumption' | 'detourFactor' | 'averageSpeed', max: number): number | undefined => {
    const v = text(field);
    if (v === null) return undefined;
    if (!POSITIVE.test(v) || !(Number(v) > 0) || Number(v) > max) return void problem(field, v, `must be a positive number up to ${max}`);
    return Number(v);
  };
  out.settings.fuelLitresPer100Km = positive('fuelConsumption', 200);
  out.settings.detourFactor = positive('detourFactor', 10);
  out.settings.averageSpeedKmh = positive('averageSpeed', 200);
  const price = text('fuelPrice');
  if (price !== null) {
    if (POSITIVE.test(price)) out.settings.fuelPricePerLitre = price;
    else problem('fuelPrice', price, 'must be a decimal price per litre such as 1.659');
  }
  const toll = text('defaultToll');
  if (toll !== null) {
    if (/^\d+(\.\d+)?$/.test(toll)) out.settings.defaultToll = toll;
    else problem('defaultToll', toll, 'must be a decimal amount such as 12.50');
  }
  const limit = text('drivingLimit');
  if (limit !== null) {
    const parsed = drivingLimitOf(limit);
    if (parsed) out.settings.drivingLimit = parsed;
    else problem('drivingLimit', limit, 'must be eu, us or a number of hours up to 24');
  }
  const currency = text('currency');
  if (currency !== null) {
    if (/^[A-Za-z]{3}$/.test(currency)) out.currency = currency.toUpperCase();
    else problem('currency', currency, 'must be an ISO 4217 code such as EUR');
  }
  const rates = text('exchangeRates');
  if (rates !== null) {
    const table: Record<string, string> = Object.create(null) as Record<string, string>;
    for (const part of rates.split(',')) {
      const m = /^\s*([A-Za-z]{3})\s*=\s*(\d+(?:\.\d+)?)\s*$/.exec(part);
      if (!m || !(Number(m[2]) > 0)) {
        problem('exchangeRates', rates, `takes CODE=RATE pairs such as USD=0.92; "${part.trim()}" is not one`);
        break;
      }
      table[m[1].toUpperCase()] = m[2];
    }
    if (!out.problems.some((p) => p.field === 'exchangeRates')) out.exchangeRates = table;
  }
  // Fields read as undefined are not set, so the defaults apply.
  for (const key of Object.keys(out.settings) as (keyof PlanningSettings)[]) if (out.settings[key] === undefined) delete out.settings[key];
  return out;
}

/** Whether two sets of choices are the same (a changed one re-plans). */
export function samePlanningChoices(a: PlanningChoices | undefined, b: PlanningChoices | undefined): boolean {
  const x = a ?? EMPTY_PLANNING_CHOICES;
  const y = b ?? EMPTY_PLANNING_CHOICES;
  return PLANNING_CHOICE_FIELDS.every((f) => (x[f] ?? null) === (y[f] ?? null));
}

/** Each choice's default as shown beside its field, and where that default comes from. */
export const PLANNING_CHOICE_DEFAULTS: Readonly<Record<keyof PlanningChoices, { value: string; source: string }>> = {
  fuelPrice: { value: `${DEFAULT_PLANNING_SETTINGS.fuelPriceCurrency} ${DEFAULT_PLANNING_SETTINGS.fuelPricePerLitre}/l`, source: PLANNING_DEFAULT_SOURCES.fuelPricePerLitre },
  fuelConsumption: { value: `${DEFAULT_PLANNING_SETTINGS.fuelLitresPer100Km} l/100 km`, source: PLANNING_DEFAULT_SOURCES.fuelLitresPer100Km },
  drivingLimit: { value: `${DEFAULT_PLANNING_SETTINGS.drivingLimit.rule.toUpperCase()}, ${DEFAULT_PLANNING_SETTINGS.drivingLimit.dailyDrivingMinutes / 60} h a day`, source: PLANNING_DEFAULT_SOURCES.drivingLimit },
  detourFactor: { value: String(DEFAULT_PLANNING_SETTINGS.detourFactor), source: PLANNING_DEFAULT_SOURCES.detourFactor },
  averageSpeed: { value: `${DEFAULT_PLANNING_SETTINGS.averageSpeedKmh} km/h`, source: PLANNING_DEFAULT_SOURCES.averageSpeedKmh },
  defaultToll: { value: 'none', source: PLANNING_DEFAULT_SOURCES.defaultToll },
  currency: { value: "the lanes file's", source: "The lanes file's currency column (ISO 4217); one currency per network unless exchange rates convert the others." },
  exchangeRates: { value: 'none', source: 'None: a lane in another currency than the network\'s is an error unless its rate is given (1 unit = RATE of the network currency).' },
};
