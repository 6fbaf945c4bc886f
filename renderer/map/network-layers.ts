// Builds the network's Leaflet layers: all lanes as one multi-line on the canvas renderer (one
// layer, so 50,000 lanes stay smooth), the route tree, the selected route, rebate loops, depots.

import L from 'leaflet';
import { addedLaneName, addedLaneOf, type AddedLane } from '../model/added-lanes';
import type { NetworkView, RouteView, SolveView } from '../worker/protocol';
import { MAX_DIAMONDS, STYLE } from './map-style';

type Segments = L.LatLngExpression[][];

function segmentsOf(network: NetworkView, lanes: ArrayLike<number>, added: readonly AddedLane[] = []): Segments {
  const out: Segments = [];
  for (let i = 0; i < lanes.length; i++) {
    const e = lanes[i];
    // A lane the scenario adds is not in the network: its ends come from its change.
    const extra = e < 0 ? addedLaneOf(added, e) : undefined;
    const known = e >= 0 && e < network.laneFrom.length;
    const a = extra ? extra.from : known ? network.laneFrom[e] : -1;
    const b = extra ? extra.to : known ? network.laneTo[e] : -1;
    if (a < 0 || b < 0) continue;
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
export function treeLayer(network: NetworkView, treeLanes: Int32Array, added: readonly AddedLane[], renderer: L.Renderer): L.Layer {
  return L.polyline(segmentsOf(network, treeLanes, added), { ...STYLE.tree, renderer, interactive: false });
}

/** The selected route: a dark casing under a bright line, so it reads on any background. */
export function routeLayer(network: NetworkView, route: RouteView, added: readonly AddedLane[], renderer: L.Renderer): L.Layer {
  const segments = segmentsOf(network, route.lanes, added);
  return L.layerGroup([
    L.polyline(segments, { ...STYLE.route, renderer, interactive: false }),
    L.polyline(segments, { ...STYLE.routeInner, renderer, interactive: false }),
  ]);
}

/** Rebate loops: heavy dashed lines with a permanent text label on each loop. */
export function loopLayer(network: NetworkView, solve: SolveView, added: readonly AddedLane[], renderer: L.Renderer): L.Layer {
  const group = L.layerGroup();
  solve.loops.forEach((loop, i) => {
    const line = L.polyline(segmentsOf(network, loop.lanes, added), { ...STYLE.loop, renderer, interactive: false });
    group.addLayer(line);
    const lats = loop.depots.map((d) => network.lat[d]);
    const lons = loop.depots.map((d) => network.lon[d]);
    const centre: L.LatLngExpression = [lats.reduce((a, b) => a + b, 0) / lats.length, lons.reduce((a, b) => a + b, 0) / lons.length];
    const label = `Rebate loop ${i + 1}: ${loop.depots.map((d) => network.depotIds[d]).join(' → ')} → ${network.depotIds[loop.depots[0]]}`;
    group.addLayer(L.tooltip({ permanent: true, direction: 'center', className: 'lw-loop-label' }).setLatLng(centre).setContent(label));
  });
  return group;
}

/** Lanes the scenario adds: dotted lines over a casing, each with a permanent "added" label. */
export function addedLaneLayer(network: NetworkView, added: readonly AddedLane[], renderer: L.Renderer): L.Layer | null {
  const drawable = added.filter((a) => a.from >= 0 && a.to >= 0);
  if (drawable.length === 0) return null;
  const group = L.layerGroup();
  for (const a of drawable) {
    const ends: L.LatLngExpression[] = [
      [network.lat[a.from], network.lon[a.from]],
      [network.lat[a.to], network.lon[a.to]],
    ];
    group.addLayer(L.polyline(ends, { ...STYLE.addedCasing, renderer, interactive: false }));
    group.addLayer(L.polyline(ends, { ...STYLE.added, renderer, interactive: false }));
    const middle: L.LatLngExpression = [(network.lat[a.from] + network.lat[a.to]) / 2, (network.lon[a.from] + network.lon[a.to]) / 2];
    group.addLayer(L.tooltip({ permanent: true, direction: 'center', className: 'lw-added-label' }).setLatLng(middle).setContent(escapeHtml(`Added: ${addedLaneName(a.lane)}`)));
  }
  return group;
}

export interface DepotHandlers {
  onSelect(depot: number): void;
  /** Double-click: plan from this depot. */
  onPlanFrom(depot: number): void;
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

/** One canvas circle per depot, created once per network; styles follow the solve (styleDepots). */
export function depotMarkers(network: NetworkView, renderer: L.Renderer, handlers: DepotHandlers): { layer: L.LayerGroup; markers: L.CircleMarker[] } {
  const markers: L.CircleMarker[] = [];
  for (let d = 0; d < network.depotIds.length; d++) {
    const marker = L.circleMarker([network.lat[d], network.lon[d]], { ...STYLE.depot, renderer }).bindTooltip(`${network.depotIds[d]} · ${network.depotNames[d]}`, { direction: 'top' });
    marker.on('click', () => handlers.onSelect(d));
    marker.on('dblclick', (event) => {
      L.DomEvent.stop(event); // not the map's double-click zoom
      handlers.onPlanFrom(d);
    });
    markers.push(marker);
  }
  return { layer: L.layerGroup(markers), markers };
}

function unboundedCount(solve: SolveView): number {
  let n = 0;
  for (let d = 0; d < solve.status.length; d++) if (solve.status[d] === 2) n++;
  return n;
}

/** Restyles the depot circles for a solve: origin, selection, reachable, unreachable (dashed), unbounded (ring). */
export function styleDepots(markers: readonly L.CircleMarker[], solve: SolveView | null, selected: number | null): void {
  const ringsOnly = solve !== null && unboundedCount(solve) > MAX_DIAMONDS;
  // Thousands of depots: smaller circles, so the lanes between them stay visible.
  const scale = markers.length > 1000 ? 0.5 : 1;
  markers.forEach((marker, d) => {
    const status = solve ? solve.status[d] : -1;
    // Restyling a canvas circle schedules a redraw of its area; thousands of unchanged ones are skipped.
    const key = `${status}|${solve !== null && d === solve.origin}|${d === selected}|${ringsOnly}`;
    const withKey = marker as L.CircleMarker & { lwStyleKey?: string };
    if (withKey.lwStyleKey === key) return;
    withKey.lwStyleKey = key;
    const style =
      solve && d === solve.origin
        ? STYLE.origin
        : d === selected
          ? STYLE.selected
          : status === 1
            ? STYLE.reachable
            : status === 0
              ? STYLE.unreachable
              : status === 2
                ? { ...STYLE.unreachable, color: STYLE.loop.color, weight: ringsOnly ? 3 : 0, fillOpacity: ringsOnly ? 1 : 0 }
                : STYLE.depot;
    marker.setStyle({ dashArray: undefined, ...style });
    marker.setRadius(Math.max(2, style.radius * scale));
  });
}

/** Unbounded depots as diamonds marked ∞, plus the origin's label; rebuilt per solve (few elements). */
export function solveMarkers(network: NetworkView, solve: SolveView, handlers: DepotHandlers): L.Layer {
  const group = L.layerGroup();
  if (unboundedCount(solve) <= MAX_DIAMONDS) {
    for (let d = 0; d < solve.status.length; d++) {
      if (solve.status[d] !== 2) continue;
      const title = `${network.depotIds[d]} · ${network.depotNames[d]} (cost unbounded: rebate loop)`;
      const marker = L.marker([network.lat[d], network.lon[d]], { icon: diamond(network.depotIds[d]), title, alt: network.depotIds[d], keyboard: false });
      marker.on('click', () => handlers.onSelect(d));
      marker.on('dblclick', (event) => {
        L.DomEvent.stop(event);
        handlers.onPlanFrom(d);
      });
      group.addLayer(marker);
    }
  }
  const o = solve.origin;
  group.addLayer(L.tooltip({ permanent: true, direction: 'right', offset: [10, 0], className: 'lw-origin-label' }).setLatLng([network.lat[o], network.lon[o]]).setContent(`Origin ${escapeHtml(network.depotIds[o])}${solve.status[o] === 2 ? ' · ∞ unbounded' : ''}`));
  return group;
}
