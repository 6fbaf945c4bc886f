// Fitting the whole network into the map at any window size: the network is kept clear of the
// corner that holds the map tools and key, by padding either the right side (key's width) or the
// top (key's height), whichever leaves the larger zoom.

import L from 'leaflet';
import type { NetworkView } from '../worker/protocol';
import { layerTransform, mercatorOf } from './lane-canvas';

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
  // Projected with the arithmetic the lane canvas uses (no Leaflet point per depot: 50,000 depots).
  const m = mercatorOf(network);
  const t = layerTransform(map);
  const shift = map.latLngToContainerPoint([0, 0]).subtract(map.latLngToLayerPoint([0, 0]));
  let n = 0;
  for (let d = 0; d < network.depotIds.length; d++) {
    const x = t.sx * m.x[d] + t.ox + shift.x;
    const y = t.sy * m.y[d] + t.oy + shift.y;
    if (x < 0 || y < 0 || x > size.x || y > size.y) continue;
    if (x > size.x - w && y < h) continue;
    n++;
  }
  return n;
}
