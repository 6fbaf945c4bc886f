// Depot ids as text labels beside the depots, shown only when zoomed in far enough that they do not
// pile up, and only for the depots in view (a 5,000-depot network never gets 5,000 labels).

import L from 'leaflet';
import type { NetworkView } from '../worker/protocol';
import { textNode } from './dom-text';

/** Labels appear from this zoom level on (about a region the size of a country's province). */
export const LABEL_MIN_ZOOM = 7;
/** More depots than this in view and no labels are drawn (they would hide the map). */
export const MAX_LABELS = 250;

/** The label layer for the current view, or null when zoomed out or too many depots are in view. */
export function depotLabelLayer(map: L.Map, network: NetworkView): L.Layer | null {
  if (map.getZoom() < LABEL_MIN_ZOOM) return null;
  const view = map.getBounds().pad(0.1);
  const inView: number[] = [];
  for (let d = 0; d < network.depotIds.length; d++) {
    if (!view.contains([network.lat[d], network.lon[d]])) continue;
    inView.push(d);
    if (inView.length > MAX_LABELS) return null;
  }
  const group = L.layerGroup();
  for (const d of inView) {
    group.addLayer(L.tooltip({ permanent: true, direction: 'bottom', offset: [0, 4], className: 'lw-depot-label', interactive: false }).setLatLng([network.lat[d], network.lon[d]]).setContent(textNode(network.depotIds[d])));
  }
  return group;
}
