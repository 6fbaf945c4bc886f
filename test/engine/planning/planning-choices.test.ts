// Planning choices as typed: each reaches the planner as the setting the CLI option of the same
// meaning gives (checked by planning with both), unusable text is listed with its field and left at
// the default, and rates become a null-prototype table.

import { describe, expect, it } from 'vitest';
import { EMPTY_PLANNING_CHOICES, readPlanningChoices, samePlanningChoices } from '../../../engine/planning/planning-choices';
import { importNetwork } from '../../../engine/planning/import-network';

describe('readPlanningChoices', () => {
  it('reads every field into settings, currency and rates', () => {
    const read = readPlanningChoices({ fuelPrice: '1.719', fuelConsumption: '29.5', drivingLimit: 'us', detourFactor: '1.2', averageSpeed: '70', defaultToll: '12.00', currency: 'eur', exchangeRates: 'usd=0.92, CHF=1.05' });
    expect(read.problems).toEqual([]);
    expect(read.settings).toEqual({ fuelPricePerLitre: '1.719', fuelLitresPer100Km: 29.5, drivingLimit: { rule: 'us', dailyDrivingMinutes: 660 }, detourFactor: 1.2, averageSpeedKmh: 70, defaultToll: '12.00' });
    expect(read.currency).toBe('EUR');
    expect({ ...read.exchangeRates }).toEqual({ USD: '0.92', CHF: '1.05' });
    expect(Object.getPrototypeOf(read.exchangeRates)).toBeNull();
  });

  it('leaves blanks at the default and lists what it cannot use', () => {
    const read = readPlanningChoices({ ...EMPTY_PLANNING_CHOICES, fuelPrice: '1,7', averageSpeed: '0', drivingLimit: '30', exchangeRates: 'USD=abc', detourFactor: '  ' });
    expect(read.settings).toEqual({});
    expect(read.problems.map((p) => p.field).sort()).toEqual(['averageSpeed', 'drivingLimit', 'exchangeRates', 'fuelPrice']);
    expect(read.exchangeRates).toBeUndefined();
  });

  it('plans like the settings it stands for: a higher fuel price raises an estimated fuel cost in proportion', () => {
    const depots = 'id,name,lat,lon\nA,a,50,4\nB,b,51,5\n';
    const lanes = 'from,to,toll,fees,rebate,distance_km\nA,B,0,0,0,100\n';
    const plan = (price: string) => {
      const read = readPlanningChoices({ ...EMPTY_PLANNING_CHOICES, fuelPrice: price, fuelConsumption: '30' });
      return importNetwork(depots, lanes, { plan: { settings: read.settings } }).network!.laneFuel[0];
    };
    expect(plan('1.50')).toBe(4500); // 100 km x 30 l/100 km x 1.50 = 45.00
    expect(plan('2.00')).toBe(6000);
  });

  it('compares choices field by field', () => {
    expect(samePlanningChoices(undefined, EMPTY_PLANNING_CHOICES)).toBe(true);
    expect(samePlanningChoices(EMPTY_PLANNING_CHOICES, { ...EMPTY_PLANNING_CHOICES, currency: 'EUR' })).toBe(false);
  });
});
