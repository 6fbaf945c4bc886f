// The estimate rules say what the planner does: a lane with blank distance, fuel and drive time is
// planned, and its values are recomputed here from the rule's words (great circle by the haversine
// formula on a 6,371.0088 km sphere, the IUGG mean Earth radius; from memory).

import { describe, expect, it } from 'vitest';
import { importNetwork } from '../../../engine/planning/import-network';
import { estimateRules } from '../../../engine/planning/estimate-rules';

function haversineKm(lat1: number, lon1: number, lat2: number, lon2: number): number {
  const rad = Math.PI / 180;
  const a = Math.sin(((lat2 - lat1) * rad) / 2) ** 2 + Math.cos(lat1 * rad) * Math.cos(lat2 * rad) * Math.sin(((lon2 - lon1) * rad) / 2) ** 2;
  return 2 * 6371.0088 * Math.asin(Math.sqrt(a));
}

describe('estimateRules', () => {
  const depots = 'id,name,lat,lon\nPAR,Paris,48.756,2.35\nLYS,Lyon,45.67,4.901\n';
  const lanes = 'from,to,toll,fees,rebate,currency\nPAR,LYS,10.00,0.00,0.00,EUR\n';
  const settings = { detourFactor: 1.25, fuelLitresPer100Km: 30, fuelPricePerLitre: '1.80', averageSpeedKmh: 70 };

  it('states the settings it used', () => {
    const imported = importNetwork(depots, lanes, { plan: { settings } });
    const rules = estimateRules(imported.plan.settings, 'EUR');
    expect(rules.distance).toBe('great-circle distance x detour factor 1.25');
    expect(rules.fuel).toBe('distance x 30 l/100 km x EUR 1.80/l');
    expect(rules.driveTime).toBe('distance / 70 km/h average speed');
  });

  it('matches the planned values, recomputed from its words', () => {
    const imported = importNetwork(depots, lanes, { plan: { settings } });
    const lane = imported.plan.lanes[0];
    expect(lane.distanceEstimated && lane.fuelEstimated && lane.driveEstimated).toBe(true);
    const km = Math.round(haversineKm(48.756, 2.35, 45.67, 4.901) * 1.25 * 10) / 10;
    expect(lane.distanceKm).toBeCloseTo(km, 1);
    expect(lane.driveMinutes).toBe(Math.round((lane.distanceKm! / 70) * 60));
    expect(lane.fuel).toBe(Math.round(lane.distanceKm! * 0.3 * 180)); // litres x cents per litre
  });

  it('says when fuel cannot be estimated', () => {
    expect(estimateRules({ ...importNetwork(depots, lanes).plan.settings, fuelPricePerLitre: null }, 'EUR').fuel).toMatch(/no fuel price/);
  });
});
