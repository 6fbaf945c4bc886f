// Builds the network's Leaflet layers for the few lanes drawn on top (the selected route, rebate
// loops, lanes a scenario adds) and the depots of a small network. All lanes and the route tree are
// painted on canvases of their own (lane-canvas.ts), with level of detail.

import L from 'leaflet';
import { addedLaneLabel, addedLaneOf, type AddedLane } from '../model/added-lanes';
import type { NetworkView, RouteView, SolveView } from '../worker/protocol';
import { textNode } from './dom-text';
import { MAX_DIAMONDS, STYLE } from './map-style';
import { OffsetLines } from './offset-lanes';
import { offsetFor } from './two-way';

type Segments = L.LatLngExpression[][];

/**
 * Lines of these lanes; a lane whose reverse is in the network (`laneReverse`, found by the worker)
 * is shifted right of its direction (offset-lanes.ts).
 */
function linesOf(network: NetworkView, lanes: ArrayLike<number>, style: L.PolylineOptions & { weight: number }, renderer: L.Renderer, added: readonly AddedLane[] = [], shift = offsetFor(style.weight)): L.Polyline {
  const drawn: number[] = [];
  const segments = segmentsOf(network, lanes, added, [], drawn);
  const offsets = new Float32Array(segments.length);
  for (let i = 0; i < segments.length; i++) if (drawn[i] >= 0 && network.laneReverse[drawn[i]] === 1) offsets[i] = shift;
  return new OffsetLines(segments, { ...style, renderer, interactive: false, lwOffsets: offsets });
}

function segmentsOf(network: NetworkView, lanes: ArrayLike<number>, added: readonly AddedLane[] = [], ends: number[] = [], drawn: number[] = []): Segments {
  const out: Segments = [];
  for (let i = 0; i < lanes.length; i++) {
    const e = lanes[i];
    // A lane only the scenario plans is not in the network: its ends come from the solve's list.
    const extra = e < 0 ? addedLaneOf(added, e) : undefined;
    const known = e >= 0 && e < network.laneFrom.length;
    const a = extra ? extra.from : known ? network.laneFrom[e] : -1;
    const b = extra ? extra.to : known ? network.laneTo[e] : -1;
    if (a < 0 || b < 0) continue;
    ends.push(a, b);
    drawn.push(e);
    out.push([
      [network.lat[a], network.lon[a]],
      [network.lat[b], network.lon[b]],
    ]);
  }
  return out;
}

/** The selected route: a dark casing under a bright line, so it reads on any background. */
export function routeLayer(network: NetworkView, route: RouteView, added: readonly AddedLane[], renderer: L.Renderer): L.Layer {
  // Casing and line share the casing's shift, so the bright line stays centred on it.
  const shift = offsetFor(STYLE.route.weight);
  return L.layerGroup([linesOf(network, route.lanes, STYLE.route, renderer, added, shift), linesOf(network, route.lanes, STYLE.routeInner, renderer, added, shift)]);
}

/** Rebate loops: heavy dashed lines with a permanent text label on each loop. */
export function loopLayer(network: NetworkView, solve: SolveView, added: readonly AddedLane[], renderer: L.Renderer): L.Layer {
  const group = L.layerGroup();
  solve.loops.forEach((loop, i) => {
    group.addLayer(linesOf(network, loop.lanes, STYLE.loop, renderer, added));
    const lats = loop.depots.map((d) => network.lat[d]);
    const lons = loop.depots.map((d) => network.lon[d]);
    const centre: L.LatLngExpression = [lats.reduce((a, b) => a + b, 0) / lats.length, lons.reduce((a, b) => a + b, 0) / lons.length];
    const label = `Rebate loop ${i + 1}: ${loop.depots.map((d) => network.depotIds[d]).join(' → ')} → ${network.depotIds[loop.depots[0]]}`;
    group.addLayer(L.tooltip({ permanent: true, direction: 'center', className: 'lw-loop-label' }).setLatLng(centre).setContent(textNode(label)));
  });
  return group;
}

/** Lanes only the scenario plans: dotted lines over a casing, each with a permanent label ("Added", "Valid by scenario"). */
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
    group.addLayer(L.tooltip({ permanent: true, direction: 'center', className: 'lw-added-label' }).setLatLng(middle).setContent(textNode(addedLaneLabel(a))));
  }
  return group;
}

export interface DepotHandlers {
  onSelect(depot: number): void;
  /** Double-click: plan from this depot. */
  onPlanFrom(depot: number): void;
}

// The label names the depot for screen readers (and for tests looking at the map).
function diamond(id: string): L.DivIcon {
  // Leaflet positions the icon with a transform, so the rotated diamond is an inner element.
  const shape = textNode('', 'lw-diamond');
  shape.setAttribute('role', 'img');
  shape.setAttribute('aria-label', `${id}: cost unbounded`);
  shape.append(textNode('∞'));
  return L.divIcon({
    className: 'lw-unbounded-marker',
    html: shape,
    iconSize: [22, 22],
    iconAnchor: [11, 11],
  });
}

/** One canvas circle per depot, created once per network; styles follow the solve (styleDepots). */
export function depotMarkers(network: NetworkView, renderer: L.Renderer, handlers: DepotHandlers): { layer: L.LayerGroup; markers: L.CircleMarker[] } {
  const markers: L.CircleMarker[] = [];
  for (let d = 0; d < network.depotIds.length; d++) {
    const marker = L.circleMarker([network.lat[d], network.lon[d]], { ...STYLE.depot, renderer }).bindTooltip(() => textNode(`${network.depotIds[d]} · ${network.depotNames[d]}`), { direction: 'top' });
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
  group.addLayer(L.tooltip({ permanent: true, direction: 'right', offset: [10, 0], className: 'lw-origin-label' }).setLatLng([network.lat[o], network.lon[o]]).setContent(textNode(`Origin ${network.depotIds[o]}${solve.status[o] === 2 ? ' · ∞ unbounded' : ''}`)));
  return group;
}
