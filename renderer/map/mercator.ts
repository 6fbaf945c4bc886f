// Web Mercator (Leaflet's spherical Mercator, EPSG:3857) written out as plain arithmetic, without
// Leaflet: the paint worker cannot load Leaflet (it needs a document), and one L.LatLng per depot
// cost more than the arithmetic. One owner of the projection for the basemap, lanes and depots.

/** Sphere radius (m) and the latitude limit of Leaflet's L.Projection.SphericalMercator. */
export const MERCATOR_R = 6378137;
export const MERCATOR_MAX_LATITUDE = 85.0511287798;
const RAD = Math.PI / 180;

/** Mercator x in metres of a longitude. */
export function mercatorX(lon: number): number {
  return MERCATOR_R * lon * RAD;
}

/** Mercator y in metres of a latitude (clamped to the projection's limit). */
export function mercatorY(lat: number): number {
  const sin = Math.sin(Math.max(Math.min(MERCATOR_MAX_LATITUDE, lat), -MERCATOR_MAX_LATITUDE) * RAD);
  return (MERCATOR_R * Math.log((1 + sin) / (1 - sin))) / 2;
}

/** Mercator metres of every point, once per network. */
export function projectPoints(lat: ArrayLike<number>, lon: ArrayLike<number>): { x: Float64Array; y: Float64Array } {
  const n = lat.length;
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  for (let d = 0; d < n; d++) {
    x[d] = mercatorX(lon[d]);
    y[d] = mercatorY(lat[d]);
  }
  return { x, y };
}

/**
 * Metres to canvas pixels: x_px = sx * x + ox, y_px = sy * y + oy. The map thread makes it per
 * frame (layerTransform, lane-canvas.ts); painters apply it to projected points.
 */
export interface ViewTransform {
  sx: number;
  ox: number;
  sy: number;
  oy: number;
}
