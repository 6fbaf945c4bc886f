// A load's route from the Loads panel, and on request its alternatives: the best route solid over a
// casing, each alternative dashed in its own pattern with a text label ("Alt 1 +12.40"), so they are
// told apart without colour. Routes are depot sequences (a load may be priced for another day).

import L from 'leaflet';
import type { NetworkView } from '../worker/protocol';
import { textNode } from './dom-text';

export interface LoadRouteDrawing {
  /** Depot ids in travel order. */
  path: string[];
  /** Shown on the map for alternatives; null for the best route. */
  label: string | null;
}

const DASHES = ['10 6', '2 6', '14 4 2 4', '6 6 2 6'];


export function loadRouteLayer(network: NetworkView, routes: readonly LoadRouteDrawing[], renderer: L.Renderer): L.Layer | null {
  const index = new Map(network.depotIds.map((id, i) => [id, i]));
  const group = L.layerGroup();
  let alt = 0;
  for (const route of routes) {
    const points = route.path.map((id) => index.get(id)).filter((d): d is number => d !== undefined).map((d) => [network.lat[d], network.lon[d]] as L.LatLngTuple);
    if (points.length < 2) continue;
    if (route.label === null) {
      group.addLayer(L.polyline(points, { renderer, interactive: false, color: '#1b1b1b', weight: 9, opacity: 0.85 }));
      group.addLayer(L.polyline(points, { renderer, interactive: false, color: '#ffd23f', weight: 5, opacity: 1 }));
    } else {
      group.addLayer(L.polyline(points, { renderer, interactive: false, color: '#1b1b1b', weight: 4, opacity: 0.9, dashArray: DASHES[alt % DASHES.length] }));
      const middle = points[Math.floor(points.length / 2)];
      group.addLayer(L.tooltip({ permanent: true, direction: 'right', className: 'lw-loop-label' }).setLatLng(middle).setContent(textNode(route.label)));
      alt++;
    }
  }
  return group;
}
