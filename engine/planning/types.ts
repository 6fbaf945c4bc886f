// Shapes of a plan: which day and vehicle class, which settings, and the network that results.
// A plan is cheap to redo from an import result, so the desktop app re-plans when the user changes them.

import type { LaneInput, Network } from '../network/types';

/** The driving-time rule a route is checked against. */
export interface DrivingLimit {
  /** 'eu' and 'us' are the published daily limits; 'custom' is whatever the user sets. */
  rule: 'eu' | 'us' | 'custom';
  dailyDrivingMinutes: number;
}

export interface PlanningSettings {
  /** Road distance = great-circle distance x this factor, for lanes without a distance. */
  detourFactor: number;
  /** Litres per 100 km, for lanes without a fuel amount. */
  fuelLitresPer100Km: number;
  /** Price of a litre of diesel as decimal text in the network currency, e.g. "1.659"; null = none. */
  fuelPricePerLitre: string | null;
  /** Currency the default fuel price is in; a price given by the user is in the network currency. */
  fuelPriceCurrency: string;
  /** For lanes without a drive time: distance / this speed. */
  averageSpeedKmh: number;
  drivingLimit: DrivingLimit;
  /** Toll for lanes that have none for the chosen class, as decimal text; null = such a lane is an error. */
  defaultToll: string | null;
}

export interface PlanRequest {
  /** ISO 8601 calendar date: only lanes valid on it take part. */
  date?: string;
  /** Vehicle class whose tolls apply. */
  vehicleClass?: string;
  settings?: Partial<PlanningSettings>;
}

/** A lane as planned: the engine's LaneInput plus what the lane table and scenarios need. */
export interface PlannedLane extends LaneInput {
  validFrom: string | null;
  validTo: string | null;
  vehicleClass: string | null;
  /** True when the distance came from the great-circle fallback, not the file. */
  distanceEstimated: boolean;
  fuelEstimated: boolean;
  driveEstimated: boolean;
}

export interface PlannedNetwork {
  /** Null when the plan or the import has errors and skipInvalid is not set. */
  network: Network | null;
  lanes: PlannedLane[];
  /** LaneTable row of each network lane. */
  laneRecord: Int32Array;
  date: string | null;
  vehicleClass: string | null;
  settings: PlanningSettings;
  /** Lane rows left out because they are not valid on the date or belong to another class. */
  excluded: number;
  notes: string[];
}
