// The rules that fill a lane's blank distance, fuel and drive time, in words with the settings
// that made them, so every screen, sheet and export that marks a value "estimated" says how.
// The arithmetic itself is in plan-network.ts; these texts follow its formulas.

import type { PlanningSettings } from './types';

export interface EstimateRules {
  distance: string;
  fuel: string;
  driveTime: string;
}

/**
 * The estimate rules under `settings`. `currency` is the network's: fuel is only ever estimated
 * with a price in the network's currency (plan-network.ts refuses the estimate otherwise).
 */
export function estimateRules(settings: PlanningSettings, currency: string): EstimateRules {
  return {
    distance: `great-circle distance x detour factor ${settings.detourFactor}`,
    fuel:
      settings.fuelPricePerLitre === null
        ? 'no fuel price set: blank fuel cannot be estimated'
        : `distance x ${settings.fuelLitresPer100Km} l/100 km x ${currency} ${settings.fuelPricePerLitre}/l`,
    driveTime: `distance / ${settings.averageSpeedKmh} km/h average speed`,
  };
}
