// Depots of a large network drawn as circles straight onto one canvas (50,000 Leaflet circle markers
// took seconds to make, and Leaflet tested every one of them on each mouse move). Only depots in view
// are drawn; clicks, double-clicks and the hover tooltip find the nearest depot drawn in the last
// frame. Styles follow the solve as the markers of a small network do (map-style.ts).

import L from 'leaflet';
import type { NetworkView, SolveView } from '../worker/protocol';
import { textNode } from './dom-text';
import { layerTransform, mercatorOf, PaintLayer, viewBoxOf } from './lane-canvas';
import { STYLE } from './map-style';
import type { DepotHandlers } from './network-layers';

/** More depots than this and they are drawn on the depot canvas instead of as markers. */
export const DEPOT_CANVAS_THRESHOLD = 2_000;
/** Depots drawn per frame at most (the origin and the selection always); the map says when it thins them. */
export const MAX_DEPOTS_PER_FRAME = 6_000;
/**
 * More depots than this in a frame and solid styles are drawn as dots in their outline colour,
 * without the outline (stroking thousands of circles took most of a frame without a GPU); dashed
 * and unbounded rings keep their outline, so states still differ in more than colour.
 */
export const DENSE_DEPOTS = 2_000;

type DepotStyle = { radius: number; color: string; weight: number; fillColor: string; fillOpacity: number; dashArray?: string };

function styleOf(solve: SolveView | null, selected: number | null, d: number): DepotStyle {
  if (solve && d === solve.origin) return STYLE.origin;
  if (d === selected) return STYLE.selected;
  const status = solve ? solve.status[d] : -1;
  if (status === 1) return STYLE.reachable;
  if (status === 0) return STYLE.unreachable;
  if (status === 2) return { ...STYLE.unreachable, color: STYLE.loop.color, weight: 3, fillOpacity: 1 };
  return STYLE.depot;
}

export interface DepotCanvas {
  layer: PaintLayer;
  /** New solve or selection: restyle on the next frame. */
  restyle(solve: SolveView | null, selected: number | null): void;
  /** Adds the layer and its pointer handling to `map`; returns the undo. */
  attach(map: L.Map): () => void;
}

export function depotCanvas(pane: string, network: NetworkView, handlers: DepotHandlers, onCounts: (drawn: number, inView: number) => void): DepotCanvas {
  let solve: SolveView | null = null;
  let selected: number | null = null;
  // Depots drawn in the last frame with their layer pixels, for hit tests.
  let shown = new Int32Array(0);
  let shownX = new Float32Array(0);
  let shownY = new Float32Array(0);
  const scale = network.depotIds.length > 1000 ? 0.5 : 1;

  const layer = new PaintLayer(pane, (ctx, bounds, map) => {
    const m = mercatorOf(network);
    const t = layerTransform(map);
    const view = viewBoxOf(map, bounds);
    const n = network.lat.length;
    let inView: number[] = [];
    for (let d = 0; d < n; d++) {
      const lat = network.lat[d];
      const lon = network.lon[d];
      if (lat >= view.south && lat <= view.north && lon >= view.west && lon <= view.east) inView.push(d);
    }
    const inViewCount = inView.length;
    if (inView.length > MAX_DEPOTS_PER_FRAME) {
      // An even stride over depots in file order, plus the origin and the selection.
      const step = inView.length / MAX_DEPOTS_PER_FRAME;
      const kept = Array.from({ length: MAX_DEPOTS_PER_FRAME }, (_, j) => inView[Math.floor(j * step)]);
      for (const d of [solve?.origin ?? -1, selected ?? -1]) if (d >= 0 && inView.includes(d) && !kept.includes(d)) kept.push(d);
      inView = kept;
    }
    onCounts(inView.length, inViewCount);
    shown = Int32Array.from(inView);
    shownX = new Float32Array(shown.length);
    shownY = new Float32Array(shown.length);
    // One path per style: the origin and the selection last, so they sit on top.
    const groups = new Map<DepotStyle, number[]>();
    const special: number[] = [];
    shown.forEach((d, i) => {
      shownX[i] = t.sx * m.x[d] + t.ox;
      shownY[i] = t.sy * m.y[d] + t.oy;
      if ((solve && d === solve.origin) || d === selected) return void special.push(i);
      const style = styleOf(solve, selected, d);
      let list = groups.get(style);
      if (!list) groups.set(style, (list = []));
      list.push(i);
    });
    const dense = shown.length > DENSE_DEPOTS;
    const paint = (given: DepotStyle, items: number[], radius: number) => {
      const style = dense && !given.dashArray && given.weight < 3 ? { ...given, fillColor: given.color, weight: 0 } : given;
      ctx.beginPath();
      for (const i of items) {
        ctx.moveTo(shownX[i] + radius, shownY[i]);
        ctx.arc(shownX[i], shownY[i], radius, 0, 2 * Math.PI);
      }
      ctx.globalAlpha = style.fillOpacity;
      ctx.fillStyle = style.fillColor;
      ctx.fill();
      ctx.globalAlpha = 1;
      if (style.weight > 0) {
        ctx.setLineDash(style.dashArray ? style.dashArray.split(' ').map(Number) : []);
        ctx.lineWidth = style.weight;
        ctx.strokeStyle = style.color;
        ctx.stroke();
        ctx.setLineDash([]);
      }
    };
    for (const [style, items] of groups) paint(style, items, Math.max(2, style.radius * scale));
    for (const i of special) {
      const style = styleOf(solve, selected, shown[i]);
      paint(style, [i], style.radius);
    }
  });

  /** Nearest depot drawn within a few pixels of the container point, or -1. */
  const hit = (map: L.Map, containerPoint: L.Point): number => {
    const p = map.containerPointToLayerPoint(containerPoint);
    let best = -1;
    let bestDistance = 8 * 8;
    for (let i = 0; i < shown.length; i++) {
      const dx = shownX[i] - p.x;
      const dy = shownY[i] - p.y;
      const distance = dx * dx + dy * dy;
      if (distance <= bestDistance) {
        bestDistance = distance;
        best = shown[i];
      }
    }
    return best;
  };

  return {
    layer,
    restyle(nextSolve, nextSelected) {
      solve = nextSolve;
      selected = nextSelected;
      layer.repaint();
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
