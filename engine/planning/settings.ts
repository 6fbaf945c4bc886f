// Planning defaults, each with where it comes from, and the driving-limit caution. A dispatcher
// replaces any of them (CLI options, the settings panel); the defaults only fill blanks in a file.

import type { DrivingLimit, PlanningSettings } from './types';

/**
 * EU: Regulation (EC) No 561/2006, Article 6(1): daily driving time shall not exceed 9 hours,
 * extendable to 10 hours at most twice in the week. The 9-hour figure is the default.
 */
export const EU_DAILY_DRIVING: DrivingLimit = { rule: 'eu', dailyDrivingMinutes: 9 * 60 };

/**
 * US: FMCSA, 49 CFR 395.3(a)(3): a property-carrying driver may drive a maximum of 11 hours after
 * 10 consecutive hours off duty, within the 14-hour window of 395.3(a)(2).
 */
export const US_DAILY_DRIVING: DrivingLimit = { rule: 'us', dailyDrivingMinutes: 11 * 60 };

/** Where every default comes from, for the settings panel and the README. */
export const PLANNING_DEFAULT_SOURCES: Record<keyof PlanningSettings, string> = {
  detourFactor:
    '1.3: common practice, no source. Published road circuity studies give roughly 1.1-1.4 for European road networks (e.g. Ballou, Rahardja & Sakai 2002, Transportation Research Part A 36(9); range from memory).',
  fuelLitresPer100Km:
    '32 l/100 km for a 40 t articulated truck on long haul: common practice, no source (fleet figures are usually 29-35 l/100 km).',
  fuelPricePerLitre:
    'EUR 1.65 per litre of diesel: an assumption, no source. Prices change weekly; set your own (the EU Weekly Oil Bulletin publishes national averages).',
  fuelPriceCurrency: 'The default fuel price is in EUR; for other currencies give a price.',
  averageSpeedKmh: '65 km/h average for a heavy truck including junctions and traffic: common practice, no source.',
  drivingLimit:
    'EU: Regulation (EC) No 561/2006 Art. 6(1), 9 h daily driving (10 h twice a week). US: FMCSA 49 CFR 395.3(a)(3), 11 h driving within a 14-hour window (property-carrying).',
  defaultToll: 'None: a lane without a toll for the chosen vehicle class is an error unless a default toll is set.',
};

export const DEFAULT_PLANNING_SETTINGS: PlanningSettings = {
  detourFactor: 1.3,
  fuelLitresPer100Km: 32,
  fuelPricePerLitre: '1.65',
  fuelPriceCurrency: 'EUR',
  averageSpeedKmh: 65,
  drivingLimit: EU_DAILY_DRIVING,
  defaultToll: null,
};

/** The caution shown beside every driving-time flag. */
export const DRIVING_LIMIT_CAUTION =
  'The driving-time flag is an estimate: summed lane drive times against a daily driving limit. Rest breaks, weekly ' +
  'and fortnightly limits, working time, local rules and licensed practice apply, and this flag does not plan them.';

/** Settings with the user's choices laid over the defaults. */
export function planningSettings(overrides: Partial<PlanningSettings> = {}): PlanningSettings {
  const merged = { ...DEFAULT_PLANNING_SETTINGS };
  for (const [key, value] of Object.entries(overrides) as [keyof PlanningSettings, unknown][]) {
    if (value !== undefined) (merged as Record<string, unknown>)[key] = value;
  }
  return merged;
}

/** The limit for 'eu', 'us' or a number of hours (e.g. "10" or "10.5"); null when the text is none of them. */
export function drivingLimitOf(text: string): DrivingLimit | null {
  const t = text.trim().toLowerCase();
  if (t === 'eu') return EU_DAILY_DRIVING;
  if (t === 'us') return US_DAILY_DRIVING;
  if (!/^\d+(\.\d+)?$/.test(t)) return null;
  const hours = Number(t);
  if (hours <= 0 || hours > 24) return null;
  return { rule: 'custom', dailyDrivingMinutes: Math.round(hours * 60) };
}
