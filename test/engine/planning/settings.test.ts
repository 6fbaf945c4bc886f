// Planning defaults and driving limits. Limits: EU Regulation (EC) No 561/2006, Art. 6(1) (daily
// driving time 9 h, extendable to 10 h twice a week); US FMCSA 49 CFR 395.3(a)(3) (11 h driving,
// property-carrying, within the 14-hour window of 395.3(a)(2)).

import { describe, expect, it } from 'vitest';
import { DEFAULT_PLANNING_SETTINGS, DRIVING_LIMIT_CAUTION, drivingLimitOf, EU_DAILY_DRIVING, PLANNING_DEFAULT_SOURCES, US_DAILY_DRIVING } from '../../../engine/planning/settings';

describe('planning settings', () => {
  it('uses the published daily driving limits', () => {
    expect(EU_DAILY_DRIVING.dailyDrivingMinutes).toBe(9 * 60);
    expect(US_DAILY_DRIVING.dailyDrivingMinutes).toBe(11 * 60);
    expect(DEFAULT_PLANNING_SETTINGS.drivingLimit).toBe(EU_DAILY_DRIVING);
    expect(PLANNING_DEFAULT_SOURCES.drivingLimit).toMatch(/561\/2006/);
    expect(PLANNING_DEFAULT_SOURCES.drivingLimit).toMatch(/49 CFR 395\.3/);
  });

  it('states a source, or "no source", for every default', () => {
    for (const key of Object.keys(DEFAULT_PLANNING_SETTINGS) as (keyof typeof DEFAULT_PLANNING_SETTINGS)[]) {
      expect(PLANNING_DEFAULT_SOURCES[key].length).toBeGreaterThan(10);
    }
    for (const key of ['detourFactor', 'fuelLitresPer100Km', 'fuelPricePerLitre', 'averageSpeedKmh'] as const) {
      expect(PLANNING_DEFAULT_SOURCES[key]).toMatch(/no source/);
    }
  });

  it('reads eu, us or hours; refuses anything else', () => {
    expect(drivingLimitOf('EU')).toBe(EU_DAILY_DRIVING);
    expect(drivingLimitOf('us')).toBe(US_DAILY_DRIVING);
    expect(drivingLimitOf('10')).toEqual({ rule: 'custom', dailyDrivingMinutes: 600 });
    expect(drivingLimitOf('10.5')).toEqual({ rule: 'custom', dailyDrivingMinutes: 630 });
    for (const bad of ['', 'x', '0', '25', '-3']) expect(drivingLimitOf(bad)).toBeNull();
  });

  it('the caution says the flag is an estimate and that rest breaks, local rules and licensed practice apply', () => {
    expect(DRIVING_LIMIT_CAUTION).toMatch(/estimate/);
    expect(DRIVING_LIMIT_CAUTION).toMatch(/rest breaks/i);
    expect(DRIVING_LIMIT_CAUTION).toMatch(/local rules/);
    expect(DRIVING_LIMIT_CAUTION).toMatch(/licensed practice/);
  });
});
