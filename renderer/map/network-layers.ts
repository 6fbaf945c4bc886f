// Builds the network's Leaflet layers: all lanes as one multi-line on the canvas renderer (one
// layer, so 50,000 lanes stay smooth), the route tree, the selected route, rebate loops, depots.

import L from 'leaflet';
import type { NetworkView, RouteView, SolveView } from '../worker/protocol';
import { MAX_DIAMONDS, STYLE } from './map-style';

type Segments = L.LatLngExpression[][];

function segmentsOf(network: NetworkView, lanes: ArrayLike<number>): Segments {
  const out: Segments = [];
  for (let i = 0; i < lanes.length; i++) {
    const e = lanes[i];
    const a = network.laneFrom[e];
    const b = network.laneTo[e];
    out.push([
      [network.lat[a], network.lon[a]],
      [network.lat[b], network.lon[b]],
    ]);
  }
  return out;
}

/** Every lane, thin and grey. */
export function laneLayer(network: NetworkView, renderer: L.Renderer): L.Layer {
  const all = new Int32Array(network.laneFrom.length).map((_, i) => i);
  return L.polyline(segmentsOf(network, all), { ...STYLE.lane, renderer, interactive: false });
}

/** The cheapest-route tree from the origin. */
export function treeLayer(network: NetworkView, solve: SolveView, renderer: L.Renderer): L.Layer {
  return L.polyline(segmentsOf(network, solve.treeLanes), { ...STYLE.tree, renderer, interactive: false });
}

/** The selected route: a dark casing under a bright line, so it reads on any background. */
export function routeLayer(network: NetworkView, route: RouteView, renderer: L.Renderer): L.Layer {
  const segments = segmentsOf(network, route.lanes);
  return L.layerGroup([
    L.polyline(segments, { ...STYLE.route, renderer, interactive: false }),
    L.polyline(segments, { ...STYLE.routeInner, renderer, interactive: false }),
  ]);
}

/** Rebate loops: heavy dashed lines with a permanent text label on each loop. */
export function loopLayer(network: NetworkView, solve: SolveView, renderer: L.Renderer): L.Layer {
  const group = L.layerGroup();
  solve.loops.forEach((loop, i) => {
    const line = L.polyline(segmentsOf(network, loop.lanes), { ...STYLE.loop, renderer, interactive: false });
    group.addLayer(line);
    const lats = loop.depots.map((d) => network.lat[d]);
    const lons = loop.depots.map((d) => network.lon[d]);
    const centre: L.LatLngExpression = [lats.reduce((a, b) => a + b, 0) / lats.length, lons.reduce((a, b) => a + b, 0) / lons.length];
    const label = `Rebate loop ${i + 1}: ${loop.depots.map((d) => network.depotIds[d]).join(' → ')} → ${network.depotIds[loop.depots[0]]}`;
    group.addLayer(L.tooltip({ permanent: true, direction: 'center', className: 'lw-loop-label' }).setLatLng(centre).setContent(label));
  });
  return group;
}

export interface DepotHandlers {
  onSelect(depot: number): void;
}

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

// The label names the depot for screen readers (and for tests looking at the map).
function diamond(id: string): L.DivIcon {
  return L.divIcon({
    className: 'lw-unbounded-marker',
    // Leaflet positions the icon with a transform, so the rotated diamond is an inner element.
    html: `<span class="lw-diamond" role="img" aria-label="${escapeHtml(id)}: cost unbounded"><span>∞</span></span>`,
    iconSize: [22, 22],
    iconAnchor: [11, 11],
  });
}

/** Depot markers by status: circles for bounded depots, diamonds marked ∞ for unbounded ones. */
export function depotLayer(network: NetworkView, solve: SolveView | null, selected: number | null, renderer: L.Renderer, handlers: DepotHandlers): L.Layer {
  const group = L.layerGroup();
  const unboundedCount = solve ? solve.status.reduce((n, s) => n + (s === 2 ? 1 : 0), 0) : 0;
  for (let d = 0; d < network.depotIds.length; d++) {
    const at: L.LatLngExpression = [network.lat[d], network.lon[d]];
    const status = solve ? solve.status[d] : -1;
    const title = `${network.depotIds[d]} · ${network.depotNames[d]}`;
    let marker: L.Layer;
    if (status === 2 && unboundedCount <= MAX_DIAMONDS) {
      marker = L.marker(at, { icon: diamond(network.depotIds[d]), title: `${title} (cost unbounded: rebate loop)`, alt: network.depotIds[d], keyboard: false });
    } else {
      const style = solve && d === solve.origin ? STYLE.origin : d === selected ? STYLE.selected : status === 1 ? STYLE.reachable : status === 0 ? STYLE.unreachable : status === 2 ? { ...STYLE.unreachable, color: STYLE.loop.color, weight: 3 } : STYLE.depot;
      marker = L.circleMarker(at, { ...style, renderer }).bindTooltip(title, { direction: 'top' });
    }
    marker.on('click', () => handlers.onSelect(d));
    group.addLayer(marker);
  }
  if (solve) {
    const o = solve.origin;
    group.addLayer(L.tooltip({ permanent: true, direction: 'right', offset: [10, 0], className: 'lw-origin-label' }).setLatLng([network.lat[o], network.lon[o]]).setContent(`Origin ${network.depotIds[o]}`));
  }
  return group;
}
