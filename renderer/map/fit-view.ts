// Fitting the whole network into the map at any window size: the network is kept clear of the
// corner that holds the map tools and key, by padding either the right side (key's width) or the
// top (key's height), whichever leaves the larger zoom.

import L from 'leaflet';
import type { NetworkView } from '../worker/protocol';

// Room for the zoom buttons (left), the attribution line (bottom) and a margin on every side.
const LEFT = 44;
const EDGE = 14;
const BOTTOM = 24;

/** The corner box (tools and key) as width and height in pixels, with its gap to the map's edge. */
function cornerSize(corner: HTMLElement | null): { w: number; h: number } {
  if (!corner) return { w: 0, h: 0 };
  return { w: corner.offsetWidth + 8, h: corner.offsetHeight + 8 };
}

export function fitNetwork(map: L.Map, bounds: L.LatLngBounds, corner: HTMLElement | null): void {
  if (!bounds.isValid()) return;
  const { w, h } = cornerSize(corner);
  const right = { paddingTopLeft: L.point(LEFT, EDGE), paddingBottomRight: L.point(w + EDGE, BOTTOM) };
  const top = { paddingTopLeft: L.point(LEFT, h + EDGE), paddingBottomRight: L.point(EDGE, BOTTOM) };
  const zoomOf = (p: typeof right) => map.getBoundsZoom(bounds, false, p.paddingTopLeft.add(p.paddingBottomRight));
  const padding = zoomOf(top) >= zoomOf(right) ? top : right;
  // A single depot (or none apart) would zoom in without end.
  map.fitBounds(bounds, { ...padding, maxZoom: 11, animate: false });
}

/** Depots drawn inside the map's box and not under the corner's tools and key. */
export function depotsInView(map: L.Map, network: NetworkView, corner: HTMLElement | null): number {
  const size = map.getSize();
  const { w, h } = cornerSize(corner);
  // Depots outside the view's latitude / longitude box are not projected at all (50,000 depots).
  const box = map.getBounds();
  const south = box.getSouth(), north = box.getNorth(), west = box.getWest(), east = box.getEast();
  let n = 0;
  for (let d = 0; d < network.depotIds.length; d++) {
    if (network.lat[d] < south || network.lat[d] > north || network.lon[d] < west || network.lon[d] > east) continue;
    const p = map.latLngToContainerPoint([network.lat[d], network.lon[d]]);
    if (p.x < 0 || p.y < 0 || p.x > size.x || p.y > size.y) continue;
    if (p.x > size.x - w && p.y < h) continue;
    n++;
  }
  return n;
}
