// The one module that imports @turf/turf. The engine needs only great-circle distances (the fallback
// for lanes without a road distance); keeping turf behind this file keeps the rest of the engine
// free of GeoJSON object shapes on its hot paths.

import { distance } from '@turf/turf';

/**
 * Great-circle distance in km between two WGS 84 points given in decimal degrees (turf's haversine
 * on a sphere of radius 6371.0088 km, the mean Earth radius).
 */
export function greatCircleKm(latA: number, lonA: number, latB: number, lonB: number): number {
  return distance([lonA, latA], [lonB, latB], { units: 'kilometers' });
}
