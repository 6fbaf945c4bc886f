// Depots of a large network drawn as circles straight onto one canvas (50,000 Leaflet circle markers
// took seconds to make, and Leaflet tested every one of them on each mouse move). Only depots in view
// are drawn (depot-paint.ts), by the paint worker where OffscreenCanvas exists, else on the UI
// thread; clicks, double-clicks and the hover tooltip find the nearest depot drawn in the last frame.
// Styles follow the solve as the markers of a small network do (map-style.ts).

import L from 'leaflet';
import type { NetworkView, SolveView } from '../worker/protocol';
import { paintDepots, type DepotLook } from './depot-paint';
import { textNode } from './dom-text';
import { layerTransform, mercatorOf, PaintLayer, viewBoxOf } from './lane-canvas';
import type { DepotHandlers } from './network-layers';
import { OffscreenPaintLayer } from './offscreen-layer';
import { offscreenPaintAvailable, type CanvasContent } from './paint/paint-client';

/** More depots than this and they are drawn on the depot canvas instead of as markers. */
export const DEPOT_CANVAS_THRESHOLD = 2_000;

export interface DepotCanvas {
  /** New solve or selection: restyle on the next frame. */
  restyle(solve: SolveView | null, selected: number | null): void;
  /** Adds the layer and its pointer handling to `map`; returns the undo. */
  attach(map: L.Map): () => void;
}

export function depotCanvas(pane: string, network: NetworkView, handlers: DepotHandlers, onCounts: (drawn: number, inView: number) => void): DepotCanvas {
  let look: DepotLook = { status: null, origin: -1, selected: -1 };
  // Depots drawn in the last frame painted, for hit tests.
  let shown: Int32Array = new Int32Array(0);
  const scale = network.depotIds.length > 1000 ? 0.5 : 1;
  const content = (): CanvasContent => ({ kind: 'depots', look: { ...look, status: look.status ? Uint8Array.from(look.status) : null }, scale });
  let layer: { addTo(map: L.Map): unknown; remove(): unknown };
  let restyled: () => void;
  if (offscreenPaintAvailable()) {
    const offscreen = new OffscreenPaintLayer(pane, network, content(), (answer) => {
      shown = answer.shown ?? new Int32Array(0);
      onCounts(answer.counts.drawn, answer.counts.inView);
    });
    layer = offscreen;
    restyled = () => offscreen.setCanvasContent(content());
  } else {
    const points = { lat: network.lat, lon: network.lon, ...mercatorOf(network) };
    const painted = new PaintLayer(pane, (ctx, bounds, map) => {
      const result = paintDepots(ctx, layerTransform(map), points, viewBoxOf(map, bounds), look, scale);
      shown = result.shown;
      onCounts(shown.length, result.inView);
    });
    layer = painted;
    restyled = () => painted.repaint();
  }

  /** Nearest depot drawn within a few pixels of the container point, or -1. */
  const hit = (map: L.Map, containerPoint: L.Point): number => {
    const p = map.containerPointToLayerPoint(containerPoint);
    const m = mercatorOf(network);
    const t = layerTransform(map);
    let best = -1;
    let bestDistance = 8 * 8;
    for (let i = 0; i < shown.length; i++) {
      const d = shown[i];
      const dx = t.sx * m.x[d] + t.ox - p.x;
      const dy = t.sy * m.y[d] + t.oy - p.y;
      const distance = dx * dx + dy * dy;
      if (distance <= bestDistance) {
        bestDistance = distance;
        best = d;
      }
    }
    return best;
  };

  return {
    restyle(nextSolve, nextSelected) {
      look = { status: nextSolve?.status ?? null, origin: nextSolve?.origin ?? -1, selected: nextSelected ?? -1 };
      restyled();
    },
    attach(map) {
      layer.addTo(map);
      const tooltip = L.tooltip({ direction: 'top', offset: [0, -6] });
      let hovered = -1;
      const onMove = (event: L.LeafletMouseEvent) => {
        const d = hit(map, event.containerPoint);
        if (d === hovered) return;
        hovered = d;
        const container = map.getContainer();
        if (d < 0) {
          tooltip.remove();
          container.style.cursor = '';
          // A double-click away from depots zooms, as on any map.
          map.doubleClickZoom.enable();
          return;
        }
        container.style.cursor = 'pointer';
        // A double-click on a depot plans from it; it must not zoom as well.
        map.doubleClickZoom.disable();
        tooltip.setLatLng([network.lat[d], network.lon[d]]).setContent(textNode(`${network.depotIds[d]} · ${network.depotNames[d]}`));
        if (!map.hasLayer(tooltip)) tooltip.addTo(map);
      };
      const onClick = (event: L.LeafletMouseEvent) => {
        const d = hit(map, event.containerPoint);
        if (d >= 0) handlers.onSelect(d);
      };
      const onDouble = (event: L.LeafletMouseEvent) => {
        const d = hit(map, event.containerPoint);
        if (d >= 0) handlers.onPlanFrom(d);
      };
      map.on('mousemove', onMove);
      map.on('click', onClick);
      map.on('dblclick', onDouble);
      return () => {
        map.off('mousemove', onMove);
        map.off('click', onClick);
        map.off('dblclick', onDouble);
        tooltip.remove();
        map.doubleClickZoom.enable();
        map.getContainer().style.cursor = '';
        layer.remove();
      };
    },
  };
}
