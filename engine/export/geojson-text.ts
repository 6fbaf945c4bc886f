// Serialises a FeatureCollection as the text of a .geojson file (media type application/geo+json,
// RFC 7946 section 12): UTF-8 JSON, coordinates written with at most 7 decimals (about 1 cm),
// as RFC 7946 section 11.2 advises against needless precision.

import type { FeatureCollection } from './geojson';

export function geoJsonText(collection: FeatureCollection): string {
  return (
    JSON.stringify(collection, (key, value) =>
      key === 'coordinates' ? roundPositions(value) : value,
    ) + '\n'
  );
}

function roundPositions(value: unknown): unknown {
  if (typeof value === 'number') return Math.round(value * 1e7) / 1e7;
  if (Array.isArray(value)) return value.map(roundPositions);
  return value;
}
