// The offline basemap: land and country borders from Natural Earth (world-atlas, 1:50m), drawn
// as plain vector layers. No tile layer exists anywhere in the app, so no tile server is contacted.

import L from 'leaflet';
import { feature, mesh } from 'topojson-client';
import type { GeometryCollection, Topology } from 'topojson-specification';
import countries from 'world-atlas/countries-50m.json';

/** Adds land and borders to the map, under everything else; non-interactive. */
export function addBasemap(map: L.Map, renderer: L.Renderer): void {
  const topology = countries as unknown as Topology<{ land: GeometryCollection; countries: GeometryCollection }>;
  const land = feature(topology, topology.objects.land);
  const borders = mesh(topology, topology.objects.countries, (a, b) => a !== b);
  // GeoJSON hands its options to the paths it creates, so they draw on the shared canvas renderer.
  const onCanvas = (options: L.GeoJSONOptions): L.GeoJSONOptions => ({ ...options, renderer } as L.GeoJSONOptions);
  L.geoJSON(land, onCanvas({ interactive: false, style: { stroke: false, fillColor: '#ece8dc', fillOpacity: 1 } })).addTo(map);
  L.geoJSON(borders, onCanvas({ interactive: false, style: { color: '#b4ab96', weight: 0.8, opacity: 1, fill: false } })).addTo(map);
}
