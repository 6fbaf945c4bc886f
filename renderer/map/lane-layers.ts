// The map's two lane canvases (every lane, thinned; the route tree), painted by the paint worker on
// an OffscreenCanvas (offscreen-layer.ts) or, where OffscreenCanvas is missing, on the UI thread
// (PaintLayer in lane-canvas.ts) with the same drawing code (lane-paint.ts).

import type L from 'leaflet';
import type { AddedLane } from '../model/added-lanes';
import type { NetworkView } from '../worker/protocol';
import { layerTransform, mercatorOf, PaintLayer, viewBoxOf } from './lane-canvas';
import { paintAllLanes, strokeLanes, type AddedEnds, type LaneCounts, type LanePaintData, type LineStyle } from './lane-paint';
import { OffscreenPaintLayer } from './offscreen-layer';
import { offscreenPaintAvailable, type AddedLaneEnds, type CanvasContent } from './paint/paint-client';

export interface LaneLayer {
  addTo(map: L.Map): unknown;
  remove(): unknown;
}

export interface LaneSetLayer extends LaneLayer {
  /** New lanes for the same canvas (a solve's route tree). */
  setLanes(lanes: Int32Array, added: readonly AddedLane[]): void;
}

function paintDataOf(network: NetworkView): LanePaintData {
  const { x, y } = mercatorOf(network);
  return { lat: network.lat, lon: network.lon, x, y, laneFrom: network.laneFrom, laneTo: network.laneTo, laneReverse: network.laneReverse, laneGrid: network.laneGrid };
}

function addedEndsOf(added: readonly AddedLane[]): AddedLaneEnds[] {
  return added.map((a) => ({ ref: a.ref, from: a.from, to: a.to }));
}

/** Every lane of the network, grey, culled to the view and thinned above the threshold; `onCounts` hears what each frame drew. */
export function allLanesLayer(pane: string, network: NetworkView, style: LineStyle, onCounts: (counts: LaneCounts) => void): LaneLayer {
  if (offscreenPaintAvailable()) return new OffscreenPaintLayer(pane, network, { kind: 'all-lanes', style }, (answer) => onCounts(answer.counts));
  const data = paintDataOf(network);
  return new PaintLayer(pane, (ctx, bounds, map) => onCounts(paintAllLanes(ctx, layerTransform(map), data, viewBoxOf(map, bounds), style)));
}

/** A set of lanes (the route tree), culled to the view; lanes the scenario adds are drawn from `added`. */
export function laneSetLayer(pane: string, network: NetworkView, lanes: Int32Array, added: readonly AddedLane[], style: LineStyle): LaneSetLayer {
  const content = (next: Int32Array, nextAdded: readonly AddedLane[]): CanvasContent => ({ kind: 'lane-set', lanes: next, added: addedEndsOf(nextAdded), style });
  if (offscreenPaintAvailable()) {
    const layer = new OffscreenPaintLayer(pane, network, content(lanes, added));
    return {
      addTo: (map) => layer.addTo(map),
      remove: () => layer.remove(),
      setLanes: (next, nextAdded) => layer.setCanvasContent(content(next, nextAdded)),
    };
  }
  const data = paintDataOf(network);
  let shown = lanes;
  let ends: AddedEnds = new Map();
  const setEnds = (list: readonly AddedLane[]) => (ends = new Map(list.map((a) => [a.ref, { from: a.from, to: a.to }])));
  setEnds(added);
  const layer = new PaintLayer(pane, (ctx, bounds, map) => void strokeLanes(ctx, layerTransform(map), data, shown, style, viewBoxOf(map, bounds), ends));
  return {
    addTo: (map) => layer.addTo(map),
    remove: () => layer.remove(),
    setLanes: (next, nextAdded) => {
      shown = next;
      setEnds(nextAdded);
      layer.repaint();
    },
  };
}
